package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.CrateType;

/**
 * Reads a crate catalog: {@code crate,inner_length_mm,inner_width_mm,inner_height_mm,outer_length_mm,
 * outer_width_mm,outer_height_mm,tare_kg,max_gross_kg,stackable,max_top_load_kg,price}. Inner sizes must fit in
 * the outer ones, the maximum gross mass must exceed the tare, and a stackable crate must state its top load.
 */
public final class CrateCatalogReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("crate", "inner_length_mm", "inner_width_mm", "inner_height_mm", "outer_length_mm",
                    "outer_width_mm", "outer_height_mm", "tare_kg", "max_gross_kg", "stackable", "max_top_load_kg",
                    "price"),
            List.of());
    private static final List<String> SIZES = List.of("length", "width", "height");

    private CrateCatalogReader() {
    }

    /** Reads a crate catalog on its own; throws with every problem found. */
    public static List<CrateType> read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        List<CrateType> crates = read(file, problems);
        problems.throwIfAny();
        return crates;
    }

    /** Reads a crate catalog, adding problems; returns the crates that could be read. */
    public static List<CrateType> read(Path file, Problems problems) {
        List<CrateType> crates = new ArrayList<>();
        CsvTable table = CsvTable.read(file, COLUMNS, "a crate catalog", problems).orElse(null);
        if (table == null) {
            return crates;
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no crates under the header (expected one row per crate type)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvRow row : table.rows()) {
            String name = row.required("crate", "the crate type's name");
            double[] inner = new double[3];
            double[] outer = new double[3];
            for (int i = 0; i < 3; i++) {
                String size = SIZES.get(i);
                Double in = row.length("inner_" + size + "_mm", "the inside " + size + " in millimetres above 0");
                Double out = row.length("outer_" + size + "_mm", "the outside " + size + " in millimetres above 0");
                row.requireValues("inner_" + size + "_mm", "outer_" + size + "_mm");
                inner[i] = in == null ? 0 : in;
                outer[i] = out == null ? 0 : out;
                if (in != null && out != null && in > out) {
                    row.problem("inner_" + size + "_mm", "the inside " + size + " " + Figures.plain(in)
                            + " mm exceeds the outside " + size + " " + Figures.plain(out)
                            + " mm (expected inside sizes within the outside sizes)");
                }
            }
            Double tare = row.number("tare_kg", 0, true, "the empty crate's mass in kilograms, 0 or more");
            Double maxGross = row.number("max_gross_kg", 0, false, "the crate's maximum gross mass in kilograms");
            Boolean stackable = row.flag("stackable");
            Double topLoad = row.number("max_top_load_kg", 0, true, "the load allowed on top in kilograms");
            Double price = row.number("price", 0, true, "a price per crate, 0 or more, or blank");
            row.requireValues("tare_kg", "max_gross_kg");
            if (stackable == null && row.blank("stackable")) {
                row.problem("stackable", "the value is blank (expected yes or no)");
            }
            if (Boolean.TRUE.equals(stackable) && row.blank("max_top_load_kg")) {
                row.problem("max_top_load_kg", "a stackable crate needs its top load (expected the mass in"
                        + " kilograms it may carry on top)");
            }
            if (tare != null && maxGross != null && maxGross <= tare) {
                row.problem("max_gross_kg", "the maximum gross mass " + Figures.plain(maxGross)
                        + " kg is not above the tare " + Figures.plain(tare) + " kg (expected more than the tare)");
            }
            if (name != null) {
                Integer earlier = firstLine.putIfAbsent(name, row.line());
                if (earlier != null) {
                    row.problem("crate", "crate " + name + " is already on " + row.at(earlier)
                            + " (expected each crate type on one row only)");
                }
            }
            if (row.clean()) {
                crates.add(new CrateType(name, inner[0], inner[1], inner[2], outer[0], outer[1], outer[2], tare,
                        maxGross, stackable, topLoad == null ? 0 : topLoad, price));
            }
        }
        return crates;
    }
}
