package coilwright.magnet;

import coilwright.validation.Checks;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The catalogue of magnet grades: sintered NdFeB N35..N52 in the temperature classes that are commonly sold,
 * and three hard ferrites. Nominal Br is the midpoint of the grade's published Br range.
 */
public final class MagnetGrades {

    /** source: manufacturers' published sintered NdFeB grade tables (Br range per grade, HcJ minimum and
     *  maximum working temperature per class, alphaBr -0.12 %/K, mu_rec 1.05); the class list is from memory. */
    static final String NDFEB_SOURCE = "manufacturers' typical sintered NdFeB data sheets (Br = midpoint of the "
            + "grade's range; HcJ = class minimum; alphaBr -0.12 %/K; mu_rec 1.05); grade/class availability from memory";
    static final String FERRITE_SOURCE = "manufacturers' typical hard ferrite data sheets (Chinese Y grades, "
            + "US C grades); alphaBr -0.20 %/K and mu_rec 1.1 typical; 250 C working limit common practice";

    private static final double KA_PER_M_PER_KOE = 1000.0 / (4.0 * Math.PI); // 1 kOe = 79.577 kA/m

    private record BrRange(int number, double lowT, double highT) { }

    private record TemperatureClass(String suffix, double hcjKOe, double maxWorkingTempC, int highestGrade) { }

    // Br ranges per energy-product number, from manufacturers' grade tables.
    private static final List<BrRange> BR_RANGES = List.of(
            new BrRange(35, 1.17, 1.22), new BrRange(38, 1.22, 1.25), new BrRange(40, 1.25, 1.28),
            new BrRange(42, 1.28, 1.32), new BrRange(45, 1.32, 1.38), new BrRange(48, 1.38, 1.42),
            new BrRange(50, 1.40, 1.45), new BrRange(52, 1.43, 1.48));

    // Coercivity classes: HcJ minimum and maximum working temperature; highestGrade is the strongest Br number
    // commonly sold in that class (from memory).
    private static final List<TemperatureClass> CLASSES = List.of(
            new TemperatureClass("", 12, 80, 52), new TemperatureClass("M", 14, 100, 52),
            new TemperatureClass("H", 17, 120, 50), new TemperatureClass("SH", 20, 150, 48),
            new TemperatureClass("UH", 25, 180, 42), new TemperatureClass("EH", 30, 200, 38));

    // HcJ temperature coefficients per class, in the order of CLASSES (from memory, see coercivityTempCoeffPerK)
    private static final double[] NDFEB_HCJ_COEFF_PER_K = {-0.0060, -0.0060, -0.0058, -0.0055, -0.0052, -0.0050};
    private static final double FERRITE_HCJ_COEFF_PER_K = 0.0030;

    private static final Map<String, MagnetGrade> BY_NAME = build();
    private static final String UNKNOWN = "unknown magnet grade; allowed: " + String.join(", ", BY_NAME.keySet());

    private MagnetGrades() {
    }

    private static Map<String, MagnetGrade> build() {
        Map<String, MagnetGrade> m = new LinkedHashMap<>();
        for (TemperatureClass tc : CLASSES) {
            for (BrRange br : BR_RANGES) {
                if (br.number() > tc.highestGrade()) {
                    continue;
                }
                String name = "N" + br.number() + tc.suffix();
                m.put(name, new MagnetGrade(name, MagnetMaterial.NDFEB_SINTERED, (br.lowT() + br.highT()) / 2.0,
                        -0.0012, tc.hcjKOe() * KA_PER_M_PER_KOE, 1.05, tc.maxWorkingTempC(), NDFEB_SOURCE));
            }
        }
        // Ferrite: Y30 Br 380-390 mT, HcJ >= 199 kA/m; Y35 Br 400-410 mT, HcJ >= 180 kA/m;
        // C8 (C8A) Br 385-395 mT, HcJ >= 235 kA/m (manufacturers' tables).
        addFerrite(m, "Ferrite Y30", 0.385, 199.0);
        addFerrite(m, "Ferrite Y35", 0.405, 180.0);
        addFerrite(m, "Ferrite C8", 0.390, 235.0);
        return Collections.unmodifiableMap(m);
    }

    private static void addFerrite(Map<String, MagnetGrade> m, String name, double brT, double hcjKAPerM) {
        m.put(name, new MagnetGrade(name, MagnetMaterial.FERRITE, brT, -0.0020, hcjKAPerM, 1.10, 250.0,
                FERRITE_SOURCE));
    }

    /**
     * Temperature coefficient of HcJ per kelvin for a grade. Sintered NdFeB by coercivity class (the class with the
     * highest minimum HcJ the grade reaches): no suffix -0.60, M -0.60, H -0.58, SH -0.55, UH -0.52, EH -0.50 %/K;
     * hard ferrite +0.30 %/K (its coercivity rises with temperature). Typical values over 20 to 150 C from
     * manufacturers' data sheets, from memory; the spread between makers is about +-0.05 %/K.
     */
    static double coercivityTempCoeffPerK(MagnetGrade grade) {
        if (grade.material() == MagnetMaterial.FERRITE) {
            return FERRITE_HCJ_COEFF_PER_K;
        }
        double coeff = NDFEB_HCJ_COEFF_PER_K[0];
        for (int i = 0; i < CLASSES.size(); i++) {
            if (grade.intrinsicCoercivityKAPerM() >= CLASSES.get(i).hcjKOe() * KA_PER_M_PER_KOE * (1 - 1e-9)) {
                coeff = NDFEB_HCJ_COEFF_PER_K[i];
            }
        }
        return coeff;
    }

    /** Every grade, NdFeB by class then strength, then the ferrites. */
    public static List<MagnetGrade> all() {
        return List.copyOf(BY_NAME.values());
    }

    /** The allowed grade names in catalogue order. */
    public static List<String> names() {
        return List.copyOf(BY_NAME.keySet());
    }

    /** The grade of that name (case and surrounding blanks ignored), if it exists. */
    public static Optional<MagnetGrade> find(String name) {
        if (name == null) {
            return Optional.empty();
        }
        String wanted = name.strip();
        return BY_NAME.values().stream().filter(g -> g.name().equalsIgnoreCase(wanted)).findFirst();
    }

    /**
     * The grade of that name (case and surrounding blanks ignored).
     *
     * @throws InvalidInputException on field {@code gradeName} listing the allowed names when there is no such grade
     */
    public static MagnetGrade byName(String name) {
        return find(name).orElseThrow(() -> new InvalidInputException(unknown("gradeName", name)));
    }

    /** The error for an unknown grade name, listing the allowed names. */
    static FieldError unknown(String field, String name) {
        return new FieldError(field, String.valueOf(name), field + " = " + name + ": " + UNKNOWN, allowedText());
    }

    /** Records an error on {@code field} in {@code checks} unless {@code name} is a known grade. */
    static void checkName(Checks checks, String field, String name) {
        checks.require(find(name).isPresent(), field, name, UNKNOWN, allowedText());
    }

    private static String allowedText() {
        return String.join(", ", names());
    }
}
