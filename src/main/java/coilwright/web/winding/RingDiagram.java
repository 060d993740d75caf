package coilwright.web.winding;

import coilwright.winding.Coil;
import coilwright.winding.Layers;
import coilwright.winding.Winding;
import java.util.Locale;

/**
 * The winding seen from the connection end, as a ring of slots: each coil side a disc in its phase colour marked
 * with the textbook signs for current direction (a dot: the current comes towards the viewer; a cross: it goes away),
 * its phase letter beside it, and each coil's two sides joined by a numbered curve inside the ring. The unrolled
 * drawing ({@link UnrolledWinding}) is the main view; this one shows where the sections sit round the machine.
 */
public final class RingDiagram {
    private static final double C = 300;
    private static final double R = 215;

    private RingDiagram() {
    }

    public static String svg(Winding w) {
        int q = w.spec().slots();
        double step = 360.0 / q;
        boolean two = w.spec().layers() == Layers.DOUBLE;
        double disc = Math.min(9, 0.42 * 2 * Math.PI * R / q / (two ? 1 : 1.2));
        StringBuilder s = new StringBuilder(f("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"ring-diagram\" "
                + "viewBox=\"0 0 600 600\" role=\"img\" font-family=\"sans-serif\" aria-label=\"The winding seen from the "
                + "connection end: %d slots, %d poles\">", q, w.spec().poles()));
        s.append(f("<circle cx=\"%.0f\" cy=\"%.0f\" r=\"%.0f\" fill=\"none\" stroke=\"#c3cbd2\" stroke-width=\"%.1f\"/>",
                C, C, R, two ? 4 * disc + 6 : 2 * disc + 6));
        for (Coil coil : w.coils()) {
            s.append(curve(coil, step, w.coilPitchSlots(), q, two, disc));
        }
        SlotContents contents = SlotContents.of(w);
        boolean letters = q <= 48;
        for (int slot = 1; slot <= q; slot++) {
            double angle = (slot - 1) * step;
            for (SlotContents.Side side : contents.in(slot)) {
                double radius = two ? (side.position() == 0 ? R + disc + 1 : R - disc - 1) : R;
                s.append(side(side, polar(radius, angle), disc));
                if (letters) {
                    boolean outside = !two || side.position() == 0;
                    double[] at = polar(outside ? R + (two ? 2 : 1) * disc + 10 : R - 2 * disc - 10, angle);
                    s.append(f("<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\" dominant-baseline=\"central\" "
                                    + "font-size=\"11\" font-weight=\"700\" fill=\"%s\">%s</text>", at[0], at[1],
                            PhaseColours.of(side.coil().phase()), side.coil().phaseName()));
                }
            }
            if (q <= 60 || slot % 2 == 1) {
                double[] at = polar(R + (two ? 2 : 1) * disc + 26, angle);
                s.append(f("<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\" dominant-baseline=\"central\" "
                        + "font-size=\"%d\" fill=\"#4a555e\">%d</text>", at[0], at[1], q > 36 ? 9 : 12, slot));
            }
        }
        s.append(f("<text x=\"%.0f\" y=\"%.0f\" text-anchor=\"middle\" font-size=\"17\" font-weight=\"700\" "
                + "fill=\"#1c2329\">%d slots, %d poles</text>", C, C + 6, q, w.spec().poles()));
        return s.append("</svg>").toString();
    }

    private static String side(SlotContents.Side side, double[] p, double r) {
        String colour = PhaseColours.of(side.coil().phase());
        String mark = side.up()
                ? f("<path d=\"M%.1f %.1f l%.1f %.1f M%.1f %.1f l%.1f %.1f\" stroke=\"#ffffff\" stroke-width=\"1.8\"/>",
                p[0] - r * 0.5, p[1] - r * 0.5, r, r, p[0] - r * 0.5, p[1] + r * 0.5, r, -r)
                : f("<circle cx=\"%.1f\" cy=\"%.1f\" r=\"%.1f\" fill=\"#ffffff\"/>", p[0], p[1], r * 0.3);
        return f("<g class=\"ring-side\" data-slot=\"%d\" data-coil=\"%d\" data-direction=\"%s\"><circle cx=\"%.1f\" "
                        + "cy=\"%.1f\" r=\"%.1f\" fill=\"%s\"/>", side.slot(), side.coil().number(),
                side.up() ? "away" : "towards", p[0], p[1], r, colour) + mark + "</g>";
    }

    private static String curve(Coil coil, double step, int pitch, int q, boolean two, double disc) {
        double a0 = (coil.goSlot() - 1) * step;
        double a1 = a0 + pitch * step;
        double inner = R - (two ? 2 * disc + 22 : disc + 18);
        double depth = 20 + 0.3 * R * Math.min(1.0, 4.0 * pitch / q);
        double[] p0 = polar(inner, a0);
        double[] p1 = polar(inner, a1);
        double[] ctl = polar(inner - depth, (a0 + a1) / 2);
        double lx = 0.25 * p0[0] + 0.5 * ctl[0] + 0.25 * p1[0];
        double ly = 0.25 * p0[1] + 0.5 * ctl[1] + 0.25 * p1[1];
        String colour = PhaseColours.of(coil.phase());
        return f("<path class=\"ring-coil\" data-coil=\"%d\" d=\"M%.1f,%.1f Q%.1f,%.1f %.1f,%.1f\" fill=\"none\" "
                        + "stroke=\"%s\" stroke-width=\"1.8\"/>", coil.number(), p0[0], p0[1], ctl[0], ctl[1], p1[0],
                p1[1], colour)
                + (q > 48 ? "" : f("<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\" dominant-baseline=\"central\" "
                + "font-size=\"10\" fill=\"%s\">%d</text>", lx, ly, colour, coil.number()));
    }

    private static double[] polar(double radius, double deg) {
        double a = Math.toRadians(deg - 90);
        return new double[] {C + radius * Math.cos(a), C + radius * Math.sin(a)};
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
