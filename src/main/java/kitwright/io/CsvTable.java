package kitwright.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * One CSV file, or one sheet of an .xlsx workbook ({@link WorkbookSheet}), read whole and checked against its
 * known columns: UTF-8 (a byte-order mark is accepted), header on line 1 with names matched after trimming, in any
 * letter case. Files as spreadsheets save them in either
 * convention read alike: comma-separated with decimal points, or, as European spreadsheet programs save CSV,
 * semicolon-separated with decimal commas ({@link CsvDialect} tells which from the file, unless kit.json states it;
 * a file that mixes them is refused with the line that shows it). Rows come with the line they start
 * on (the header is line 1; in a sheet, the spreadsheet's row number); blank rows are skipped. Every problem goes
 * to a {@link Problems}; a file whose header cannot be used yields no table.
 */
public final class CsvTable {
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder()
            .setIgnoreSurroundingSpaces(true).setTrim(true).setIgnoreEmptyLines(true).get();

    private static final Pattern START_LINE = Pattern.compile("\\(startline (\\d+)\\)");

    /** One row as text: the line (or row of a sheet) it starts on, its values, false when a cell was refused. */
    record Line(int line, List<String> values, boolean readable) {
        Line {
            values = List.copyOf(values);
        }
    }

    private final Path file;
    private final String sheet;
    private final int headerLine;
    private final List<CsvRow> rows;
    private final int dataRows;

    private CsvTable(Path file, String sheet, int headerLine, List<CsvRow> rows, int dataRows) {
        this.file = file;
        this.sheet = sheet;
        this.headerLine = headerLine;
        this.rows = List.copyOf(rows);
        this.dataRows = dataRows;
    }

    public Path file() {
        return file;
    }

    /** The sheet of a workbook the table was read from, as the workbook spells it; null for a CSV file. */
    public String sheet() {
        return sheet;
    }

    /** A problem with the table as a whole, placed on the line under the header (where rows should be). */
    public Problem belowHeader(String message) {
        return new Problem(file, sheet, headerLine + 1, "", message);
    }

    /** The rows that have one value per column (others are reported and left out). */
    public List<CsvRow> rows() {
        return rows;
    }

    /** True when every non-blank row under the header was kept in {@link #rows()} (none was left out). */
    public boolean everyRowRead() {
        return rows.size() == dataRows;
    }

    /** True when nothing but blank rows follows the header. */
    public boolean isEmpty() {
        return dataRows == 0;
    }

    /**
     * Reads a CSV file, or reports why it cannot be read.
     *
     * @param what what the file holds, for messages ("the kit's bars")
     */
    public static Optional<CsvTable> read(Path file, CsvColumns columns, String what, Problems problems) {
        return read(TableSource.of(file), columns, what, problems);
    }

    /**
     * Reads a CSV file or a sheet of a workbook, or reports why it cannot be read.
     *
     * @param what what the table holds, for messages ("the kit's bars")
     */
    public static Optional<CsvTable> read(TableSource source, CsvColumns columns, String what, Problems problems) {
        Path file = source.file();
        if (source.workbook()) {
            return WorkbookSheet.read(file, source.sheet(), what, columns, problems).flatMap(sheet -> {
                if (sheet.lines().isEmpty()) {
                    problems.add(file, sheet.sheet(), 1, "", "the sheet is empty (expected a header row: "
                            + columns.header().replace(',', ' ') + ", one name per cell)");
                    return Optional.empty();
                }
                return table(file, sheet.sheet(), sheet.lines(), columns, false, problems);
            });
        }
        byte[] bytes;
        try {
            bytes = InputBytes.read(file);
        } catch (NoSuchFileException e) {
            problems.add(Problem.ofFile(file, "file not found (expected " + what + ", columns "
                    + columns.header() + ")"));
            return Optional.empty();
        } catch (InputBytes.TooLargeException e) {
            problems.add(InputBytes.tooLarge(file, what + ", a CSV file with the columns " + columns.header()));
            return Optional.empty();
        } catch (IOException e) {
            problems.add(Problem.ofFile(file, "cannot read the file: " + InputBytes.reason(e)));
            return Optional.empty();
        }
        Optional<String> text = decode(file, bytes, problems);
        Optional<Problem> hidden = InputBytes.textProblem(file, bytes, "UTF-8; save it as 'CSV UTF-8'");
        if (text.isPresent() && hidden.isPresent()) {
            problems.add(hidden.get());
            return Optional.empty();
        }
        if (text.isEmpty()) {
            return Optional.empty();
        }
        if (text.get().isBlank()) {
            problems.add(file, 1, "", "the file is empty (expected a header line: " + columns.header() + ")");
            return Optional.empty();
        }
        return parse(file, text.get(), columns, source.convention(), problems);
    }

    private static Optional<String> decode(Path file, byte[] bytes, Problems problems) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            problems.add(file, InputBytes.lineOf(bytes, in.position()), "", "the file is not UTF-8 text (expected UTF-8; save it as 'CSV UTF-8')");
            return Optional.empty();
        }
        decoder.flush(out);
        String text = out.flip().toString();
        return Optional.of(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }

    private static Optional<CsvTable> parse(Path file, String text, CsvColumns columns, CsvConvention stated,
                                            Problems problems) {
        int[] lineStarts = lineStarts(text);
        Optional<Character> separator = CsvDialect.separator(file, text, columns, stated, problems);
        if (separator.isEmpty()) {
            return Optional.empty();
        }
        List<CSVRecord> records = new ArrayList<>();
        CSVFormat format = FORMAT.builder().setDelimiter(separator.get()).get();
        try (CSVParser parser = CSVParser.parse(text, format)) {
            for (CSVRecord record : parser) {
                records.add(record);
            }
        } catch (IOException | UncheckedIOException e) {
            problems.add(file, brokenLine(e, records, text, lineStarts), "", "the file is not valid CSV: "
                    + describe(e) + " (expected comma-separated values; close every opening quote)");
            return Optional.empty();
        }
        List<Line> lines = records.stream().map(r -> new Line(lineOf(lineStarts, start(text, r)), r.toList(), true))
                .toList();
        Optional<Boolean> decimalComma = CsvDialect.decimalComma(file, separator.get(), lines, stated, problems);
        if (decimalComma.isEmpty()) {
            return Optional.empty();
        }
        return table(file, null, lines, columns, decimalComma.get(), problems);
    }

    /** The table of a file's (or sheet's) lines: the first is the header, blank ones are skipped. */
    private static Optional<CsvTable> table(Path file, String sheet, List<Line> lines, CsvColumns columns,
                                            boolean decimalComma, Problems problems) {
        Line headerRecord = lines.get(0);
        int headerLine = headerRecord.line();
        if (!headerRecord.readable()) {
            return Optional.empty(); // its cell was reported
        }
        Optional<List<String>> header = header(file, sheet, headerLine, headerRecord.values(), columns, problems);
        if (header.isEmpty()) {
            return Optional.empty();
        }
        List<CsvRow> rows = new ArrayList<>();
        int dataRows = 0;
        for (Line record : lines.subList(1, lines.size())) {
            int line = record.line();
            if (record.values().stream().allMatch(String::isBlank) && record.readable()) {
                continue;
            }
            dataRows++;
            if (!record.readable()) {
                continue; // a cell of the sheet was refused and reported
            }
            if (sheet == null && record.values().size() > header.get().size()) {
                problems.add(file, line, "", "the row has " + record.values().size() + " values but the header has "
                        + header.get().size() + " columns (expected one value per column; quote a value that"
                        + " contains a comma)");
                continue;
            }
            // A short row reads its missing trailing values as blank, as hand-written files often leave them out.
            Map<String, String> values = new LinkedHashMap<>();
            boolean unnamed = false;
            for (int i = 0; i < record.values().size(); i++) {
                String name = i < header.get().size() ? header.get().get(i) : "";
                String value = record.values().get(i).trim();
                if (name.isEmpty() && !value.isEmpty() && !unnamed) {
                    unnamed = true;
                    problems.add(file, sheet, line, "", "the value '" + value + "' stands in a column without a"
                            + " name (expected a header name for every column that holds values)");
                }
                values.put(name, value);
            }
            if (unnamed) {
                continue;
            }
            rows.add(new CsvRow(file, sheet, line, values, problems, decimalComma));
        }
        return Optional.of(new CsvTable(file, sheet, headerLine, rows, dataRows));
    }

    /** Checks the header: separator, duplicates, unknown (with the nearest known name) and missing columns. */
    private static Optional<List<String>> header(Path file, String sheet, int line, List<String> record,
                                                 CsvColumns columns, Problems problems) {
        // Header names in any letter case stand for the known column of that name ("Length_MM" is length_mm).
        List<String> names = record.stream().map(String::trim).map(columns::canonical).toList();
        int before = problems.count();
        Set<String> seen = new HashSet<>();
        Set<String> suggested = new HashSet<>();
        for (String name : names) {
            if (name.isEmpty()) {
                continue; // spreadsheets add unnamed empty columns; values under them are reported per row
            }
            if (!seen.add(name)) {
                problems.add(file, sheet, line, name, "the column appears twice (expected each column once)");
            } else if (!columns.knows(name)) {
                List<String> unused = columns.all().stream().filter(c -> !names.contains(c)).toList();
                Optional<String> near = NearestName.of(name, unused);
                near.ifPresent(suggested::add);
                String hint = near.map(n -> "did you mean " + n + "? ").orElse("");
                problems.add(file, sheet, line, name, "unknown column (" + hint
                        + "known columns: " + columns.describe() + ")");
            }
        }
        for (String required : columns.required()) {
            if (!names.contains(required) && !suggested.contains(required)) {
                problems.add(file, sheet, line, required, "the column is missing (expected the header "
                        + columns.header() + ")");
            }
        }
        return problems.count() == before ? Optional.of(names) : Optional.empty();
    }

    /** Where a record's first value starts: the parser's position may point at the blank lines it skipped. */
    private static long start(String text, CSVRecord record) {
        int position = (int) record.getCharacterPosition();
        while (position < text.length() && (text.charAt(position) == '\r' || text.charAt(position) == '\n')) {
            position++;
        }
        return position;
    }

    private static int[] lineStarts(String text) {
        List<Integer> starts = new ArrayList<>(List.of(0));
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                starts.add(i + 1);
            }
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }

    private static int lineOf(int[] lineStarts, long position) {
        int low = 0;
        int high = lineStarts.length - 1;
        while (low < high) {
            int middle = (low + high + 1) / 2;
            if (lineStarts[middle] <= position) {
                low = middle;
            } else {
                high = middle - 1;
            }
        }
        return low + 1;
    }

    /** The line the parser names ("startline N"), else the line after the last good record. */
    private static int brokenLine(Exception e, List<CSVRecord> records, String text, int[] lineStarts) {
        Matcher startLine = START_LINE.matcher(String.valueOf(rootCause(e).getMessage()));
        if (startLine.find()) {
            return Integer.parseInt(startLine.group(1));
        }
        return records.isEmpty() ? 1 : lineOf(lineStarts, start(text, records.get(records.size() - 1))) + 1;
    }

    private static String describe(Exception e) {
        String message = String.valueOf(rootCause(e).getMessage());
        if (message.contains("EOF reached before encapsulated token finished")) {
            return "a quoted value is not closed before the end of the file";
        }
        if (message.toLowerCase(java.util.Locale.ROOT).contains("between encapsulated token and delimiter")) {
            return "text follows a closing quote; quote the whole value and double any quote inside it";
        }
        return START_LINE.matcher(message.lines().findFirst().orElse(message)).replaceAll("").trim();
    }

    private static Throwable rootCause(Throwable t) {
        return t.getCause() == null || t.getCause() == t ? t : rootCause(t.getCause());
    }
}
