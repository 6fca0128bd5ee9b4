package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputFolderTest {

    @Test
    void theFolderAppearsOnlyWhenCommittedAndWhole(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("plan");
        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("summary.json", "{}\n");
            out.write("sheets/cut-list.csv", "a\n");
            assertThat(target).as("invisible while being written").doesNotExist();
            out.commit();
        }
        assertThat(target.resolve("summary.json")).hasContent("{}");
        assertThat(target.resolve("sheets/cut-list.csv")).exists();
        assertThat(target.resolve(OutputFolder.MARKER)).exists();
        assertThat(entries(dir)).containsExactly("plan");
    }

    @Test
    void aFailedRunLeavesNothingAndKeepsThePreviousResult(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("plan");
        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("summary.json", "old\n");
            out.commit();
        }
        assertThatThrownBy(() -> {
            try (OutputFolder out = OutputFolder.create(target)) {
                out.write("summary.json", "new\n");
                throw new IllegalStateException("a stage failed");
            }
        }).hasMessage("a stage failed");

        assertThat(target.resolve("summary.json")).hasContent("old");
        assertThat(entries(dir)).containsExactly("plan");
    }

    @Test
    void aPreviousResultIsReplacedWhole(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("plan");
        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("stale.csv", "old\n");
            out.commit();
        }
        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("summary.json", "new\n");
            out.commit();
        }
        assertThat(target.resolve("stale.csv")).doesNotExist();
        assertThat(target.resolve("summary.json")).hasContent("new");
        assertThat(entries(dir)).containsExactly("plan");
    }

    @Test
    void aFolderKitwrightDidNotWriteIsNeverReplaced(@TempDir Path dir) throws Exception {
        Path mine = Files.createDirectories(dir.resolve("documents"));
        Files.writeString(mine.resolve("letter.txt"), "keep me");

        assertThatThrownBy(() -> OutputFolder.create(mine)).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("the folder exists and was not written by kitwright");
        assertThat(mine.resolve("letter.txt")).hasContent("keep me");
        assertThat(entries(dir)).containsExactly("documents");
    }

    @Test
    void anEmptyFolderMayBeUsed(@TempDir Path dir) throws Exception {
        Path empty = Files.createDirectories(dir.resolve("out"));
        try (OutputFolder out = OutputFolder.create(empty)) {
            out.write("summary.json", "{}\n");
            out.commit();
        }
        assertThat(empty.resolve("summary.json")).exists();
    }

    @Test
    void namesOutsideTheFolderAreRefused(@TempDir Path dir) throws Exception {
        try (OutputFolder out = OutputFolder.create(dir.resolve("plan"))) {
            assertThatThrownBy(() -> out.write("../escape.txt", "x")).isInstanceOf(IllegalArgumentException.class);
        }
        assertThat(entries(dir)).isEmpty();
    }

    private static java.util.List<String> entries(Path dir) throws IOException {
        try (Stream<Path> list = Files.list(dir)) {
            return list.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
