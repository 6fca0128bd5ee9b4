package kitwright.packing;

import java.util.ArrayList;
import java.util.List;

/**
 * Rows of lane cells of one diameter in one {@link RowPattern}, from height {@code base} up a crate's
 * cross-section, handed out row by row from the left wall. Its pattern is chosen when it opens: the one that holds
 * all the lanes meant for it in the fewest rows (least height), or the most of them when none holds all.
 */
final class RowGroup {
    private static final double EPS = 1e-6;

    /** A cell for one lane: its diameter and centre in the cross-section. */
    record Cell(double d, double y, double z) {
    }

    final RowPattern pattern;
    final double d;
    final double base;
    final double width;
    final int maxRows;
    int row;
    int inRow;

    private RowGroup(RowPattern pattern, double d, double base, double width, int maxRows) {
        this.pattern = pattern;
        this.d = d;
        this.base = base;
        this.width = width;
        this.maxRows = maxRows;
    }

    /** A group for lanes.get(from) and the lanes after it close enough in size, in the better pattern. */
    static RowGroup open(List<LaneBuilder.Lane> lanes, int from, double width, double room, double base) {
        double d = lanes.get(from).cellMm();
        int n = 0;
        for (int k = from; k < lanes.size() && lanes.get(k).cellMm() >= CrateFiller.MERGE * d - EPS; k++) {
            n++;
        }
        RowPattern best = null;
        double bestHeight = Double.MAX_VALUE;
        int bestCapacity = -1;
        boolean bestHoldsAll = false;
        for (RowPattern p : RowPattern.values()) {
            int rows = p.rows(room, d);
            int capacity = p.count(rows, width, d);
            int need = p.rowsFor(n, width, d);
            boolean holdsAll = need >= 0 && need <= rows;
            double h = holdsAll ? p.height(need, d) : p.height(rows, d);
            boolean better = best == null
                    || (holdsAll && (!bestHoldsAll || h < bestHeight - EPS))
                    || (!holdsAll && !bestHoldsAll && capacity > bestCapacity);
            if (better) {
                best = p;
                bestHeight = h;
                bestCapacity = capacity;
                bestHoldsAll = holdsAll;
            }
        }
        return new RowGroup(best, d, base, width, best.rows(room, d));
    }

    boolean hasRoomInOpenRow() {
        return inRow > 0 && inRow < pattern.perRow(row, width, d);
    }

    boolean canOpenRow() {
        int r = inRow == 0 ? row : row + 1;
        while (r < maxRows && pattern.perRow(r, width, d) == 0) {
            r++;
        }
        return r < maxRows;
    }

    Cell next() {
        if (inRow > 0 && inRow >= pattern.perRow(row, width, d)) {
            row++;
            inRow = 0;
        }
        while (row < maxRows && pattern.perRow(row, width, d) == 0) {
            row++;
        }
        if (row >= maxRows) {
            return null;
        }
        Cell c = new Cell(d, pattern.centreY(row, inRow, d), base + pattern.centreZ(row, d));
        inRow++;
        return c;
    }

    double heightUsed() {
        int rows = inRow == 0 ? row : row + 1;
        return pattern.height(rows, d);
    }

    List<Cell> unusedInOpenRows() {
        List<Cell> cells = new ArrayList<>();
        if (inRow > 0) {
            for (int j = inRow; j < pattern.perRow(row, width, d); j++) {
                cells.add(new Cell(d, pattern.centreY(row, j, d), base + pattern.centreZ(row, d)));
            }
        }
        return cells;
    }
}
