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

    @Test
    void theMarkerNamesKitwrightAndListsTheFilesItWrote(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("plan");
        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("summary.json", "{}\n");
            out.write("drawings/crate-1.svg", "<svg/>\n");
            out.commit();
        }
        java.util.List<String> lines = Files.readAllLines(target.resolve(OutputFolder.MARKER));
        assertThat(lines.get(0)).startsWith("# kitwright output folder, written by kitwright ");
        assertThat(lines.stream().filter(l -> !l.startsWith("#"))).containsExactly("drawings/crate-1.svg",
                "summary.json");
    }

    @Test
    void aFileOrFolderNotInTheMarkerStopsTheRunAndIsKept(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("plan");
        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("drawings/crate-1.svg", "<svg/>\n");
            out.commit();
        }
        Files.writeString(target.resolve("drawings/mine.svg"), "keep");
        Files.createDirectories(target.resolve("photos"));

        assertThatThrownBy(() -> OutputFolder.create(target)).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("the folder holds files kitwright did not write: drawings/mine.svg, photos/");
        assertThat(target.resolve("drawings/mine.svg")).hasContent("keep");
        assertThat(entries(dir)).containsExactly("plan");
    }

    @Test
    void staleTemporaryAndOldFoldersBesideTheTargetAreRemovedByTheNextRun(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("plan");
        for (String stale : new String[] {".plan.partial-1x2y3z", ".plan.old-abc123"}) {
            Path folder = Files.createDirectories(dir.resolve(stale));
            Files.writeString(folder.resolve(OutputFolder.MARKER), "# kitwright output folder\nreport.html\n");
            Files.writeString(folder.resolve("report.html"), "half");
        }
        Path notOurs = Files.createDirectories(dir.resolve(".plan.partial-mine"));
        Files.writeString(notOurs.resolve("keep.txt"), "keep");
        Path otherTarget = Files.createDirectories(dir.resolve(".planb.old-abc123"));
        Files.writeString(otherTarget.resolve(OutputFolder.MARKER), "# kitwright output folder\n");

        try (OutputFolder out = OutputFolder.create(target)) {
            out.write("summary.json", "{}\n");
            out.commit();
        }

        assertThat(entries(dir)).containsExactly(".plan.partial-mine", ".planb.old-abc123", "plan");
        assertThat(notOurs.resolve("keep.txt")).hasContent("keep");
    }

    @Test
    void aDanglingSymbolicLinkIsNamedBeforeAnyWork(@TempDir Path dir) throws Exception {
        Path link = Files.createSymbolicLink(dir.resolve("plan"), dir.resolve("nowhere"));
        assertThatThrownBy(() -> OutputFolder.check(link)).isInstanceOf(InvalidInputException.class)
                .hasMessageContaining("this is a symbolic link to " + dir.resolve("nowhere") + ", which does not exist");
        assertThat(entries(dir)).containsExactly("plan");
    }

    private static java.util.List<String> entries(Path dir) throws IOException {
        try (Stream<Path> list = Files.list(dir)) {
            return list.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
