package kitwright.io;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import kitwright.model.JointBox;
import kitwright.model.KitSettings;
import kitwright.model.MiscutAllowance;
import kitwright.model.NestTolerance;
import kitwright.model.SparesPolicy;

/**
 * Reads {@code kit.json}: every key is optional and has a documented default (see {@link KitSettings}). An unknown
 * key, a value of the wrong type or out of range is reported with the line the parser found it on; such a key
 * keeps its default so that the other files can still be checked. Relative paths resolve from the kit folder.
 */
public final class KitJsonReader {
    /** Every key kit.json knows, in documented order. */
    public static final List<String> KEYS = List.of("name", "description", "stockCatalog", "materials",
            "crateCatalog", "vehicleCatalog", "kerfMm", "trimMm", "minRemnantMm", "timeLimitSeconds",
            "structuresStandTogether", "endDeductionMm", "nestTolerance", "nestClearanceMm", "nestEndAllowanceMm",
            "maxBundleMassKg", "jointBox", "spares", "miscutAllowance", "csv", "tour");
    static final List<String> JOINT_BOX_KEYS = List.of("lengthMm", "widthMm", "heightMm", "maxMassKg");
    static final List<String> SPARES_KEYS = List.of("lossRatePerCycle", "cycles", "serviceLevel");
    static final List<String> MISCUT_ALLOWANCE_KEYS = List.of("piecesPerMark", "percent");
    static final List<String> CSV_KEYS = List.of("delimiter", "decimalSign");

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .build();

    private KitJsonReader() {
    }

    /** The settings of a kit folder without kit.json: all defaults, named after the folder. */
    public static KitJson defaults(Path kitDir) {
        return new KitJson(KitSettings.defaults(folderName(kitDir)), kitDir.resolve("stock.csv").normalize(),
                null, null, null, CsvConvention.DETECTED);
    }

    /** Reads a kit.json on its own; throws with every problem found. */
    public static KitJson read(Path file, Path kitDir) throws InvalidInputException {
        Problems problems = new Problems();
        Optional<KitJson> kitJson = read(file, kitDir, problems);
        problems.throwIfAny();
        return kitJson.orElseThrow();
    }

    /** Reads kit.json, adding problems; empty when the file is not a JSON object at all. */
    public static Optional<KitJson> read(Path file, Path kitDir, Problems problems) {
        byte[] bytes;
        try {
            bytes = InputBytes.read(file);
        } catch (NoSuchFileException e) {
            problems.add(Problem.ofFile(file, "file not found (expected the kit's settings as a JSON object)"));
            return Optional.empty();
        } catch (InputBytes.TooLargeException e) {
            problems.add(InputBytes.tooLarge(file, "the kit's settings as a JSON object of a few lines"));
            return Optional.empty();
        } catch (IOException e) {
            problems.add(Problem.ofFile(file, "cannot read the file: " + InputBytes.reason(e)));
            return Optional.empty();
        }
        Optional<Problem> hidden = InputBytes.textProblem(file, bytes, "UTF-8 text");
        if (hidden.isPresent()) {
            problems.add(hidden.get());
            return Optional.empty();
        }
        Map<String, Integer> lines = new HashMap<>();
        JsonNode root;
        try {
            collectKeyLines(bytes, lines);
            root = MAPPER.readTree(bytes);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
            problems.add(file, line, "", "the file is not valid JSON: " + plainMessage(e.getOriginalMessage())
                    + " (expected a JSON object such as {\"kerfMm\": 2.0})");
            return Optional.empty();
        } catch (IOException e) {
            problems.add(Problem.ofFile(file, "cannot read the file: " + e.getMessage()));
            return Optional.empty();
        }
        if (root == null || root.isMissingNode()) {
            problems.add(file, 1, "", "the file is empty (expected a JSON object, at least {})");
            return Optional.empty();
        }
        if (!root.isObject()) {
            problems.add(file, 1, "", "the file holds " + KitJsonValues.kind(root)
                    + " (expected a JSON object such as {\"kerfMm\": 2.0})");
            return Optional.empty();
        }
        return Optional.of(settings(new KitJsonValues(file, lines, problems), root, kitDir));
    }

