package coilwright.load;

import coilwright.machine.Connection;
import coilwright.validation.SolverFailedException;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Builders;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The bridge solver over the whole box its inputs admit: single- and three-phase, star and delta (through the
 * equivalent star), from far below cut-in through a relative margin of 1e-12 above it to a thousand times the
 * threshold, resistance-limited to reactance-limited (wL/R from 1e-9 to 1e9), tiny and huge R, L, battery
 * voltages, diode drops and DC-side resistances. Expected: no exception but {@link SolverFailedException}; every
 * returned figure finite and non-negative; power from the EMF = battery power + losses.
 * <p>
 * Tolerance of the power balance: the periodic state is accepted at a residual of 1e-9 of the current scale at the
 * latest (the solver's ACCEPT_TOLERANCE), or at its rounding noise floor (1e-13 of the waveforms' coefficient sums);
 * the balance is an exact identity of the integrals of a periodic solution, so it holds to the same relative
 * 1e-9 of the power that flows, plus the rounding of integrals whose terms reach the coefficient sums (1e-12 of
 * the largest term, bounded here by the short-circuit power E^2/R). 10 000 single points and 500 warm-started
 * sweeps of 20 speeds; the ratio wL/R is drawn from 1e-9 to 1e7, beyond what the solver takes on each
 * side, so that its typed refusal is exercised too (the outcomes are reported as statistics).
 */
class BridgeSolverBoxPropertiesTest {
    private static final double BALANCE_RELATIVE = 1e-9;
    private static final double NOISE_RELATIVE = 1e-12;

    record Case(boolean three, boolean delta, double marginRatio, double frequencyHz, double phaseResistanceOhm,
                double phaseInductanceH, double cableOhm, double batteryV, double diodeDropV, double dcOhm,
                double internalOhm) {

        AcSource source(double ratio) {
            double threshold = batteryV + 2 * diodeDropV;
            // peak driving EMF = threshold x ratio; from it the winding phase EMF of a star or delta machine
            double starPhase = threshold * ratio / (Math.sqrt(2) * (three ? Math.sqrt(3) : 1));
            double phase = delta ? starPhase * Math.sqrt(3) : starPhase;
            return new AcSource(three ? 3 : 1, delta ? Connection.DELTA : Connection.STAR, Math.min(phase, 1e6),
                    frequencyHz, phaseResistanceOhm, phaseInductanceH);
        }

        BridgeCircuit circuit(AcSource s) {
            return new BridgeCircuit(three ? BridgeType.THREE_PHASE_BRIDGE : BridgeType.SINGLE_PHASE_BRIDGE,
                    s.starEmfRmsV(), s.frequencyHz(), s.starResistanceOhm(), cableOhm, s.starInductanceH(), batteryV,
                    diodeDropV, dcOhm, internalOhm);
        }
    }

    private static Arbitrary<Double> logUniform(double min, double max) {
        double lo = Math.ceil(Math.log10(min) * 1e6) / 1e6;
        double hi = Math.floor(Math.log10(max) * 1e6) / 1e6;
        return Arbitraries.doubles().between(lo, hi).ofScale(6).map(x -> Math.pow(10, x));
    }

    private static Arbitrary<Double> zeroOrLogUniform(double min, double max) {
        return Arbitraries.frequencyOf(Tuple(1, Arbitraries.just(0.0)), Tuple(4, logUniform(min, max)));
    }

    private static net.jqwik.api.Tuple.Tuple2<Integer, Arbitrary<? extends Double>> Tuple(int weight,
                                                                                           Arbitrary<Double> a) {
        return net.jqwik.api.Tuple.of(weight, a);
    }

    @Provide
    Arbitrary<Case> cases() {
        Arbitrary<Double> margin = Arbitraries.frequencyOf(
                Tuple(1, Arbitraries.doubles().between(0.2, 1.0).ofScale(6)),
                Tuple(4, logUniform(1e-12, 1e3).map(m -> 1 + m)));
        return Builders.withBuilder(() -> new Object[11])
                .use(Arbitraries.of(true, false)).in((a, v) -> set(a, 0, v))
                .use(Arbitraries.of(true, false)).in((a, v) -> set(a, 1, v))
                .use(margin).in((a, v) -> set(a, 2, v))
                .use(logUniform(1e-9, 1e5)).in((a, v) -> set(a, 3, v))
                .use(logUniform(1e-9, 1e7)).in((a, v) -> set(a, 4, v))
                .use(logUniform(1e-15, 100)).in((a, v) -> set(a, 5, v))
                .use(zeroOrLogUniform(1e-5, 1e4)).in((a, v) -> set(a, 6, v))
                .use(logUniform(0.5, 2000)).in((a, v) -> set(a, 7, v))
                .use(Arbitraries.frequencyOf(Tuple(1, Arbitraries.just(0.0)), Tuple(4, Arbitraries.doubles().between(0, 5).ofScale(4))))
                .in((a, v) -> set(a, 8, v))
                .use(zeroOrLogUniform(1e-6, 1e4)).in((a, v) -> set(a, 9, v))
                .use(zeroOrLogUniform(1e-6, 100)).in((a, v) -> set(a, 10, v))
                .build(a -> {
                    // a[4] is the ratio wL/R: the resistance follows from it, within the admitted 1e4 Ohm
                    double f = (Double) a[3];
                    double l = (Double) a[5];
                    double r = Math.min(2 * Math.PI * f * l / (Double) a[4], 1e4);
                    return new Case((Boolean) a[0], (Boolean) a[1] && (Boolean) a[0], (Double) a[2], f, r, l,
                            (Double) a[6], (Double) a[7], (Double) a[8], (Double) a[9], (Double) a[10]);
                });
    }

