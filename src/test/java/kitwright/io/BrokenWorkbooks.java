package kitwright.io;

import java.nio.file.Path;
import java.util.Map;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FormulaError;

/**
 * Writes the workbooks of the broken-input corpus ({@code src/test/resources/broken/}) with Apache POI; run it
 * after changing one: {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt)
 * kitwright.io.BrokenWorkbooks}.
 */
public final class BrokenWorkbooks {
    private static final Path CORPUS = Path.of("src", "test", "resources", "broken");
    private static final String BARS = "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,10\n";

    private BrokenWorkbooks() {
    }

    public static void main(String[] args) {
        KitWorkbooks.fromCsv(CORPUS.resolve("kit-xlsx-beside-bars-csv/kit.xlsx"), Map.of("bars", BARS));
        KitWorkbooks.fromCsv(CORPUS.resolve("kit-xlsx-bars-sheet-missing/kit.xlsx"), Map.of("bar", BARS));
        KitWorkbooks.write(CORPUS.resolve("kit-xlsx-bad-cells/kit.xlsx"), workbook -> {
            var sheet = workbook.createSheet("bars");
            KitWorkbooks.fill(sheet, "mark,section,length_mm,quantity\n"
                    + "A1,CHS 48.3x3.2,2400,10\n" // row 2: a date, below
                    + ",,,\n" // row 3: blank, skipped
                    + "B1,CHS 33.7x2.6,,8\n" // row 4: a formula without a saved result, below
                    + "C1,CHS 33.7x2.6,,8\n" // row 5: an error value, below
                    + "D1,CHS 33.7x2.6,1200.5,-8\n"); // row 6: a negative quantity
            CellStyle date = workbook.createCellStyle();
            date.setDataFormat(workbook.getCreationHelper().createDataFormat().getFormat("yyyy-mm-dd"));
            sheet.getRow(1).getCell(2).setCellStyle(date);
            sheet.getRow(3).createCell(2).setCellFormula("C2/2");
            sheet.getRow(4).createCell(2).setCellErrorValue(FormulaError.REF.getCode());
            KitWorkbooks.fill(workbook.createSheet("structures"), "structure,mark,count\nframe,Z9,2\n");
        });
        KitWorkbooks.fromCsv(CORPUS.resolve("catalog-xlsx-bad-rows/stock.xlsx"), Map.of("steel",
                "section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin\n"
                        + "CHS 48.3x3.2,steel,48.3,3.2,6000,31.00,,mill\n"
                        + "CHS 48.3x3.2,steel,48.3,3.2,0,31.00,,mill\n"
                        + "CHS 48.3x3.2,steel,48.3,3.2,6000,31.00,,mill\n"));
    }
}