    private static KitJson settings(KitJsonValues json, JsonNode root, Path kitDir) {
        json.unknownKeys(root, "", KEYS);
        KitSettings defaults = KitSettings.defaults(folderName(kitDir));
        String name = json.text(root, "", "name", "the kit's name").orElse(defaults.name());
        if (name.isBlank()) {
            json.report("", "name", "the name is blank (expected a name, or leave the key out to use the folder's)");
            name = defaults.name();
        }
        Optional<String> unsafe = Names.problem(name, "the kit's name");
        if (unsafe.isPresent()) {
            json.report("", "name", unsafe.get());
            name = defaults.name();
        }
        String description = json.text(root, "", "description", "a description of the kit").orElse("");
        Path stock = json.path(root, "stockCatalog", kitDir).orElse(kitDir.resolve("stock.csv").normalize());
        Path materials = json.path(root, "materials", kitDir).orElse(null);
        Path crates = json.path(root, "crateCatalog", kitDir).orElse(null);
        Path vehicles = json.path(root, "vehicleCatalog", kitDir).orElse(null);
        double kerf = json.length(root, "", "kerfMm", true, "the saw kerf in millimetres, 0 or more, e.g. 2.0")
                .orElse(defaults.kerfMm());
        double trim = json.length(root, "", "trimMm", true, "the end trim per end in millimetres, 0 or more")
                .orElse(defaults.trimMm());
        double minRemnant = json.length(root, "", "minRemnantMm", true,
                "the shortest remnant in millimetres, 0 or more").orElse(defaults.minRemnantMm());
        double timeLimit = json.number(root, "", "timeLimitSeconds", 0, false,
                "a time limit in seconds above 0").orElse(defaults.timeLimitSeconds());
        boolean together = json.flag(root, "structuresStandTogether").orElse(false);
        double endDeduction = json.length(root, "", "endDeductionMm", true,
                "the deduction per end in millimetres, 0 or more").orElse(0.0);
        NestTolerance tolerance = json.nestTolerance(root).orElse(defaults.nestTolerance());
        double clearance = json.length(root, "", "nestClearanceMm", true,
                "a diametral clearance in millimetres, 0 or more").orElse(defaults.nestClearanceMm());
        double endAllowance = json.length(root, "", "nestEndAllowanceMm", true,
                "an allowance per end in millimetres, 0 or more").orElse(defaults.nestEndAllowanceMm());
        Double maxBundle = json.number(root, "", "maxBundleMassKg", 0, false,
                "a mass in kilograms above 0, or leave the key out for no limit").orElse(null);
        JointBox jointBox = jointBox(json, root);
        SparesPolicy spares = spares(json, root);
        List<Sourced<String>> tour = json.tour(root);
        KitSettings settings = new KitSettings(name, description, kerf, trim, minRemnant, timeLimit, together,
                endDeduction, tolerance, clearance, endAllowance, maxBundle, jointBox, spares,
                miscutAllowance(json, root), tour.stream().map(Sourced::value).toList());
        return new KitJson(settings, stock, materials, crates, vehicles, csv(json, root), tour);
    }

    private static JointBox jointBox(KitJsonValues json, JsonNode root) {
        JsonNode box = json.object(root, "jointBox", "an object {lengthMm, widthMm, heightMm, maxMassKg}");
        if (box == null) {
            return JointBox.DEFAULT;
        }
        json.unknownKeys(box, "jointBox.", JOINT_BOX_KEYS);
        JointBox d = JointBox.DEFAULT;
        String size = "a size in millimetres above 0";
        return new JointBox(
                json.length(box, "jointBox.", "lengthMm", false, size).orElse(d.lengthMm()),
                json.length(box, "jointBox.", "widthMm", false, size).orElse(d.widthMm()),
                json.length(box, "jointBox.", "heightMm", false, size).orElse(d.heightMm()),
                json.number(box, "jointBox.", "maxMassKg", 0, false, "a mass in kilograms above 0")
                        .orElse(d.maxMassKg()));
    }

