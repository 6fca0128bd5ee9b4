package kitwright.io;

import java.nio.file.Path;
import java.util.Locale;

/**
 * Where one input table comes from: a CSV file (read with the delimiter and decimal sign kit.json states, else
 * detected), or a sheet of an {@code .xlsx} workbook ({@link WorkbookSheet}). A file whose name ends in
 * {@code .xlsx} is a workbook; without a sheet name its first sheet is read.
 *
 * @param file       the CSV file or the workbook
 * @param sheet      the sheet of a workbook, or null for a CSV file or the workbook's first sheet
 * @param convention what kit.json states for a CSV file
 */
public record TableSource(Path file, String sheet, CsvConvention convention) {
    public TableSource {
        convention = convention == null ? CsvConvention.DETECTED : convention;
    }

    /** A CSV file read as detected, or the first sheet of a workbook. */
    public static TableSource of(Path file) {
        return new TableSource(file, null, CsvConvention.DETECTED);
    }

    /** A sheet of a workbook. */
    public static TableSource sheet(Path workbook, String sheet) {
        return new TableSource(workbook, sheet, CsvConvention.DETECTED);
    }

    /** True when the file is an {@code .xlsx} workbook. */
    public boolean workbook() {
        return isWorkbook(file);
    }

    /** True when the file's name ends in {@code .xlsx} (in any letter case). */
    public static boolean isWorkbook(Path file) {
        Path name = file.getFileName();
        return name != null && name.toString().toLowerCase(Locale.ROOT).endsWith(".xlsx");
    }
}
