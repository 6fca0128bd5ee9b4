package kitwright.sweep;

/**
 * Problem: the fewest marks, each a whole number of tenths of a millimetre, such that every target length of a
 * section lies within {@code change} of some mark.
 *
 * <p>Method: the greedy covering of points by intervals of width 2·change: the shortest uncovered length x gets the
 * mark x + change, the longest mark that still serves it, which covers every length up to x + 2·change; repeat.
 *
 * <p>Guarantee: the count is the least possible. Exchange argument: any cover has a mark serving x, at most
 * x + change, so it covers no length beyond x + 2·change; replacing it by x + change leaves every later length
 * covered: the "greedy stays ahead" argument for covering points by unit intervals (Kleinberg and Tardos,
 * Algorithm Design, 2006, chapter 4, from memory). Marks on the grid lose nothing, as x + change is a whole number
 * of tenths when x and change are.
 */
final class GreedyCover {
    private GreedyCover() {
    }

    /**
     * @param values distinct lengths in tenths, ascending
     * @param change the largest change allowed, in tenths, 0 or more
     */
    static int marksNeeded(long[] values, long change) {
        int marks = 0;
        int i = 0;
        while (i < values.length) {
            long reach = values[i] + 2 * change;
            marks++;
            while (i < values.length && values[i] <= reach) {
                i++;
            }
        }
        return marks;
    }
}
