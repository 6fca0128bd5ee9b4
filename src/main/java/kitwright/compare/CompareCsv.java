package kitwright.compare;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import kitwright.report.CsvFile;
import kitwright.report.SpreadsheetCell;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes {@code compare.csv}: a header row with the compare.json keys in snake_case ({@code reuseRatio} is
 * {@code reuse_ratio}), then one row per option in the given order. Unknown figures are empty cells; numbers in
 * plain notation with a point as decimal separator; laid out by {@link CsvFile}.
 */
public final class CompareCsv {
    /** The header: the compare.json keys in their order, in snake_case. */
    public static final List<String> HEADER = List.of("kit", "marks", "bars", "members", "reuse_ratio",
            "stock_pieces", "stock_length_mm", "cost", "payable_cost", "offcut_pct", "scrap_pct", "remnant_pct",
            "kit_mass_kg", "bought_mass_kg", "used_stock_mass_kg", "co2e_kg", "bundles", "crates", "vehicles",
            "trip_cost", "crate_cost", "total_cost", "status", "status_reason");

    private CompareCsv() {
    }

    public static void write(List<OptionSummary> options, Writer out) throws IOException {
        try (CSVPrinter printer = CsvFile.printer(out, HEADER)) {
            for (OptionSummary o : options) {
                printer.printRecord(SpreadsheetCell.row(row(o)));
            }
        }
    }

    private static List<String> row(OptionSummary o) {
        List<String> cells = new ArrayList<>(HEADER.size());
        cells.add(o.kit());
        cells.add(Integer.toString(o.marks()));
        cells.add(Integer.toString(o.bars()));
        cells.add(o.members() == null ? "" : o.members().toString());
        cells.add(number(o.reuseRatio()));
        cells.add(Integer.toString(o.stockPieces()));
        cells.add(number(o.stockLengthMm()));
        cells.add(number(o.cost()));
        cells.add(number(o.payableCost()));
        cells.add(number(o.offcutPct()));
        cells.add(number(o.scrapPct()));
        cells.add(number(o.remnantPct()));
        cells.add(number(o.kitMassKg()));
        cells.add(number(o.boughtMassKg()));
        cells.add(number(o.usedStockMassKg()));
        cells.add(number(o.co2eKg()));
        cells.add(o.bundles() == null ? "" : o.bundles().toString());
        cells.add(o.crates() == null ? "" : o.crates().toString());
        cells.add(o.vehicles() == null ? "" : o.vehicles().toString());
        cells.add(number(o.tripCost()));
        cells.add(number(o.crateCost()));
        cells.add(number(o.totalCost()));
        cells.add(o.status().name());
        cells.add(o.statusReason() == null ? "" : o.statusReason());
        return cells;
    }

    private static String number(Double value) {
        return value == null ? "" : BigDecimal.valueOf(value).toPlainString();
    }
}
