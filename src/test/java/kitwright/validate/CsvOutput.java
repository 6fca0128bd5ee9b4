package kitwright.validate;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a CSV file kitwright wrote, after checking the layout every such file must have so that common spreadsheet
 * programs open it cleanly: a UTF-8 byte-order mark first (U+FEFF, bytes EF BB BF), CRLF after every record and no
 * other line end (RFC 4180, section 2, rules 1 and 6), and a header of snake_case names.
 */
public final class CsvOutput {
    private static final Pattern SNAKE_CASE = Pattern.compile("^[a-z0-9_]+$");

    private CsvOutput() {
    }

    /** The data rows by header name; throws {@link AssertionError} when the layout is not kept. */
    public static List<CSVRecord> records(String text) {
        checkLayout(text);
        try {
            return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                    .parse(new StringReader(text.substring(1))).getRecords();
        } catch (IOException e) {
            throw new AssertionError("CSV unreadable: " + e.getMessage(), e);
        }
    }

    /** The lines after the byte-order mark, header first; throws {@link AssertionError} when the layout is not kept. */
    public static List<String> lines(String text) {
        checkLayout(text);
        return text.substring(1).lines().toList();
    }

    /** Byte-order mark, CRLF only, snake_case header. */
    public static void checkLayout(String text) {
        check(text.startsWith("\uFEFF"), "CSV starts with the byte-order mark U+FEFF");
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n') {
                check(i > 0 && text.charAt(i - 1) == '\r', "CSV line end at character " + i + " is CRLF");
            } else if (c == '\r') {
                check(i + 1 < text.length() && text.charAt(i + 1) == '\n', "CSV CR at character " + i
                        + " starts a CRLF");
            }
        }
        check(text.endsWith("\r\n"), "CSV ends with CRLF");
        String header = text.substring(1, text.indexOf("\r\n"));
        for (String name : header.split(",", -1)) {
            check(SNAKE_CASE.matcher(name).matches(), "CSV header name '" + name + "' is snake_case in " + header);
        }
    }

    private static void check(boolean condition, String what) {
        if (!condition) {
            throw new AssertionError("expected: " + what);
        }
    }
}
