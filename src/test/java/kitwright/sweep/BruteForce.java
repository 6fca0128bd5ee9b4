package kitwright.sweep;

import java.util.ArrayList;
import java.util.List;

/**
 * Brute force of the grouping for tests: per section, every set of k whole-tenth marks between its shortest and
 * longest target (a mark outside that range is never better than the range's end), each target sent to its nearest
 * mark; then the least largest change over all shares of at most K marks, and under it the least sum of squares.
 */
final class BruteForce {
    private static final long NONE = Long.MAX_VALUE;

    private BruteForce() {
    }

    /** {largest change, sum of squares} of the best grouping into at most {@code marks} marks. */
    static long[] best(List<List<Long>> sections, int marks) {
        int s = sections.size();
        // table[s][k][d]: least squares of section s with k marks and largest change at most d
        List<long[][]> tables = new ArrayList<>();
        long span = 0;
        for (List<Long> xs : sections) {
            span = Math.max(span, xs.stream().mapToLong(x -> x).max().orElseThrow()
                    - xs.stream().mapToLong(x -> x).min().orElseThrow());
        }
        for (List<Long> xs : sections) {
            tables.add(table(xs, marks, (int) span));
        }
        for (int d = 0; d <= span; d++) {
            long best = bestShare(tables, 0, marks, d);
            if (best != NONE) {
                return new long[] {d, best};
            }
        }
        throw new IllegalStateException("no grouping");
    }

    private static long bestShare(List<long[][]> tables, int section, int left, int d) {
        if (section == tables.size()) {
            return 0;
        }
        long best = NONE;
        long[][] t = tables.get(section);
        for (int k = 1; k <= left - (tables.size() - section - 1) && k < t.length; k++) {
            if (t[k][d] == NONE) {
                continue;
            }
            long rest = bestShare(tables, section + 1, left - k, d);
            if (rest != NONE) {
                best = Math.min(best, t[k][d] + rest);
            }
        }
        return best;
    }

    private static long[][] table(List<Long> xs, int marks, int span) {
        long lo = xs.stream().mapToLong(x -> x).min().orElseThrow();
        long hi = xs.stream().mapToLong(x -> x).max().orElseThrow();
        int grid = (int) (hi - lo + 1);
        long[][] t = new long[marks + 1][span + 1];
        for (long[] row : t) {
            java.util.Arrays.fill(row, NONE);
        }
        for (int k = 1; k <= Math.min(marks, grid); k++) {
            enumerate(xs, lo, grid, k, 0, new long[k], 0, t[k]);
        }
        return t;
    }

    private static void enumerate(List<Long> xs, long lo, int grid, int k, int from, long[] chosen, int depth,
                                  long[] row) {
        if (depth == k) {
            long largest = 0;
            long squares = 0;
            for (long x : xs) {
                long near = NONE;
                for (long m : chosen) {
                    near = Math.min(near, Math.abs(x - m));
                }
                largest = Math.max(largest, near);
                squares += near * near;
            }
            for (int d = (int) largest; d < row.length; d++) {
                row[d] = Math.min(row[d], squares);
            }
            return;
        }
        for (int g = from; g < grid; g++) {
            chosen[depth] = lo + g;
            enumerate(xs, lo, grid, k, g + 1, chosen, depth + 1, row);
        }
    }
}
