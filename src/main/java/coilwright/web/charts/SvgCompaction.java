package coilwright.web.charts;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Makes the SVG JFreeSVG writes small enough to inline several charts in one page without changing what a reader
 * sees: curves keep only the points that move the drawn line by more than {@link #TOLERANCE_PX} (and always their
 * highest and lowest point), coordinates are written to 0.1 px, colours as hex, attributes equal to their defaults
 * or to a clip as large as the drawing are left out, and runs of lines or rectangles drawn alike share one group.
 */
final class SvgCompaction {
    /** Largest distance, in px of the drawing, between a curve as drawn and the curve through every point. */
    static final double TOLERANCE_PX = 0.25;

    private static final Pattern PATH_D = Pattern.compile("\\bd='([ML0-9.,\\-E ]+)'");
    private static final Pattern POINT = Pattern.compile("([ML])\\s*(-?[0-9.E\\-]+)[, ](-?[0-9.E\\-]+)");
    private static final Pattern RGB = Pattern.compile("rgb\\((\\d+),(\\d+),(\\d+)\\)");
    private static final Pattern ATTR = Pattern.compile("([a-z0-9:-]+)=(?:'([^']*)'|\"([^\"]*)\")");
    /** A self-closing line or rectangle, or a text with plain content. */
    private static final Pattern ELEMENT = Pattern.compile(
            "<(line|rect)((?: [a-z0-9:-]+=(?:'[^']*'|\"[^\"]*\"))*)/>|<text((?: [a-z0-9:-]+=(?:'[^']*'|\"[^\"]*\"))*)>([^<]*)</text>");
    private static final List<String> GEOMETRY = List.of("x", "y", "x1", "y1", "x2", "y2", "width", "height",
            "transform");
    /** Stroke joins and miters have no effect on a straight line. */
    private static final List<String> NOT_FOR_LINES = List.of("stroke-miterlimit", "stroke-linejoin");

    private SvgCompaction() {
    }

    /** The compact form of one chart drawn by JFreeSVG (after its styles became presentation attributes). */
    static String compact(String svg, String id, int widthPx, int heightPx, double tolerancePx) {
        String s = svg.replace(" fill-opacity=\"1.0\"", "").replace(" stroke-opacity=\"1.0\"", "")
                .replace(" xmlns:jfreesvg='http://www.jfree.org/jfreesvg/svg'", "");
        if (!s.contains("xlink:")) {
            s = s.replace(" xmlns:xlink='http://www.w3.org/1999/xlink'", "");
        }
        String wholeClip = "<clipPath id='" + id + "-clip-0'><path d='M0,0L" + widthPx + ",0L" + widthPx + ","
                + heightPx + "L0," + heightPx + "L0,0Z'/></clipPath>";
        if (s.contains(wholeClip)) {
            s = s.replace(wholeClip, "").replace(" clip-path='url(#" + id + "-clip-0)'", "");
        }
        s = s.replaceAll("<g>(<text[^>]*>[^<]*</text>)</g>", "$1");
        if (s.contains("font-family=\"sans-serif\"")) {
            s = s.replace(" font-family=\"sans-serif\"", "").replaceFirst("<svg ", "<svg font-family=\"sans-serif\" ");
        }
        s = replaceAll(RGB, s, m -> String.format(Locale.ROOT, "#%02x%02x%02x", Integer.parseInt(m.group(1)),
                Integer.parseInt(m.group(2)), Integer.parseInt(m.group(3))));
        s = replaceAll(PATH_D, s, m -> "d='" + simplifiedPath(m.group(1), tolerancePx) + "'");
        return groupRuns(s);
    }

