package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.model.Joint;
import kitwright.model.JointBox;

/** Reads {@code joints.csv}: {@code mark,diameter_mm,mass_kg,quantity}, the kit's joint types. */
public final class JointsReader {
    public static final CsvColumns COLUMNS = new CsvColumns(
            List.of("mark", "diameter_mm", "mass_kg", "quantity"), List.of());

    private JointsReader() {
    }

    /** Reads a joints file on its own; throws with every problem found. */
    public static List<Joint> read(Path file) throws InvalidInputException {
        Problems problems = new Problems();
        List<Joint> joints = read(file, problems);
        problems.throwIfAny();
        return joints;
    }

    /** Reads a joints file, adding problems; returns the rows that could be read. */
    public static List<Joint> read(Path file, Problems problems) {
        return read(file, null, problems);
    }

    /**
     * Reads a joints file, adding problems, and checks each joint against the kit's joint box (when given): a
     * joint wider than the box's smallest side, or heavier than its mass limit, can travel in no box.
     */
    public static List<Joint> read(Path file, JointBox box, Problems problems) {
        return read(TableSource.of(file), box, problems);
    }

    /** Reads joints.csv or the joints sheet of kit.xlsx, adding problems, as above. */
    public static List<Joint> read(TableSource source, JointBox box, Problems problems) {
        List<Joint> joints = new ArrayList<>();
        CsvTable table = CsvTable.read(source, COLUMNS, "the kit's joints", problems).orElse(null);
        if (table == null) {
            return joints;
        }
        if (table.isEmpty()) {
            problems.add(table.belowHeader("no joints under the header (expected one row per joint type)"));
        }
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvRow row : table.rows()) {
            String mark = row.required("mark", "the joint's mark");
            Double diameter = row.length("diameter_mm", "the joint's outside diameter in millimetres above 0");
            Double mass = row.number("mass_kg", 0, false, "the mass of one joint in kilograms above 0");
            Integer quantity = row.count("quantity", 1, "a whole number of joints, at least 1");
            row.requireValues("diameter_mm", "mass_kg", "quantity");
            if (mark != null) {
                Integer earlier = firstLine.putIfAbsent(mark, row.line());
                if (earlier != null) {
                    row.problem("mark", "joint mark " + mark + " is already on " + row.at(earlier)
                            + " (expected each joint mark on one row only)");
                }
            }
            if (box != null && diameter != null) {
                double side = Math.min(box.lengthMm(), Math.min(box.widthMm(), box.heightMm()));
                if (diameter > side + 1e-9) {
                    row.problem("diameter_mm", String.format(Locale.ROOT, "joint %s (%s mm across) does not fit"
                            + " the joint box %s x %s x %s mm (expected at most %s mm, or a larger kit.json"
                            + " jointBox)", mark, plain(diameter), plain(box.lengthMm()), plain(box.widthMm()),
                            plain(box.heightMm()), plain(side)));
                }
            }
            if (box != null && mass != null && mass > box.maxMassKg() + 1e-9) {
                row.problem("mass_kg", String.format(Locale.ROOT, "joint %s (%s kg) is heavier than a joint box may"
                        + " be (expected at most %s kg, or a larger kit.json jointBox.maxMassKg)", mark,
                        plain(mass), plain(box.maxMassKg())));
            }
            if (row.clean()) {
                joints.add(new Joint(mark, diameter, mass, quantity));
            }
        }
        return joints;
    }

    private static String plain(double value) {
        return java.math.BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }
}
