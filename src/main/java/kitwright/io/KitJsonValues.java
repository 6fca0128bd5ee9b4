package kitwright.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import kitwright.model.NestTolerance;

/**
 * Typed access to the values of one kit.json, reporting each wrong value with the key and the line the parser
 * found it on. A JSON {@code null} reads as "not given". Keys of nested objects are shown as
 * {@code parent.key} (e.g. {@code jointBox.lengthMm}).
 */
final class KitJsonValues {
    private final Path file;
    private final Map<String, Integer> lines;
    private final Problems problems;

    KitJsonValues(Path file, Map<String, Integer> lines, Problems problems) {
        this.file = file;
        this.lines = lines;
        this.problems = problems;
    }

    /** How a JSON value looks to a person: "text 'abc'", "a number", "an object", ... */
    static String kind(JsonNode value) {
        if (value.isTextual()) {
            return "the text \"" + value.asText() + "\"";
        }
        if (value.isNumber()) {
            return "the number " + value.asText();
        }
        if (value.isBoolean()) {
            return "the value " + value.asText();
        }
        if (value.isArray()) {
            return "a list";
        }
        return value.isObject() ? "an object" : "null";
    }

    void unknownKeys(JsonNode object, String prefix, List<String> known) {
        for (Iterator<String> names = object.fieldNames(); names.hasNext(); ) {
            String name = names.next();
            if (!known.contains(name)) {
                String hint = NearestName.of(name, known).map(n -> "did you mean " + n + "? ").orElse("");
                report(prefix, name, "unknown key (" + hint + "known keys: " + String.join(", ", known) + ")");
            }
        }
    }

    Optional<String> text(JsonNode object, String prefix, String key, String expected) {
        JsonNode value = value(object, key);
        if (value == null) {
            return Optional.empty();
        }
        if (!value.isTextual()) {
            report(prefix, key, "the value is " + kind(value) + " (expected text: " + expected + ")");
            return Optional.empty();
        }
        return Optional.of(value.asText());
    }

    Optional<Path> path(JsonNode root, String key, Path kitDir) {
        String expected = "a file path, relative to the kit folder or absolute";
        Optional<String> text = text(root, "", key, expected);
        if (text.isPresent() && text.get().isBlank()) {
            report("", key, "the path is blank (expected " + expected + ", or leave the key out)");
            return Optional.empty();
        }
        Optional<Path> path = text.flatMap(t -> KitJsonReader.resolve(kitDir, t));
        if (text.isPresent() && path.isEmpty()) {
            report("", key, "'" + text.get() + "' is not a usable path (expected " + expected + ")");
        }
        return path;
    }

    Optional<Double> number(JsonNode object, String prefix, String key, double minimum, boolean minimumAllowed,
                            String expected) {
        return number(object, prefix, key, minimum, minimumAllowed, Limits.MAX_NUMBER, expected);
    }

    /** A length in millimetres from 0 (or above 0) up to {@link Limits#MAX_LENGTH_MM}. */
    Optional<Double> length(JsonNode object, String prefix, String key, boolean zeroAllowed, String expected) {
        return number(object, prefix, key, 0, zeroAllowed, Limits.MAX_LENGTH_MM, expected);
    }

    /**
     * A number at least {@code minimum} (above it when {@code minimumAllowed} is false) and at most {@code maximum};
     * a number too large for a double (e.g. 1e400) reads as infinite and is above the limit.
     */
    Optional<Double> number(JsonNode object, String prefix, String key, double minimum, boolean minimumAllowed,
                            double maximum, String expected) {
        JsonNode value = value(object, key);
        if (value == null) {
            return Optional.empty();
        }
        if (!value.isNumber()) {
            report(prefix, key, "the value is " + kind(value) + " (expected a number: " + expected + ")");
            return Optional.empty();
        }
        double number = value.asDouble();
        if (number < minimum || (!minimumAllowed && number == minimum)) {
            String wrong = number < 0 ? "is negative" : number == 0 ? "is zero" : "is too small";
            report(prefix, key, value.asText() + " " + wrong + " (expected " + expected + ")");
            return Optional.empty();
        }
        if (!(number <= maximum)) {
            String shown = Double.isInfinite(number) ? "the number" : value.asText();
            report(prefix, key, shown + " is above the limit of " + Figures.plain(maximum) + " (expected " + expected
                    + ")");
            return Optional.empty();
        }
        return Optional.of(number);
    }

    Optional<Integer> whole(JsonNode object, String prefix, String key, int minimum, String expected) {
        return whole(object, prefix, key, minimum, Limits.MAX_NUMBER, expected);
    }

