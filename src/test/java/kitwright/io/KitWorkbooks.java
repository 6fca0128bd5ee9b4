package kitwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Writes .xlsx workbooks for tests with Apache POI, a different library from the FastExcel reader the main code
 * reads them with, so that a fault of one library cannot hide behind the same fault of the other.
 */
public final class KitWorkbooks {
    private static final java.util.regex.Pattern NUMBER = java.util.regex.Pattern.compile("-?\\d+(\\.\\d+)?");

    private KitWorkbooks() {
    }

    /**
     * A workbook with one sheet per entry, named by the key, holding the CSV text's rows from row 1: values that
     * read as plain numbers become number cells, others text cells, empty values no cell.
     */
    public static Path fromCsv(Path file, Map<String, String> sheets) {
        return write(file, workbook -> sheets.forEach((name, csv) -> fill(workbook.createSheet(name), csv)));
    }

    /** kit.xlsx in {@code dir} from the kit folder's bars.csv, structures.csv and joints.csv (those present). */
    public static Path kitFromCsvFolder(Path csvKit, Path dir) throws IOException {
        Map<String, String> sheets = new LinkedHashMap<>();
        for (String table : List.of("bars", "structures", "joints")) {
            Path csv = csvKit.resolve(table + ".csv");
            if (Files.exists(csv)) {
                sheets.put(table, Files.readString(csv));
            }
        }
        return fromCsv(dir.resolve(KitReader.WORKBOOK), sheets);
    }

    /** A workbook built by hand, for cells a CSV cannot hold (dates, formulas, errors). */
    public static Path write(Path file, Consumer<XSSFWorkbook> build) {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            build.accept(workbook);
            Files.createDirectories(file.toAbsolutePath().getParent());
            try (OutputStream out = Files.newOutputStream(file)) {
                workbook.write(out);
            }
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The CSV text's rows into the sheet from row 1, numbers as number cells. */
    public static void fill(XSSFSheet sheet, String csv) {
        try {
            List<CSVRecord> records = CSVFormat.RFC4180.parse(new StringReader(csv)).getRecords();
            for (int r = 0; r < records.size(); r++) {
                Row row = sheet.createRow(r);
                CSVRecord record = records.get(r);
                for (int c = 0; c < record.size(); c++) {
                    String value = record.get(c);
                    if (value.isEmpty()) {
                        continue;
                    }
                    if (r > 0 && NUMBER.matcher(value).matches()) {
                        row.createCell(c).setCellValue(Double.parseDouble(value));
                    } else {
                        row.createCell(c).setCellValue(value);
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
