package kitwright.sweep;

import java.util.List;

/**
 * Problem: over all sections together, the least largest change D (whole tenths of a millimetre) of any member
 * from its target such that K marks suffice, each section having marks of its own.
 *
 * <p>Method: for a given D each section needs at least {@link GreedyCover#marksNeeded} marks, and that many suffice,
 * so D is feasible exactly when the sections' greedy counts sum to at most K. That test is monotone in D (a larger
 * change never needs more marks), so a binary search over the whole numbers from 0 to the largest half-span finds
 * the least feasible D. The least D is the rounded-up half of some difference of two target lengths (the candidate
 * widths of the continuous problem, (x_j - x_i)/2), which the search meets without listing them.
 *
 * <p>Guarantee: the least largest change achievable with marks in whole tenths; O(n log span) time.
 */
final class LeastLargestChange {
    private LeastLargestChange() {
    }

    /**
     * @param sections one array of distinct ascending lengths (tenths) per section
     * @param marks    K, at least the number of sections
     */
    static long of(List<long[]> sections, int marks) {
        if (marks < sections.size()) {
            throw new IllegalArgumentException(marks + " marks for " + sections.size() + " sections");
        }
        long low = 0;
        long high = 0;
        for (long[] v : sections) {
            high = Math.max(high, (v[v.length - 1] - v[0] + 1) / 2);
        }
        while (low < high) {
            long mid = low + (high - low) / 2;
            if (needed(sections, mid) <= marks) {
                high = mid;
            } else {
                low = mid + 1;
            }
        }
        return low;
    }

    /** Marks the sections need together for a largest change of {@code change}. */
    static long needed(List<long[]> sections, long change) {
        long total = 0;
        for (long[] v : sections) {
            total += GreedyCover.marksNeeded(v, change);
        }
        return total;
    }
}
