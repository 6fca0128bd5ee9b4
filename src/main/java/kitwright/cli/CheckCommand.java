package kitwright.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code kitwright check KIT_DIR}: validate a kit folder and summarise it. (Being built: issue 2.) */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Reads and validates a kit folder and its catalogs, then prints a summary.")
public final class CheckCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "KIT_DIR", description = "The kit folder (holds kit.json and bars.csv).")
    Path kitDir;

    @Override
    public Integer call() {
        throw new UnsupportedOperationException("check is not built yet");
    }
}
