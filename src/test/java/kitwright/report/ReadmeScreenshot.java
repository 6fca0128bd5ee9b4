package kitwright.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import kitwright.cutting.CutPlan;
import kitwright.io.KitReader;
import kitwright.model.Kit;

/**
 * Makes the README's picture of the report, {@code src/docs/report-screenshot.png}: the page head and the first
 * saw sheets of a sample kit, rendered by headless Chromium at 0.7 scale. The plan is the tests' first-fit
 * decreasing (statuses and gaps are that plan's own, honestly bounded). Run:
 * {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.report.ReadmeScreenshot
 * sample-kits/cinema-12 src/docs/report-screenshot.png}
 * (after {@code mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt}).
 */
public final class ReadmeScreenshot {
    private ReadmeScreenshot() {
    }

    public static void main(String[] args) throws Exception {
        Path kitDir = Path.of(args.length > 0 ? args[0] : "sample-kits/cinema-12");
        Path png = Path.of(args.length > 1 ? args[1] : "src/docs/report-screenshot.png");
        Kit kit = KitReader.read(kitDir);
        CutPlan plan = new CutPlan(kit.usedSections().stream()
                .map(section -> ReportFixtures.firstFitDecreasing(kit, section)).toList());
        ReportModel full = ReportModel.of(kit, plan, LocalDate.of(2025, 3, 14));
        ReportModel sawSheets = new ReportModel(full.kitName(), full.description(), full.date(),
                full.sections().stream().filter(s -> s.id().equals(SawSheetSection.ID)).toList());
        Path work = Files.createTempDirectory("kitwright-screenshot-");
        Path page = ReportWriter.writeInto(sawSheets, work);
        HeadlessChromium chromium = HeadlessChromium.find(work)
                .orElseThrow(() -> new IllegalStateException("chromium is not installed"));
        Files.createDirectories(png.toAbsolutePath().getParent());
        chromium.screenshot(page, png, 1100, 1500, 0.7);
        System.out.println(png.toAbsolutePath() + ": " + Files.size(png) + " bytes");
    }
}
