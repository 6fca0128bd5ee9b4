package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.LocalDate;
import kitwright.cutting.CutPlan;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.nesting.NestResult;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class NestingSectionTest {

    @Test
    @DisplayName("The nesting block renders in report.html: rule, cautions, one figure per distinct bundle layout")
    void rendersInTheReport() throws Exception {
        Kit kit = KitReader.read(Path.of("sample-kits", "cinema-12"));
        CutPlan cuts = kitwright.nesting.SampleKitNestingTest.oneBarPerStockPiece(kit);
        NestResult result = Nester.run(kit, cuts, NestingOptions.DEFAULT);
        NestPlanValidator.validate(kit, cuts, result.plan());
        String html = HtmlReport.render(ReportModel.builder(kit, LocalDate.of(2026, 12, 1)).cutting(cuts)
                .section(NestingSection.of(result)).build());
        assertThat(html).contains("Nested bundles").contains("Out-of-roundness and straightness are not counted")
                .contains("Worst case: largest outside diameter against smallest bore");
        int layouts = BundleDrawing.distinct(result.plan()).size();
        assertThat(html.split("<figure class=\"pattern bundle\"[^>]* data-bundle=\"", -1)).hasSize(layouts + 1);
        assertThat(html.split("<svg [^>]*class=\"bundle-drawing\" data-bundle=\"", -1)).hasSize(layouts + 1);
        assertThat(html).doesNotContain("<script");
    }
}
