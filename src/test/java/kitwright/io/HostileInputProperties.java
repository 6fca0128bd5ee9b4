package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import kitwright.model.Bar;
import kitwright.model.Kit;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.LongRange;

/**
 * Reading never crashes: a valid kit with random cells of its CSV files and random values of its kit.json replaced
 * by hostile text (huge, negative, non-numeric, quotes, separators, control characters, JSON of the wrong type)
 * either reads as a kit whose numbers are all within {@link Limits}, or is refused with problems that are one line
 * each. Any other exception fails the property.
 */
class HostileInputProperties {
    private static final String[] CELLS = {"", "-0", "-0.0", "0", "-1", "1e308", "Infinity", "NaN", "1,5",
        "99999999999999999999", "2147483648", "100001", "1000000.001", "0.0000001", "\"", "\"a\"\"b\"", ",", "\t",
        "a\nb", "\u00e9\u200b", "\u0000", "\uFEFF", "yes", "rack", "mill", "CHS 48.3x3.2", "A1", " 12 ", "+3", ".5"};
    private static final String[] JSON_VALUES = {"null", "[]", "{}", "\"\"", "\"2\"", "true", "-0.0", "0", "-1",
        "1e308", "1e400", "123456789012345678901234567890", "0.5", "1", "2.5", "{\"lengthMm\": 0}", "[1, 2]",
        "\"worst-case\"", "\"nominal\"", "\"../nowhere.csv\"", "\"\\u0000\""};
    private static final List<String> KEYS = KitJsonReader.KEYS;

    private static final String BARS = """
            mark,section,length_mm,quantity,node_to_node_mm,tolerance_mm,note
            A1,CHS 48.3x3.2,2400,,2470,0.5,top chord
            B1,CHS 33.7x2.6,,8,1270,,brace
            """;
    private static final String STRUCTURES = "structure,mark,count\npavilion,A1,12\nstage,A1,8\nstage,B1,6\n";
    private static final String JOINTS = "mark,diameter_mm,mass_kg,quantity\nN90,90,1.6,20\n";

    @Property(tries = 300, seed = "20261203")
    void readingEndsInAKitOrInOneLineProblems(@ForAll @LongRange(min = 1, max = 1_000_000_000L) long seed)
            throws IOException {
        Random random = new Random(seed);
        Path dir = Files.createTempDirectory("hostile");
        try {
            KitFiles.kit(dir, mutateCsv(BARS, random));
            KitFiles.write(dir, "stock.csv", mutateCsv(KitFiles.STOCK, random));
            KitFiles.write(dir, "structures.csv", mutateCsv(STRUCTURES, random));
            KitFiles.write(dir, "joints.csv", mutateCsv(JOINTS, random));
            KitFiles.write(dir, "kit.json", kitJson(random));
            try {
                Kit kit = KitReader.read(dir);
                for (Bar bar : kit.bars()) {
                    assertThat(bar.lengthMm()).isPositive().isLessThanOrEqualTo(Limits.MAX_LENGTH_MM);
                    assertThat(bar.quantity()).isPositive().isLessThanOrEqualTo(Limits.MAX_COUNT);
                }
                assertThat(kit.settings().kerfMm()).isBetween(0.0, Limits.MAX_LENGTH_MM);
                assertThat(kit.settings().trimMm()).isBetween(0.0, Limits.MAX_LENGTH_MM);
            } catch (InvalidInputException e) {
                assertThat(e.problems()).isNotEmpty().allSatisfy(p -> assertThat(p.toString()).doesNotContain("\n",
                        "\r"));
            }
        } finally {
            deleteTree(dir);
        }
    }

    /** Replaces one to three cells (header included) with hostile text, quoted or not. */
    private static String mutateCsv(String csv, Random random) {
        List<List<String>> rows = new ArrayList<>();
        for (String line : csv.strip().split("\n")) {
            rows.add(new ArrayList<>(List.of(line.split(",", -1))));
        }
        for (int n = 1 + random.nextInt(3); n > 0; n--) {
            List<String> row = rows.get(random.nextInt(rows.size()));
            String cell = CELLS[random.nextInt(CELLS.length)];
            boolean quote = random.nextBoolean();
            row.set(random.nextInt(row.size()), quote ? "\"" + cell.replace("\"", "\"\"") + "\"" : cell);
        }
        StringBuilder sb = new StringBuilder();
        for (List<String> row : rows) {
            sb.append(String.join(",", row)).append(random.nextInt(4) == 0 ? "\r\n" : "\n");
        }
        return random.nextInt(5) == 0 ? sb.toString().strip() : sb.toString();
    }

    /** A kit.json of two to five known keys (or a nested one) with values of any kind. */
    private static String kitJson(Random random) {
        List<String> entries = new ArrayList<>();
        List<String> used = new ArrayList<>();
        for (int n = 2 + random.nextInt(4); n > 0; n--) {
            String key = KEYS.get(random.nextInt(KEYS.size()));
            if (used.contains(key)) {
                continue;
            }
            used.add(key);
            String value = JSON_VALUES[random.nextInt(JSON_VALUES.length)];
            if (key.equals("spares") && random.nextBoolean()) {
                value = "{\"lossRatePerCycle\": " + JSON_VALUES[random.nextInt(JSON_VALUES.length)] + ", \"cycles\": "
                        + JSON_VALUES[random.nextInt(JSON_VALUES.length)] + ", \"serviceLevel\": 0.95}";
            }
            if (key.equals("miscutAllowance") && random.nextBoolean()) {
                value = "{\"piecesPerMark\": " + JSON_VALUES[random.nextInt(JSON_VALUES.length)] + ", \"percent\": "
                        + JSON_VALUES[random.nextInt(JSON_VALUES.length)] + "}";
            }
            if (key.equals("stockCatalog") && random.nextBoolean()) {
                value = "\"stock.csv\"";
            }
            entries.add("\"" + key + "\": " + value);
        }
        return "{\n  " + String.join(",\n  ", entries) + "\n}\n";
    }

    private static void deleteTree(Path root) {
        try (Stream<Path> walk = Files.walk(root)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.delete(p);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
