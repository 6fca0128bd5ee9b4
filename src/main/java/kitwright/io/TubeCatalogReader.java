package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockLength;
import kitwright.model.StockTerms;
import kitwright.model.TubeCatalog;

/**
 * Reads a tube catalog: {@code section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin} and
 * optional {@code weld_bead_mm,od_tolerance_mm,wall_tolerance_pct}, one row per section and stock length. A
 * section's material, sizes and tolerances must agree on every row; {@code available} blank means unlimited;
 * {@code origin} is {@code mill} (the default) or {@code rack}, and a rack row must say how many pieces lie there.
 * The optional buying columns {@code price_basis,currency,grade,standard,supplier} are read by {@link StockTermsColumns}:
 * the price is turned into a price per piece on its basis here, so every stage adds the same per-piece prices.
 */
public final class TubeCatalogReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("section", "material", "outer_diameter_mm", "wall_mm", "length_mm", "price", "available",
                    "origin"),
            List.of("weld_bead_mm", "od_tolerance_mm", "wall_tolerance_pct", "price_basis", "currency", "grade",
                    "standard", "supplier"));

    private TubeCatalogReader() {
    }

    /** Reads a tube catalog on its own, without checking materials; throws with every problem found. */
    public static TubeCatalog read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        Optional<TubeCatalog> catalog = read(file, null, null, problems);
        problems.throwIfAny();
        return catalog.orElseThrow();
    }

    /**
     * Reads a tube catalog, adding problems; empty when the file cannot be used at all.
     *
     * @param materials     known materials, or null to skip the material check
     * @param materialsFile where the materials came from, for messages (may be null)
     */
    public static Optional<TubeCatalog> read(Path file, Map<String, Material> materials, Path materialsFile,
                                             Problems problems) {
        CsvTable table = CsvTable.read(file, COLUMNS, "a tube catalog", problems).orElse(null);
        if (table == null) {
            return Optional.empty();
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no stock under the header (expected one row per section and stock"
                    + " length)"));
        }
        Map<String, Section> sections = new LinkedHashMap<>();
        Map<String, Integer> sectionLines = new HashMap<>();
        Map<String, Integer> stockLines = new HashMap<>();
        List<StockLength> stock = new ArrayList<>();
        StockTermsColumns terms = new StockTermsColumns(materials, materialsFile);
        for (CsvRow row : table.rows()) {
            Section section = section(row);
            Double length = row.length("length_mm", "a stock length in millimetres above 0");
            Double price = row.number("price", 0, true, "a price per piece, 0 or more, or blank");
            Integer available = row.whole("available", 0,
                    "how many pieces can be had, a whole number 0 or more, or blank for unlimited");
            Origin origin = origin(row);
            StockTerms quoted = terms.read(row, price);
            row.requireValues("length_mm");
            if (origin == Origin.RACK && row.blank("available")) {
                row.problem("available", "a rack row needs a count (expected how many offcuts of this length"
                        + " lie on the rack)");
            }
            if (!row.clean() || section == null) {
                continue;
            }
            Section first = sections.putIfAbsent(section.name(), section);
            sectionLines.putIfAbsent(section.name(), row.line());
            if (first != null && !agree(row, first, section, sectionLines.get(section.name()))) {
                continue;
            }
            if (first == null && materials != null) {
                checkMaterial(row, section.material(), materials, materialsFile);
            }
            if (!terms.sameCurrency(row, section.name(), quoted)) {
                continue;
            }
            Double perPiece = terms.perPiece(section, length, quoted);
            if (price != null && perPiece == null) {
                continue; // a price per kg without a density (reported)
            }
            String key = section.name() + "\u0000" + length + "\u0000" + origin;
            Integer earlier = stockLines.putIfAbsent(key, row.line());
            if (earlier != null) {
                row.problem("length_mm", section.name() + " " + Figures.plain(length) + " mm " + origin.code()
                        + " is already on " + row.at(earlier) + " (expected one row per section, stock length and"
                        + " origin; add up the available pieces instead)");
                continue;
            }
            stock.add(new StockLength(section.name(), length, perPiece, available, origin, quoted));
        }
        return Optional.of(new TubeCatalog(file, sections, stock));
    }

    private static Section section(CsvRow row) {
        String name = row.required("section", "the section's name, e.g. CHS 48.3x3.2");
        String material = row.required("material", "a material of materials.csv, e.g. steel");
        Double diameter = row.length("outer_diameter_mm", "the outside diameter in millimetres above 0");
        Double wall = row.length("wall_mm", "the wall thickness in millimetres above 0");
        Double weldBead = row.number("weld_bead_mm", 0, true, "the weld bead height in millimetres, 0 or more");
        Double odTolerance = row.number("od_tolerance_mm", 0, true, "the diameter tolerance in millimetres");
        Double wallTolerance = row.number("wall_tolerance_pct", 0, true, "the wall tolerance in percent");
        row.requireValues("outer_diameter_mm", "wall_mm");
        if (diameter != null && wall != null && 2 * wall >= diameter) {
            row.problem("wall_mm", "the wall " + Figures.plain(wall) + " mm is at least half the outside diameter "
                    + Figures.plain(diameter) + " mm (expected a wall below " + Figures.plain(diameter / 2) + " mm)");
        } else if (diameter != null && wall != null) {
            double bore = diameter - 2 * wall;
            if (weldBead != null && weldBead >= bore) {
                row.problem("weld_bead_mm", "the weld bead " + Figures.plain(weldBead) + " mm fills the bore "
                        + Figures.plain(bore) + " mm (expected a bead height below the bore, usually 0 to 2 mm)");
            }
            if (odTolerance != null && odTolerance >= diameter) {
                row.problem("od_tolerance_mm", "the tolerance " + Figures.plain(odTolerance) + " mm is not below the"
                        + " outside diameter " + Figures.plain(diameter) + " mm (expected plus or minus a small"
                        + " fraction of the diameter, e.g. 0.5)");
            }
        }
        if (wallTolerance != null && wallTolerance >= 100) {
            row.problem("wall_tolerance_pct", Figures.plain(wallTolerance) + " % would allow no wall at all (expected"
                    + " a tolerance below 100 %, e.g. 10)");
        }
        if (!row.clean()) {
            return null;
        }
        return new Section(name, material, diameter, wall, weldBead, odTolerance, wallTolerance);
    }

    private static Origin origin(CsvRow row) {
        if (row.blank("origin")) {
            return Origin.MILL;
        }
        Optional<Origin> origin = Origin.parse(row.text("origin"));
        if (origin.isEmpty()) {
            row.problem("origin", "'" + row.text("origin") + "' is not an origin (expected mill, for stock"
                    + " bought, or rack, for offcuts already on the rack)");
        }
        return origin.orElse(null);
    }

    /** True when a later row of a section repeats the first row's material, sizes and tolerances. */
    private static boolean agree(CsvRow row, Section first, Section now, int firstLine) {
        List<String> differ = new ArrayList<>();
        if (!first.material().equals(now.material())) {
            differ.add("material");
        }
        if (first.outerDiameterMm() != now.outerDiameterMm()) {
            differ.add("outer_diameter_mm");
        }
        if (first.wallMm() != now.wallMm()) {
            differ.add("wall_mm");
        }
        if (!Objects.equals(first.weldBeadMm(), now.weldBeadMm())) {
            differ.add("weld_bead_mm");
        }
        if (!Objects.equals(first.odToleranceMm(), now.odToleranceMm())) {
            differ.add("od_tolerance_mm");
        }
        if (!Objects.equals(first.wallTolerancePct(), now.wallTolerancePct())) {
            differ.add("wall_tolerance_pct");
        }
        for (String column : differ) {
            row.problem(column, first.name() + " has " + column + " '" + row.text(column) + "' here but '"
                    + valueOf(first, column) + "' on " + row.at(firstLine) + " (expected the same material, sizes"
                    + " and tolerances on every row of a section)");
        }
        return differ.isEmpty();
    }

    private static String valueOf(Section section, String column) {
        Object value = switch (column) {
            case "material" -> section.material();
            case "outer_diameter_mm" -> section.outerDiameterMm();
            case "wall_mm" -> section.wallMm();
            case "weld_bead_mm" -> section.weldBeadMm();
            case "od_tolerance_mm" -> section.odToleranceMm();
            default -> section.wallTolerancePct();
        };
        return value == null ? "" : value instanceof Double d ? Figures.plain(d) : value.toString();
    }

    private static void checkMaterial(CsvRow row, String material, Map<String, Material> materials,
                                      Path materialsFile) {
        if (materials.containsKey(material)) {
            return;
        }
        String hint = NearestName.of(material, materials.keySet()).map(n -> "did you mean " + n + "? ").orElse("");
        String from = materialsFile == null ? "the materials file" : String.valueOf(materialsFile.getFileName());
        row.problem("material", "unknown material '" + material + "' (" + hint + "expected a material of " + from
                + ": " + String.join(", ", materials.keySet()) + ")");
    }
}
