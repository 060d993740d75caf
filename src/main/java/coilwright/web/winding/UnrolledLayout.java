package coilwright.web.winding;

import coilwright.web.winding.UnrolledWinding.Band;
import coilwright.web.winding.UnrolledWinding.Cell;
import coilwright.web.winding.UnrolledWinding.Loop;
import coilwright.web.winding.UnrolledWinding.Mark;
import coilwright.web.winding.UnrolledWinding.Row;
import coilwright.web.winding.UnrolledWinding.Text;
import coilwright.winding.Coil;
import coilwright.winding.Layers;
import coilwright.winding.Winding;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Places the slots, sides, end connections and section marks of {@link UnrolledWinding} row by row. */
final class UnrolledLayout {
    static final double PITCH = 30;
    static final double MARGIN = 30;
    static final double STRIP = 52;
    static final double LEVEL = 10;
    private static final double TOP = 18;
    private static final double BELOW = 50;

    private final Winding w;
    private final SlotContents contents;
    private final boolean two;
    private final int[] levels;
    private final int levelCount;
    private final int repeat;

    private UnrolledLayout(Winding w) {
        this.w = w;
        this.contents = SlotContents.of(w);
        this.two = w.spec().layers() == Layers.DOUBLE;
        this.levels = LoopLevels.assign(w.coils(), w.coilPitchSlots(), w.spec().slots(), two);
        int max = 0;
        for (int l : levels) {
            max = Math.max(max, l);
        }
        this.levelCount = max + 1;
        this.repeat = contents.repeatSlots();
    }

    static UnrolledWinding draw(Winding w, int maxSlotsPerRow, String variant) {
        return new UnrolledLayout(w).build(maxSlotsPerRow, variant);
    }

    private UnrolledWinding build(int maxSlotsPerRow, String variant) {
        int q = w.spec().slots();
        int perRow = slotsPerRow(q, repeat, maxSlotsPerRow);
        double rowHeight = TOP + levelCount * LEVEL + STRIP + BELOW;
        List<Row> rows = new ArrayList<>();
        for (int first = 1, i = 0; first <= q; first += perRow, i++) {
            rows.add(row(i, first, Math.min(q, first + perRow - 1), i * rowHeight));
        }
        int sections = q / repeat;
        String description = String.format("Unrolled winding of %d slots and %d poles: %d coils, phases by colour "
                        + "and letter, current direction by arrows; the pattern repeats %s round the stator.",
                q, w.spec().poles(), w.coils().size(), sections == 1 ? "once (it does not repeat)" : sections + " times");
        return new UnrolledWinding(variant, q, w.spec().poles(), sections, repeat, two,
                2 * MARGIN + Math.min(q, perRow) * PITCH, rows.size() * rowHeight - 8, rows, description);
    }

    /** Whole repeating sections per row where they fit, else rows of equal length. */
    static int slotsPerRow(int slots, int repeat, int max) {
        if (slots <= max) {
            return slots;
        }
        if (repeat <= max) {
            return repeat * (max / repeat);
        }
        int rows = (slots + max - 1) / max;
        return (slots + rows - 1) / rows;
    }

    private Row row(int index, int first, int last, double y0) {
        double stripTop = y0 + TOP + levelCount * LEVEL;
        List<Cell> cells = new ArrayList<>();
        List<Text> numbers = new ArrayList<>();
        for (int s = first; s <= last; s++) {
            for (SlotContents.Side side : contents.in(s)) {
                cells.add(cell(side, first, stripTop));
            }
            numbers.add(new Text(Integer.toString(s), slotLeft(s, first) + PITCH / 2, stripTop + STRIP + 16));
        }
        List<Loop> loops = new ArrayList<>();
        for (int i = 0; i < w.coils().size(); i++) {
            loops.addAll(loops(w.coils().get(i), levels[i], first, last, stripTop));
        }
        double bandTop = stripTop + STRIP + 22;
        List<Band> bands = new ArrayList<>();
        List<Mark> marks = new ArrayList<>();
        int sections = w.spec().slots() / repeat;
        for (int k = (first - 1) / repeat; k * repeat < last; k++) {
            int a = Math.max(first, k * repeat + 1);
            int b = Math.min(last, (k + 1) * repeat);
            double x = slotLeft(a, first);
            double width = (b - a + 1) * PITCH;
            bands.add(new Band(k + 1, a, b, x, bandTop, width, 16, k % 2 == 1,
                    Optional.of(new Text(bandLabel(k + 1, sections, width), x + width / 2, bandTop + 12))));
            if (a == k * repeat + 1 && a != first) {
                marks.add(new Mark(x, y0 + 4, bandTop + 16));
            }
        }
        return new Row(index, first, last, cells, loops, bands, marks, numbers);
    }

