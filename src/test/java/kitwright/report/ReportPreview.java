package kitwright.report;

import java.nio.file.Path;
import java.time.LocalDate;
import kitwright.model.Kit;

/**
 * Writes the report of the invented test kit, for looking at it in a browser:
 * {@code java -cp target/classes:target/test-classes:$(cat cp.txt) kitwright.report.ReportPreview OUT_DIR}
 * (after {@code mvn -q -o dependency:build-classpath -Dmdep.outputFile=cp.txt} and {@code mvn -q -o test-compile}).
 */
public final class ReportPreview {
    private ReportPreview() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "target/report-preview");
        Kit kit = ReportFixtures.sampleKit();
        ReportModel model = ReportModel.of(kit, ReportFixtures.samplePlan(kit), LocalDate.of(2025, 3, 14));
        System.out.println(ReportWriter.writeInto(model, out).toAbsolutePath());
    }
}
