package coilwright.web;

import coilwright.validation.Checks;
import coilwright.validation.InfeasibleDesignException;
import java.util.List;
import java.util.Optional;

/** Test-only input records, nested three levels deep, validated with {@link Checks} like the core's. */
record SampleDesign(String name, SampleDesign.Rotor rotor, SampleDesign.Stator stator, Optional<String> note) {
    SampleDesign {
        new Checks().require(!name.isBlank(), "name", name, "must not be blank", "a non-empty text").throwIfAny();
    }

    enum Grade { N35, N42, N52 }

    record Magnet(Grade grade, double thicknessM) {
        Magnet {
            new Checks().range("thicknessM", thicknessM, 0.001, 0.05).throwIfAny();
        }
    }

    record Rotor(double airGapM, int poles, Magnet magnet) {
        Rotor {
            new Checks().positive("airGapM", airGapM)
                    .require(poles % 2 == 0, "poles", poles, "must be even", "an even number")
                    .throwIfAny();
        }
    }

    record Coil(int turns, double wireDiameterMm) {
        Coil {
            new Checks().intRange("turns", turns, 1, 1000).positive("wireDiameterMm", wireDiameterMm).throwIfAny();
        }
    }

    record Stator(int slots, Optional<Double> skewDeg, List<Coil> coils, boolean airCored) {
        Stator {
            new Checks().intRange("slots", slots, 3, 200).throwIfAny();
            if (slots == 10) {
                throw new InfeasibleDesignException("slots", "slots = 10 cannot carry a balanced three-phase winding");
            }
        }
    }

    static String validJson() {
        return """
                {"name": "test rig",
                 "rotor": {"airGapM": 0.002, "poles": 8, "magnet": {"grade": "N42", "thicknessM": 0.01}},
                 "stator": {"slots": 12, "skewDeg": 5.0, "coils": [{"turns": 40, "wireDiameterMm": 1.0}], "airCored": false}}
                """;
    }
}
