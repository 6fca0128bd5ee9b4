package kitwright.testing;

import static org.assertj.core.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;

/**
 * A Debian tool a test runs (pdftotext, pdftoppm, zbarimg): the test is skipped with a message when it is missing,
 * unless the environment variable CI is "true", then it fails ({@code .ci/run} installs them).
 */
public final class ExternalTool {
    private ExternalTool() {
    }

    /** The tool at {@code path}, or the test skipped (failed in CI) naming the package to install. */
    public static Path require(String path, String debianPackage) {
        Path tool = Path.of(path);
        if (!Files.isExecutable(tool)) {
            String message = path + " is not installed (apt-get install " + debianPackage + "); the test needs it";
            if ("true".equals(System.getenv("CI"))) {
                fail(message + " and CI=true");
            }
            Assumptions.abort(message + "; skipped outside CI");
        }
        return tool;
    }
}