    private static Object[] set(Object[] a, int i, Object v) {
        a[i] = v;
        return a;
    }

    @Property(tries = 10_000)
    void every_admitted_circuit_is_solved_or_fails_typed_and_conserves_power(@ForAll("cases") Case c) {
        BridgeCircuit circuit = c.circuit(c.source(c.marginRatio()));
        try {
            BridgeOperatingPoint p = BridgeSolver.solve(circuit);
            check(circuit, p);
            Statistics.label("outcome").collect(p.mode());
        } catch (SolverFailedException e) {
            assertTrue(e.getMessage().contains("Hz"), e.getMessage());
            Statistics.label("outcome").collect(e.getMessage().contains("reactance") ? "refused: wL/R outside the model"
                    : "solver failed");
        }
    }

    @Property(tries = 500)
    void a_warm_started_sweep_over_the_box_is_solved_or_fails_typed(@ForAll("cases") Case c) {
        AcSource reference = c.source(1);
        LoadSolver.Sweep sweep = LoadSolver.sweep(reference, load(c));
        for (int i = 1; i <= 20; i++) {
            // from far below cut-in up to the case's own margin, in speed order (EMF and frequency rise together)
            double share = i / 20.0;
            double ratio = c.marginRatio() * share;
            AcSource s = c.source(ratio).withEmfAndFrequency(c.source(ratio).emfPhaseRmsV(), c.frequencyHz() * share);
            try {
                OperatingPoint p = sweep.solveAt(s.emfPhaseRmsV(), s.frequencyHz());
                Statistics.label("outcome").collect(p.mode());
                assertTrue(Double.isFinite(p.powerFromEmfW()) && p.powerFromEmfW() >= 0, () -> p.toString());
                double total = p.powerToLoadW() + p.windingCopperLossW() + p.acCableLossW() + p.dcCableLossW()
                        + p.batteryInternalLossW() + p.diodeLossW();
                assertEquals(p.powerFromEmfW(), total, tolerance(c.circuit(s), p.powerFromEmfW()), () -> p.toString());
            } catch (SolverFailedException e) {
                assertTrue(e.getMessage().contains("Hz"), e.getMessage());
                Statistics.label("outcome").collect(e.getMessage().contains("reactance")
                        ? "refused: wL/R outside the model" : "solver failed");
            }
        }
    }

    /** A battery load whose cables have the case's resistances at 20 C (copper, IEC 60028). */
    private static BatteryLoad load(Case c) {
        double rho = 1.0 / 58e6;
        double area = 1e-4;
        Cable ac = new Cable(Math.min(c.cableOhm() * area / rho, 10_000), area, 20);
        Cable dc = new Cable(Math.min(c.dcOhm() * area / rho / 2, 10_000), area, 20);
        Battery b = new Battery(Chemistry.CUSTOM, 1, c.batteryV(), ChargeStage.NOMINAL, c.internalOhm());
        Rectifier r = new Rectifier(c.three() ? BridgeType.THREE_PHASE_BRIDGE : BridgeType.SINGLE_PHASE_BRIDGE,
                DiodeType.SILICON, c.diodeDropV());
        return new BatteryLoad(b, r, ac, dc);
    }

    private static double tolerance(BridgeCircuit c, double powerFromEmfW) {
        double r = c.windingResistanceOhm() + c.acCableResistanceOhm();
        double shortCircuitW = c.emfPhaseRmsV() * c.emfPhaseRmsV() / r;
        return BALANCE_RELATIVE * powerFromEmfW + NOISE_RELATIVE * shortCircuitW;
    }

    private static void check(BridgeCircuit c, BridgeOperatingPoint p) {
        double[] values = {p.dcCurrentA(), p.dcCurrentRmsA(), p.lineCurrentRmsA(), p.lineCurrentPeakA(),
                p.deltaPhaseCurrentPeakA(), p.lineToLineTerminalVoltageRmsV(), p.powerFromEmfW(),
                p.powerToBatteryW(), p.windingCopperLossW(), p.acCableLossW(), p.dcCableLossW(),
                p.batteryInternalLossW(), p.diodeLossW(), p.conductionAngleDeg(), p.commutationOverlapDeg(),
                p.dcVoltageAtRectifierV()};
        for (double v : values) {
            assertTrue(Double.isFinite(v) && v >= 0, () -> "non-finite or negative value in " + p + " for " + c);
        }
        assertEquals(0, p.energyBalanceResidualW(), tolerance(c, p.powerFromEmfW()), () -> p + " for " + c);
    }
}
