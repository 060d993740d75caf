package coilwright.sizing;

import coilwright.conductor.CoilWindow;
import coilwright.conductor.FillCheck;
import coilwright.conductor.WireSpec;
import coilwright.machine.Alternator;
import coilwright.machine.AlternatorModel;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;
import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.winding.StarOfSlots;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ForkJoinPool;

/**
 * The layouts of a request: drafted by the topology's enumerator, then each built once with the full model (one
 * turn of the thinnest wire) for its flux per pole, winding factor, mean turn length, window and magnet mass.
 *
 * @param layouts   the buildable layouts, in drafting order
 * @param drafted   combinations considered
 * @param rejected  combinations not searched, by reason
 */
record Layouts(List<Layout> layouts, long drafted, EnumMap<LayoutRejection, Long> rejected) {
    /** Most combinations of poles, coils, magnets and sizes drafted in one search. */
    static final long MAX_COMBINATIONS = 200_000;
    /** Most layouts built with the full model in one search. */
    static final int MAX_LAYOUTS = 4_000;

    /**
     * @throws InvalidInputException (field {@code build}) when the request drafts more than {@link #MAX_COMBINATIONS}
     *                               combinations or more than {@link #MAX_LAYOUTS} usable layouts
     */
    static Layouts of(SizingRequest req, ForkJoinPool pool) {
        long combinations = req.build() instanceof AxialBuild a ? AxialDrafts.combinations(a)
                : RadialDrafts.combinations((RadialBuild) req.build());
        if (combinations > MAX_COMBINATIONS) {
            throw tooMany(combinations + " combinations of poles, coil counts, magnets and sizes", MAX_COMBINATIONS);
        }
        WindingCheck windings = new WindingCheck(req.winding().minWindingFactor());
        List<LayoutDraft> drafts = new ArrayList<>();
        EnumMap<LayoutRejection, Long> rejected = new EnumMap<>(LayoutRejection.class);
        if (req.build() instanceof AxialBuild a) {
            AxialDrafts.draft(a, windings, drafts::add, rejected);
        } else {
            RadialDrafts.draft((RadialBuild) req.build(), windings, drafts::add, rejected);
        }
        if (drafts.size() > MAX_LAYOUTS) {
            throw tooMany(drafts.size() + " usable layouts", MAX_LAYOUTS);
        }
        List<Optional<Layout>> built = Parallel.map(pool, drafts, d -> build(d, req));
        List<Layout> layouts = new ArrayList<>();
        for (Optional<Layout> l : built) {
            l.ifPresentOrElse(layouts::add, () -> rejected.merge(LayoutRejection.MODEL_REFUSED, 1L, Long::sum));
        }
        return new Layouts(List.copyOf(layouts), combinations, rejected);
    }

    private static InvalidInputException tooMany(String what, long cap) {
        return new InvalidInputException(new FieldError("build", what, String.format(Locale.ROOT,
                "build: the request makes %s, more than the %d one search takes; narrow the pole range "
                        + "(minPoles, maxPoles), or give fewer magnets, counts per pole, diameters or stator thicknesses",
                what, cap), "at most " + cap));
    }

    private static Optional<Layout> build(LayoutDraft d, SizingRequest req) {
        WindingChoices w = req.winding();
        List<WireSpec> sizes = w.wire().sizes();
        WireSpec thinnest = sizes.get(sizes.size() - 1);
        try {
            Alternator alt = AlternatorModel.build(new AlternatorSpec(d.winding(), 1, Connection.STAR, d.rotor(),
                    d.stator(), thinnest, w.cooling(), w.insulationClass(), w.windingTempC(), req.build().magnetTempC(),
                    0, 0));
            FillCheck fill = alt.fill();
            // one turn of one strand: copper fill = strand area / window
            double windowM2 = thinnest.conductorCopperAreaM2() / fill.copperFill();
            CoilWindow.Kind kind = fill.basis() == FillCheck.Basis.COPPER_FILL ? CoilWindow.Kind.SLOTTED
                    : CoilWindow.Kind.AIR_CORED;
            List<Integer> paths = StarOfSlots.allowedParallelPaths(d.winding()).stream()
                    .filter(a -> a <= w.maxParallelPaths()).toList();
            return Optional.of(new Layout(d.rotor(), d.stator(), d.winding(), alt.winding().coilsPerPhase(),
                    alt.winding().fundamentalTotalFactor(), alt.gapField().fluxPerPoleWb(), alt.meanTurnLengthM(),
                    windowM2, kind, alt.phaseInductanceH(), alt.magnetMassKg(), d.rotor().grade().material(), paths, d.label()));
        } catch (InfeasibleDesignException | InvalidInputException e) {
            return Optional.empty();
        }
    }
}
