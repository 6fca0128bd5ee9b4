package kitwright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * Writes the time-limit benchmark kit (not a unit test): the sample kit cinema-20 with a crate catalog of N crate
 * types (inner sizes, tares and prices from a fixed seed, invented), the shipped vehicle catalog and
 * {@code timeLimitSeconds} 10. The crate mix's constructions run once per crate type and per pair of types, so
 * such a catalog ran the crating stage far past its time limit before the filling budget
 * ({@code LaneCratePacker.Limits.maxFillings}). Usage: {@code CrateCatalogKit [types] [folder]}, then
 * {@code /usr/bin/time java -jar target/kitwright.jar plan FOLDER --out OUT --date 2026-12-03}; the measured
 * figures are in src/test/resources/bench/limits-results.md.
 */
public final class CrateCatalogKit {
    private CrateCatalogKit() {
    }

    public static void main(String[] args) throws IOException {
        int types = args.length > 0 ? Integer.parseInt(args[0]) : 30;
        Path kit = Path.of(args.length > 1 ? args[1] : "target/bench-kits/crate-types-" + types).toAbsolutePath();
        Path sample = Path.of("sample-kits/cinema-20").toAbsolutePath();
        Path catalogs = Path.of("stock-catalogs").toAbsolutePath();
        Files.createDirectories(kit);
        for (String file : new String[] {"bars.csv", "joints.csv", "structures.csv"}) {
            Files.copy(sample.resolve(file), kit.resolve(file), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        StringBuilder crates = new StringBuilder("crate,inner_length_mm,inner_width_mm,inner_height_mm,"
                + "outer_length_mm,outer_width_mm,outer_height_mm,tare_kg,max_gross_kg,stackable,max_top_load_kg,"
                + "price\n");
        Random random = new Random(1717);
        for (int t = 0; t < types; t++) {
            int length = 2100 + 100 * random.nextInt(50);
            int width = 600 + 50 * random.nextInt(10);
            int height = 500 + 50 * random.nextInt(8);
            int tare = 40 + random.nextInt(180);
            crates.append(String.format(Locale.ROOT, "bench-%02d,%d,%d,%d,%d,%d,%d,%d,%d,yes,1000,%d%n", t, length,
                    width, height, length + 120, width + 120, height + 140, tare, 600 + 100 * random.nextInt(25),
                    100 + random.nextInt(250)));
        }
        Files.writeString(kit.resolve("crates.csv"), crates.toString());
        String json = Files.readString(sample.resolve("kit.json"))
                .replace("\"../../stock-catalogs/steel-chs.csv\"", quote(catalogs.resolve("steel-chs.csv")) + ",\n"
                        + "  \"crateCatalog\": \"crates.csv\",\n  \"vehicleCatalog\": "
                        + quote(catalogs.resolve("vehicles.csv")))
                .replace("\"timeLimitSeconds\": 60", "\"timeLimitSeconds\": 10");
        Files.writeString(kit.resolve("kit.json"), json);
        System.out.println(kit);
    }

    private static String quote(Path path) {
        return "\"" + path.toString().replace("\\", "/") + "\"";
    }
}