    private static SparesPolicy spares(KitJsonValues json, JsonNode root) {
        JsonNode spares = json.object(root, "spares", "an object {lossRatePerCycle, cycles, serviceLevel}");
        if (spares == null) {
            return null;
        }
        json.unknownKeys(spares, "spares.", SPARES_KEYS);
        Optional<Double> loss = json.required(spares, "spares.", "lossRatePerCycle").flatMap(k -> json.number(
                spares, "spares.", k, 0, true, "a share of bars lost per cycle, from 0 up to below 1"));
        Optional<Integer> cycles = json.required(spares, "spares.", "cycles").flatMap(k -> json.whole(
                spares, "spares.", k, 1, Limits.MAX_CYCLES, "a whole number of assembly cycles, at least 1"));
        Optional<Double> level = json.required(spares, "spares.", "serviceLevel").flatMap(k -> json.number(
                spares, "spares.", k, 0, false, "a probability above 0 and below 1, e.g. 0.95"));
        loss = loss.filter(p -> json.below(spares, "spares.", "lossRatePerCycle", p, 1,
                "a share of bars lost per cycle, from 0 up to below 1"));
        level = level.filter(p -> json.below(spares, "spares.", "serviceLevel", p, 1,
                "a probability above 0 and below 1, e.g. 0.95"));
        if (loss.isEmpty() || cycles.isEmpty() || level.isEmpty()) {
            return null;
        }
        return new SparesPolicy(loss.get(), cycles.get(), level.get());
    }

    /** The miscut allowance; both keys are optional, and a wrong one counts as 0 so the rest is still checked. */
    private static MiscutAllowance miscutAllowance(KitJsonValues json, JsonNode root) {
        JsonNode allowance = json.object(root, "miscutAllowance", "an object {piecesPerMark, percent}");
        if (allowance == null) {
            return MiscutAllowance.NONE;
        }
        String prefix = "miscutAllowance.";
        json.unknownKeys(allowance, prefix, MISCUT_ALLOWANCE_KEYS);
        int pieces = json.whole(allowance, prefix, "piecesPerMark", 0, Limits.MAX_COUNT,
                "a whole number of extra pieces per mark, 0 or more").orElse(0);
        double percent = json.number(allowance, prefix, "percent", 0, true, 100,
                "a share of each mark's quantity in percent, from 0 to 100").orElse(0.0);
        return new MiscutAllowance(pieces, percent);
    }

    /**
     * The delimiter and decimal sign stated for the kit's own CSV files; a wrong part is reported and detected.
     * A decimal comma in a file separated by commas would need every number quoted, which spreadsheets never
     * save, so that pair is refused.
     */
    private static CsvConvention csv(KitJsonValues json, JsonNode root) {
        JsonNode csv = json.object(root, "csv", "an object {delimiter, decimalSign}, e.g. {\"delimiter\": \";\","
                + " \"decimalSign\": \",\"}");
        if (csv == null) {
            return CsvConvention.DETECTED;
        }
        String prefix = "csv.";
        json.unknownKeys(csv, prefix, CSV_KEYS);
        Character delimiter = sign(json, csv, "delimiter", ",;", "\",\" or \";\", the character between columns");
        Character decimal = sign(json, csv, "decimalSign", ".,", "\".\" or \",\", the sign before decimals");
        if (delimiter != null && decimal != null && delimiter == ',' && decimal == ',') {
            json.report(prefix, "decimalSign", "a decimal comma in a file separated by ',' (expected \".\" with the"
                    + " delimiter \",\", or the delimiter \";\" with \",\", as spreadsheets save CSV)");
            decimal = null;
        }
        return new CsvConvention(delimiter, decimal);
    }

