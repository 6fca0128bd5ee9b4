package kitwright.report.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Function;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockTerms;
import kitwright.report.CuttingFigures;
import kitwright.report.CuttingFigures.OrderLine;

/**
 * The purchase order, {@code order.csv}: only the stock bought from the mill, one row per section and stock length
 * (sections in plan order, lengths in catalog order), so that {@code total} adds up to the amount payable. Rack
 * offcuts to take are in {@code rack-pull.csv}. {@code unit_price} is the catalog's price on its
 * {@code price_basis} (per piece, per metre or per kg) in {@code currency}; {@code total} is pieces x the price per
 * piece worked out on that basis, the figure the cutting stage minimised. Unit price and total are blank where the
 * catalog gives no price. {@code grade}, {@code standard} and {@code supplier} follow when the catalog gives any.
 */
public final class OrderCsv {
    public static final List<String> HEADER = List.of("section", "material", "outer_diameter_mm", "wall_mm",
            "stock_length_mm", "pieces", "mass_kg", "unit_price", "price_basis", "currency", "total");
    /** Columns written only when some row of the tube catalog gives them. */
    static final List<String> OPTIONAL = List.of("grade", "standard", "supplier");
    private static final List<Function<StockTerms, String>> OPTIONAL_VALUES = List.of(StockTerms::grade,
            StockTerms::standard, StockTerms::supplier);

    private OrderCsv() {
    }

    public static String format(Kit kit, CutPlan plan) {
        List<String> header = new ArrayList<>(HEADER);
        List<Integer> optional = new ArrayList<>();
        for (int i = 0; i < OPTIONAL.size(); i++) {
            Function<StockTerms, String> value = OPTIONAL_VALUES.get(i);
            if (kit.catalog().stock().stream().anyMatch(s -> !value.apply(s.terms()).isEmpty())) {
                header.add(OPTIONAL.get(i));
                optional.add(i);
            }
        }
        List<List<Object>> rows = new ArrayList<>();
        for (SectionCutPlan section : plan.sections()) {
            Section info = kit.catalog().section(section.section()).orElseThrow();
            for (OrderLine line : CuttingFigures.of(kit, section).lines()) {
                if (line.origin() != Origin.MILL) {
                    continue;
                }
                StockTerms terms = line.terms();
                List<Object> row = new ArrayList<>(List.of(info.name(), info.material(), info.outerDiameterMm(),
                        info.wallMm(), line.stockLengthMm(), line.pieces()));
                row.add(line.massKg());
                row.add(line.unitPrice() == null ? null : terms.quotedPrice());
                row.add(terms.basis().code());
                row.add(terms.currency());
                row.add(line.totalInCents());
                optional.forEach(i -> row.add(OPTIONAL_VALUES.get(i).apply(terms)));
                rows.add(row);
            }
        }
        return CsvText.of(header, ColumnFormat.apply(header, Set.of("unit_price", "total"), rows));
    }
}