    private static String bandLabel(int section, int sections, double width) {
        if (sections == 1) {
            return width >= 7 * PITCH ? "one section: the pattern does not repeat" : "no repeat";
        }
        return width >= 3 * PITCH ? "section " + section + " of " + sections : Integer.toString(section);
    }

    private Cell cell(SlotContents.Side side, int first, double stripTop) {
        double left = slotLeft(side.slot(), first);
        double x = two ? left + 2 + side.position() * 14 : left + 3;
        double width = two ? 12 : 24;
        double cx = x + width / 2;
        String arrow = side.up()
                ? "M" + n(cx) + " " + n(stripTop + 47) + " V" + n(stripTop + 30) + " M" + n(cx) + " "
                + n(stripTop + 24) + " l-4 7 h8 z"
                : "M" + n(cx) + " " + n(stripTop + 24) + " V" + n(stripTop + 41) + " M" + n(cx) + " "
                + n(stripTop + 47) + " l-4 -7 h8 z";
        Coil c = side.coil();
        return new Cell(side.slot(), side.position(), c.number(), c.phaseName(), PhaseColours.of(c.phase()),
                side.up() ? "up" : "down", x, stripTop, width, STRIP,
                new Text(c.phaseName(), cx, stripTop + 18), arrow);
    }

    /** The coil's end connection in this row: whole, the part leaving to the right, or the part arriving. */
    private List<Loop> loops(Coil c, int level, int first, int last, double stripTop) {
        int pitch = w.coilPitchSlots();
        int returnIndex = c.goSlot() + pitch;
        boolean goHere = c.goSlot() >= first && c.goSlot() <= last;
        boolean returnHere = c.returnSlot() >= first && c.returnSlot() <= last;
        double bar = stripTop - 8 - level * LEVEL;
        double edgeRight = MARGIN + (last - first + 1) * PITCH + 4;
        double edgeLeft = MARGIN - 4;
        if (goHere && returnIndex <= last) {
            return List.of(loop(c, "whole", legX(c.goSlot(), 0, first), legX(c.returnSlot(), two ? 1 : 0, first),
                    bar, stripTop, Optional.empty()));
        }
        List<Loop> parts = new ArrayList<>();
        if (goHere) {
            parts.add(loop(c, "out", legX(c.goSlot(), 0, first), edgeRight, bar, stripTop,
                    Optional.of(new Text("→" + c.returnSlot(), edgeRight + 1, bar + 3.5))));
        }
        if (returnHere) {
            parts.add(loop(c, "in", edgeLeft, legX(c.returnSlot(), two ? 1 : 0, first), bar, stripTop,
                    Optional.of(new Text(c.goSlot() + "→", edgeLeft - 1, bar + 3.5))));
        }
        return parts;
    }

    private Loop loop(Coil c, String part, double xa, double xb, double bar, double stripTop, Optional<Text> onward) {
        StringBuilder d = new StringBuilder();
        d.append(part.equals("in") ? "M" + n(xa) + " " + n(bar) : "M" + n(xa) + " " + n(stripTop) + " V" + n(bar));
        d.append(" H").append(n(xb));
        if (!part.equals("out")) {
            d.append(" V").append(n(stripTop));
        }
        double mid = (xa + xb) / 2;
        boolean rightwards = c.polarity() > 0;
        String chevron = rightwards
                ? "M" + n(mid - 3) + " " + n(bar - 4) + " l5 4 l-5 4"
                : "M" + n(mid + 3) + " " + n(bar - 4) + " l-5 4 l5 4";
        return new Loop(c.number(), c.phaseName(), PhaseColours.of(c.phase()), c.polarity() < 0, c.goSlot(),
                c.returnSlot(), part, d.toString(), chevron, new Text(Integer.toString(c.number()), mid, bar - 2.5),
                onward);
    }

    private double legX(int slot, int position, int first) {
        double left = slotLeft(slot, first);
        return two ? left + 8 + position * 14 : left + PITCH / 2;
    }

    private static double slotLeft(int slot, int first) {
        return MARGIN + (slot - first) * PITCH;
    }

    private static String n(double v) {
        return UnrolledWinding.num(v);
    }
}
