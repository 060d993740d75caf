package coilwright.sizing;

import coilwright.conductor.WireSpec;
import coilwright.machine.AlternatorSpec;
import coilwright.machine.Connection;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.winding.WindingSpec;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The discrete space searched: every layout with each of its parallel-path counts, times every wire size and strand
 * count, turn count and connection. A candidate is a number in [0, size); its digits, slowest first, are the
 * winding case, the wire option, the turn count and the connection.
 */
final class SearchSpace {
    /** The most candidates one search takes. */
    static final long MAX_CANDIDATES = 20_000_000L;

    private final SizingRequest request;
    private final List<WindingCase> cases;
    private final List<WireOption> wires;
    private final List<Connection> connections;
    private final int minTurns;
    private final int turnCount;
    private final long perCase;

    /** @throws InvalidInputException (field {@code winding...} or {@code build}) when the space holds more than {@code cap} */
    SearchSpace(SizingRequest request, List<Layout> layouts, long cap) {
        this.request = request;
        List<WindingCase> c = new ArrayList<>();
        for (Layout l : layouts) {
            for (int a : l.parallelPaths()) {
                c.add(new WindingCase(l, a));
            }
        }
        this.cases = List.copyOf(c);
        List<WireOption> w = new ArrayList<>();
        for (WireSpec size : request.winding().wire().sizes()) {
            for (int s = 1; s <= request.winding().wire().maxStrands(); s++) {
                w.add(WireOption.of(size.withStrands(s)));
            }
        }
        this.wires = List.copyOf(w);
        this.connections = request.winding().connections();
        this.minTurns = request.winding().minTurnsPerCoil();
        this.turnCount = request.winding().turnCount();
        this.perCase = (long) wires.size() * turnCount * connections.size();
        long size = perCase * cases.size();
        if (size > cap) {
            throw tooLarge(size, cap);
        }
    }

    private InvalidInputException tooLarge(long size, long cap) {
        int sizes = request.winding().wire().sizes().size();
        String text = String.format(Locale.ROOT, "the search space holds %,d candidates, more than the %,d allowed: "
                        + "%d layouts with their parallel-path counts x %d wire sizes x %d strand counts x %d turn counts x "
                        + "%d connections. Narrow it: fewer turn counts (winding.minTurnsPerCoil to maxTurnsPerCoil), a "
                        + "narrower wire range or fewer strands (winding.wire), fewer parallel paths "
                        + "(winding.maxParallelPaths), or a narrower pole range and fewer magnets (build)", size,
                cap, cases.size(), sizes, request.winding().wire().maxStrands(), turnCount, connections.size());
        String field = turnCount >= Math.max(sizes * request.winding().wire().maxStrands(), cases.size())
                ? "winding.maxTurnsPerCoil" : sizes * request.winding().wire().maxStrands() >= cases.size()
                ? "winding.wire" : "build";
        return new InvalidInputException(new FieldError(field, Long.toString(size), field + ": " + text,
                "at most " + cap + " candidates"));
    }

    SizingRequest request() {
        return request;
    }

    long size() {
        return perCase * cases.size();
    }

    long perCase() {
        return perCase;
    }

    List<WindingCase> cases() {
        return cases;
    }

    List<WireOption> wires() {
        return wires;
    }

    List<Connection> connections() {
        return connections;
    }

    int minTurns() {
        return minTurns;
    }

    int turnCount() {
        return turnCount;
    }

    /** The candidate number of a case, wire option, turn count and connection (all as indices). */
    long index(int caseIndex, int wireIndex, int turnIndex, int connectionIndex) {
        return ((caseIndex * (long) wires.size() + wireIndex) * turnCount + turnIndex) * connections.size()
                + connectionIndex;
    }

    WindingCase caseOf(long index) {
        return cases.get((int) (index / perCase));
    }

    WireOption wireOf(long index) {
        return wires.get((int) (index % perCase / ((long) turnCount * connections.size())));
    }

    int turnsOf(long index) {
        return minTurns + (int) (index / connections.size() % turnCount);
    }

    Connection connectionOf(long index) {
        return connections.get((int) (index % connections.size()));
    }

    /** The full alternator specification of a candidate. */
    AlternatorSpec spec(long index) {
        WindingCase wc = caseOf(index);
        Layout l = wc.layout();
        WindingChoices w = request.winding();
        WindingSpec winding = l.winding().withParallelPaths(wc.paths());
        return new AlternatorSpec(winding, turnsOf(index), connectionOf(index), l.rotor(), l.stator(),
                wireOf(index).wire(), w.cooling(), w.insulationClass(), w.windingTempC(), request.build().magnetTempC(),
                0, 0);
    }
}
