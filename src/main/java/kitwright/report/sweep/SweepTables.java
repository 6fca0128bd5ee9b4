package kitwright.report.sweep;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.io.PrettyJson;
import kitwright.report.CsvFile;
import kitwright.sweep.SweepRow;

/**
 * Writes {@code sweep.json} ({@code {"options": [...]}}, one object per option in K order, keys in the order of
 * {@link SweepRow}) and {@code sweep.csv} (the same rows, the keys in snake_case as the header, unknown figures as
 * empty cells, numbers in plain notation; laid out by {@link CsvFile}).
 */
public final class SweepTables {
    /** The sweep.csv header: the sweep.json keys in snake_case. */
    public static final List<String> HEADER = List.of("marks", "kit", "max_change_mm", "mean_change_mm",
            "reuse_ratio", "cost", "crate_cost", "trip_cost", "total_cost", "offcut_pct", "bundles", "crates",
            "vehicles", "co2e_kg", "status", "reason", "pareto");

    private SweepTables() {
    }

    public static String json(List<SweepRow> rows) {
        Map<String, Object> document = new LinkedHashMap<>();
        document.put("options", rows);
        return PrettyJson.write(document);
    }

    public static String csv(List<SweepRow> rows) {
        List<List<String>> cells = new ArrayList<>();
        for (SweepRow r : rows) {
            cells.add(List.of(Integer.toString(r.marks()), r.kit(), number(r.maxChangeMm()), number(r.meanChangeMm()),
                    number(r.reuseRatio()), number(r.cost()), number(r.crateCost()), number(r.tripCost()),
                    number(r.totalCost()), number(r.offcutPct()), count(r.bundles()), count(r.crates()),
                    count(r.vehicles()), number(r.co2eKg()), r.status().name(), r.reason() == null ? "" : r.reason(),
                    Boolean.toString(r.pareto())));
        }
        return CsvFile.text(HEADER, cells);
    }

    private static String number(Double v) {
        return v == null ? "" : BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    private static String count(Integer v) {
        return v == null ? "" : v.toString();
    }
}
