package coilwright.web.pages;

import coilwright.winding.Coil;
import coilwright.winding.Winding;
import java.util.List;
import java.util.Locale;

/**
 * The winding drawn round the stator as an SVG diagram: every slot (or air-cored coil position) with its coil
 * sides coloured by phase, filled where the side carries its phase's current in and hollow where it carries it
 * out, each coil as a curve from its go slot to its return slot (dashed when the coil is connected reversed),
 * slot numbers outside, and a legend. Double-layer slots show the go side outside and the return side inside.
 */
final class WindingDiagram {
    /** Phase colours A, B, C: copper, blue, green (distinct in grey print and for red-green colour blindness). */
    static final List<String> PHASE_COLOURS = List.of("#b3470f", "#1f5fa8", "#2d7a3a");
    private static final double SIZE = 600;
    private static final double C = 300;
    private static final double R = 205;
    private static final double HALF_DEPTH = 22;

    private WindingDiagram() {
    }

    static String svg(Winding w) {
        int q = w.spec().slots();
        double pitchDeg = 360.0 / q;
        double width = Math.min(26, 0.62 * 2 * Math.PI * R / q);
        StringBuilder s = new StringBuilder();
        s.append(f("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"winding-diagram\" viewBox=\"0 0 %.0f %.0f\" role=\"img\" "
                + "aria-label=\"Winding layout: %d slots, %d poles, %d phase(s)\">", SIZE, SIZE + 100, q, w.spec().poles(), w.spec().phases()));
        s.append(f("<circle cx=\"%.0f\" cy=\"%.0f\" r=\"%.1f\" fill=\"#eef1f3\" stroke=\"#8a949c\" stroke-width=\"%.1f\"/>",
                C, C, R, 2 * HALF_DEPTH + 8));
        for (Coil coil : w.coils()) {
            s.append(coilCurve(coil, pitchDeg, w.coilPitchSlots(), q));
        }
        boolean twoLayers = w.spec().layers().sidesPerSlot() == 2;
        for (Coil coil : w.coils()) {
            s.append(side(coil, coil.goSlot(), true, twoLayers, pitchDeg, width));
            s.append(side(coil, coil.returnSlot(), false, twoLayers, pitchDeg, width));
        }
        int every = q <= 60 ? 1 : (int) Math.ceil(q / 60.0);
        for (int slot = 1; slot <= q; slot += every) {
            double[] p = polar(R + HALF_DEPTH + 18, (slot - 1) * pitchDeg);
            s.append(f("<text x=\"%.1f\" y=\"%.1f\" class=\"slot-number\" text-anchor=\"middle\" dominant-baseline=\"middle\" "
                    + "font-size=\"%.0f\" fill=\"#1c2329\">%d</text>", p[0], p[1], q > 36 ? 10.0 : 13.0, slot));
        }
        s.append(f("<text x=\"%.0f\" y=\"%.0f\" text-anchor=\"middle\" font-size=\"16\" font-weight=\"700\" fill=\"#1c2329\">"
                + "%d slots · %d poles</text>", C, C - 6, q, w.spec().poles()));
        s.append(f("<text x=\"%.0f\" y=\"%.0f\" text-anchor=\"middle\" font-size=\"13\" fill=\"#4a555e\">q = %s · pitch %d</text>",
                C, C + 14, fraction(w), w.coilPitchSlots()));
        s.append(legend(w.spec().phases(), w.spec().layers().sidesPerSlot() == 2));
        return s.append("</svg>").toString();
    }

