package kitwright.report.cutting;

import java.util.List;
import kitwright.io.Figures;
import kitwright.report.CsvFile;

/**
 * The cutting stage's CSV text: figures without float noise, laid out by {@link CsvFile} (byte-order mark, RFC 4180,
 * CRLF, every cell made safe for spreadsheets).
 */
final class CsvText {
    private CsvText() {
    }

    static String of(List<String> header, List<List<Object>> rows) {
        return CsvFile.text(header, rows.stream().map(row -> row.stream().map(CsvText::cell).toList()).toList());
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
