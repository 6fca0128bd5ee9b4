package kitwright.report;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;

/**
 * Makes the README's picture of the report, {@code src/docs/report-screenshot.png}: the report.html that
 * {@code kitwright plan} writes for a sample kit (the whole chain, dated 2026-12-01), rendered by headless Chromium
 * at 0.6 scale with the purchase order hidden in the picture only, so the summary and the first saw sheets show
 * together. Run:
 * {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.report.ReadmeScreenshot
 * sample-kits/cinema-12 src/docs/report-screenshot.png}
 * (after {@code mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt}).
 */
public final class ReadmeScreenshot {
    static final LocalDate DATE = LocalDate.of(2026, 12, 1);

    private ReadmeScreenshot() {
    }

    public static void main(String[] args) throws Exception {
        Path kitDir = Path.of(args.length > 0 ? args[0] : "sample-kits/cinema-12");
        Path png = Path.of(args.length > 1 ? args[1] : "src/docs/report-screenshot.png");
        Kit kit = KitReader.read(kitDir);
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        kitwright.validate.PlanValidator.validate(result);
        String html = PlanFiles.of(result, DATE).get(PlanFiles.REPORT_HTML);
        String picture = html.replace("</head>", "<style>#" + PurchaseOrderSection.ID + " { display: none; }</style>\n"
                + "</head>");
        if (picture.equals(html)) {
            throw new IllegalStateException("report.html has no </head>");
        }
        Path work = Files.createTempDirectory("kitwright-screenshot-");
        Path page = Files.writeString(work.resolve(PlanFiles.REPORT_HTML), picture, StandardCharsets.UTF_8);
        HeadlessChromium chromium = HeadlessChromium.find(work)
                .orElseThrow(() -> new IllegalStateException("chromium is not installed"));
        Files.createDirectories(png.toAbsolutePath().getParent());
        chromium.screenshot(page, png, 1100, 1900, 0.6);
        System.out.println(png.toAbsolutePath() + ": " + Files.size(png) + " bytes");
    }
}
