package kitwright.report;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Makes the README's picture of the sweep page, {@code src/docs/sweep-screenshot.png}: a sweep.html that
 * {@code kitwright sweep sample-kits/cinema-members --marks 5..24 --out DIR} wrote, rendered by headless Chromium at
 * 0.6 scale. Run:
 * {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.report.SweepScreenshot
 * DIR/sweep.html src/docs/sweep-screenshot.png}
 * (after {@code mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt}).
 */
public final class SweepScreenshot {
    private SweepScreenshot() {
    }

    public static void main(String[] args) throws Exception {
        Path page = Path.of(args[0]).toAbsolutePath();
        Path png = Path.of(args.length > 1 ? args[1] : "src/docs/sweep-screenshot.png");
        Path work = Files.createTempDirectory("kitwright-screenshot-");
        HeadlessChromium chromium = HeadlessChromium.find(work)
                .orElseThrow(() -> new IllegalStateException("chromium is not installed"));
        chromium.screenshot(page, png, 1200, 1500, 0.6);
        System.out.println(png.toAbsolutePath() + ": " + Files.size(png) + " bytes");
    }
}
