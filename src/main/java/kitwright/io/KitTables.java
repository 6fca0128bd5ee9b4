package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Where a kit folder's tables are: {@code bars.csv} with the optional {@code structures.csv} and
 * {@code joints.csv}, or the sheets {@code bars}, {@code structures} and {@code joints} of {@code kit.xlsx} (sheet
 * names in any letter case; other sheets are left alone, unless a name is one letter or so from a missing known
 * sheet, which is reported as a likely slip). A folder holding kit.xlsx and any of the three CSV files is refused:
 * which of them holds the kit would be a guess.
 *
 * @param bars       the bars table
 * @param structures the structures table, or null when the kit has none
 * @param joints     the joints table, or null when the kit has none
 * @param workbook   kit.xlsx, or null when the kit is in CSV files
 * @param sheets     the sheets of kit.xlsx read, as the workbook spells them (empty for CSV files)
 */
record KitTables(TableSource bars, TableSource structures, TableSource joints, Path workbook, List<String> sheets) {
    static final List<String> SHEETS = List.of("bars", "structures", "joints");

    KitTables {
        sheets = List.copyOf(sheets);
    }

    /** The kit's tables, or empty with a problem when they cannot be told. */
    static Optional<KitTables> of(Path kitDir, CsvConvention csv, Problems problems) {
        Path workbook = kitDir.resolve(KitReader.WORKBOOK);
        List<Path> files = List.of(kitDir.resolve(KitReader.BARS), kitDir.resolve(KitReader.STRUCTURES),
                kitDir.resolve(KitReader.JOINTS));
        if (!KitReader.present(workbook)) {
            return Optional.of(new KitTables(new TableSource(files.get(0), null, csv), optional(files.get(1), csv),
                    optional(files.get(2), csv), null, List.of()));
        }
        List<String> beside = files.stream().filter(KitReader::present).map(f -> f.getFileName().toString())
                .toList();
        if (!beside.isEmpty()) {
            problems.add(Problem.ofFile(workbook, "the kit folder holds both " + KitReader.WORKBOOK + " and "
                    + String.join(" and ", beside) + ", so which of them holds the kit is unclear (expected either "
                    + KitReader.WORKBOOK + " with the sheets bars, structures and joints, or bars.csv,"
                    + " structures.csv and joints.csv; move or delete the one not meant)"));
            return Optional.empty();
        }
        return WorkbookSheet.names(workbook, "the kit's tables: a workbook with the sheets bars, structures and"
                + " joints", problems).flatMap(names -> sheets(workbook, names, problems));
    }

    private static TableSource optional(Path file, CsvConvention csv) {
        return KitReader.present(file) ? new TableSource(file, null, csv) : null;
    }

    private static Optional<KitTables> sheets(Path workbook, List<String> names, Problems problems) {
        List<String> found = new ArrayList<>();
        for (String known : SHEETS) {
            found.add(names.stream().filter(known::equalsIgnoreCase).findFirst().orElse(null));
        }
        List<String> missing = SHEETS.stream().filter(s -> found.get(SHEETS.indexOf(s)) == null).toList();
        int before = problems.count();
        for (String name : names) {
            if (SHEETS.stream().noneMatch(name::equalsIgnoreCase)) {
                NearestName.of(name, missing).ifPresent(near -> problems.add(workbook, name, 0, "", "a sheet"
                        + " kitwright does not read (did you mean " + near + "? expected the sheets bars,"
                        + " structures and joints; other sheets are left alone)"));
            }
        }
        if (found.get(0) == null) {
            problems.add(Problem.ofFile(workbook, "the workbook has no sheet bars (expected a sheet named bars with"
                    + " the columns " + BarsReader.COLUMNS.header().replace(',', ' ') + ", and the sheets"
                    + " structures and joints when the kit has them; sheets found: " + String.join(", ", names)
                    + ")"));
        }
        if (problems.count() > before) {
            return Optional.empty();
        }
        List<String> read = found.stream().filter(java.util.Objects::nonNull).toList();
        return Optional.of(new KitTables(TableSource.sheet(workbook, found.get(0)), sheet(workbook, found.get(1)),
                sheet(workbook, found.get(2)), workbook, read));
    }

    private static TableSource sheet(Path workbook, String name) {
        return name == null ? null : TableSource.sheet(workbook, name);
    }

    /** How messages name the bars table: bars.csv, or the bars sheet. */
    String barsName() {
        return workbook == null ? KitReader.BARS : "the " + bars.sheet() + " sheet";
    }

    /** How messages name the structures table: structures.csv, or the structures sheet. */
    String structuresName() {
        return workbook == null ? KitReader.STRUCTURES
                : "the " + (structures == null ? "structures" : structures.sheet()) + " sheet";
    }

    /** How messages name the joints table: joints.csv, or the joints sheet. */
    String jointsName() {
        return workbook == null ? KitReader.JOINTS : "the " + (joints == null ? "joints" : joints.sheet()) + " sheet";
    }
}
