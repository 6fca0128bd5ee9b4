package kitwright.report.cutting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import kitwright.io.TubeCatalogReader;
import kitwright.model.Origin;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** rack-after.csv, byte-order mark and CRLF included, reads back as the tube catalog of the next job. */
class RackAfterReadBackTest {

    @Test
    void theWrittenRackReadsBackAsATubeCatalog(@TempDir Path dir) throws Exception {
        CutPlanValidator.validate(CuttingFilesTest.kit(), CuttingFilesTest.plan());
        String text = RackAfterCsv.format(CuttingFilesTest.kit(), CuttingFilesTest.plan());
        assertThat(text).startsWith("\uFEFF").contains("\r\n");
        Path file = Files.writeString(dir.resolve("rack-after.csv"), text);

        TubeCatalog rack = TubeCatalogReader.read(file);

        // the 3 rack offcuts of 3200 less the one the plan takes, and the new 986 mm remnant (CuttingFilesTest)
        assertThat(rack.stock()).containsExactly(
                new StockLength(CuttingFilesTest.SECTION, 3200, 2.0, 2, Origin.RACK),
                new StockLength(CuttingFilesTest.SECTION, 986, null, 1, Origin.RACK));
        assertThat(rack.sections().get(CuttingFilesTest.SECTION).outerDiameterMm()).isEqualTo(48.3);
        assertThat(List.copyOf(rack.sections().keySet())).containsExactly(CuttingFilesTest.SECTION);
    }
}
