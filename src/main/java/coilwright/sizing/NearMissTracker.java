package coilwright.sizing;

import java.util.Arrays;

/**
 * The few candidates that break exactly one given limit by the least, kept while candidates stream past: ordered by
 * relative excess, then by candidate number, so the choice does not depend on the order of arrival.
 */
final class NearMissTracker {
    /** Candidates kept per limit. */
    static final int KEPT = 3;

    private final long[] index = new long[KEPT];
    private final double[] excess = new double[KEPT];
    private int size;

    void offer(long candidate, double relativeExcess) {
        int pos = size;
        while (pos > 0 && before(candidate, relativeExcess, pos - 1)) {
            pos--;
        }
        if (pos >= KEPT) {
            return;
        }
        int last = Math.min(size, KEPT - 1);
        for (int i = last; i > pos; i--) {
            index[i] = index[i - 1];
            excess[i] = excess[i - 1];
        }
        index[pos] = candidate;
        excess[pos] = relativeExcess;
        size = Math.min(KEPT, size + 1);
    }

    private boolean before(long candidate, double relativeExcess, int i) {
        return relativeExcess < excess[i] || relativeExcess == excess[i] && candidate < index[i];
    }

    void merge(NearMissTracker other) {
        for (int i = 0; i < other.size; i++) {
            offer(other.index[i], other.excess[i]);
        }
    }

    long[] candidates() {
        return Arrays.copyOf(index, size);
    }
}
