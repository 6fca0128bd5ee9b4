package kitwright.io;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.dhatim.fastexcel.reader.Cell;
import org.dhatim.fastexcel.reader.CellType;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.ReadingOptions;
import org.dhatim.fastexcel.reader.Row;
import org.dhatim.fastexcel.reader.Sheet;

/**
 * One sheet of an {@code .xlsx} workbook as rows of text, for {@link CsvTable} to check as it checks a CSV file.
 * Method: the sheet is read with FastExcel's streaming reader. A text cell reads as its text; an empty cell as
 * blank; a number cell as its decimal value rounded to the 15 significant digits a spreadsheet keeps and shows
 * (so 599.1 stored as 599.10000000000002 reads 599.1); a true/false cell as {@code true} or {@code false}; a
 * formula cell as the result the spreadsheet saved with it. Guarantee: a cell whose value would mislead is
 * refused with its row and column, never guessed: a number formatted as a date or time (no input holds dates,
 * so it is a length or count shown as a date), an error value ({@code #DIV/0!}), or a formula saved without its
 * result. Rows carry the spreadsheet's row numbers (the first row is 1).
 */
final class WorkbookSheet {
    /** A spreadsheet keeps numbers to 15 significant digits and shows at most these. */
    private static final MathContext SPREADSHEET_DIGITS = new MathContext(15);
    private static final Set<String> ERRORS = Set.of("#NULL!", "#DIV/0!", "#VALUE!", "#REF!", "#NAME?", "#NUM!",
            "#N/A", "#GETTING_DATA", "#SPILL!", "#CALC!", "#FIELD!", "#BLOCKED!", "#CONNECT!", "#BUSY!",
            "#UNKNOWN!", "#EXTERNAL!", "#PYTHON!");

    private WorkbookSheet() {
    }

    /** The rows of a sheet, under the sheet's name as the workbook spells it. */
    record Rows(String sheet, List<CsvTable.Line> lines) {
        Rows {
            lines = List.copyOf(lines);
        }
    }

    /** The names of the workbook's sheets in order, or empty with a problem when it cannot be read. */
    static Optional<List<String>> names(Path file, String what, Problems problems) {
        Optional<ReadableWorkbook> opened = open(file, what, problems);
        if (opened.isEmpty()) {
            return Optional.empty();
        }
        try (ReadableWorkbook workbook = opened.get()) {
            return Optional.of(workbook.getSheets().map(Sheet::getName).toList());
        } catch (IOException | RuntimeException e) {
            problems.add(Problem.ofFile(file, unreadable(e)));
            return Optional.empty();
        }
    }

    /**
     * Reads a sheet, or the first sheet when {@code sheet} is null; empty with a problem when the workbook or the
     * sheet cannot be read.
     */
    static Optional<Rows> read(Path file, String sheet, String what, CsvColumns columns, Problems problems) {
        Optional<ReadableWorkbook> opened = open(file, what, problems);
        if (opened.isEmpty()) {
            return Optional.empty();
        }
        try (ReadableWorkbook workbook = opened.get()) {
            Optional<Sheet> found = sheet == null ? workbook.getSheets().findFirst() : workbook.getSheets()
                    .filter(s -> s.getName().equalsIgnoreCase(sheet)).findFirst();
            if (found.isEmpty()) {
                problems.add(Problem.ofFile(file, "the workbook has no sheet " + (sheet == null ? "" : sheet + " ")
                        + "(expected " + what + " with the columns " + columns.header() + ")"));
                return Optional.empty();
            }
            String name = found.get().getName();
            return rows(file, name, found.get(), columns, problems).map(lines -> new Rows(name, lines));
        } catch (IOException | RuntimeException e) {
            problems.add(Problem.ofFile(file, unreadable(e)));
            return Optional.empty();
        }
    }

    private static Optional<ReadableWorkbook> open(Path file, String what, Problems problems) {
        byte[] bytes;
        try {
            bytes = InputBytes.read(file);
        } catch (NoSuchFileException e) {
            problems.add(Problem.ofFile(file, "file not found (expected " + what + ")"));
            return Optional.empty();
        } catch (InputBytes.TooLargeException e) {
            problems.add(InputBytes.tooLarge(file, what));
            return Optional.empty();
        } catch (IOException e) {
            problems.add(Problem.ofFile(file, "cannot read the file: " + InputBytes.reason(e)));
            return Optional.empty();
        }
        if (ReadableWorkbook.isOLE2Header(bytes)) {
            problems.add(Problem.ofFile(file, "the file is an old .xls workbook or a workbook protected by a"
                    + " password, which kitwright cannot read (expected an .xlsx workbook without a password; save"
                    + " it as 'Excel Workbook (.xlsx)')"));
            return Optional.empty();
        }
        if (!ReadableWorkbook.isOOXMLZipHeader(bytes)) {
            problems.add(Problem.ofFile(file, "the file is not an .xlsx workbook (expected " + what + ", saved as"
                    + " 'Excel Workbook (.xlsx)'; a CSV file keeps the name .csv)"));
            return Optional.empty();
        }
        try {
            return Optional.of(new ReadableWorkbook(new ByteArrayInputStream(bytes), new ReadingOptions(true,
                    false)));
        } catch (IOException | RuntimeException e) {
            problems.add(Problem.ofFile(file, unreadable(e)));
            return Optional.empty();
        }
    }

