package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The help a user reads first: the root command's list and each command's --help. */
class HelpTextTest {

    @Test
    @DisplayName("the root command lists every command with a whole first sentence, not one cut off mid-line")
    void rootListsWholeSentences() {
        CliRun run = CliRun.of("--help");
        assertThat(run.exitCode()).isZero();
        List<String> commands = run.out().lines().dropWhile(l -> !l.equals("Commands:")).skip(1)
                .takeWhile(l -> !l.isBlank()).toList();
        // A command's entry starts with two spaces and its name; wrapped lines are indented further.
        StringBuilder entry = new StringBuilder();
        List<String> entries = new java.util.ArrayList<>();
        for (String line : commands) {
            if (line.matches("  \\S.*") && entry.length() > 0) {
                entries.add(entry.toString());
                entry.setLength(0);
            }
            entry.append(line.strip()).append(' ');
        }
        entries.add(entry.toString());
        assertThat(entries).hasSize(8);
        assertThat(entries).allSatisfy(e -> assertThat(e.strip()).endsWith("."));
    }

    @ParameterizedTest(name = "{0} --help")
    @ValueSource(strings = {"check", "plan", "cut", "nest", "pack", "compare", "sweep"})
    @DisplayName("each command's help ends with a runnable example on a sample kit")
    void eachCommandHasAnExample(String command) {
        CliRun run = CliRun.of(command, "--help");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).containsPattern("Examples?: kitwright " + command + " .*sample-kits/");
    }

    @Test
    @DisplayName("compare with one kit folder says it needs two, in words a user reads")
    void compareNeedsTwoKits() {
        CliRun run = CliRun.of("compare", "sample-kits/cinema-6", "--out", "never-written");
        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("compare needs two or more kit folders (got 1: sample-kits/cinema-6)")
                .doesNotContain("positional parameter");
        assertThat(java.nio.file.Path.of("never-written")).doesNotExist();
    }
}
