package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import kitwright.model.KitSettings;
import kitwright.model.TubeCatalog;
import kitwright.sweep.Member;

/**
 * Reads {@code members.csv}, the designer's input to {@code sweep}: {@code structure,member,section,node_to_node_mm},
 * every member of every structure with its target node-to-node length from the design model. Checks: names as
 * every name ({@link Names}); a section of the tube catalog; a length above 0 in whole tenths of a millimetre
 * (the marks' grid) whose cut length (node-to-node minus kit.json's endDeductionMm at each end) is above 0 and fits
 * the longest stock length of its section after trim; each member id once within its structure.
 */
public final class MembersReader {
    public static final String FILE = "members.csv";
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("structure", "member", "section", "node_to_node_mm"), List.of());

    private MembersReader() {
    }

    /**
     * Reads the members, adding problems; returns the rows that passed every check.
     *
     * @param catalog the tube catalog, or null when it could not be read (section checks are skipped)
     */
    public static List<Member> read(Path file, KitSettings settings, TubeCatalog catalog, Problems problems) {
        List<Member> members = new ArrayList<>();
        CsvTable table = CsvTable.read(file, COLUMNS, "the structures' members", problems).orElse(null);
        if (table == null) {
            return members;
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no members under the header (expected one row per member of a structure)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvRow row : table.rows()) {
            String structure = row.required("structure", "the name of a structure, e.g. screen-frame");
            String member = row.required("member", "the member's id in the design model, e.g. chord-12");
            String section = row.required("section", "a section of the tube catalog, e.g. CHS 48.3x3.2");
            Double length = row.length("node_to_node_mm", "a node-to-node length in millimetres above 0");
            if (row.blank("node_to_node_mm")) {
                row.problem("node_to_node_mm", "the value is blank (expected the member's target node-to-node"
                        + " length in millimetres)");
            }
            if (length != null && Math.abs(length * 10 - Math.rint(length * 10)) > 1e-6) {
                row.problem("node_to_node_mm", row.text("node_to_node_mm") + " has more than one decimal (expected"
                        + " a length in whole tenths of a millimetre, e.g. 2412.5: marks are made to 0.1 mm)");
                length = null;
            }
            if (section != null && catalog != null && !knownSection(row, section, catalog)) {
                section = null;
            }
            if (length != null && section != null && catalog != null) {
                length = fitting(row, settings, catalog, section, length);
            }
            if (structure != null && member != null) {
                Integer earlier = firstLine.putIfAbsent(structure + "\u0000" + member, row.line());
                if (earlier != null) {
                    row.problem("member", "structure " + structure + " already has member " + member + " on "
                            + row.at(earlier) + " (expected each member id once within its structure)");
                }
            }
            if (row.clean() && structure != null && member != null && section != null && length != null) {
                members.add(new Member(structure, member, section, Math.round(length * 10)));
            }
        }
        return members;
    }

    private static boolean knownSection(CsvRow row, String section, TubeCatalog catalog) {
        if (catalog.section(section).isPresent()) {
            return true;
        }
        Set<String> sections = catalog.sections().keySet();
        String hint = NearestName.of(section, sections).map(n -> "did you mean " + n + "? ").orElse("");
        String known = sections.size() <= 20 ? ": " + String.join(", ", sections) : "";
        String name = catalog.file() == null ? "the tube catalog" : String.valueOf(catalog.file().getFileName());
        row.problem("section", "unknown section '" + section + "' (" + hint + "expected a section of " + name
                + known + ")");
        return false;
    }

    /** The length when its cut length is above 0 and fits the section's longest stock; else null (reported). */
    private static Double fitting(CsvRow row, KitSettings settings, TubeCatalog catalog, String section,
                                  double length) {
        double deductions = 2 * settings.endDeductionMm();
        double cut = length - deductions;
        if (cut <= 0) {
            row.problem("node_to_node_mm", Figures.plain(length) + " mm minus 2 x endDeductionMm "
                    + Figures.plain(settings.endDeductionMm()) + " mm leaves no bar (expected more than "
                    + Figures.plain(deductions) + " mm)");
            return null;
        }
        double longest = catalog.longestLengthMm(section);
        double usable = longest - 2 * settings.trimMm();
        if (cut > usable + 1e-9) {
            row.problem("node_to_node_mm", "the cut length " + Figures.plain(cut) + " mm (" + Figures.plain(length)
                    + " mm minus 2 x endDeductionMm " + Figures.plain(settings.endDeductionMm()) + " mm) is longer"
                    + " than the usable " + Figures.plain(usable) + " mm of the longest stock length of " + section
                    + " (expected at most " + Figures.plain(usable + deductions) + " mm node to node, or a longer"
                    + " stock length in the catalog)");
            return null;
        }
        return length;
    }
}