    private static String unreadable(Exception e) {
        String reason = e instanceof UncheckedIOException u ? String.valueOf(u.getCause().getMessage())
                : String.valueOf(e.getMessage());
        return "the workbook cannot be read: " + reason + " (expected an .xlsx workbook as a spreadsheet program"
                + " saves it)";
    }

    /**
     * Every row with a value, as text; reading stops with a problem past {@link Limits#MAX_FILE_BYTES} characters,
     * as the compressed file may hold far more than its size on disk.
     */
    private static Optional<List<CsvTable.Line>> rows(Path file, String sheet, Sheet source, CsvColumns columns,
                                             Problems problems) throws IOException {
        List<CsvTable.Line> lines = new ArrayList<>();
        List<String> header = null;
        long characters = 0;
        try (Stream<Row> stream = source.openStream()) {
            for (Iterator<Row> rows = stream.iterator(); rows.hasNext(); ) {
                Row row = rows.next();
                List<String> values = new ArrayList<>();
                boolean readable = true;
                for (int i = 0; i < row.getCellCount(); i++) {
                    String column = header == null ? "" : i < header.size() ? header.get(i) : "";
                    Optional<String> text = text(row.getCell(i), column, file, sheet, row.getRowNum(), problems);
                    readable &= text.isPresent();
                    values.add(text.orElse(""));
                    characters += text.map(String::length).orElse(0) + 1;
                }
                if (characters > Limits.MAX_FILE_BYTES) {
                    problems.add(file, sheet, row.getRowNum(), "", "the sheet holds more than "
                            + (Limits.MAX_FILE_BYTES >> 20) + " MB of text (expected a table of a kit: rows with"
                            + " the columns " + columns.header() + ")");
                    return Optional.empty();
                }
                while (!values.isEmpty() && values.get(values.size() - 1).isBlank()) {
                    values.remove(values.size() - 1);
                }
                if (values.isEmpty() && readable) {
                    continue;
                }
                if (header == null) {
                    header = values.stream().map(String::trim).map(columns::canonical).toList();
                }
                lines.add(new CsvTable.Line(row.getRowNum(), values, readable));
            }
        }
        return Optional.of(lines);
    }

    /** A cell as text, or empty after reporting a cell whose value would mislead. */
    private static Optional<String> text(Cell cell, String column, Path file, String sheet, int row,
                                         Problems problems) {
        if (cell == null || cell.getType() == CellType.EMPTY || cell.getValue() == null
                && cell.getType() != CellType.FORMULA) {
            return Optional.of("");
        }
        Object value = cell.getValue();
        String formula = cell.getType() == CellType.FORMULA ? "the formula =" + cell.getFormula() : null;
        String shown = formula == null ? "the cell" : formula;
        if (value == null) {
            problems.add(file, sheet, row, column, formula + " has no saved result (expected a value; open the"
                    + " workbook in a spreadsheet program and save it, or type the value)");
            return Optional.empty();
        }
        if ((cell.getType() == CellType.ERROR || formula != null) && ERRORS.contains(String.valueOf(value))) {
            problems.add(file, sheet, row, column, shown + " shows the error " + value + " (expected a value)");
            return Optional.empty();
        }
        if (value instanceof BigDecimal number) {
            if (dateFormat(cell)) {
                problems.add(file, sheet, row, column, shown + " holds " + plain(number) + " formatted as a date"
                        + " or time ('" + cell.getDataFormatString() + "') (expected a number or text; format the"
                        + " cell as Number or Text and check its value)");
                return Optional.empty();
            }
            return Optional.of(plain(number));
        }
        if (value instanceof Boolean flag) {
            return Optional.of(flag.toString());
        }
        return Optional.of(value.toString());
    }

    /** A number as a spreadsheet shows it at most: 15 significant digits, no exponent, no trailing zeros. */
    static String plain(BigDecimal number) {
        return number.round(SPREADSHEET_DIGITS).stripTrailingZeros().toPlainString();
    }

    /**
     * True when the cell's number format shows a date or time: one of the built-in date and time formats
     * (ids 14 to 22 and 45 to 47 of ECMA-376 Part 1, 18.8.30), or a format with a date or time letter (y, m, d, h,
     * s) outside quoted text, escapes and bracketed colours or locales.
     */
    static boolean dateFormat(Cell cell) {
        Integer id = cell.getDataFormatId();
        if (id != null && (id >= 14 && id <= 22 || id >= 45 && id <= 47)) {
            return true;
        }
        String format = cell.getDataFormatString();
        if (format == null) {
            return false;
        }
        String bare = format.replaceAll("\"[^\"]*\"", "").replaceAll("\\\\.", "").replaceAll("\\[[^]]*]", "")
                .toLowerCase(Locale.ROOT);
        return bare.matches(".*[ymdhs].*");
    }
}
