package kitwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.plan.JointClearance;
import kitwright.plan.KitSummary;
import kitwright.spares.SparesStage;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code kitwright check KIT_DIR}: validate a kit folder and its catalogs, then summarise the kit. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {
            "Reads and validates a kit folder and its catalogs, then prints a summary: marks, bars, total cut"
                    + " length and mass per section, joints, members per structure, the reuse ratio, the surplus"
                    + " bars, and the service-life spares that plan will make; a warning for each bar end that"
                    + " would sit inside the smallest joint of joints.csv.",
            "",
            "Service-life spares (kit.json \"spares\": lossRatePerCycle p, cycles c, serviceLevel L): a mark"
                    + " of n bars in service loses Binomial(n x c, p) bars over the kit's life, since a lost bar"
                    + " is replaced from the spares and can be lost again. Each of the m marks gets the fewest"
                    + " spares s with P(losses <= s) >= L^(1/m); surplus bars count towards them.",
            "",
            "Every problem is listed as FILE:LINE: COLUMN: what is wrong (what was expected); nothing is"
                    + " written. Exit code 0 when the kit is valid, 2 when it has problems."
        },
        footer = {
            "",
            "Example: kitwright check sample-kits/cinema-12"
        })
public final class CheckCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "KIT_DIR",
            description = "The kit folder: kit.json (optional), bars.csv, and optionally structures.csv and"
                    + " joints.csv.")
    Path kitDir;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InvalidInputException {
        Kit kit = KitReader.read(kitDir);
        PrintWriter out = spec.commandLine().getOut();
        out.print(SummaryText.format(KitSummary.of(kit)));
        out.println(SparesText.sizing(SparesStage.sizing(kit)));
        out.println();
        for (String warning : JointClearance.warnings(kit)) {
            out.println("Warning: " + warning);
        }
        out.println("Tube catalog: " + kit.catalog().file());
        out.println("The kit is valid.");
        out.flush();
        return ExitCode.OK.code();
    }
}
