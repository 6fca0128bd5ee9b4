package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Single result files and the checks made before any work on both kinds of output path. */
class OutputFileTest {

    @Test
    void writesAWholeFileCreatingItsFoldersAndReplacesAnOldOne(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("deep/er/plan.json");
        OutputFile.write(file, "old\n");
        OutputFile.write(file, "new\n");
        assertThat(file).hasContent("new");
        assertThat(entries(file.getParent())).containsExactly("plan.json");
    }

    @Test
    void aFolderIsNoFileAndIsLeftAlone(@TempDir Path dir) throws Exception {
        Path folder = Files.createDirectories(dir.resolve("plan.json"));
        assertThatThrownBy(() -> OutputFile.write(folder, "x")).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("this is a folder");
        assertThat(folder).isEmptyDirectory();
        assertThat(entries(dir)).containsExactly("plan.json");
    }

    @Test
    void aFileWhereAFolderShouldBeIsReportedForFilesAndFolders(@TempDir Path dir) throws Exception {
        Path blocker = Files.writeString(dir.resolve("notes.txt"), "mine");
        assertThatThrownBy(() -> OutputFile.check(blocker.resolve("plan.json")))
                .isInstanceOf(InvalidInputException.class).hasMessageContaining("notes.txt is a file");
        assertThatThrownBy(() -> OutputFolder.check(blocker.resolve("out/plan")))
                .isInstanceOf(InvalidInputException.class).hasMessageContaining("notes.txt is a file");
        assertThatThrownBy(() -> OutputFolder.create(blocker.resolve("plan")))
                .isInstanceOf(InvalidInputException.class).hasMessageContaining("notes.txt is a file");
        assertThat(blocker).hasContent("mine");
        assertThat(entries(dir)).containsExactly("notes.txt");
    }

    @Test
    void theRootOfTheFileSystemIsNeverAnOutputFolder() {
        Path root = Path.of("").toAbsolutePath().getRoot();
        assertThatThrownBy(() -> OutputFolder.check(root)).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("root of the file system");
    }

    @Test
    void aNewPathUnderAWritableFolderPassesTheCheck(@TempDir Path dir) throws Exception {
        OutputFile.check(dir.resolve("a/b/plan.json"));
        OutputFolder.check(dir.resolve("a/b/plan"));
        assertThat(entries(dir)).as("checking writes nothing").isEmpty();
    }

    private static List<String> entries(Path dir) throws IOException {
        try (Stream<Path> list = Files.list(dir)) {
            return list.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
