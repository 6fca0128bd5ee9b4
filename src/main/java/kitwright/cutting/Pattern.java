package kitwright.cutting;

import java.util.Arrays;

/**
 * One stock piece's cut in solver terms: a stock type and how many pieces of each item type it yields.
 * Equality is by content, so patterns can key maps.
 */
record Pattern(int stock, int[] counts) {
    Pattern {
        counts = counts.clone();
    }

    /** A copy of the counts (the record keeps its own). */
    @Override
    public int[] counts() {
        return counts.clone();
    }

    int types() {
        return counts.length;
    }

    int count(int type) {
        return counts[type];
    }

    boolean isEmpty() {
        for (int c : counts) {
            if (c != 0) {
                return false;
            }
        }
        return true;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Pattern p && p.stock == stock && Arrays.equals(p.counts, counts);
    }

    @Override
    public int hashCode() {
        return 31 * stock + Arrays.hashCode(counts);
    }

    @Override
    public String toString() {
        return "Pattern[" + stock + ":" + Arrays.toString(counts) + "]";
    }
}
