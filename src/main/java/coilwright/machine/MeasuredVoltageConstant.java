package coilwright.machine;

import coilwright.magnet.MagnetGrade;
import coilwright.validation.Checks;

/**
 * A voltage constant measured on the real machine (open-circuit line voltage per rpm, rms) with the magnet
 * temperature at the time of measurement, so that it can be carried to the working magnet temperature. The EMF is
 * proportional to the magnet flux, which follows the remanence: Ke(T) = Ke(T_meas) Br(T) / Br(T_meas), with the
 * grade's reversible temperature coefficient of Br ({@link MagnetGrade#remanenceRatio}). A machine measured by
 * spinning it by hand in a workshop is at about the room temperature.
 *
 * @param keLineRmsVPerRpm          measured open-circuit line voltage per rpm, V rms / rpm, &gt; 0 and &lt;= 100
 * @param magnetTempAtMeasurementC  magnet temperature during the measurement, C, -40 to 150 (25 when unknown:
 *                                  a workshop measurement)
 */
public record MeasuredVoltageConstant(double keLineRmsVPerRpm, double magnetTempAtMeasurementC) {
    /** Magnet temperature assumed for a measurement without one: a workshop at room temperature, C. */
    public static final double DEFAULT_MEASUREMENT_TEMP_C = 25.0;

    public MeasuredVoltageConstant {
        new Checks().rangeExclusiveMin("keLineRmsVPerRpm", keLineRmsVPerRpm, 0, 100)
                .range("magnetTempAtMeasurementC", magnetTempAtMeasurementC, -40, 150).throwIfAny();
    }

    /**
     * The constant at a working magnet temperature, V rms / rpm.
     *
     * @param grade         the magnet grade (its Br temperature coefficient)
     * @param magnetTempC   working magnet temperature, C, -60 to 300
     */
    public double at(MagnetGrade grade, double magnetTempC) {
        new Checks().present("grade", grade).throwIfAny();
        return keLineRmsVPerRpm * grade.remanenceRatio(magnetTempAtMeasurementC, magnetTempC);
    }
}
