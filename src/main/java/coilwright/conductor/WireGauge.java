package coilwright.conductor;

/** How a round magnet wire's size is stated: by American Wire Gauge number or by metric nominal bare diameter. */
public enum WireGauge {
    /** American Wire Gauge (ASTM B258). */
    AWG,
    /** Metric nominal bare conductor diameter (IEC 60317 series). */
    METRIC
}