    /** A whole number from {@code minimum} up to {@code maximum}. */
    Optional<Integer> whole(JsonNode object, String prefix, String key, int minimum, double maximum,
                            String expected) {
        Optional<Double> number = number(object, prefix, key, minimum, true, maximum, expected);
        if (number.isPresent() && (number.get() != Math.rint(number.get()) || number.get() > Integer.MAX_VALUE)) {
            report(prefix, key, value(object, key).asText() + " is not a whole number (expected " + expected + ")");
            return Optional.empty();
        }
        return number.map(Double::intValue);
    }

    /** True when {@code value} is below {@code limit}; otherwise reports it. */
    boolean below(JsonNode object, String prefix, String key, double value, double limit, String expected) {
        if (value < limit) {
            return true;
        }
        report(prefix, key, value(object, key).asText() + " is too large (expected " + expected + ")");
        return false;
    }

    Optional<Boolean> flag(JsonNode object, String key) {
        JsonNode value = value(object, key);
        if (value == null) {
            return Optional.empty();
        }
        if (!value.isBoolean()) {
            report("", key, "the value is " + kind(value) + " (expected true or false, without quotes)");
            return Optional.empty();
        }
        return Optional.of(value.asBoolean());
    }

    Optional<NestTolerance> nestTolerance(JsonNode root) {
        String expected = "\"worst-case\" or \"nominal\"";
        Optional<String> text = text(root, "", "nestTolerance", expected);
        Optional<NestTolerance> tolerance = text.flatMap(NestTolerance::parse);
        if (text.isPresent() && tolerance.isEmpty()) {
            report("", "nestTolerance", "'" + text.get() + "' is not a fit rule (expected " + expected + ")");
        }
        return tolerance;
    }

    /**
     * The structures of {@code tour} in building order, each with its line: a non-empty list of structure names
     * (text). A wrong entry is reported on its line and left out; whether structures.csv has the names is checked
     * with the kit. Empty when the key is absent or wrong.
     */
    List<Sourced<String>> tour(JsonNode root) {
        String expected = "a list of the structures of structures.csv in the order they are built, e.g."
                + " [\"screen-frame\", \"ticket-canopy\"]";
        JsonNode value = value(root, "tour");
        if (value == null) {
            return List.of();
        }
        if (!value.isArray()) {
            report("", "tour", "the value is " + kind(value) + " (expected " + expected + ")");
            return List.of();
        }
        if (value.isEmpty()) {
            report("", "tour", "the list is empty (expected " + expected + ", or leave the key out)");
            return List.of();
        }
        if (value.size() > Limits.MAX_TOUR_LEGS) {
            report("", "tour", "the list names " + value.size() + " structures, above the limit of "
                    + Limits.MAX_TOUR_LEGS + " (expected " + expected + ")");
            return List.of();
        }
        List<Sourced<String>> tour = new java.util.ArrayList<>();
        for (int i = 0; i < value.size(); i++) {
            JsonNode entry = value.get(i);
            int line = lineOf("/tour/" + i);
            if (!entry.isTextual() || entry.asText().isBlank()) {
                String what = entry.isTextual() ? "blank text" : kind(entry);
                problems.add(file, line, "tour", "entry " + (i + 1) + " is " + what + " (expected the name of a"
                        + " structure of structures.csv, in double quotes)");
                continue;
            }
            tour.add(new Sourced<>(entry.asText(), file, line));
        }
        return tour.size() == value.size() ? tour : List.of();
    }

    /** A nested object, or null when not given (or not an object, which is reported). */
    JsonNode object(JsonNode root, String key, String expected) {
        JsonNode value = value(root, key);
        if (value != null && !value.isObject()) {
            report("", key, "the value is " + kind(value) + " (expected " + expected + ")");
            return null;
        }
        return value;
    }

    /** The key when the object has it, else reports it missing. */
    Optional<String> required(JsonNode object, String prefix, String key) {
        if (value(object, key) != null) {
            return Optional.of(key);
        }
        String parent = prefix.substring(0, prefix.length() - 1);
        problems.add(file, lineOf("/" + parent), prefix + key, "the key is missing (expected " + parent
                + " to give " + String.join(", ", switch (parent) {
                    case "spares" -> KitJsonReader.SPARES_KEYS;
                    default -> KitJsonReader.JOINT_BOX_KEYS;
                }) + ")");
        return Optional.empty();
    }

    private static JsonNode value(JsonNode object, String key) {
        JsonNode value = object.get(key);
        return value == null || value.isNull() ? null : value;
    }

    void report(String prefix, String key, String message) {
        String pointer = "/" + prefix.replace('.', '/') + key.replace("~", "~0").replace("/", "~1");
        problems.add(file, lineOf(pointer), prefix + key, message);
    }

    private int lineOf(String pointer) {
        return lines.getOrDefault(pointer, 1);
    }
}
