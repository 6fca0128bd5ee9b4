package kitwright.compare;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small invented kit folders on the project's steel catalog (with its crates and vehicles), for fast chain runs. */
public final class TinyKits {
    private TinyKits() {
    }

    /**
     * Writes a kit folder: marks on CHS 60.3, 48.3 and 33.7 (the last one shorter for the {@code short} variant),
     * two structures, a few joints; {@code sparesJson} is put into kit.json as it is (or nothing when null).
     */
    public static Path write(Path dir, String name, boolean shortBars, String sparesJson) throws IOException {
        Path kit = Files.createDirectories(dir.resolve(name));
        String catalog = Path.of("stock-catalogs", "steel-chs.csv").toAbsolutePath().toString().replace('\\', '/');
        Files.writeString(kit.resolve("kit.json"), "{\n  \"name\": \"" + name + "\",\n  \"stockCatalog\": \""
                + catalog + "\",\n  \"timeLimitSeconds\": 5" + (sparesJson == null ? "" : ",\n  \"spares\": "
                + sparesJson) + "\n}\n");
        Files.writeString(kit.resolve("bars.csv"), "mark,section,length_mm,quantity\n"
                + "A,CHS 60.3x3.2,2400,\n"
                + "B,CHS 48.3x3.2,1800,\n"
                + "C,CHS 33.7x2.6," + (shortBars ? "950" : "1450") + ",\n");
        Files.writeString(kit.resolve("structures.csv"), "structure,mark,count\n"
                + "kiosk,A,6\nkiosk,B,8\nkiosk,C,10\n"
                + "shelter,A,4\nshelter,B,9\nshelter,C,6\n");
        Files.writeString(kit.resolve("joints.csv"), "mark,diameter_mm,mass_kg,quantity\nN90,90,1.6,12\n");
        return kit;
    }
}
