package kitwright.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code kitwright plan KIT_DIR --out DIR}: the main job. (Being built: issue 2 onwards.) */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = "Runs every planning stage on a kit and writes the report folder.")
public final class PlanCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "KIT_DIR", description = "The kit folder (holds kit.json and bars.csv).")
    Path kitDir;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Folder to write the plan into.")
    Path out;

    @Override
    public Integer call() {
        throw new UnsupportedOperationException("plan is not built yet");
    }
}
