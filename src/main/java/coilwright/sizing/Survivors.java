package coilwright.sizing;

import java.util.Arrays;

/**
 * The candidates that passed the screen, kept in primitive arrays (there may be millions): their numbers, the
 * bound and the estimate of their objective score (higher is better), and the two axes of the Pareto front (an
 * upper bound of the energy or output, and the exact cost or mass).
 */
final class Survivors {
    private long[] index = new long[16];
    private double[] scoreBound = new double[16];
    private double[] scoreEstimate = new double[16];
    private double[] valueBound = new double[16];
    private double[] cost = new double[16];
    private int size;

    void add(long candidate, double score, double estimate, double value, double costOrMass) {
        if (size == index.length) {
            int n = size * 2;
            index = Arrays.copyOf(index, n);
            scoreBound = Arrays.copyOf(scoreBound, n);
            scoreEstimate = Arrays.copyOf(scoreEstimate, n);
            valueBound = Arrays.copyOf(valueBound, n);
            cost = Arrays.copyOf(cost, n);
        }
        index[size] = candidate;
        scoreBound[size] = score;
        scoreEstimate[size] = estimate;
        valueBound[size] = value;
        cost[size] = costOrMass;
        size++;
    }

    void addAll(Survivors other) {
        for (int i = 0; i < other.size; i++) {
            add(other.index[i], other.scoreBound[i], other.scoreEstimate[i], other.valueBound[i], other.cost[i]);
        }
    }

    int size() {
        return size;
    }

    long index(int i) {
        return index[i];
    }

    double scoreBound(int i) {
        return scoreBound[i];
    }

    double scoreEstimate(int i) {
        return scoreEstimate[i];
    }

    double valueBound(int i) {
        return valueBound[i];
    }

    double cost(int i) {
        return cost[i];
    }
}
