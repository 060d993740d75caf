package coilwright.losses;

import coilwright.validation.Checks;

/**
 * One rolling bearing of the alternator or turbine shaft.
 *
 * @param type                    bearing type (sets mu)
 * @param boreDiameterM           bore diameter d, m, 0.003 to 0.5
 * @param equivalentLoadN         equivalent dynamic load P, N, &gt;= 0 (for a radial bearing with little thrust, the
 *                                radial load: the share of rotor weight, magnetic pull and blade thrust it carries)
 * @param sealDragNm              added friction of contact seals and grease, N m, 0 to 10 (0 for open or shielded
 *                                bearings; contact-sealed bearings of 20 to 30 mm bore add a few hundredths of a
 *                                N m each, from memory: measure a real shaft by hand with a spring balance)
 */
public record Bearing(BearingType type, double boreDiameterM, double equivalentLoadN, double sealDragNm) {
    public Bearing {
        new Checks().present("type", type).range("boreDiameterM", boreDiameterM, 0.003, 0.5)
                .range("equivalentLoadN", equivalentLoadN, 0, 1e6).range("sealDragNm", sealDragNm, 0, 10)
                .throwIfAny();
    }

    /**
     * Running friction torque by the SKF simplified model, M = 0.5 mu P d, plus seal drag, N m.
     */
    public double frictionTorqueNm() {
        return 0.5 * type.frictionCoefficient() * equivalentLoadN * boreDiameterM + sealDragNm;
    }
}
