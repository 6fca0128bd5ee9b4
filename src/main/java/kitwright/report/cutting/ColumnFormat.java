package kitwright.report.cutting;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Fixed number formats per CSV column, so that a column reads the same in every row: money with two decimals
 * ({@code 845.70}, {@code 1.00}); every other column of figures with as many decimals as its finest value needs,
 * at most three (0.001 mm, 0.001 kg), the same in every row ({@code 6000.0} beside {@code 2345.5}). Whole numbers
 * ({@link Integer}) and text are left as they are, a null as an empty cell. Pure function.
 */
final class ColumnFormat {
    /** The finest step a figure is written to, as the rest of kitwright writes figures (io.Figures). */
    private static final int MAX_DECIMALS = 3;
    private static final int MONEY_DECIMALS = 2;

    private ColumnFormat() {
    }

    /** The rows with every {@link Double} cell written as text in its column's format. */
    static List<List<Object>> apply(List<String> header, Set<String> moneyColumns, List<List<Object>> rows) {
        int[] decimals = new int[header.size()];
        for (int c = 0; c < header.size(); c++) {
            decimals[c] = moneyColumns.contains(header.get(c)) ? MONEY_DECIMALS : finest(rows, c);
        }
        List<List<Object>> out = new ArrayList<>();
        for (List<Object> row : rows) {
            List<Object> cells = new ArrayList<>(row.size());
            for (int c = 0; c < row.size(); c++) {
                Object cell = row.get(c);
                cells.add(cell instanceof Double d ? scaled(d, decimals[c]).toPlainString() : cell);
            }
            out.add(cells);
        }
        return out;
    }

    /** Decimals the finest figure of a column needs, once rounded to {@link #MAX_DECIMALS}. */
    private static int finest(List<List<Object>> rows, int column) {
        int decimals = 0;
        for (List<Object> row : rows) {
            if (column < row.size() && row.get(column) instanceof Double d) {
                decimals = Math.max(decimals, Math.max(0, scaled(d, MAX_DECIMALS).stripTrailingZeros().scale()));
            }
        }
        return decimals;
    }

    private static BigDecimal scaled(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP);
    }
}
