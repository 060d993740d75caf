package coilwright.sizing;

import coilwright.magnet.MagnetGrades;
import coilwright.validation.Checks;

import java.util.List;

/**
 * A magnet block the builder can buy, and how many of them may make one pole. Blocks of one pole lie side by side:
 * along the radius on an axial disc (the pole's radial length is count x lengthM), across the pole arc on a radial
 * rotor (the pole's arc is count x widthM).
 *
 * @param gradeName      magnet grade, one of {@link MagnetGrades#names()}
 * @param widthM         block width across the pole (tangential), m, 2 mm to 0.3 m
 * @param lengthM        block length: radial on an axial disc, along the stack on a radial rotor, m, 2 mm to 0.3 m
 * @param thicknessM     block thickness along the magnetisation, m, 0.5 mm to 0.1 m
 * @param countsPerPole  numbers of blocks per pole to try, each 1 to 8, 1 to 4 entries, no repeats
 */
public record MagnetOption(String gradeName, double widthM, double lengthM, double thicknessM,
                           List<Integer> countsPerPole) {
    public MagnetOption {
        Checks c = new Checks();
        c.require(MagnetGrades.find(gradeName).isPresent(), "gradeName", gradeName, "is not a known magnet grade",
                String.join(", ", MagnetGrades.names()));
        c.range("widthM", widthM, 0.002, 0.3).range("lengthM", lengthM, 0.002, 0.3)
                .range("thicknessM", thicknessM, 0.0005, 0.1).present("countsPerPole", countsPerPole);
        BuildChecks.entriesPresent(c, "countsPerPole", countsPerPole);
        c.throwIfAny();
        countsPerPole = List.copyOf(countsPerPole);
        c.intRange("countsPerPole.size", countsPerPole.size(), 1, 4);
        for (int i = 0; i < countsPerPole.size(); i++) {
            c.intRange("countsPerPole[" + i + "]", countsPerPole.get(i), 1, 8);
        }
        c.require(countsPerPole.stream().distinct().count() == countsPerPole.size(), "countsPerPole", countsPerPole,
                "must not repeat a count", "distinct counts");
        c.throwIfAny();
    }

    /** A label such as "N42 40 x 50 x 10 mm". */
    public String label() {
        return String.format(java.util.Locale.ROOT, "%s %.0f x %.0f x %.0f mm", gradeName, widthM * 1000,
                lengthM * 1000, thicknessM * 1000);
    }
}
