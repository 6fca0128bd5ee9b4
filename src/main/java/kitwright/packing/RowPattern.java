package kitwright.packing;

/**
 * Equal circles of diameter d in rows across a W x H cross-section, the two layouts the trade uses for tubes
 * lying lengthwise (src/docs/sources.md, Rows of circles):
 * <ul>
 *   <li>{@link #SQUARE}: rows d apart, each holding floor(W/d) circles: floor(W/d) * floor(H/d) in all;</li>
 *   <li>{@link #STAGGERED}: rows d*sqrt(3)/2 apart, every second row shifted by d/2, so a circle rests in the dip
 *   between two below; 1 + floor((H - d) / (d*sqrt(3)/2)) rows holding floor(W/d) and floor((W - d/2)/d)
 *   circles in turn.</li>
 * </ul>
 * For 1000 x 1000 and d = 100 that is 100 square and 105 staggered. Row 0 lies on the floor; circle j of a row
 * is counted from the left wall. Floors use a tolerance of 1e-9 so exact fits count.
 */
public enum RowPattern {
    SQUARE, STAGGERED;

    /** Tolerance of the floor functions, so that 1000 / 100 counts as 10. */
    static final double EPS = 1e-9;
    static final double ROW_PITCH = Math.sqrt(3) / 2;

    static int floor(double x) {
        return (int) Math.floor(x + EPS);
    }

    /** Vertical distance between the centres of two neighbouring rows. */
    public double rowPitch(double d) {
        return this == SQUARE ? d : d * ROW_PITCH;
    }

    /** Rows of circles of diameter d that fit a height h. */
    public int rows(double h, double d) {
        if (h + EPS < d) {
            return 0;
        }
        return 1 + floor((h - d) / rowPitch(d));
    }

    /** Height taken by the given number of rows. */
    public double height(int rows, double d) {
        return rows <= 0 ? 0 : d + (rows - 1) * rowPitch(d);
    }

    /** Circles in row {@code row} (0 on the floor) across a width w. */
    public int perRow(int row, double w, double d) {
        if (this == STAGGERED && row % 2 == 1) {
            return Math.max(0, floor((w - d / 2) / d));
        }
        return Math.max(0, floor(w / d));
    }

    /** Circles in the first {@code rows} rows. */
    public int count(int rows, double w, double d) {
        int n = 0;
        for (int r = 0; r < rows; r++) {
            n += perRow(r, w, d);
        }
        return n;
    }

    /** Circles of diameter d in a w x h cross-section. */
    public int capacity(double w, double h, double d) {
        return count(rows(h, d), w, d);
    }

    /** Fewest rows that hold n circles across a width w, or -1 when no number of rows does. */
    public int rowsFor(int n, double w, double d) {
        if (n <= 0) {
            return 0;
        }
        if (perRow(0, w, d) == 0) {
            return -1;
        }
        int rows = 0;
        int held = 0;
        while (held < n) {
            held += perRow(rows, w, d);
            rows++;
        }
        return rows;
    }

    /** Centre of circle j of row {@code row} from the left wall. */
    public double centreY(int row, int j, double d) {
        return (this == STAGGERED && row % 2 == 1 ? d : d / 2) + j * d;
    }

    /** Centre height of row {@code row} above the bottom of its rows. */
    public double centreZ(int row, double d) {
        return d / 2 + row * rowPitch(d);
    }

    /** The layout holding more circles of diameter d in w x h (square on a tie). */
    public static RowPattern better(double w, double h, double d) {
        return STAGGERED.capacity(w, h, d) > SQUARE.capacity(w, h, d) ? STAGGERED : SQUARE;
    }
}
