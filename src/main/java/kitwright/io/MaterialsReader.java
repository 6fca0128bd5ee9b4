package kitwright.io;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.List;
import kitwright.model.Material;

/**
 * Reads {@code materials.csv}: {@code material,density_kg_m3,co2e_kg_per_kg,source}, in file order. The source
 * says where the density and the embodied-carbon factor come from (a standard, a database, or "from memory").
 */
public final class MaterialsReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("material", "density_kg_m3", "co2e_kg_per_kg", "source"), List.of());

    private MaterialsReader() {
    }

    /** Reads a materials file on its own; throws with every problem found. */
    public static Map<String, Material> read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        Map<String, Material> materials = read(file, problems);
        problems.throwIfAny();
        return materials;
    }

    /** Reads a materials file, adding problems; returns the materials that could be read, by name. */
    public static Map<String, Material> read(Path file, Problems problems) {
        Map<String, Material> materials = new LinkedHashMap<>();
        CsvTable table = CsvTable.read(file, COLUMNS, "the materials", problems).orElse(null);
        if (table == null) {
            return materials;
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no materials under the header (expected one row per material)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvRow row : table.rows()) {
            String name = row.required("material", "the material's name, e.g. steel");
            Double density = row.number("density_kg_m3", 0, false, "a density in kg/m3 above 0, e.g. 7850");
            Double carbon = row.number("co2e_kg_per_kg", 0, true,
                    "an embodied-carbon factor in kg CO2e per kg, 0 or more");
            row.requireValues("density_kg_m3", "co2e_kg_per_kg");
            if (name != null) {
                Integer earlier = firstLine.putIfAbsent(name, row.line());
                if (earlier != null) {
                    row.problem("material", "material " + name + " is already on " + row.at(earlier)
                            + " (expected each material on one row only)");
                }
            }
            if (row.clean()) {
                materials.put(name, new Material(name, density, carbon, row.text("source")));
            }
        }
        return materials;
    }
}
