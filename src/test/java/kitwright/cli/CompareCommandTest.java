package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import kitwright.compare.OptionPlanner;
import kitwright.compare.OptionSummary;
import kitwright.io.InvalidInputException;
import kitwright.io.Problem;
import kitwright.model.Status;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class CompareCommandTest {
    @TempDir
    Path tmp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    /** A fake planner: folder "bad*" is invalid, "none*" has no feasible plan, others are OPTIMAL. */
    private static final OptionPlanner FAKE = dir -> {
        String name = dir.getFileName().toString();
        if (name.startsWith("bad")) {
            throw new InvalidInputException(new Problem(dir.resolve("kit.json"), 2, "kerfMm",
                    "is not a number (expected millimetres, e.g. 2.0)"));
        }
        Status status = name.startsWith("none") ? Status.INFEASIBLE : Status.OPTIMAL;
        return new OptionSummary(name, 6, 300, 750, 2.5, 80, 480000.0, 5000.0, 4.0, 1.5, 2.5, 1500.0, 1700.0,
                1750.0, 2635.0, 30, 4, 2, 1800.0, status);
    };

    private int run(String... args) {
        CommandLine cl = KitwrightCommand.commandLine();
        ((CompareCommand) cl.getSubcommands().get("compare").getCommand()).usePlanner(FAKE);
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return cl.execute(args);
    }

    @Test
    @org.junit.jupiter.api.DisplayName("with the real planner, compare.json is the comparison of plans that pass the"
            + " shared validator")
    void realPlansAreValid() throws Exception {
        Path six = kitwright.io.KitFiles.kit(tmp.resolve("kits").resolve("two-marks"),
                "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1900,6\nE,CHS 33.7x2.6,1500,5\n");
        Path one = kitwright.io.KitFiles.kit(tmp.resolve("kits").resolve("one-mark"),
                "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1750,11\n");
        CommandLine cl = KitwrightCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        Path written = tmp.resolve("written");
        assertThat(cl.execute("compare", six.toString(), one.toString(), "--out", written.toString()))
                .as(err.toString()).isEqualTo(ExitCode.OK.code());
        java.util.List<OptionSummary> valid = java.util.List.of(
                kitwright.compare.OptionSummaries.of(WrittenPlans.validated(six)),
                kitwright.compare.OptionSummaries.of(WrittenPlans.validated(one)));
        Path again = tmp.resolve("again");
        kitwright.compare.CompareFiles.write(again, valid);
        assertThat(Files.readString(written.resolve(kitwright.compare.CompareFiles.JSON)))
                .isEqualTo(Files.readString(again.resolve(kitwright.compare.CompareFiles.JSON)));
    }

    @Test
    void writesTheThreeFilesAndExitsZero() throws Exception {
        Path dir = tmp.resolve("out");
        int code = run("compare", "kits/cinema-6", "kits/cinema-12", "--out", dir.toString(), "--threads", "2");
        assertThat(code).as(err.toString()).isEqualTo(ExitCode.OK.code());
        assertThat(Files.readString(dir.resolve("compare.json"))).contains("\"kit\" : \"cinema-6\"",
                "\"kit\" : \"cinema-12\"");
        assertThat(dir.resolve("compare.csv")).isRegularFile();
        assertThat(dir.resolve("compare.html")).isRegularFile();
        assertThat(err.toString()).contains("compare: planning option 1/2").contains("(2 of 2 done)");
        assertThat(out.toString()).contains("wrote compare.html");
    }

    @Test
    void invalidInputInAnyOptionWritesNothingAndExitsTwo() {
        Path dir = tmp.resolve("out");
        int code = run("compare", "kits/cinema-6", "kits/bad-one", "--out", dir.toString());
        assertThat(code).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(err.toString()).contains("kits/bad-one/kit.json:2: kerfMm: is not a number");
        assertThat(dir).doesNotExist();
        assertThat(tmp.toFile().list()).isEmpty();
    }

    @Test
    void anOptionWithoutAFeasiblePlanIsWrittenAndExitsThree() throws Exception {
        Path dir = tmp.resolve("out");
        int code = run("compare", "kits/cinema-6", "kits/none-fits", "--out", dir.toString());
        assertThat(code).isEqualTo(ExitCode.NO_FEASIBLE_PLAN.code());
        assertThat(Files.readString(dir.resolve("compare.csv"))).contains("none-fits").contains("INFEASIBLE");
        assertThat(err.toString()).contains("no feasible plan for none-fits");
    }

    @Test
    void needsTwoFoldersAnOutputAndAtLeastOneThread() {
        assertThat(run("compare", "kits/cinema-6", "--out", tmp.resolve("o").toString()))
                .isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run("compare", "kits/a", "kits/b")).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run("compare", "kits/a", "kits/b", "--out", tmp.resolve("o").toString(), "--threads", "0"))
                .isEqualTo(ExitCode.INVALID_INPUT.code());
    }

    @Test
    void helpNamesTheFilesAndTheExitCodes() {
        assertThat(run("compare", "--help")).isZero();
        // Whitespace folded: the wrapping follows the root command's help width.
        assertThat(out.toString().replaceAll("\\s+", " ")).contains("KIT_DIR", "--out", "--threads", "compare.html",
                "compare.csv", "compare.json", "3 some option has no feasible plan");
    }

    @Test
    void comparesTwoKitsThroughTheWholeChain() throws Exception {
        Path a = kitwright.compare.TinyKits.write(tmp, "long-c", false, null);
        Path b = kitwright.compare.TinyKits.write(tmp, "short-c", true, null);
        Path dir = tmp.resolve("out");
        CommandLine cl = KitwrightCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute("compare", a.toString(), b.toString(), "--out", dir.toString(), "--threads", "2");
        assertThat(code).as(err.toString()).isEqualTo(ExitCode.OK.code());
        var options = kitwright.compare.CompareJson.read(Files.readString(dir.resolve("compare.json"))).options();
        assertThat(options).extracting(OptionSummary::kit).containsExactly("long-c", "short-c");
        assertThat(options).allSatisfy(o -> {
            assertThat(o.vehicles()).isPositive();
            assertThat(o.cost()).isPositive();
            assertThat(o.co2eKg()).isPositive();
        });
        assertThat(options).extracting(OptionSummary::members).containsOnly(43);
        assertThat(err.toString()).contains("compare: long-c: cutting: 3 sections", "(2 of 2 done)");
    }
}
