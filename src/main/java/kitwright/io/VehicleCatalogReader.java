package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.AxleGeometry;
import kitwright.model.VehicleType;

/**
 * Reads a vehicle catalog: {@code vehicle,deck_length_mm,deck_width_mm,deck_height_mm,payload_kg,cost_per_trip,
 * source}, the load space and payload of each truck or container and where those figures come from.
 *
 * <p>Optional columns: the axle geometry {@code front_support_mm, rear_support_mm} (from the front of the deck: the
 * front axle of a rigid truck, negative when ahead of the deck, or a semi-trailer's kingpin, at or behind the front;
 * and the rear axle group's centre), {@code unladen_front_kg, unladen_rear_kg, max_front_kg, max_rear_kg} (all six
 * together or none), {@code min_front_kg} (the least front load for steering, only with the geometry), and
 * {@code door_height_mm}, a container's door opening height, which stacks stay below.
 */
public final class VehicleCatalogReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("vehicle", "deck_length_mm", "deck_width_mm", "deck_height_mm", "payload_kg", "cost_per_trip",
                    "source"),
            List.of(VehicleColumns.FRONT_SUPPORT, VehicleColumns.REAR_SUPPORT, VehicleColumns.UNLADEN_FRONT,
                    VehicleColumns.UNLADEN_REAR, VehicleColumns.MAX_FRONT, VehicleColumns.MAX_REAR,
                    VehicleColumns.MIN_FRONT, VehicleColumns.DOOR_HEIGHT));

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
            AxleGeometry axles = VehicleColumns.axles(row, length);
            Double door = VehicleColumns.doorHeight(row, height);
            if (row.clean()) {
                vehicles.add(new VehicleType(name, length, width, height, payload, cost, row.text("source"), axles,
                        door));
            }
        }
        return vehicles;
    }
}
