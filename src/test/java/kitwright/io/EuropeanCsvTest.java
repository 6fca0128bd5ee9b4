package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Input files as spreadsheet programs in decimal-comma locales save CSV (';' between columns, ',' as decimal sign,
 * header names as a person typed them, a byte-order mark, CRLF) read exactly as their comma twins do.
 */
class EuropeanCsvTest {
    private static final String BARS = """
            mark,section,length_mm,quantity,tolerance_mm,note
            A1,CHS 48.3x3.2,2400.5,7,0.5,"top chord; long"
            B1,CHS 33.7x2.6,1200.25,12,,
            """;

    @Test
    void semicolonsDecimalCommasAndAnyLetterCaseReadAsTheCommaTwin(@TempDir Path dir) throws Exception {
        Path comma = dir.resolve("comma");
        Path semicolon = dir.resolve("semicolon");
        KitFiles.write(comma, "bars.csv", BARS);
        KitFiles.write(semicolon, "bars.csv", european(BARS));
        Path stock = KitFiles.write(comma, "stock.csv", KitFiles.STOCK);
        Path europeanStock = KitFiles.write(semicolon, "stock.csv", european(KitFiles.STOCK));
        Path materials = KitFiles.write(comma, "materials.csv", KitFiles.MATERIALS);
        Path europeanMaterials = KitFiles.write(semicolon, "materials.csv", european(KitFiles.MATERIALS));
        assertThat(european(BARS)).startsWith("\uFEFFMark;Section;Length_Mm;").contains("2400,5", "\"top chord; long\"");

        Kit twin = KitReader.fromFiles(comma.resolve("bars.csv"), stock, materials, KitSettings.defaults("k"));
        Kit kit = KitReader.fromFiles(semicolon.resolve("bars.csv"), europeanStock, europeanMaterials,
                KitSettings.defaults("k"));

        assertThat(kit.bars()).isEqualTo(twin.bars());
        assertThat(kit.bars().get(0).lengthMm()).isEqualTo(2400.5);
        assertThat(kit.bars().get(0).note()).isEqualTo("top chord; long");
        assertThat(kit.catalog().stock()).isEqualTo(twin.catalog().stock());
        assertThat(kit.catalog().sections()).isEqualTo(twin.catalog().sections());
        assertThat(kit.materials()).isEqualTo(twin.materials());
    }

    @Test
    void aSemicolonFileWithDecimalPointsReadsToo(@TempDir Path dir) throws Exception {
        Path bars = KitFiles.write(dir, "bars.csv", "mark;section;length_mm;quantity\nA1;CHS 48.3x3.2;2400.5;7\n");
        Path stock = KitFiles.write(dir, "stock.csv", KitFiles.STOCK);

        Kit kit = KitReader.fromFiles(bars, stock, null, KitSettings.defaults("k"));

        assertThat(kit.bars().get(0).lengthMm()).isEqualTo(2400.5);
    }

    /** The file as a spreadsheet in a decimal-comma locale saves it: header in title case, ';', ',', CRLF, BOM. */
    static String european(String csv) throws Exception {
        List<CSVRecord> records = CSVFormat.RFC4180.parse(new StringReader(csv)).getRecords();
        List<String> lines = new ArrayList<>();
        for (int r = 0; r < records.size(); r++) {
            boolean header = r == 0;
            lines.add(records.get(r).stream().map(cell -> header ? titleCase(cell)
                    : cell.matches("-?\\d+\\.\\d+") ? cell.replace('.', ',')
                    : cell.contains(";") ? "\"" + cell + "\"" : cell).collect(Collectors.joining(";")));
        }
        return "\uFEFF" + String.join("\r\n", lines) + "\r\n";
    }

    private static String titleCase(String name) {
        StringBuilder out = new StringBuilder();
        for (String part : name.split("_", -1)) {
            out.append(out.length() == 0 ? "" : "_").append(part.isEmpty() ? ""
                    : part.substring(0, 1).toUpperCase(Locale.ROOT) + part.substring(1));
        }
        return out.toString();
    }
}
