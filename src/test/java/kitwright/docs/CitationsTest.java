package kitwright.docs;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Citations a reader can follow: no file cites notes or tracker entries outside the repository, links into the
 * sources page land on one of its headings, and tube tolerances cite EN 10219-2 (part 2, "Tolerances, dimensions
 * and sectional properties"), never part 1 (technical delivery conditions).
 */
class CitationsTest {
    private static final List<Path> ROOTS = List.of(Path.of("src"), Path.of("README.md"), Path.of("DEVELOPERS.md"),
            Path.of("sample-kits"), Path.of("stock-catalogs"));
    /** Built from parts so that this file does not match itself. */
    private static final Pattern OUTSIDE = Pattern.compile("DOMAIN" + "\\.md|\\bissue [0-9]+");
    private static final Pattern PART_ONE = Pattern.compile("EN 10219" + "-1\\b");
    private static final Path SOURCES = Path.of("src/docs/sources.md");

    @Test
    @DisplayName("No file cites a place outside the repository (domain notes file, tracker issue numbers)")
    void noCitationsOutsideTheRepository() throws IOException {
        assertThat(matches(OUTSIDE, false)).isEmpty();
    }

    @Test
    @DisplayName("Tolerances cite EN 10219-2; part 1 appears only on the sources page, where the parts are told apart")
    void en10219PartTwo() throws IOException {
        assertThat(matches(PART_ONE, true)).isEmpty();
        assertThat(Files.readString(SOURCES)).contains("EN 10219" + "-1").contains("EN 10219-2");
    }

    @Test
    @DisplayName("Every link into the sources page (sources.md#...) lands on a heading of the sources page")
    void anchorsExist() throws IOException {
        List<String> anchors = Files.readAllLines(SOURCES).stream().filter(l -> l.startsWith("#"))
                .map(CitationsTest::anchor).toList();
        List<String> broken = new ArrayList<>();
        Pattern link = Pattern.compile("sources\\.md#([a-z0-9-]+)");
        for (Path f : files()) {
            Matcher m = link.matcher(read(f));
            while (m.find()) {
                if (!anchors.contains(m.group(1))) {
                    broken.add(f + ": #" + m.group(1));
                }
            }
        }
        assertThat(anchors).contains("tube-sections", "crates-trucks-and-containers");
        assertThat(broken).isEmpty();
    }

    /** GitHub's heading anchor: lower case, punctuation dropped, spaces to hyphens. */
    private static String anchor(String heading) {
        return heading.replaceFirst("^#+\\s*", "").toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9 -]", "")
                .replace(' ', '-');
    }

    private static List<String> matches(Pattern pattern, boolean exceptSources) throws IOException {
        List<String> found = new ArrayList<>();
        for (Path f : files()) {
            if (exceptSources && f.equals(SOURCES)) {
                continue;
            }
            List<String> lines = read(f).lines().toList();
            for (int i = 0; i < lines.size(); i++) {
                if (pattern.matcher(lines.get(i)).find()) {
                    found.add(f + ":" + (i + 1) + ": " + lines.get(i).trim());
                }
            }
        }
        return found;
    }

    /** Byte for byte (some broken-input cases are not UTF-8 on purpose); the patterns are ASCII. */
    private static String read(Path f) throws IOException {
        return new String(Files.readAllBytes(f), StandardCharsets.ISO_8859_1);
    }

    private static List<Path> files() throws IOException {
        List<Path> files = new ArrayList<>();
        for (Path root : ROOTS) {
            try (Stream<Path> walk = Files.walk(root)) {
                walk.filter(Files::isRegularFile).filter(f -> f.toString().matches(".*\\.(java|md|csv|json|txt)"))
                        .forEach(files::add);
            }
        }
        return files;
    }
}
