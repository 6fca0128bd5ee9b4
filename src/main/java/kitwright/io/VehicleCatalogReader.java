package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.VehicleType;

/**
 * Reads a vehicle catalog: {@code vehicle,deck_length_mm,deck_width_mm,deck_height_mm,payload_kg,cost_per_trip,
 * source}, the load space and payload of each truck or container and where those figures come from.
 */
public final class VehicleCatalogReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("vehicle", "deck_length_mm", "deck_width_mm", "deck_height_mm", "payload_kg", "cost_per_trip",
                    "source"),
            List.of());

    private VehicleCatalogReader() {
    }

    /** Reads a vehicle catalog on its own; throws with every problem found. */
    public static List<VehicleType> read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        List<VehicleType> vehicles = read(file, problems);
        problems.throwIfAny();
        return vehicles;
    }

    /** Reads a vehicle catalog, adding problems; returns the vehicles that could be read. */
    public static List<VehicleType> read(Path file, Problems problems) {
        List<VehicleType> vehicles = new ArrayList<>();
        CsvTable table = CsvTable.read(file, COLUMNS, "a vehicle catalog", problems).orElse(null);
        if (table == null) {
            return vehicles;
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no vehicles under the header (expected one row per vehicle type)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvRow row : table.rows()) {
            String name = row.required("vehicle", "the vehicle or container's name");
            Double length = row.length("deck_length_mm", "the load space length in millimetres above 0");
            Double width = row.length("deck_width_mm", "the load space width in millimetres above 0");
            Double height = row.length("deck_height_mm", "the load space height in millimetres above 0");
            Double payload = row.number("payload_kg", 0, false, "the payload in kilograms above 0");
            Double cost = row.number("cost_per_trip", 0, true, "the cost of one trip, 0 or more");
            row.requireValues("deck_length_mm", "deck_width_mm", "deck_height_mm", "payload_kg", "cost_per_trip");
            if (name != null) {
                Integer earlier = firstLine.putIfAbsent(name, row.line());
                if (earlier != null) {
                    row.problem("vehicle", "vehicle " + name + " is already on " + row.at(earlier)
                            + " (expected each vehicle type on one row only)");
                }
            }
            if (row.clean()) {
                vehicles.add(new VehicleType(name, length, width, height, payload, cost, row.text("source")));
            }
        }
        return vehicles;
    }
}
