package kitwright.io;

import java.util.List;
import kitwright.model.AxleGeometry;

/**
 * The optional columns of a vehicle catalog row: axle geometry and door opening ({@link VehicleCatalogReader}).
 * Every problem is told with the row's file, line and column.
 */
final class VehicleColumns {
    static final String FRONT_SUPPORT = "front_support_mm";
    static final String REAR_SUPPORT = "rear_support_mm";
    static final String UNLADEN_FRONT = "unladen_front_kg";
    static final String UNLADEN_REAR = "unladen_rear_kg";
    static final String MAX_FRONT = "max_front_kg";
    static final String MAX_REAR = "max_rear_kg";
    static final String MIN_FRONT = "min_front_kg";
    static final String DOOR_HEIGHT = "door_height_mm";
    private static final List<String> GEOMETRY = List.of(FRONT_SUPPORT, REAR_SUPPORT, UNLADEN_FRONT, UNLADEN_REAR,
            MAX_FRONT, MAX_REAR);

    private VehicleColumns() {
    }

    /** The row's axle geometry, or null when it gives none (or problems were added). */
    static AxleGeometry axles(CsvRow row, Double deckLength) {
        boolean any = GEOMETRY.stream().anyMatch(c -> !row.blank(c));
        if (!any) {
            if (!row.blank(MIN_FRONT)) {
                row.problem(MIN_FRONT, "a least front load needs the axle geometry (expected " + FRONT_SUPPORT
                        + ", " + REAR_SUPPORT + " and the axle loads on this row, or no " + MIN_FRONT + ")");
            }
            return null;
        }
        for (String c : GEOMETRY) {
            if (row.blank(c)) {
                row.problem(c, "the value is blank while other axle columns are given (expected all of "
                        + String.join(", ", GEOMETRY) + ", or none)");
            }
        }
        Double front = row.number(FRONT_SUPPORT, -Limits.MAX_LENGTH_MM, true, Limits.MAX_LENGTH_MM,
                "the front axle or kingpin position from the front of the deck in millimetres, negative ahead of"
                        + " it");
        Double rear = row.number(REAR_SUPPORT, 0, false, Limits.MAX_LENGTH_MM,
                "the rear axle group's centre from the front of the deck in millimetres above 0");
        Double unladenFront = row.number(UNLADEN_FRONT, 0, true, "the unladen front load in kilograms, 0 or more");
        Double unladenRear = row.number(UNLADEN_REAR, 0, true, "the unladen rear load in kilograms, 0 or more");
        Double maxFront = row.number(MAX_FRONT, 0, false, "the front limit in kilograms above 0");
        Double maxRear = row.number(MAX_REAR, 0, false, "the rear limit in kilograms above 0");
        Double minFront = row.number(MIN_FRONT, 0, true, "the least front load in kilograms, 0 or more");
        if (front == null || rear == null || unladenFront == null || unladenRear == null || maxFront == null
                || maxRear == null) {
            return null;
        }
        boolean wrong = false;
        if (rear <= front) {
            row.problem(REAR_SUPPORT, "the rear axle at " + Figures.plain(rear) + " mm is not behind the front"
                    + " support at " + Figures.plain(front) + " mm (expected a larger value)");
            wrong = true;
        }
        if (deckLength != null && rear > deckLength) {
            row.problem(REAR_SUPPORT, "the rear axle at " + Figures.plain(rear) + " mm lies behind the deck's end at "
                    + Figures.plain(deckLength) + " mm (expected a position under the deck)");
            wrong = true;
        }
        if (unladenFront > maxFront) {
            row.problem(UNLADEN_FRONT, "the unladen front load " + Figures.plain(unladenFront) + " kg is above the"
                    + " front limit " + Figures.plain(maxFront) + " kg (expected at most the limit)");
            wrong = true;
        }
        if (unladenRear > maxRear) {
            row.problem(UNLADEN_REAR, "the unladen rear load " + Figures.plain(unladenRear) + " kg is above the"
                    + " rear limit " + Figures.plain(maxRear) + " kg (expected at most the limit)");
            wrong = true;
        }
        if (minFront != null && minFront > maxFront) {
            row.problem(MIN_FRONT, "the least front load " + Figures.plain(minFront) + " kg is above the front"
                    + " limit " + Figures.plain(maxFront) + " kg (expected at most the limit)");
            wrong = true;
        }
        return wrong ? null : new AxleGeometry(front, rear, unladenFront, unladenRear, maxFront, maxRear, minFront);
    }

    /** The door opening's height, or null when blank (or wrong: a problem is added). */
    static Double doorHeight(CsvRow row, Double deckHeight) {
        Double door = row.length(DOOR_HEIGHT, "the door opening height in millimetres above 0");
        if (door != null && deckHeight != null && door > deckHeight) {
            row.problem(DOOR_HEIGHT, "the door opening " + Figures.plain(door) + " mm is higher than the load space "
                    + Figures.plain(deckHeight) + " mm (expected at most the deck height)");
            return null;
        }
        return door;
    }
}
