package coilwright.thermal;

import java.util.ArrayList;
import java.util.List;

/** Shared assembly of solution records. */
final class ThermalSolutions {
    private ThermalSolutions() {
    }

    static List<NodeTemperature> nodes(ThermalNetwork net, double[] t) {
        List<String> names = net.names();
        List<NodeTemperature> out = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            out.add(new NodeTemperature(names.get(i), t[i]));
        }
        return out;
    }
}
