package coilwright.thermal;

import java.util.List;

/**
 * Steady temperatures of a machine at one operating point.
 *
 * @param windingMeanC     mean copper temperature, C (sets the copper resistance)
 * @param windingHotSpotC  hottest copper, C: the figure compared with the insulation class (IEC 60085 limits are
 *                         hot-spot limits); from the conduction profile across the coil or slot
 * @param magnetC          magnet temperature, C (rotor node)
 * @param nodes            every node of the network with its temperature
 * @param heatInW          total heat put in, W
 * @param heatOutW         heat leaving to ambient, W (equals heatInW within the solver's tolerance)
 * @param ambientC         ambient air temperature, C
 * @param iterations       passes of the surface-coefficient iteration
 */
public record ThermalSolution(double windingMeanC, double windingHotSpotC, double magnetC, List<NodeTemperature> nodes,
                              double heatInW, double heatOutW, double ambientC, int iterations) {
    public ThermalSolution {
        nodes = List.copyOf(nodes);
    }

    /** Temperature of the named node, C. */
    public double temperatureC(String nodeName) {
        return nodes.stream().filter(n -> n.name().equals(nodeName)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no node " + nodeName + " in " + nodes))
                .temperatureC();
    }
}
