package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import kitwright.model.Bar;
import kitwright.model.KitSettings;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;

/**
 * The checks across files that turn bars.csv rows into the kit's marks: each section is in the tube catalog; the
 * cut length is derived from or agrees with the node-to-node length minus the deduction at each end
 * (start_deduction_mm and end_deduction_mm, each over kit.json's endDeductionMm); each bar fits the longest stock
 * length of its section; structures.csv names only known marks; and each quantity covers what the structures need
 * (the largest count any one structure uses, or the sum when the structures stand together).
 */
final class KitAssembler {
    /** Node-to-node and cut length agree within this, in millimetres. */
    static final double LENGTH_AGREEMENT_MM = 0.1;

    private KitAssembler() {
    }

    /**
     * The kit's marks in bars.csv order, adding a problem for each row that fails a check.
     *
     * @param catalog    the tube catalog, or null when it could not be read cleanly (section checks are skipped)
     * @param structures rows of structures.csv, empty when there is none
     */
    static List<Bar> marks(KitSettings settings, List<Sourced<BarLine>> lines, List<Sourced<StructureCount>> structures,
                           TubeCatalog catalog, Problems problems) {
        return marks(settings, new BarsReader.Rows(lines, true), structures, true, Set.of(), catalog, problems,
                new TableNames(KitReader.BARS, KitReader.STRUCTURES, KitReader.JOINTS));
    }

    /** How messages name the bars, structures and joints tables: the CSVs, or sheets of kit.xlsx. */
    record TableNames(String bars, String structures, String joints) {
    }

    /**
     * As above; when {@code structuresReadable} is false, structures.csv has problems of its own (already
     * reported), so a blank quantity is not judged against its rows, which would blame bars.csv for them. When
     * bars.csv or one of its rows could not be read ({@code everyMarkRead} false, already reported), a structures.csv
     * mark missing from the rows read is not reported: it may stand on the row that could not be read. A
     * structures.csv row whose mark is in {@code jointMarks} (joints.csv) counts joints, not bars: it sets no bar
     * quantity.
     */
    static List<Bar> marks(KitSettings settings, BarsReader.Rows rows, List<Sourced<StructureCount>> structures,
                           boolean structuresReadable, Set<String> jointMarks, TubeCatalog catalog,
                           Problems problems, TableNames names) {
        List<Sourced<BarLine>> lines = rows.lines();
        Map<String, Need> needs = needs(settings, rows, structures, jointMarks, problems, names);
        List<Bar> bars = new ArrayList<>();
        for (Sourced<BarLine> sourced : lines) {
            BarLine line = sourced.value();
            if (!line.readable()) {
                continue;
            }
            int before = problems.count();
            Double length = cutLength(settings, sourced, problems);
            if (catalog != null) {
                checkSection(settings, sourced, length, catalog, problems);
            }
            Need need = needs.get(line.mark());
            Integer quantity = line.quantity();
            if (need != null && need.count > Limits.MAX_COUNT) {
                continue; // reported on the structures.csv row where the sum passed the limit
            }
            if (quantity == null && need != null) {
                quantity = need.count;
            } else if (quantity == null && structuresReadable) {
                String why = structures.isEmpty() ? "a whole number of bars; without " + names.structures()
                        + " the quantity must be given" : "a whole number of bars; " + names.structures()
                        + " does not use mark " + line.mark();
                problems.add(sourced.problem("quantity", "the value is blank (expected " + why + ")"));
            } else if (need != null && quantity < need.count) {
                problems.add(sourced.problem("quantity", "mark " + line.mark() + " has " + quantity + " bars but "
                        + need.who + " " + need.count + " (expected at least " + need.count
                        + ", or a blank quantity to take it from " + names.structures() + ")"));
            }
            if (problems.count() == before && quantity != null) {
                int required = structures.isEmpty() ? quantity : need == null ? 0 : need.count;
                boolean ends = line.nodeToNodeMm() != null;
                bars.add(new Bar(line.mark(), line.section(), length, quantity, required, line.nodeToNodeMm(),
                        line.toleranceMm(), line.note(), ends ? startDeduction(settings, line) : null,
                        ends ? endDeduction(settings, line) : null));
            }
        }
        return bars;
    }