    /**
     * A path of straight segments with the points a reader cannot see dropped: Douglas-Peucker (Douglas and
     * Peucker, Canadian Cartographer 10(2), 1973) within {@code tolerancePx}, run separately on each side of the
     * highest and lowest point so those always stay. Coordinates are px of the drawing.
     */
    static String simplifiedPath(String d, double tolerancePx) {
        Matcher m = POINT.matcher(d);
        StringBuilder out = new StringBuilder();
        List<double[]> run = new ArrayList<>();
        int end = 0;
        while (m.find()) {
            if (m.group(1).equals("M") && !run.isEmpty()) {
                append(out, run, tolerancePx);
                run.clear();
            }
            run.add(new double[] {Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3))});
            end = m.end();
        }
        if (run.isEmpty()) {
            return d;
        }
        append(out, run, tolerancePx);
        return out + d.substring(end).strip();
    }

    private static void append(StringBuilder out, List<double[]> points, double tolerancePx) {
        boolean[] keep = visible(points, tolerancePx);
        String command = "M";
        for (int i = 0; i < points.size(); i++) {
            if (keep[i]) {
                out.append(command).append(tenth(points.get(i)[0])).append(',').append(tenth(points.get(i)[1]));
                command = "L";
            }
        }
    }

    /** Which points to keep: the ends, the highest and lowest, and every one farther than the tolerance. */
    static boolean[] visible(List<double[]> points, double tolerancePx) {
        int n = points.size();
        boolean[] keep = new boolean[n];
        int low = 0;
        int high = 0;
        for (int i = 1; i < n; i++) {
            low = points.get(i)[1] > points.get(low)[1] ? i : low;
            high = points.get(i)[1] < points.get(high)[1] ? i : high;
        }
        int[] anchors = java.util.stream.IntStream.of(0, Math.min(low, high), Math.max(low, high), n - 1)
                .distinct().toArray();
        for (int a = 0; a < anchors.length; a++) {
            keep[anchors[a]] = true;
            if (a > 0) {
                douglasPeucker(points, anchors[a - 1], anchors[a], keep, tolerancePx);
            }
        }
        return keep;
    }

    private static void douglasPeucker(List<double[]> p, int first, int last, boolean[] keep, double tolerancePx) {
        java.util.ArrayDeque<int[]> spans = new java.util.ArrayDeque<>();
        spans.push(new int[] {first, last});
        while (!spans.isEmpty()) {
            int[] span = spans.pop();
            double[] a = p.get(span[0]);
            double[] b = p.get(span[1]);
            double dx = b[0] - a[0];
            double dy = b[1] - a[1];
            double length = Math.hypot(dx, dy);
            int farthest = -1;
            double worst = tolerancePx;
            for (int i = span[0] + 1; i < span[1]; i++) {
                double[] c = p.get(i);
                double distance = length == 0 ? Math.hypot(c[0] - a[0], c[1] - a[1])
                        : Math.abs(dx * (a[1] - c[1]) - dy * (a[0] - c[0])) / length;
                if (distance > worst) {
                    worst = distance;
                    farthest = i;
                }
            }
            if (farthest >= 0) {
                keep[farthest] = true;
                spans.push(new int[] {span[0], farthest});
                spans.push(new int[] {farthest, span[1]});
            }
        }
    }

    /**
     * Consecutive lines, rectangles and texts: lines drawn alike go into one group carrying their common attributes,
     * as do rectangles. Texts may move after the lines that follow them (tick labels beside their tick marks, which
     * they do not overlap), never past a rectangle, so nothing that was covered comes to the top or the reverse.
     */
    private static String groupRuns(String svg) {
        Matcher m = ELEMENT.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        Runs runs = new Runs(out);
        int copied = 0;
        while (m.find()) {
            if (m.start() != copied) {
                runs.flushAll();
                out.append(svg, copied, m.start());
            }
            if (m.group(1) != null) {
                runs.shape(m.group(1), m.group(2));
            } else {
                runs.text(m.group(3), m.group(4));
            }
            copied = m.end();
        }
        runs.flushAll();
        return out.append(svg, copied, svg.length()).toString();
    }

    /** The run being grouped: the open group of alike shapes and the texts waiting to follow it. */
    private static final class Runs {
        private final StringBuilder out;
        private final StringBuilder members = new StringBuilder();
        private final StringBuilder texts = new StringBuilder();
        private final List<String> textMembers = new ArrayList<>();
        private Map<String, String> textStyle;
        private String tag;
        private Map<String, String> style;
        private int count;

        Runs(StringBuilder out) {
            this.out = out;
        }

        void shape(String elementTag, String attributes) {
            Map<String, String> geometry = new LinkedHashMap<>();
            Map<String, String> paint = new LinkedHashMap<>();
            split(attributes, elementTag.equals("line") ? NOT_FOR_LINES : List.of(), geometry, paint);
            boolean rect = elementTag.equals("rect");
            boolean textsWaiting = texts.length() > 0 || !textMembers.isEmpty();
            if (!elementTag.equals(tag) || !paint.equals(style) || (rect && textsWaiting)) {
                flushGroup();
                if (rect) {
                    flushTexts();
                }
                tag = elementTag;
                style = paint;
            }
            members.append('<').append(elementTag);
            geometry.forEach((k, v) -> members.append(' ').append(k).append("='").append(v).append('\''));
            members.append("/>");
            count++;
        }

        void text(String attributes, String content) {
            if ("rect".equals(tag)) {
                flushGroup();
            }
            Map<String, String> position = new LinkedHashMap<>();
            Map<String, String> paint = new LinkedHashMap<>();
            split(attributes, List.of(), position, paint);
            if (!paint.equals(textStyle)) {
                closeTexts();
                textStyle = paint;
            }
            StringBuilder text = new StringBuilder("<text");
            position.forEach((k, v) -> text.append(' ').append(k).append("='").append(v).append('\''));
            textMembers.add(text.append('>').append(content).append("</text>").toString());
        }

        /** Geometry attributes (x, y, width, ...) to one map, the others (paint, font) to the other. */
        private static void split(String attributes, List<String> dropped, Map<String, String> geometry,
                                  Map<String, String> paint) {
            Matcher a = ATTR.matcher(attributes);
            while (a.find()) {
                String value = a.group(2) != null ? a.group(2) : a.group(3);
                if (GEOMETRY.contains(a.group(1))) {
                    geometry.put(a.group(1), value);
                } else if (!dropped.contains(a.group(1))) {
                    paint.put(a.group(1), value);
                }
            }
        }

        private void closeTexts() {
            if (textMembers.size() == 1) {
                String only = textMembers.get(0);
                int open = only.indexOf('>');
                texts.append(only, 0, open).append(attributes(textStyle)).append(only, open, only.length());
            } else if (textMembers.size() > 1) {
                texts.append("<g").append(attributes(textStyle)).append('>');
                textMembers.forEach(texts::append);
                texts.append("</g>");
            }
            textMembers.clear();
            textStyle = null;
        }

        void flushAll() {
            flushGroup();
            flushTexts();
        }

        private void flushTexts() {
            closeTexts();
            out.append(texts);
            texts.setLength(0);
        }

        private void flushGroup() {
            if (count > 0) {
                String attrs = attributes(style);
                if (count == 1) {
                    out.append(members, 0, members.indexOf("/>")).append(attrs).append("/>");
                } else {
                    out.append("<g").append(attrs).append('>').append(members).append("</g>");
                }
            }
            members.setLength(0);
            count = 0;
            tag = null;
            style = null;
        }

        private static String attributes(Map<String, String> values) {
            StringBuilder attrs = new StringBuilder();
            values.forEach((k, v) -> attrs.append(' ').append(k).append("=\"").append(v).append('"'));
            return attrs.toString();
        }
    }

    /** A coordinate to 0.1 px, without a trailing ".0". */
    static String tenth(double v) {
        long tenths = Math.round(v * 10);
        return tenths % 10 == 0 ? Long.toString(tenths / 10)
                : (tenths < 0 && tenths > -10 ? "-0." + (-tenths) : (tenths / 10) + "." + Math.abs(tenths % 10));
    }

    private static String replaceAll(Pattern p, String s, java.util.function.Function<Matcher, String> f) {
        Matcher m = p.matcher(s);
        StringBuilder out = new StringBuilder(s.length());
        while (m.find()) {
            m.appendReplacement(out, Matcher.quoteReplacement(f.apply(m)));
        }
        m.appendTail(out);
        return out.toString();
    }
}
