package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import kitwright.io.MembersReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The broken-input cases of {@code sweep}: the folders of {@code src/test/resources/broken/} that hold a
 * members.csv (the designer's input, which {@code plan} does not read). Each runs through the real command line:
 * exit code 2, exactly the lines of its expected.txt, and no output folder.
 */
class SweepBrokenInputTest {
    static boolean isSweepCase(Path folder) {
        return Files.exists(folder.resolve(MembersReader.FILE));
    }

    static Stream<String> cases() throws IOException {
        try (Stream<Path> folders = Files.list(BrokenInputTest.CORPUS)) {
            return folders.filter(Files::isDirectory).filter(SweepBrokenInputTest::isSweepCase)
                    .map(p -> p.getFileName().toString()).sorted().toList().stream();
        }
    }

    @Test
    void everyMembersCheckHasACase() throws IOException {
        assertThat(cases()).contains("members-section-unknown", "members-length-bad", "members-duplicate-member");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void sweepPrintsTheExpectedProblemsAndWritesNothing(String name, @TempDir Path scratch) throws IOException {
        Path kit = BrokenInputTest.CORPUS.resolve(name);
        List<String> expected = Files.readAllLines(kit.resolve("expected.txt"), StandardCharsets.UTF_8);
        Path out = scratch.resolve("sweep");

        CliRun run = CliRun.of("sweep", kit.toString(), "--marks", "2..3", "--out", out.toString());

        assertThat(run.exitCode()).as("exit code").isEqualTo(ExitCode.INVALID_INPUT.code());
        String prefix = kit + File.separator;
        assertThat(run.problemLines().stream().map(l -> l.startsWith(prefix) ? l.substring(prefix.length()) : l))
                .containsExactlyElementsOf(expected);
        assertThat(out).doesNotExist();
        try (Stream<Path> left = Files.list(scratch)) {
            assertThat(left).as("nothing beside the output folder").isEmpty();
        }
    }
}
