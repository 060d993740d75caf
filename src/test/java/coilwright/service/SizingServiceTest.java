package coilwright.service;

import coilwright.conductor.Cooling;
import coilwright.conductor.ThermalClass;
import coilwright.load.Battery;
import coilwright.load.BatteryLoad;
import coilwright.load.BridgeType;
import coilwright.load.Cable;
import coilwright.load.ChargeStage;
import coilwright.load.Chemistry;
import coilwright.load.DiodeType;
import coilwright.load.Rectifier;
import coilwright.machine.Connection;
import coilwright.machine.SlottedStator;
import coilwright.magnet.RotorSide;
import coilwright.sizing.Limits;
import coilwright.sizing.MagnetOption;
import coilwright.sizing.MaterialPrices;
import coilwright.sizing.Objective;
import coilwright.sizing.RadialBuild;
import coilwright.sizing.SizingProgress;
import coilwright.sizing.SizingRequest;
import coilwright.sizing.SizingResult;
import coilwright.sizing.SpeedTargets;
import coilwright.sizing.WindingChoices;
import coilwright.sizing.WireRange;
import coilwright.winding.Layers;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicLong;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SizingServiceTest {
    /** A 36-slot motor stator for 12 V: charging by 150 rpm, 120 W at 250 rpm. */
    private static SizingRequest request() {
        BatteryLoad load = new BatteryLoad(Battery.of(Chemistry.LEAD_ACID, 6, ChargeStage.NOMINAL),
                new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SCHOTTKY, 0.45), new Cable(15, 1.6e-5, 30),
                new Cable(2, 2.5e-5, 25));
        RadialBuild build = new RadialBuild(RotorSide.INNER, 0.10, 0.08, 36,
                new SlottedStator(0.014, 0.0045, 0.001, 0.0002, 0.005), 0.001, 0.0025, List.of(Layers.SINGLE), 8, 12,
                List.of(new MagnetOption("N42", 0.0095, 0.040, 0.005, List.of(1, 2))), 50);
        WindingChoices w = new WindingChoices(4, 20, WireRange.awg(16, 18, 2), List.of(Connection.STAR,
                Connection.DELTA), 2, 0.85, Cooling.ENCLOSED_NATURAL, ThermalClass.F, 80);
        return new SizingRequest(new SpeedTargets(150, 250, 120, 500), load, build, w, new Limits(6, 0, 0, 0, 0),
                Objective.OUTPUT_AT_RATED, MaterialPrices.none(), 3, 1000);
    }

    @Test
    void sizes_a_request_on_its_own_pool_and_on_a_given_one() {
        SizingResult own = new SizingService().size(request());
        ForkJoinPool pool = new ForkJoinPool(1);
        try {
            assertEquals(own, new SizingService(pool).size(request()));
        } finally {
            pool.shutdown();
        }
        assertTrue(own.feasible());
        assertTrue(own.provenBest());
        assertEquals(own.counts().candidatesInSpace(), new SizingService().candidateCount(request()));
    }

    @Test
    void reports_progress_and_stops_when_cancelled() {
        AtomicLong reports = new AtomicLong();
        SizingService service = new SizingService();
        service.size(request(), (stage, done, total) -> reports.incrementAndGet(), () -> false);
        assertTrue(reports.get() >= 4, "a report per stage at least");
        assertThrows(CancellationException.class, () -> service.size(request(), SizingProgress.NONE, () -> true));
    }
}
