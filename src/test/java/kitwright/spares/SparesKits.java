package kitwright.spares;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** A small kit folder with hand-countable figures for the spares and kit-figures tests (invented data). */
public final class SparesKits {
    private SparesKits() {
    }

    /**
     * Writes a kit folder on the project's steel catalog (with its crates and vehicles): marks A (1450 mm) and B
     * (2400 mm) on CHS 48.3x3.2, C (950 mm) on CHS 33.7x2.6 with 12 bars, 2 more than the structures need; two
     * structures that do not stand together, so the kit holds A 10, B 6, C 12 = 28 bars for 10+6+10 + 8+6+4 = 44
     * members; 14 joints of 0.8 kg. {@code sparesJson} goes into kit.json as it is (nothing when null).
     */
    public static Path write(Path dir, String name, String sparesJson) throws IOException {
        Path kitDir = Files.createDirectories(dir.resolve(name));
        String catalog = Path.of("stock-catalogs", "steel-chs.csv").toAbsolutePath().toString().replace('\\', '/');
        Files.writeString(kitDir.resolve("kit.json"), "{\n  \"name\": \"" + name + "\",\n  \"stockCatalog\": \""
                + catalog + "\",\n  \"timeLimitSeconds\": 5" + (sparesJson == null ? "" : ",\n  \"spares\": "
                + sparesJson) + "\n}\n");
        Files.writeString(kitDir.resolve("bars.csv"), "mark,section,length_mm,quantity\n"
                + "A,CHS 48.3x3.2,1450,\nB,CHS 48.3x3.2,2400,\nC,CHS 33.7x2.6,950,12\n");
        Files.writeString(kitDir.resolve("structures.csv"), "structure,mark,count\n"
                + "kiosk,A,10\nkiosk,B,6\nkiosk,C,10\nshelter,A,8\nshelter,B,6\nshelter,C,4\n");
        Files.writeString(kitDir.resolve("joints.csv"), "mark,diameter_mm,mass_kg,quantity\nN60,60,0.8,14\n");
        return kitDir;
    }
}