    /**
     * What the structures need of each mark; reports structure rows naming a mark neither bars.csv nor joints.csv
     * has. Joint rows are skipped: joints are counted in joints.csv.
     */
    private static Map<String, Need> needs(KitSettings settings, BarsReader.Rows rows,
                                           List<Sourced<StructureCount>> structures, Set<String> jointMarks,
                                           Problems problems, TableNames names) {
        Set<String> marks = new LinkedHashSet<>();
        rows.lines().forEach(l -> marks.add(l.value().mark()));
        Map<String, Need> needs = new LinkedHashMap<>();
        for (Sourced<StructureCount> row : structures) {
            StructureCount count = row.value();
            if (!marks.contains(count.mark()) && jointMarks.contains(count.mark())) {
                continue; // a joint row: the structure's joints, shipped by pack --for
            }
            if (!marks.contains(count.mark()) && !rows.everyMarkRead()) {
                continue; // perhaps on a bars.csv row that could not be read (reported there)
            }
            if (!marks.contains(count.mark())) {
                String hint = NearestName.of(count.mark(), marks).map(n -> "did you mean " + n + "? ").orElse("");
                String known = marks.size() <= 30 ? ": " + String.join(", ", marks) : "";
                String joints = jointMarks.isEmpty() ? "" : " or " + names.joints();
                problems.add(row.problem("mark", "mark " + count.mark() + " is not in " + names.bars() + joints
                        + " (" + hint + "expected a mark of " + names.bars() + known + joints + ")"));
                continue;
            }
            Need need = needs.get(count.mark());
            if (settings.structuresStandTogether()) {
                int before = need == null ? 0 : need.count;
                if (before > Limits.MAX_COUNT) {
                    continue;
                }
                long total = (long) before + count.count();
                if (total > Limits.MAX_COUNT) {
                    problems.add(row.problem("count", "the structures standing together need " + total
                            + " bars of mark " + count.mark() + " up to this row (expected at most " + Limits.MAX_COUNT
                            + " bars of a mark in the kit)"));
                }
                needs.put(count.mark(), new Need((int) Math.min(total, Limits.MAX_COUNT + 1L),
                        "the structures standing together need"));
            } else if (need == null || count.count() > need.count) {
                needs.put(count.mark(), new Need(count.count(), "structure " + count.structure() + " needs"));
            }
        }
        return needs;
    }

    /** The cut length, derived from node-to-node when blank; null when it cannot be had (reported). */
    private static Double cutLength(KitSettings settings, Sourced<BarLine> sourced, Problems problems) {
        BarLine line = sourced.value();
        if (line.nodeToNodeMm() == null) {
            return line.lengthMm();
        }
        double start = startDeduction(settings, line);
        double end = endDeduction(settings, line);
        double derived = line.nodeToNodeMm() - start - end;
        String sum = "node_to_node_mm " + Figures.plain(line.nodeToNodeMm()) + " mm minus "
                + (line.startDeductionMm() == null && line.endDeductionMm() == null
                ? "2 x endDeductionMm " + Figures.plain(start) + " mm"
                : deductionName(line.startDeductionMm(), "start_deduction_mm") + " " + Figures.plain(start)
                        + " mm and " + deductionName(line.endDeductionMm(), "end_deduction_mm") + " "
                        + Figures.plain(end) + " mm");
        if (derived <= 0) {
            problems.add(sourced.problem("node_to_node_mm", sum + " leaves no bar (expected more than "
                    + Figures.plain(start + end) + " mm)"));
            return null;
        }
        if (line.lengthMm() != null && Math.abs(line.lengthMm() - derived) > LENGTH_AGREEMENT_MM + 1e-9) {
            problems.add(sourced.problem("length_mm", "the cut length " + Figures.plain(line.lengthMm())
                    + " mm does not match " + sum + " = " + Figures.plain(derived) + " mm (expected "
                    + Figures.plain(derived) + " mm within " + LENGTH_AGREEMENT_MM
                    + " mm, or a blank length_mm to derive it)"));
            return null;
        }
        return line.lengthMm() != null ? line.lengthMm() : derived;
    }

    /** The deduction at the bar's start: bars.csv start_deduction_mm, else kit.json's endDeductionMm. */
    private static double startDeduction(KitSettings settings, BarLine line) {
        return line.startDeductionMm() != null ? line.startDeductionMm() : settings.endDeductionMm();
    }

    /** The deduction at the bar's end: bars.csv end_deduction_mm, else kit.json's endDeductionMm. */
    private static double endDeduction(KitSettings settings, BarLine line) {
        return line.endDeductionMm() != null ? line.endDeductionMm() : settings.endDeductionMm();
    }

    private static String deductionName(Double given, String column) {
        return given != null ? column : "endDeductionMm";
    }

    private static void checkSection(KitSettings settings, Sourced<BarLine> sourced, Double length,
                                     TubeCatalog catalog, Problems problems) {
        BarLine line = sourced.value();
        if (catalog.section(line.section()).isEmpty()) {
            Set<String> sections = catalog.sections().keySet();
            String hint = NearestName.of(line.section(), sections).map(n -> "did you mean " + n + "? ").orElse("");
            String known = sections.size() <= 20 ? ": " + String.join(", ", sections) : "";
            problems.add(sourced.problem("section", "unknown section '" + line.section() + "' (" + hint
                    + "expected a section of " + fileName(catalog.file()) + known + ")"));
            return;
        }
        double longest = catalog.longestLengthMm(line.section());
        double usable = longest - 2 * settings.trimMm();
        if (length != null && length > usable + 1e-9) {
            problems.add(sourced.problem("length_mm", "mark " + line.mark() + " is " + Figures.plain(length)
                    + " mm long, more than the usable " + Figures.plain(usable) + " mm of the longest stock length of "
                    + line.section() + " (expected at most " + Figures.plain(usable) + " mm = "
                    + Figures.plain(longest) + " mm minus 2 x trimMm " + Figures.plain(settings.trimMm())
                    + " mm, or a longer stock length in the catalog)"));
        }
    }

    private static String fileName(Path file) {
        return file == null ? "the tube catalog" : String.valueOf(file.getFileName());
    }

    /** How many bars of a mark the structures need, and who needs them (for messages). */
    private record Need(int count, String who) {
    }
}
