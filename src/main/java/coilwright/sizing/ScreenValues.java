package coilwright.sizing;

import coilwright.conductor.CoilWindow;
import coilwright.conductor.Copper;
import coilwright.machine.Connection;
import coilwright.machine.EmfEquation;

/**
 * The closed-form figures of one candidate, computed as the full model computes them (same formulas, same order
 * of operations) wherever they are exact. A mutable scratch object, one per screening thread, because the screen
 * runs millions of times a second and must not allocate.
 */
final class ScreenValues {
    private static final double SQRT2 = Math.sqrt(2);
    private static final double SQRT3 = Math.sqrt(3);

    long index;
    WindingCase windingCase;
    WireOption wire;
    int turns;
    Connection connection;

    /** Line-to-line EMF per rpm, V rms. */
    double keLineVPerRpm;
    /** Equivalent-star phase EMF per rpm, V rms. */
    double starEmfVPerRpm;
    /** Equivalent-star resistance per line: winding at its temperature plus the AC cable, Ohm. */
    double lineOhm;
    /** Equivalent-star inductance per line, H. */
    double starInductanceH;
    /** Pole pairs. */
    int polePairs;
    /** Cut-in speed: sqrt(2) E_LL = V_b + 2 V_d, rpm. */
    double cutInRpm;
    /** Coil fill on the window's basis (copper fill in slots, wire fill of air-cored coils). */
    double fill;
    /** Wire fill (enamelled circles over the window), whatever the window's basis. */
    double wireFill;
    /** Copper mass of all phases, kg. */
    double copperMassKg;
    /** Magnet mass, kg. */
    double magnetMassKg;
    /** Copper area of one parallel path's conductor, m^2. */
    double conductorAreaM2;
    /** Winding (phase) rms current per rms line current: 1 in star, 1/sqrt(3) in delta. */
    double phasePerLineCurrent;

    /**
     * Works out the figures of one candidate.
     *
     * @param lc the load's constants
     */
    void compute(long index, WindingCase wc, WireOption w, int turnsPerCoil, Connection conn, LoadConstants lc) {
        this.index = index;
        this.windingCase = wc;
        this.wire = w;
        this.turns = turnsPerCoil;
        this.connection = conn;
        Layout l = wc.layout();
        int paths = wc.paths();
        int seriesTurns = turnsPerCoil * l.coilsPerPhase() / paths;
        double kePhase = EmfEquation.phaseRmsV(EmfEquation.frequencyHz(l.polePairs(), 1.0), seriesTurns,
                l.windingFactor(), l.fluxPerPoleWb());
        boolean star = conn == Connection.STAR;
        keLineVPerRpm = star ? kePhase * SQRT3 : kePhase;
        starEmfVPerRpm = star ? kePhase : kePhase / SQRT3;
        double lengthM = (double) turnsPerCoil * l.coilsPerPhase() * l.meanTurnLengthM();
        double phaseOhm = Copper.RESISTIVITY_20C_OHM_M * lengthM / w.copperAreaM2() / ((double) paths * paths)
                * lc.copperHotRatio();
        lineOhm = (star ? phaseOhm : phaseOhm / 3) + lc.acCableOhm();
        cutInRpm = lc.thresholdV() / (SQRT2 * keLineVPerRpm);
        double turnsPerPath = (double) turnsPerCoil / paths;
        double phaseH = l.inductanceOneTurnH() * turnsPerPath * turnsPerPath;
        starInductanceH = star ? phaseH : phaseH / 3;
        polePairs = l.polePairs();
        wireFill = turnsPerCoil * w.overallAreaM2() / l.windowAreaM2();
        fill = l.windowKind() == CoilWindow.Kind.SLOTTED ? turnsPerCoil * w.copperAreaM2() / l.windowAreaM2() : wireFill;
        copperMassKg = Copper.DENSITY_KG_PER_M3 * (lengthM * w.copperAreaM2()) * 3;
        magnetMassKg = l.magnetMassKg();
        conductorAreaM2 = w.copperAreaM2();
        phasePerLineCurrent = star ? 1.0 : 1.0 / SQRT3;
    }

    /** Open-circuit line EMF at a speed, V rms. */
    double openCircuitV(double speedRpm) {
        return keLineVPerRpm * speedRpm;
    }

    /** Largest average DC current at a speed ({@link BridgeBounds#maxDcCurrentA}), A. */
    double maxDcCurrentA(double speedRpm, LoadConstants lc) {
        return BridgeBounds.maxDcCurrentA(starEmfVPerRpm * speedRpm, keLineVPerRpm * speedRpm, lc.thresholdV(),
                lineOhm, lc.dcSideOhm());
    }

    /** Least rms line current at a speed ({@link BridgeBounds#minLineCurrentRmsA}), A. */
    double minLineCurrentA(double speedRpm, LoadConstants lc) {
        double reactanceOhm = 2 * Math.PI * polePairs * speedRpm / 60 * starInductanceH;
        return BridgeBounds.minLineCurrentRmsA(keLineVPerRpm * speedRpm, lc.thresholdV(), lineOhm, reactanceOhm,
                lc.dcSideOhm());
    }

    /** Largest average DC current a shaft power can supply after the least losses, A. */
    double dcCurrentFromShaftPowerA(double shaftPowerW, LoadConstants lc) {
        return BridgeBounds.dcCurrentFromShaftPowerA(shaftPowerW, lc.thresholdV(), lineOhm, lc.dcSideOhm());
    }

    /** Current density in the winding at an rms line current, A/mm^2. */
    double currentDensityAPerMm2(double lineCurrentA) {
        return lineCurrentA * phasePerLineCurrent / windingCase.paths() / (conductorAreaM2 * 1e6);
    }

    /** Copper plus magnet mass, kg. */
    double activeMassKg() {
        return copperMassKg + magnetMassKg;
    }

    /** Material cost at the prices given. */
    double cost(MaterialPrices prices) {
        return copperMassKg * prices.copperPerKg()
                + magnetMassKg * prices.magnetPerKg(windingCase.layout().magnetMaterial());
    }
}