    private static String coilCurve(Coil coil, double pitchDeg, int pitch, int q) {
        double a0 = (coil.goSlot() - 1) * pitchDeg;
        double a1 = a0 + pitch * pitchDeg;
        double depth = 24 + 0.35 * R * Math.min(1.0, pitch * 2.0 / q * 2.0);
        double[] p0 = polar(R - HALF_DEPTH - 4, a0);
        double[] p1 = polar(R - HALF_DEPTH - 4, a1);
        double[] ctl = polar(R - HALF_DEPTH - 4 - depth, (a0 + a1) / 2);
        double lx = 0.25 * p0[0] + 0.5 * ctl[0] + 0.25 * p1[0];
        double ly = 0.25 * p0[1] + 0.5 * ctl[1] + 0.25 * p1[1];
        String colour = PHASE_COLOURS.get(coil.phase());
        return f("<path class=\"coil\" data-coil=\"%d\" d=\"M%.1f,%.1f Q%.1f,%.1f %.1f,%.1f\" fill=\"none\" stroke=\"%s\" "
                        + "stroke-width=\"2.2\"%s/>", coil.number(), p0[0], p0[1], ctl[0], ctl[1], p1[0], p1[1], colour,
                coil.polarity() < 0 ? " stroke-dasharray=\"6 4\"" : "")
                + f("<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\" dominant-baseline=\"middle\" font-size=\"11\" "
                + "fill=\"%s\" font-weight=\"700\">%d</text>", lx, ly, colour, coil.number());
    }

    private static String side(Coil coil, int slot, boolean go, boolean twoLayers, double pitchDeg, double width) {
        boolean in = (coil.polarity() > 0) == go;
        String colour = PHASE_COLOURS.get(coil.phase());
        double outer = R + HALF_DEPTH;
        double inner = twoLayers ? (go ? R : R - HALF_DEPTH) : R - HALF_DEPTH;
        double top = twoLayers && !go ? R : outer;
        double height = top - inner - 1;
        String label = (in ? "+" : "−") + coil.phaseName();
        double font = Math.min(12, width * 0.5);
        double angle = (slot - 1) * pitchDeg;
        double[] mid = polar(top - height / 2 - 0.5, angle);
        return f("<g class=\"side\" data-slot=\"%d\"><rect transform=\"rotate(%.3f %.0f %.0f)\" x=\"%.1f\" y=\"%.1f\" "
                        + "width=\"%.1f\" height=\"%.1f\" rx=\"2\" fill=\"%s\" stroke=\"%s\" stroke-width=\"1.5\"/>",
                slot, angle, C, C, C - width / 2, C - top, width, height, in ? colour : "#ffffff", colour)
                + (font < 6 ? "" : f("<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\" dominant-baseline=\"central\" "
                + "font-size=\"%.1f\" font-weight=\"700\" fill=\"%s\">%s</text>", mid[0], mid[1], font, in ? "#ffffff" : colour, label))
                + "</g>";
    }

    private static String legend(int phases, boolean twoLayers) {
        StringBuilder s = new StringBuilder();
        double y = SIZE + 10;
        for (int ph = 0; ph < phases; ph++) {
            double x = 20 + ph * 95;
            String colour = PHASE_COLOURS.get(ph);
            s.append(f("<rect x=\"%.0f\" y=\"%.0f\" width=\"18\" height=\"18\" fill=\"%s\"/>", x, y, colour));
            s.append(f("<text x=\"%.0f\" y=\"%.0f\" font-size=\"14\" fill=\"#1c2329\">Phase %s</text>", x + 24, y + 14,
                    Winding.phaseName(ph)));
        }
        String[] lines = {"Filled +A: the side carries its phase current in; hollow −A: out.",
                twoLayers ? "Two sides per slot: the go side outside, the return side inside." : "One coil side per slot.",
                "Numbered curves join each coil's sides; dashed = coil connected reversed."};
        for (int i = 0; i < lines.length; i++) {
            s.append(f("<text x=\"20\" y=\"%.0f\" font-size=\"14\" fill=\"#1c2329\">%s</text>", y + 40 + 18 * i, lines[i]));
        }
        return s.toString();
    }

    private static String fraction(Winding w) {
        return w.qDenominator() == 1 ? Integer.toString(w.qNumerator()) : w.qNumerator() + "/" + w.qDenominator();
    }

    private static double[] polar(double radius, double deg) {
        double a = Math.toRadians(deg - 90);
        return new double[] {C + radius * Math.cos(a), C + radius * Math.sin(a)};
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
