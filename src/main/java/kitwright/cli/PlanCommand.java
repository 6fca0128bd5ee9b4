package kitwright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.concurrent.Callable;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.io.OutputFolder;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.plan.KitSummary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code kitwright plan KIT_DIR --out DIR}: validates the kit and writes the report folder. The folder is built
 * beside DIR and moved into place when complete, so a failed run leaves DIR as it was.
 */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = {
            "Validates a kit and writes the plan folder: summary.json (marks, bars, cut length and mass per"
                    + " section, joints, members per structure, reuse ratio, spares).",
            "",
            "The folder is written beside DIR and moved into place only when complete. An existing DIR is"
                    + " replaced only when kitwright wrote it. On invalid input (exit code 2) nothing is written."
        })
public final class PlanCommand implements Callable<Integer> {
    /** The file holding the kit summary in the plan folder. */
    public static final String SUMMARY_JSON = "summary.json";

    @Parameters(index = "0", paramLabel = "KIT_DIR",
            description = "The kit folder: kit.json (optional), bars.csv, and optionally structures.csv and"
                    + " joints.csv.")
    Path kitDir;

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "Folder to write the plan into; created, or replaced when kitwright wrote it before.")
    Path out;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", converter = IsoDateConverter.class,
            description = "Date printed on the report (default: today). Fix it to get byte-identical output.")
    LocalDate date;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InvalidInputException, IOException {
        Kit kit = KitReader.read(kitDir);
        KitSummary summary = KitSummary.of(kit);
        try (OutputFolder folder = OutputFolder.create(out)) {
            folder.write(SUMMARY_JSON, PrettyJson.write(summary));
            folder.commit();
        }
        PrintWriter stdout = spec.commandLine().getOut();
        stdout.println("Kit " + summary.kit() + ": " + summary.marks() + " marks, " + summary.bars() + " bars.");
        stdout.println("Wrote " + out.resolve(SUMMARY_JSON));
        stdout.flush();
        return ExitCode.OK.code();
    }
}
