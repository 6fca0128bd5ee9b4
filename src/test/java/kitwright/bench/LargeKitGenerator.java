package kitwright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * Writes a large kit folder for the memory benchmark (not a unit test): by default 2,000 marks and 20,000 bars in
 * six nesting steel sections of {@code stock-catalogs/steel-chs.csv} (6 m and 12 m mill stock and its rack rows),
 * five structures, four joint types, and the shipped crate and vehicle catalogs beside the tube catalog. Every
 * value is invented and comes from a fixed seed, so the same arguments write the same files byte for byte.
 *
 * <p>Each mark has a cut length of 600-5,900 mm (every third one given as a node-to-node length instead, less
 * 35 mm per end) and a count of 1-19 in one structure, and a smaller count in a second structure for every fourth
 * mark; the kit holds, per mark, the largest count of one structure (structures.csv), and the counts are evened out
 * so that the kit holds exactly the asked number of bars.
 *
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.LargeKitGenerator \
 *     target/bench-kits/large-2000 [--marks 2000] [--bars 20000] [--seed 17]
 * /usr/bin/time -v java -Xmx2g -jar target/kitwright.jar plan target/bench-kits/large-2000 --out target/large-plan \
 *     --date 2026-01-01
 * </pre>
 * Run from the project root: kit.json names the tube catalog by a path relative to the kit folder.
 */
public final class LargeKitGenerator {
    private static final String[] SECTIONS = {"CHS 88.9x3.2", "CHS 76.1x3.2", "CHS 60.3x3.2", "CHS 48.3x3.2",
        "CHS 42.4x2.6", "CHS 33.7x2.6"};
    private static final String[] STRUCTURES = {"hall-frame", "stage-roof", "tower", "bridge", "grandstand"};
    private static final double END_DEDUCTION_MM = 35;

    private LargeKitGenerator() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length == 0) {
            throw new IllegalArgumentException("usage: LargeKitGenerator DIR [--marks N] [--bars N] [--seed N]");
        }
        Path dir = Path.of(args[0]);
        int marks = 2000;
        int bars = 20000;
        long seed = 17;
        for (int i = 1; i < args.length; i += 2) {
            switch (args[i]) {
                case "--marks" -> marks = Integer.parseInt(args[i + 1]);
                case "--bars" -> bars = Integer.parseInt(args[i + 1]);
                case "--seed" -> seed = Long.parseLong(args[i + 1]);
                default -> throw new IllegalArgumentException("unknown option " + args[i]);
            }
        }
        write(dir, marks, bars, seed);
        System.out.println("wrote " + dir + ": " + marks + " marks, " + bars + " bars");
    }

    /** Writes kit.json, bars.csv, structures.csv and joints.csv into {@code dir}. */
    public static void write(Path dir, int marks, int bars, long seed) throws IOException {
        if (bars < marks) {
            throw new IllegalArgumentException("at least one bar per mark");
        }
        Random random = new Random(seed);
        int[] quantity = new int[marks];
        int total = 0;
        for (int m = 0; m < marks; m++) {
            quantity[m] = 1 + random.nextInt(19);
            total += quantity[m];
        }
        // even out to exactly `bars`, one bar at a time over the marks in turn (at least one bar each)
        for (int m = 0; total != bars; m = (m + 1) % marks) {
            if (total < bars) {
                quantity[m]++;
                total++;
            } else if (quantity[m] > 1) {
                quantity[m]--;
                total--;
            }
        }
        StringBuilder barsCsv = new StringBuilder("mark,section,length_mm,quantity,node_to_node_mm,tolerance_mm,note\n");
        StringBuilder structuresCsv = new StringBuilder("structure,mark,count\n");
        for (int m = 0; m < marks; m++) {
            String mark = String.format(Locale.ROOT, "M%04d", m + 1);
            String section = SECTIONS[m % SECTIONS.length];
            double length = 600 + random.nextInt(5301);
            String cut = String.format(Locale.ROOT, "%.0f", length);
            String nodeToNode = String.format(Locale.ROOT, "%.0f", length + 2 * END_DEDUCTION_MM);
            boolean derived = m % 3 == 2;
            barsCsv.append(mark).append(',').append(section).append(',').append(derived ? "" : cut).append(",,")
                    .append(derived ? nodeToNode : "").append(",0.5,\n");
            int main = random.nextInt(STRUCTURES.length);
            structuresCsv.append(STRUCTURES[main]).append(',').append(mark).append(',').append(quantity[m])
                    .append('\n');
            if (m % 4 == 3 && quantity[m] > 1) {
                String other = STRUCTURES[(main + 1 + random.nextInt(STRUCTURES.length - 1)) % STRUCTURES.length];
                structuresCsv.append(other).append(',').append(mark).append(',').append(1 + random.nextInt(
                        quantity[m])).append('\n');
            }
        }
        Files.createDirectories(dir);
        Path catalog = dir.toAbsolutePath().normalize().relativize(
                Path.of("stock-catalogs", "steel-chs.csv").toAbsolutePath().normalize());
        Files.writeString(dir.resolve("kit.json"), String.format(Locale.ROOT, """
                {
                  "name": "large-%d",
                  "description": "Generated kit of %d marks and %d bars for the memory benchmark (seed %d). Invented data.",
                  "stockCatalog": "%s",
                  "kerfMm": 2.0,
                  "trimMm": 5.0,
                  "minRemnantMm": 500,
                  "timeLimitSeconds": 600,
                  "structuresStandTogether": false,
                  "endDeductionMm": %.0f
                }
                """, marks, marks, bars, seed, catalog.toString().replace('\\', '/'), END_DEDUCTION_MM));
        Files.writeString(dir.resolve("bars.csv"), barsCsv);
        Files.writeString(dir.resolve("structures.csv"), structuresCsv);
        int joints = bars / 2;
        Files.writeString(dir.resolve("joints.csv"), "mark,diameter_mm,mass_kg,quantity\n"
                + "N90,90,1.6," + (joints * 4 / 10) + "\n"
                + "N110,110,2.6," + (joints * 3 / 10) + "\n"
                + "N140,140,4.8," + (joints * 2 / 10) + "\n"
                + "N170,170,7.9," + (joints - joints * 9 / 10) + "\n");
    }
}
