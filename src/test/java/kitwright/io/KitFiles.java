package kitwright.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes small literal kit folders for tests. */
public final class KitFiles {
    public static final String STOCK = """
            section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin
            CHS 48.3x3.2,steel,48.3,3.2,6000,31.00,,mill
            CHS 48.3x3.2,steel,48.3,3.2,12000,56.00,,mill
            CHS 48.3x3.2,steel,48.3,3.2,3200,2.00,4,rack
            CHS 33.7x2.6,steel,33.7,2.6,6000,17.35,,mill
            """;
    public static final String MATERIALS = """
            material,density_kg_m3,co2e_kg_per_kg,source
            steel,7850,1.55,EN 1993-1-1
            """;

    private KitFiles() {
    }

    /** Writes {@code name} in {@code dir} and returns its path. */
    public static Path write(Path dir, String name, String text) {
        try {
            Path file = dir.resolve(name);
            Files.createDirectories(file.getParent());
            return Files.writeString(file, text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A kit folder with the small steel catalog and materials in it, and the given bars. */
    public static Path kit(Path dir, String bars) {
        write(dir, "stock.csv", STOCK);
        write(dir, "materials.csv", MATERIALS);
        write(dir, "bars.csv", bars);
        return dir;
    }

    /** The names of the entries of a folder, sorted. */
    public static java.util.List<String> entries(Path dir) throws IOException {
        try (java.util.stream.Stream<Path> list = Files.list(dir)) {
            return list.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /** What an iterator gives (JSON field names, say), as a list. */
    public static <T> java.util.List<T> listOf(java.util.Iterator<T> iterator) {
        java.util.List<T> list = new java.util.ArrayList<>();
        iterator.forEachRemaining(list::add);
        return list;
    }
}
