package coilwright.web.winding;

import coilwright.winding.Winding;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The winding unrolled into a straight line: the slots side by side, each coil side coloured and lettered by its
 * phase with an arrow for the way the phase current runs along it, each coil's end connection drawn above the slots
 * with an arrow for the way its turns run, and the repeating sections marked below the slot numbers. A long stator
 * is broken into rows. This is the drawing model; {@code templates/fragments/unrolled.html} renders it as SVG, so
 * any page (the winding page, a bench sheet) can show it with {@code ~{fragments/unrolled :: development(${u})}}.
 * All coordinates are SVG user units of the {@link #viewBox()}.
 *
 * @param variant      a CSS class telling the page which screens the drawing is for: {@code all}, {@code wide}
 *                     (screens and print) or {@code narrow} (phones)
 * @param slots        Q
 * @param poles        2p
 * @param sections     how many times the pattern repeats round the stator
 * @param sectionSlots slots in one repeating section, Q / sections
 * @param twoLayers    two coil sides per slot
 * @param width        drawing width
 * @param height       drawing height
 * @param rows         the rows, top to bottom
 * @param description  the drawing in one sentence, for screen readers
 */
public record UnrolledWinding(String variant, int slots, int poles, int sections, int sectionSlots, boolean twoLayers,
                              double width, double height, List<Row> rows, String description) {
    /** Rows of at most this many slots suit a screen or a printed page. */
    public static final int WIDE_ROW_SLOTS = 24;
    /** Rows of at most this many slots stay readable on a phone held upright (about 340 px of drawing). */
    public static final int NARROW_ROW_SLOTS = 8;

    public UnrolledWinding {
        rows = List.copyOf(rows);
    }

    /**
     * The drawing of a winding in rows of at most {@code maxSlotsPerRow} slots.
     *
     * @param variant the CSS class of the drawing (see {@link #variant()})
     */
    public static UnrolledWinding of(Winding w, int maxSlotsPerRow, String variant) {
        return UnrolledLayout.draw(w, maxSlotsPerRow, variant);
    }

    /**
     * The drawings a page shows: one for every screen when the stator fits a phone's row, else one in wide rows
     * (screens and print) and one in narrow rows (phones).
     */
    public static List<UnrolledWinding> forPage(Winding w) {
        if (w.spec().slots() <= NARROW_ROW_SLOTS) {
            return List.of(of(w, NARROW_ROW_SLOTS, "all"));
        }
        return List.of(of(w, WIDE_ROW_SLOTS, "wide"), of(w, NARROW_ROW_SLOTS, "narrow"));
    }

    /** The width the page gives the drawing at most, px: a little larger than drawn, so text stays at reading size. */
    public String displayWidth() {
        return num(Math.rint(width * 1.5));
    }

    /** The height that goes with {@link #displayWidth()}. */
    public String displayHeight() {
        return num(Math.rint(height * 1.5));
    }

    public String viewBox() {
        return "0 0 " + num(width) + " " + num(height);
    }

    /** The coil sides, loops, section marks and slot numbers of one row of slots. */
    public record Row(int index, int firstSlot, int lastSlot, List<Cell> cells, List<Loop> loops,
                      List<Band> bands, List<Mark> boundaries, List<Text> slotNumbers) {
        public Row {
            cells = List.copyOf(cells);
            loops = List.copyOf(loops);
            bands = List.copyOf(bands);
            boundaries = List.copyOf(boundaries);
            slotNumbers = List.copyOf(slotNumbers);
        }
    }

    /**
     * One coil side: a coloured cell with the phase letter and a direction arrow.
     *
     * @param position  0 = left half (a double layer's start sides) or the whole slot, 1 = right half
     * @param direction {@code up} when a positive phase current runs away from the connection end, else {@code down}
     * @param arrow     SVG path of the arrow
     */
    public record Cell(int slot, int position, int coil, String phase, String colour, String direction,
                       double x, double y, double w, double h, Text letter, String arrow) {
    }

    /**
     * A coil's end connection, or the part of it in this row when the coil continues in another row.
     *
     * @param part    {@code whole}, {@code out} (leaves the row to the right) or {@code in} (arrives from the left)
     * @param path    SVG path of the connection
     * @param chevron SVG path of the arrow giving the way the turns run (start side to return side when forward)
     * @param number  the coil number above the connection
     * @param onward  where a part that leaves the row continues, e.g. "→14" or "12→"
     */
    public record Loop(int coil, String phase, String colour, boolean reversed, int goSlot, int returnSlot,
                       String part, String path, String chevron, Text number, Optional<Text> onward) {
    }

    /**
     * One repeating section's stretch of this row.
     *
     * @param shaded every other section is shaded so neighbours are told apart
     */
    public record Band(int section, int firstSlot, int lastSlot, double x, double y, double w, double h,
                       boolean shaded, Optional<Text> label) {
    }

    /** A vertical line, here where one repeating section ends and the next begins. */
    public record Mark(double x, double y1, double y2) {
    }

    /** A text and where it stands (x is its centre unless the template anchors it otherwise). */
    public record Text(String text, double x, double y) {
    }

    static String num(double v) {
        double r = Math.rint(v * 10) / 10;
        return r == Math.rint(r) ? Long.toString((long) r) : String.format(Locale.ROOT, "%.1f", r);
    }
}
