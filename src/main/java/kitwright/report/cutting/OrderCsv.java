package kitwright.report.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.StockLength;

/**
 * The purchase order, {@code order.csv}: stock to buy per section and stock length (sections in catalog order,
 * lengths ascending), then, listed apart, the rack offcuts the plan uses. Unit price and total are blank where the
 * catalog gives no price.
 */
public final class OrderCsv {
    public static final List<String> HEADER = List.of("section", "origin", "stock_length_mm", "pieces",
            "unit_price", "total");

    private OrderCsv() {
    }

    public static String format(Kit kit, CutPlan plan) {
        List<List<Object>> rows = new ArrayList<>();
        rows.addAll(rows(kit, plan, Origin.MILL));
        rows.addAll(rows(kit, plan, Origin.RACK));
        return CsvText.of(HEADER, rows);
    }

    private static List<List<Object>> rows(Kit kit, CutPlan plan, Origin origin) {
        List<List<Object>> rows = new ArrayList<>();
        for (SectionCutPlan section : plan.sections()) {
            Map<Double, Integer> pieces = new TreeMap<>();
            for (CutPattern p : section.patterns()) {
                if (p.origin() == origin) {
                    pieces.merge(p.stockLengthMm(), p.count(), Integer::sum);
                }
            }
            pieces.forEach((length, count) -> {
                Double price = price(kit, section.section(), length, origin);
                rows.add(List.of(section.section(), origin.code(), length, count, price == null ? "" : price,
                        price == null ? "" : Math.round(price * count * 100) / 100.0));
            });
        }
        return rows;
    }

    /** The catalog's price of a stock length, or null. */
    static Double price(Kit kit, String section, double length, Origin origin) {
        for (StockLength row : kit.catalog().stockFor(section)) {
            if (row.lengthMm() == length && row.origin() == origin) {
                return row.price();
            }
        }
        return null;
    }
}
