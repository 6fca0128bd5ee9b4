package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Mistyped command lines: unknown commands and options named as unknown, with "did you mean". */
class ArgumentHintsTest {

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "plna sample-kits/alu-kiosk                  | Unknown command: 'plna' (did you mean plan?)",
        "comapre a b                                 | Unknown command: 'comapre' (did you mean compare?)",
        "plan sample-kits/alu-kiosk --outt OUT       | Unknown option: '--outt' (did you mean --out?)",
        "plan sample-kits/alu-kiosk --outt=OUT       | Unknown option: '--outt' (did you mean --out?)",
        "cut sample-kits/alu-kiosk --kerff 2         | Unknown option: '--kerff' (did you mean --kerf?)",
        "cut sample-kits/alu-kiosk --time-limt 2     | Unknown option: '--time-limt' (did you mean --time-limit?)",
        "nest sample-kits/alu-kiosk --tolerence nominal | Unknown option: '--tolerence' (did you mean --tolerance?)",
        "xyzzy                                       | Unknown command: 'xyzzy'",
    })
    void typosAreNamedAndGetTheNearestName(String args, String message) {
        CliRun run = CliRun.of(args.trim().split(" +"));
        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err().lines().findFirst()).contains("kitwright: " + message.trim());
        assertThat(run.err()).contains("--help");
    }

    @Test
    void anUnknownOptionIsReportedBeforeAMissingRequiredOne() {
        CliRun run = CliRun.of("plan", "sample-kits/alu-kiosk", "--output", "OUT");
        assertThat(run.err()).startsWith("kitwright: Unknown option: '--output' (did you mean --out?)")
                .doesNotContain("Missing required");
    }

    @Test
    void aMissingRequiredOptionIsStillSaidWhenNothingIsMistyped() {
        assertThat(CliRun.of("plan", "sample-kits/alu-kiosk").err())
                .startsWith("kitwright: Missing required option: '--out=DIR'");
    }

    /**
     * Optimal string alignment distance, checked on the examples of the Wikipedia article "Damerau-Levenshtein
     * distance" (from memory): CA to ABC is 3 under optimal string alignment (2 under the unrestricted distance),
     * a swap of neighbours costs 1; and the classic Levenshtein example kitten to sitting, 3.
     */
    @Test
    void distanceFollowsThePublishedExamples() {
        assertThat(ArgumentHints.distance("ca", "abc")).isEqualTo(3);
        assertThat(ArgumentHints.distance("ab", "ba")).isEqualTo(1);
        assertThat(ArgumentHints.distance("kitten", "sitting")).isEqualTo(3);
        assertThat(ArgumentHints.distance("", "out")).isEqualTo(3);
    }

    @Test
    void farNamesGetNoSuggestion() {
        assertThat(ArgumentHints.near("--zzz", List.of("--out", "--date", "--force"))).isEmpty();
        assertThat(ArgumentHints.hint("--zzz", List.of("--out"))).isEmpty();
    }
}
