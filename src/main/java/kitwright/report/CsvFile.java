package kitwright.report;

import java.io.IOException;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * The one place that decides how every CSV file kitwright writes is laid out, so that common spreadsheet programs
 * open each of them cleanly: UTF-8 text starting with a byte-order mark (without it, some spreadsheet programs read
 * the file in the platform's legacy encoding and garble names such as "Ø"), RFC 4180 quoting and CRLF line ends
 * (RFC 4180, section 2, rules 1 and 6), a header row of snake_case names, every cell passed through
 * {@link SpreadsheetCell}. Writers build their rows and print them through {@link #printer} or {@link #text}.
 */
public final class CsvFile {
    /** The byte-order mark U+FEFF, written as the first character of every CSV file (EF BB BF in UTF-8). */
    public static final String BYTE_ORDER_MARK = "\uFEFF";
    /** RFC 4180: comma-separated, double quotes, CRLF after every record. */
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setRecordSeparator("\r\n").get();

    private CsvFile() {
    }

    /**
     * A printer that has written the byte-order mark and the header row to {@code out}; print each row through
     * {@link SpreadsheetCell#row}. Closing or flushing the printer is the caller's.
     */
    public static CSVPrinter printer(Appendable out, List<String> header) throws IOException {
        out.append(BYTE_ORDER_MARK);
        CSVPrinter printer = new CSVPrinter(out, FORMAT);
        printer.printRecord(SpreadsheetCell.row(header));
        return printer;
    }

    /** The whole file's text: byte-order mark, header row, then the rows, each cell made safe. */
    public static String text(List<String> header, List<? extends List<?>> rows) {
        StringBuilder out = new StringBuilder();
        try (CSVPrinter printer = printer(out, header)) {
            for (List<?> row : rows) {
                printer.printRecord(SpreadsheetCell.row(row));
            }
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }
}