    private static Character sign(KitJsonValues json, JsonNode csv, String key, String allowed, String expected) {
        Optional<String> text = json.text(csv, "csv.", key, expected);
        if (text.isEmpty()) {
            return null;
        }
        if (text.get().length() != 1 || allowed.indexOf(text.get().charAt(0)) < 0) {
            json.report("csv.", key, "'" + text.get() + "' is not one of them (expected " + expected + ")");
            return null;
        }
        return text.get().charAt(0);
    }

    /**
     * Records the line of every key, as a JSON pointer (e.g. {@code /jointBox/lengthMm}), and of every value in a
     * list (e.g. {@code /tour/2}), so that one wrong entry of a long list is reported on its own line.
     */
    private static void collectKeyLines(byte[] bytes, Map<String, Integer> lines) throws IOException {
        try (JsonParser parser = MAPPER.getFactory().createParser(bytes)) {
            for (JsonToken token = parser.nextToken(); token != null; token = parser.nextToken()) {
                boolean listEntry = parser.getParsingContext().inArray() && token != JsonToken.END_ARRAY;
                if (token == JsonToken.FIELD_NAME || listEntry) {
                    lines.putIfAbsent(parser.getParsingContext().pathAsPointer().toString(),
                            parser.currentTokenLocation().getLineNr());
                }
            }
        }
    }

    /** The kit folder's own name, the default kit name. */
    static String folderName(Path kitDir) {
        Path name = kitDir.toAbsolutePath().normalize().getFileName();
        return name == null ? "kit" : name.toString();
    }

    /** A path from kit.json, resolved from the kit folder; kept apart to report unusable paths. */
    static Optional<Path> resolve(Path kitDir, String text) {
        try {
            return Optional.of(kitDir.resolve(text).normalize());
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }

    /**
     * The parser's message without its advice to programmers (parser features to enable, the Java type bound), which
     * a user editing kit.json cannot act on, and with the usual hand-editing slips named.
     */
    static String plainMessage(String parserMessage) {
        String first = parserMessage == null ? "" : parserMessage.lines().findFirst().orElse("");
        if (first.contains("comment")) {
            return "a comment (JSON has no comments; put notes in \"description\")";
        }
        if (first.startsWith("Trailing token")) {
            return "more text after the closing } (one JSON object per file)";
        }
        if (first.contains("nesting depth")) {
            return "objects and lists are nested too deeply; kit.json is one object of settings, a few of them"
                    + " objects in turn";
        }
        if (first.startsWith("Unexpected end-of-input")) {
            return "the file ends before the JSON is closed; close every {, [ and quote";
        }
        String plain = first.replaceAll("\\s*\\(not recognized as one since Feature [^)]*\\)", "")
                .replaceAll("\\s*\\(start marker at [^)]*\\)\\)?", "")
                .replaceAll("\\b(VALUE_STRING|VALUE_NUMBER_INT|VALUE_NUMBER_FLOAT|VALUE_TRUE|VALUE_FALSE|VALUE_NULL)\\b",
                        "a value")
                .replaceAll("\\b(START_OBJECT|END_OBJECT|START_ARRAY|END_ARRAY|FIELD_NAME)\\b", "a bracket or key")
                .replaceAll(":\\s*enable `[^`]*` to allow", "")
                .replaceAll("\\s*\\(bound as `[^`]*`\\)", "")
                .replaceAll(":\\s*not allowed as per `[^`]*`", "").strip();
        if (plain.contains("was expecting double-quote to start field name")) {
            plain += "; keys go in double quotes, with no comma after the last entry";
        }
        return plain.isEmpty() ? "unreadable" : plain;
    }
}
