package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads {@code bars.csv}: {@code mark,section,length_mm,quantity} and optional
 * {@code node_to_node_mm,tolerance_mm,note,start_deduction_mm,end_deduction_mm} (the last two per end, over
 * kit.json's {@code endDeductionMm}, for a bar between joints of different sizes). Checks each row on its own
 * (numbers, blanks, duplicate marks); the checks against the tube catalog and structures.csv are made when the kit
 * is assembled.
 */
public final class BarsReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("mark", "section", "length_mm", "quantity"),
            List.of("node_to_node_mm", "tolerance_mm", "note", "start_deduction_mm", "end_deduction_mm"));

    private BarsReader() {
    }

    /** Reads a bars file on its own; throws with every problem found. */
    public static List<Sourced<BarLine>> read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        List<Sourced<BarLine>> bars = read(file, problems);
        problems.throwIfAny();
        return bars;
    }

    /**
     * The rows of bars.csv that name a mark.
     *
     * @param everyMarkRead true when the file was read and every row gave its mark, so a mark missing from
     *                      {@code lines} is truly not in the file; false when the file or some row could not be read
     */
    public record Rows(List<Sourced<BarLine>> lines, boolean everyMarkRead) {
        public Rows {
            lines = List.copyOf(lines);
        }
    }

    /** Reads a bars file, adding problems; returns every row that names a mark. */
    public static List<Sourced<BarLine>> read(Path file, Problems problems) {
        return readRows(file, problems).lines();
    }

    /** Reads a bars file, adding problems; returns every row that names a mark and whether every mark was read. */
    public static Rows readRows(Path file, Problems problems) {
        return readRows(TableSource.of(file), problems);
    }

    /** Reads bars.csv or the bars sheet of kit.xlsx, adding problems, as {@link #readRows(Path, Problems)}. */
    public static Rows readRows(TableSource source, Problems problems) {
        List<Sourced<BarLine>> bars = new ArrayList<>();
        CsvTable table = CsvTable.read(source, COLUMNS, "the kit's bars", problems).orElse(null);
        if (table == null) {
            return new Rows(bars, false);
        }
        boolean everyMarkRead = table.everyRowRead();
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no bars under the header (expected one row per mark)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        Map<String, Sourced<String>> byCase = new HashMap<>(); // marks in lower case: A1 and a1 read alike
        for (CsvRow row : table.rows()) {
            String mark = row.required("mark", "the mark, the name of the bar type");
            String section = row.required("section", "a section of the tube catalog, e.g. CHS 48.3x3.2");
            Double length = row.length("length_mm", "a cut length in millimetres above 0");
            Integer quantity = row.count("quantity", 1,
                    "a whole number of bars, at least 1; delete the row if the mark is not in the kit");
            Double nodeToNode = row.length("node_to_node_mm", "a node-to-node length in millimetres above 0");
            Double tolerance = row.number("tolerance_mm", 0, true, "a cut tolerance in millimetres, 0 or more");
            Double start = deduction(row, "start_deduction_mm");
            Double end = deduction(row, "end_deduction_mm");
            if (row.blank("length_mm") && row.blank("node_to_node_mm")) {
                row.problem("length_mm", "the value is blank (expected a cut length in millimetres, or"
                        + " node_to_node_mm to derive it from)");
            }
            if (mark == null) {
                everyMarkRead = false;
                continue;
            }
            Integer earlier = firstLine.putIfAbsent(mark, row.line());
            if (earlier != null) {
                row.problem("mark", "mark " + mark + " is already on " + row.at(earlier)
                        + " (expected each mark on one row only)");
                continue;
            }
            Sourced<String> alike = byCase.putIfAbsent(mark.toLowerCase(Locale.ROOT), row.sourced(mark));
            if (alike != null) {
                row.problem("mark", "mark " + mark + " differs from mark " + alike.value() + " on "
                        + row.at(alike.line()) + " only in letter case, which a saw sheet or label does not tell apart"
                        + " (expected marks that differ in more than letter case)");
                continue;
            }
            bars.add(row.sourced(new BarLine(mark, section, length, quantity, nodeToNode, tolerance, start, end,
                    row.text("note"), row.clean())));
        }
        return new Rows(bars, everyMarkRead);
    }

    /** A per-end deduction, 0 or more; it needs a node-to-node length to be deducted from. */
    private static Double deduction(CsvRow row, String column) {
        Double value = row.number(column, 0, true, "a deduction in millimetres from the node centre to the tube"
                + " end, 0 or more");
        if (!row.blank(column) && row.blank("node_to_node_mm")) {
            row.problem(column, "a deduction without node_to_node_mm (expected node_to_node_mm to deduct it"
                    + " from, or a blank " + column + ")");
        }
        return value;
    }
}
