package kitwright.docs;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** No source, document or sample file carries a merge-conflict marker (one once sat in a Javadoc, unseen). */
class MergeMarkersTest {
    /** Built from parts so that this file does not match itself. */
    private static final Pattern MARKER = Pattern.compile("^(" + "<".repeat(7) + "|" + ">".repeat(7) + "|"
            + "=".repeat(7) + ")( |$)");

    @Test
    void noConflictMarkers() throws IOException {
        List<String> found = new ArrayList<>();
        for (Path root : List.of(Path.of("src"), Path.of("README.md"), Path.of("DEVELOPERS.md"),
                Path.of("sample-kits"), Path.of("stock-catalogs"), Path.of("pom.xml"), Path.of(".ci"))) {
            try (Stream<Path> walk = Files.walk(root)) {
                for (Path f : walk.filter(Files::isRegularFile)
                        .filter(f -> !f.toString().matches(".*\\.(png|xlsx|pdf|jar)")).toList()) {
                    List<String> lines = new String(Files.readAllBytes(f), StandardCharsets.ISO_8859_1).lines()
                            .toList();
                    for (int i = 0; i < lines.size(); i++) {
                        if (MARKER.matcher(lines.get(i)).find()) {
                            found.add(f + ":" + (i + 1));
                        }
                    }
                }
            }
        }
        assertThat(found).isEmpty();
    }
}
