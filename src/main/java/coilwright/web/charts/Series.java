package coilwright.web.charts;

import java.util.Arrays;

/**
 * One named curve: points (x[i], y[i]) in SI units, all finite.
 *
 * @param name legend text, e.g. "EMF (line)"
 */
public record Series(String name, double[] x, double[] y) {
    public Series {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("series name must not be blank");
        }
        if (x.length != y.length || x.length == 0) {
            throw new IllegalArgumentException("series " + name + ": x has " + x.length + " points and y "
                    + y.length + "; both need the same number, at least 1");
        }
        if (!Arrays.stream(x).allMatch(Double::isFinite) || !Arrays.stream(y).allMatch(Double::isFinite)) {
            throw new IllegalArgumentException("series " + name + ": every point must be finite (no NaN or infinity)");
        }
        x = x.clone();
        y = y.clone();
    }
}
