package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.StructureCount;

/**
 * Reads {@code structures.csv}: {@code structure,mark,count}, how many bars of each mark one structure uses.
 * Whether the marks exist is checked when the kit is assembled.
 */
public final class StructuresReader {
    public static final CsvColumns COLUMNS = new CsvColumns(List.of("structure", "mark", "count"), List.of());

    private StructuresReader() {
    }

    /** Reads a structures file on its own; throws with every problem found. */
    public static List<StructureCount> read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        List<Sourced<StructureCount>> counts = read(file, problems);
        problems.throwIfAny();
        return counts.stream().map(Sourced::value).toList();
    }

    /** Reads a structures file, adding problems; returns the rows that could be read. */
    public static List<Sourced<StructureCount>> read(Path file, Problems problems) {
        return read(TableSource.of(file), problems);
    }

    /** Reads structures.csv or the structures sheet of kit.xlsx, adding problems. */
    public static List<Sourced<StructureCount>> read(TableSource source, Problems problems) {
        List<Sourced<StructureCount>> counts = new ArrayList<>();
        CsvTable table = CsvTable.read(source, COLUMNS, "the bars each structure uses", problems).orElse(null);
        if (table == null) {
            return counts;
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no rows under the header (expected one row per structure and mark)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvRow row : table.rows()) {
            String structure = row.required("structure", "the name of a structure, e.g. screen-frame");
            String mark = row.required("mark", "a mark of bars.csv");
            Integer count = row.count("count", 1,
                    "a whole number of bars, at least 1; delete the row if the structure does not use the mark");
            if (row.blank("count")) {
                row.problem("count", "the value is blank (expected how many bars of the mark the structure uses)");
            }
            if (!row.clean()) {
                continue;
            }
            Integer earlier = firstLine.putIfAbsent(structure + "\u0000" + mark, row.line());
            if (earlier != null) {
                row.problem("mark", "structure " + structure + " already lists mark " + mark + " on "
                        + row.at(earlier) + " (expected one row per structure and mark)");
                continue;
            }
            counts.add(row.sourced(new StructureCount(structure, mark, count)));
        }
        return counts;
    }
}
