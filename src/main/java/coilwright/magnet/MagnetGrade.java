package coilwright.magnet;

import coilwright.validation.Checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One permanent-magnet grade with the figures a machine calculation needs.
 *
 * @param name                        grade name, e.g. {@code "N42SH"} or {@code "Ferrite Y30"}
 * @param material                    material family
 * @param remanenceT                  nominal remanence Br at 20 C in tesla (0.1 to 1.6)
 * @param reversibleTempCoeffBrPerK   reversible temperature coefficient of Br per kelvin (-0.005 to 0), e.g. -0.0012
 * @param intrinsicCoercivityKAPerM   minimum intrinsic coercivity HcJ at 20 C in kA/m (50 to 4000)
 * @param recoilPermeability          relative recoil permeability (1.0 to 1.5)
 * @param maxWorkingTempC             maximum working temperature in C (40 to 350)
 * @param source                      where the figures come from (a standard, a data sheet, or "from memory")
 */
public record MagnetGrade(String name, MagnetMaterial material, double remanenceT, double reversibleTempCoeffBrPerK,
                          double intrinsicCoercivityKAPerM, double recoilPermeability, double maxWorkingTempC,
                          String source) {

    /** Coldest temperature at which hard ferrite is considered free of low-temperature demagnetisation risk. */
    static final double FERRITE_COLD_LIMIT_C = -20.0;

    public MagnetGrade {
        Checks c = new Checks();
        c.require(name != null && !name.isBlank(), "name", name, "must be a non-empty grade name", "a grade name");
        c.present("material", material);
        c.range("remanenceT", remanenceT, 0.1, 1.6);
        c.range("reversibleTempCoeffBrPerK", reversibleTempCoeffBrPerK, -0.005, 0.0);
        c.range("intrinsicCoercivityKAPerM", intrinsicCoercivityKAPerM, 50.0, 4000.0);
        c.range("recoilPermeability", recoilPermeability, 1.0, 1.5);
        c.range("maxWorkingTempC", maxWorkingTempC, 40.0, 350.0);
        c.require(source != null && !source.isBlank(), "source", source, "must name where the figures come from", "text");
        c.throwIfAny();
    }

    /**
     * Remanence at a magnet temperature, linear reversible model Br(T) = Br20 * (1 + alphaBr * (T - 20))
     * (the usual data-sheet definition of the reversible coefficient, e.g. IEC 60404-8-1 grade tables).
     *
     * @param magnetTempC magnet temperature in C, -60 to 300
     * @return remanence in tesla
     * @throws coilwright.validation.InvalidInputException if the temperature is out of range or not finite
     */
    public double remanenceAt(double magnetTempC) {
        new Checks().range("magnetTempC", magnetTempC, -60.0, 300.0).throwIfAny();
        return remanenceT * (1.0 + reversibleTempCoeffBrPerK * (magnetTempC - 20.0));
    }

    /**
     * Br(to) / Br(from): how the remanence, and with it a measured voltage constant, scales between two magnet
     * temperatures under the reversible model of {@link #remanenceAt(double)}.
     *
     * @param fromTempC temperature the quantity refers to, C, -60 to 300
     * @param toTempC   temperature wanted, C, -60 to 300
     */
    public double remanenceRatio(double fromTempC, double toTempC) {
        return remanenceAt(toTempC) / remanenceAt(fromTempC);
    }

    /**
     * Temperature coefficient of the intrinsic coercivity HcJ per kelvin (negative for NdFeB, positive for ferrite),
     * by material and coercivity class; see {@link MagnetGrades#coercivityTempCoeffPerK(MagnetGrade)} for the values
     * and their sources.
     */
    public double intrinsicCoercivityTempCoeffPerK() {
        return MagnetGrades.coercivityTempCoeffPerK(this);
    }

    /**
     * Intrinsic coercivity at a magnet temperature, linear model HcJ(T) = HcJ20 * (1 + beta * (T - 20)), kA/m
     * (never below zero).
     *
     * @param magnetTempC magnet temperature in C, -60 to 300
     */
    public double intrinsicCoercivityAt(double magnetTempC) {
        new Checks().range("magnetTempC", magnetTempC, -60.0, 300.0).throwIfAny();
        return Math.max(0.0, intrinsicCoercivityKAPerM
                * (1.0 + intrinsicCoercivityTempCoeffPerK() * (magnetTempC - 20.0)));
    }

    /**
     * Cautions for a magnet run at {@code magnetTempC}: above the grade's maximum working temperature, and for
     * ferrite in the cold (ferrite's coercivity falls as it cools, from memory: about +0.2 to +0.5 %/K).
     *
     * @param magnetTempC magnet temperature in C
     * @return the cautions, empty when none apply
     */
    public List<String> temperatureWarnings(double magnetTempC) {
        List<String> out = new ArrayList<>();
        if (magnetTempC > maxWorkingTempC) {
            out.add(String.format(Locale.ROOT,
                    "magnet temperature %.0f C is above the %.0f C maximum working temperature of %s: "
                            + "the risk of irreversible demagnetisation increases; choose a higher temperature class "
                            + "or keep the magnets cooler", magnetTempC, maxWorkingTempC, name));
        }
        if (material == MagnetMaterial.FERRITE && magnetTempC < FERRITE_COLD_LIMIT_C) {
            out.add(String.format(Locale.ROOT,
                    "magnet temperature %.0f C: the coercivity of ferrite falls in the cold, so the risk of "
                            + "irreversible demagnetisation by a short circuit or overload is highest at low temperature",
                    magnetTempC));
        }
        return List.copyOf(out);
    }
}
