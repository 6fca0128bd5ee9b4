package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CompareFilesTest {
    @TempDir
    Path tmp;

    @Test
    void writesTheThreeFilesIntoANewFolderAndLeavesNoTemporaryFolder() throws IOException {
        Path out = tmp.resolve("options");
        CompareFiles.write(out, CompareFixtures.three());
        assertThat(out.resolve("compare.json")).isRegularFile();
        assertThat(out.resolve("compare.csv")).isRegularFile();
        assertThat(out.resolve("compare.html")).isRegularFile();
        try (Stream<Path> entries = Files.list(tmp)) {
            assertThat(entries).containsExactly(out);
        }
        assertThat(Files.readString(out.resolve("compare.json"))).isEqualTo(CompareJson.toJson(CompareFixtures.three()));
    }

    @Test
    void replacesItsOwnFilesInAnExistingFolderAndKeepsTheOthers() throws IOException {
        Path out = Files.createDirectories(tmp.resolve("report"));
        Files.writeString(out.resolve("plan.json"), "{}");
        Files.writeString(out.resolve("compare.json"), "old");
        CompareFiles.write(out, CompareFixtures.three());
        assertThat(Files.readString(out.resolve("plan.json"))).isEqualTo("{}");
        assertThat(Files.readString(out.resolve("compare.json"))).startsWith("{");
        try (Stream<Path> entries = Files.list(tmp)) {
            assertThat(entries).containsExactly(out);
        }
    }

    @Test
    void refusesAFileWhereTheFolderShouldBe() throws IOException {
        Path out = Files.writeString(tmp.resolve("taken"), "x");
        assertThatThrownBy(() -> CompareFiles.write(out, CompareFixtures.three())).hasMessageContaining("not a folder");
        assertThat(Files.readString(out)).isEqualTo("x");
    }
}
