package kitwright.nesting;

import java.util.Arrays;

/**
 * Guests of each tube type in one pattern (or rows of each type in one knapsack), kept as the types with a count
 * above zero, in ascending type order. A pattern carries a few guest types out of all the kit's, and column
 * generation keeps every column it prices: a list with one entry per type made a kit of 2,000 marks (about 1,900
 * tube types) hold some 150,000 lists of 1,900 entries, over 1 GB, for a few dozen nonzero counts each.
 *
 * <p>Reading the entries in order gives the same sums, in the same order, as a dense list without its zeros, so
 * every model built from them is the same. A class rather than a record: a record's equality would compare the
 * arrays by identity.
 */
final class TypeCounts {
    private final int[] types;
    private final int[] counts;

    private TypeCounts(int[] types, int[] counts) {
        this.types = types;
        this.counts = counts;
    }

    /** The nonzero entries of a count per type (index = type); throws on a negative count. */
    static TypeCounts of(int[] perType) {
        int nonzero = 0;
        for (int count : perType) {
            if (count < 0) {
                throw new IllegalArgumentException("negative count " + count);
            }
            nonzero += count > 0 ? 1 : 0;
        }
        int[] types = new int[nonzero];
        int[] counts = new int[nonzero];
        int i = 0;
        for (int t = 0; t < perType.length; t++) {
            if (perType[t] > 0) {
                types[i] = t;
                counts[i++] = perType[t];
            }
        }
        return new TypeCounts(types, counts);
    }

    /** Types with a count above zero. */
    int size() {
        return types.length;
    }

    /** The type of entry i (ascending in i). */
    int type(int i) {
        return types[i];
    }

    /** The count of entry i (above zero). */
    int count(int i) {
        return counts[i];
    }

    /** The count of a type, 0 when absent. */
    int get(int type) {
        int i = Arrays.binarySearch(types, type);
        return i >= 0 ? counts[i] : 0;
    }

    /** The sum of all counts. */
    int total() {
        int sum = 0;
        for (int count : counts) {
            sum += count;
        }
        return sum;
    }

    /** sum_t weight_t * count_t, summed in ascending type order. */
    double value(double[] weight) {
        double sum = 0;
        for (int i = 0; i < types.length; i++) {
            sum += weight[types[i]] * counts[i];
        }
        return sum;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof TypeCounts that && Arrays.equals(types, that.types)
                && Arrays.equals(counts, that.counts);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(types) + Arrays.hashCode(counts);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("{");
        for (int i = 0; i < types.length; i++) {
            sb.append(i > 0 ? ", " : "").append(types[i]).append('=').append(counts[i]);
        }
        return sb.append('}').toString();
    }
}
