package kitwright.report;

import java.nio.file.Path;
import java.time.LocalDate;
import kitwright.cutting.CutPlan;
import kitwright.io.KitReader;
import kitwright.model.Kit;

/**
 * Writes a report for looking at it in a browser: of the invented test kit, or of a kit folder planned by the
 * tests' first-fit decreasing (not the optimizer):
 * {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.report.ReportPreview OUT_DIR [KIT_DIR]}
 * (after {@code mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt}).
 */
public final class ReportPreview {
    private ReportPreview() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "target/report-preview");
        Kit kit;
        CutPlan plan;
        if (args.length > 1) {
            kit = KitReader.read(Path.of(args[1]));
            Kit read = kit;
            plan = new CutPlan(kit.usedSections().stream()
                    .map(section -> ReportFixtures.firstFitDecreasing(read, section)).toList());
        } else {
            kit = ReportFixtures.sampleKit();
            plan = ReportFixtures.samplePlan(kit);
        }
        kitwright.validate.CutPlanValidator.validate(kit, plan);
        ReportModel model = ReportModel.of(kit, plan, LocalDate.of(2025, 3, 14));
        System.out.println(ReportWriter.writeInto(model, out).toAbsolutePath());
    }
}
