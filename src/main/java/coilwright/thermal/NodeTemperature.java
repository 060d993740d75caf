package coilwright.thermal;

/**
 * One node of a solved thermal network.
 *
 * @param name         what the node stands for, e.g. {@code "winding"}, {@code "stator core"}
 * @param temperatureC its steady temperature, C
 */
public record NodeTemperature(String name, double temperatureC) {
}
