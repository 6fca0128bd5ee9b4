package kitwright.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;

/**
 * {@code plan.xlsx}: every CSV of a plan folder as one workbook, one sheet per CSV in the folder's order, named as
 * the file without {@code .csv}. A sheet holds exactly the CSV's rows (header on row 1, frozen; no totals row).
 * A column whose every non-empty cell is a plain decimal ({@code -12}, {@code 0.5}, {@code 845.70}; not
 * {@code 007} nor {@code 1e3}, which stay text) holds numbers, shown with as many decimals as the column's finest
 * value has; every other cell is the CSV's text as it stands.
 * <p>
 * Written with FastExcel. Byte-identical for the same files and date: the zip's entries carry a fixed time, and
 * the creation time the writer stamps on {@code docProps/core.xml} is replaced by the plan's date.
 */
public final class PlanWorkbook {
    public static final String FILE = "plan.xlsx";
    private static final Pattern NUMBER = Pattern.compile("-?(0|[1-9][0-9]*)(\\.[0-9]+)?");
    private static final Pattern CREATED = Pattern.compile(
            "(<dcterms:created xsi:type=\"dcterms:W3CDTF\">)[^<]*(</dcterms:created>)");
    private static final CSVFormat FORMAT = CSVFormat.RFC4180;

    private PlanWorkbook() {
    }

    /** The workbook of the {@code .csv} entries of {@code files} (name to text), in their order. */
    public static byte[] of(Map<String, String> files, LocalDate date) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            Workbook workbook = new Workbook(out, "kitwright", null);
            for (Map.Entry<String, String> file : files.entrySet()) {
                if (file.getKey().endsWith(".csv")) {
                    sheet(workbook.newWorksheet(file.getKey().substring(0, file.getKey().length() - 4)),
                            rows(file.getValue()));
                }
            }
            workbook.finish();
            return stamped(out.toByteArray(), date);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a byte array does not fail
        }
    }

    /** The CSV's records as written, the byte-order mark left aside. */
    static List<List<String>> rows(String csv) throws IOException {
        String text = csv.startsWith(CsvFile.BYTE_ORDER_MARK) ? csv.substring(1) : csv;
        List<List<String>> rows = new ArrayList<>();
        for (CSVRecord record : FORMAT.parse(new StringReader(text))) {
            rows.add(record.toList());
        }
        return rows;
    }

    private static void sheet(Worksheet sheet, List<List<String>> rows) {
        int columns = rows.stream().mapToInt(List::size).max().orElse(0);
        for (int c = 0; c < columns; c++) {
            int decimals = numberColumnDecimals(rows, c);
            for (int r = 0; r < rows.size(); r++) {
                List<String> row = rows.get(r);
                String cell = c < row.size() ? row.get(c) : "";
                if (cell.isEmpty()) {
                    continue;
                }
                if (r > 0 && decimals >= 0) {
                    sheet.value(r, c, new java.math.BigDecimal(cell));
                    sheet.style(r, c).format(decimals == 0 ? "0" : "0." + "0".repeat(decimals)).set();
                } else {
                    sheet.value(r, c, cell);
                }
            }
            if (!rows.isEmpty()) {
                sheet.style(0, c).bold().set();
            }
        }
        sheet.freezePane(0, 1);
    }

    /** The decimals of a column of plain numbers below the header, or -1 when any cell is not one. */
    private static int numberColumnDecimals(List<List<String>> rows, int column) {
        int decimals = 0;
        boolean any = false;
        for (List<String> row : rows.subList(Math.min(1, rows.size()), rows.size())) {
            String cell = column < row.size() ? row.get(column) : "";
            if (cell.isEmpty()) {
                continue;
            }
            if (!NUMBER.matcher(cell).matches()) {
                return -1;
            }
            any = true;
            int point = cell.indexOf('.');
            decimals = Math.max(decimals, point < 0 ? 0 : cell.length() - point - 1);
        }
        return any ? decimals : -1;
    }

    /** The same package with a fixed entry time and the plan's date as its creation time. */
    private static byte[] stamped(byte[] xlsx, LocalDate date) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(out)) {
            for (Map.Entry<String, byte[]> entry : ZipEntries.of(xlsx).entrySet()) {
                byte[] content = entry.getValue();
                if (entry.getKey().equals("docProps/core.xml")) {
                    content = CREATED.matcher(new String(content, StandardCharsets.UTF_8))
                            .replaceFirst("$1" + date + "T00:00:00Z$2").getBytes(StandardCharsets.UTF_8);
                }
                ZipEntry copy = new ZipEntry(entry.getKey());
                copy.setTimeLocal(date.atStartOfDay()); // local date-time: the same bytes in every time zone
                zip.putNextEntry(copy);
                zip.write(content);
                zip.closeEntry();
            }
        }
        return out.toByteArray();
    }
}
