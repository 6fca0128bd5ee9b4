package kitwright.report.cutting;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import kitwright.io.Figures;
import kitwright.report.SpreadsheetCell;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * CSV text as kitwright writes it: RFC 4180 quoting, a header row, "\n" line ends on every platform, every cell
 * made safe for spreadsheets ({@link SpreadsheetCell}).
 */
final class CsvText {
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setRecordSeparator("\n").get();

    private CsvText() {
    }

    static String of(List<String> header, List<List<Object>> rows) {
        StringBuilder out = new StringBuilder();
        try (CSVPrinter printer = new CSVPrinter(out, FORMAT)) {
            printer.printRecord(SpreadsheetCell.row(header));
            for (List<Object> row : rows) {
                printer.printRecord(SpreadsheetCell.row(row.stream().map(CsvText::cell).toList()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }

    /** Figures without float noise; null as an empty cell. */
    private static String cell(Object value) {
        if (value == null) {
            return "";
        }
        if (value instanceof Double d) {
            return Figures.plain(d);
        }
        return value.toString();
    }
}
