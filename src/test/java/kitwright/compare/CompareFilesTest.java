package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import kitwright.io.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CompareFilesTest {
    @TempDir
    Path tmp;

    @Test
    void writesTheThreeFilesIntoANewFolderAndLeavesNoTemporaryFolder() throws Exception {
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
    void replacesAnEarlierResultButNeverAFolderOfTheUsers() throws Exception {
        Path out = tmp.resolve("report");
        CompareFiles.write(out, CompareFixtures.three());
        CompareFiles.write(out, CompareFixtures.three().subList(0, 2));
        assertThat(Files.readString(out.resolve("compare.csv")).lines()).hasSize(3);
        Path mine = Files.createDirectories(tmp.resolve("mine"));
        Files.writeString(mine.resolve("notes.txt"), "keep");
        assertThatThrownBy(() -> CompareFiles.write(mine, CompareFixtures.three()))
                .isInstanceOf(InvalidInputException.class).hasMessageContaining("not written by kitwright");
        assertThat(Files.readString(mine.resolve("notes.txt"))).isEqualTo("keep");
        assertThat(mine.resolve("compare.json")).doesNotExist();
    }

    @Test
    void refusesAFileWhereTheFolderShouldBe() throws Exception {
        Path out = Files.writeString(tmp.resolve("taken"), "x");
        assertThatThrownBy(() -> CompareFiles.write(out, CompareFixtures.three())).hasMessageContaining("not a folder");
        assertThat(Files.readString(out)).isEqualTo("x");
    }
}
