package kitwright.sweep;

/**
 * The best mark of one contiguous group of target lengths under a largest change D: the mark m (whole tenths) that
 * keeps every length of the group within D, |x - m| ≤ D, i.e. m in [max - D, min + D], and has the least sum of
 * squared changes Σ w (x - m)². That sum is a convex quadratic in m with its minimum at the group's (weighted) mean,
 * so the best whole m is the nearer of floor and ceiling of the mean, clamped into the interval (the clamp of a
 * convex function's minimiser is its minimiser on the interval). Exact: prefix sums of w, w·x and w·x² in integers.
 */
final class GroupCost {
    private final long[] values;
    private final long[] count;
    private final long[] sum;
    private final long[] squares;

    /** @param values distinct ascending lengths in tenths; @param weights members per length */
    GroupCost(long[] values, long[] weights) {
        this.values = values.clone();
        int n = values.length;
        count = new long[n + 1];
        sum = new long[n + 1];
        squares = new long[n + 1];
        for (int i = 0; i < n; i++) {
            count[i + 1] = count[i] + weights[i];
            sum[i + 1] = Math.addExact(sum[i], Math.multiplyExact(weights[i], values[i]));
            squares[i + 1] = Math.addExact(squares[i],
                    Math.multiplyExact(weights[i], Math.multiplyExact(values[i], values[i])));
        }
    }

    int size() {
        return values.length;
    }

    long value(int i) {
        return values[i];
    }

    /** Whether lengths i..j (inclusive) fit one mark within {@code change}. */
    boolean fits(int i, int j, long change) {
        return values[j] - values[i] <= 2 * change;
    }

    /** The best mark of lengths i..j within {@code change}; the group must fit. */
    long mark(int i, int j, long change) {
        long w = count[j + 1] - count[i];
        long s = sum[j + 1] - sum[i];
        long floor = Math.floorDiv(s, w);
        long best = squaredChange(i, j, floor + 1) < squaredChange(i, j, floor) ? floor + 1 : floor;
        long low = values[j] - change;
        long high = values[i] + change;
        return Math.max(low, Math.min(high, best));
    }

    /** Σ w (x - m)² over lengths i..j, in tenths squared. */
    long squaredChange(int i, int j, long m) {
        long w = count[j + 1] - count[i];
        long s = sum[j + 1] - sum[i];
        long q = squares[j + 1] - squares[i];
        return q - 2 * m * s + m * m * w;
    }

    /** The least Σ w (x - m)² of lengths i..j within {@code change}. */
    long cost(int i, int j, long change) {
        return squaredChange(i, j, mark(i, j, change));
    }
}
