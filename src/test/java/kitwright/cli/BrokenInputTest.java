package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The broken-input corpus: each folder under {@code src/test/resources/broken/} is a kit with something wrong, and
 * its {@code expected.txt} holds the exact problem lines kitwright must print (paths relative to the case folder).
 * Each case runs through the real command line: exit code 2, exactly those lines, and no output folder.
 */
class BrokenInputTest {
    static final Path CORPUS = Path.of("src", "test", "resources", "broken");

    static Stream<String> cases() throws IOException {
        try (Stream<Path> folders = Files.list(CORPUS)) {
            return folders.filter(Files::isDirectory).filter(p -> !SweepBrokenInputTest.isSweepCase(p))
                    .map(p -> p.getFileName().toString()).sorted().toList()
                    .stream();
        }
    }

    @Test
    void theCorpusHoldsAtLeastTwentyFiveCases() throws IOException {
        assertThat(cases().count()).isGreaterThanOrEqualTo(25);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void planPrintsTheExpectedProblemsAndWritesNothing(String name, @TempDir Path scratch) throws IOException {
        Path kit = CORPUS.resolve(name);
        List<String> expected = Files.readAllLines(kit.resolve("expected.txt"), StandardCharsets.UTF_8);
        Path out = scratch.resolve("plan");

        CliRun run = CliRun.of("plan", kit.toString(), "--out", out.toString());

        assertThat(run.exitCode()).as("exit code").isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(relative(run.problemLines(), kit)).as("problem lines").containsExactlyElementsOf(expected);
        assertThat(run.err()).contains(expected.size() + " problem(s) in the input; nothing was written.");
        assertThat(out).as("output folder").doesNotExist();
        try (Stream<Path> left = Files.list(scratch)) {
            assertThat(left).as("nothing beside the output folder").isEmpty();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void checkPrintsTheSameProblems(String name) throws IOException {
        Path kit = CORPUS.resolve(name);
        List<String> expected = Files.readAllLines(kit.resolve("expected.txt"), StandardCharsets.UTF_8);

        CliRun run = CliRun.of("check", kit.toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(relative(run.problemLines(), kit)).containsExactlyElementsOf(expected);
        assertThat(run.out()).isEmpty();
    }

    private static List<String> relative(List<String> lines, Path kit) {
        String prefix = kit + File.separator;
        return lines.stream().map(line -> line.startsWith(prefix) ? line.substring(prefix.length()) : line).toList();
    }
}
