package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import kitwright.model.Kit;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A kit as one workbook: kit.xlsx, written here with Apache POI and read by the main code with FastExcel, reads as
 * its CSV twin does, with every problem placed as {@code kit.xlsx:SHEET:ROW: column: message}; and catalogs may be
 * workbooks too.
 */
class KitWorkbookTest {
    private static final String HEADER = "mark,section,length_mm,quantity,note";

    @TempDir
    Path dir;

    /** A kit folder with the small steel catalog and kit.xlsx whose bars sheet the test fills. */
    private Path kit(java.util.function.Consumer<XSSFSheet> bars) {
        KitFiles.write(dir, "stock.csv", KitFiles.STOCK);
        KitFiles.write(dir, "materials.csv", KitFiles.MATERIALS);
        KitWorkbooks.write(dir.resolve("kit.xlsx"), workbook -> bars.accept(workbook.createSheet("bars")));
        return dir;
    }

    private static List<String> problems(Path kit) {
        try {
            KitReader.read(kit);
            throw new AssertionError("the kit read without problems");
        } catch (InvalidInputException e) {
            String prefix = kit + java.io.File.separator;
            return e.problems().stream().map(Problem::toString)
                    .map(p -> p.startsWith(prefix) ? p.substring(prefix.length()) : p).toList();
        }
    }

    @Test
    void aKitWorkbookReadsAsItsCsvTwin() throws Exception {
        String bars = HEADER + "\nA1,CHS 48.3x3.2,2400.5,,top chord\nB1,CHS 33.7x2.6,1200,8,\n";
        String structures = "structure,mark,count\nframe,A1,4\nframe,B1,8\n";
        String joints = "mark,diameter_mm,mass_kg,quantity\nN1,120,1.8,6\n";
        Path csv = KitFiles.kit(dir.resolve("csv"), bars);
        KitFiles.write(csv, "structures.csv", structures);
        KitFiles.write(csv, "joints.csv", joints);
        Path xlsx = dir.resolve("xlsx");
        KitFiles.write(xlsx, "stock.csv", KitFiles.STOCK);
        KitFiles.write(xlsx, "materials.csv", KitFiles.MATERIALS);
        KitWorkbooks.kitFromCsvFolder(csv, xlsx);

        Kit twin = KitReader.read(csv);
        Kit kit = KitReader.read(xlsx);

        assertThat(kit.bars()).isEqualTo(twin.bars());
        assertThat(kit.structures()).isEqualTo(twin.structures());
        assertThat(kit.joints()).isEqualTo(twin.joints());
        assertThat(kit.bars().get(0).quantity()).as("a blank quantity taken from the structures sheet").isEqualTo(4);
        assertThat(kit.files().workbook()).isEqualTo(xlsx.resolve("kit.xlsx"));
        assertThat(kit.files().sheets()).containsExactly("bars", "structures", "joints");
        assertThat(twin.files().workbook()).isNull();
    }

    @Test
    void aNumberReadsAsItsExactDecimalWhetherTypedAsNumberOrAsText() throws Exception {
        Path kit = kit(sheet -> {
            KitWorkbooks.fill(sheet, HEADER);
            Row number = sheet.createRow(1);
            number.createCell(0).setCellValue("A1");
            number.createCell(1).setCellValue("CHS 48.3x3.2");
            number.createCell(2).setCellValue(599.1);
            number.createCell(3).setCellValue(2);
            Row text = sheet.createRow(2);
            text.createCell(0).setCellValue("B1");
            text.createCell(1).setCellValue("CHS 48.3x3.2");
            text.createCell(2).setCellValue("599.1");
            text.createCell(3).setCellValue("2");
            Row computed = sheet.createRow(3);
            computed.createCell(0).setCellValue(101); // a mark typed as a number
            computed.createCell(1).setCellValue("CHS 48.3x3.2");
            // the double next to 599.1, as a sum saves it: POI writes 599.1000000000001
            computed.createCell(2).setCellValue(Math.nextUp(599.1));
            computed.createCell(3).setCellFormula("1+1");
            computed.createCell(4).setCellValue(true);
            sheet.getWorkbook().getCreationHelper().createFormulaEvaluator().evaluateAll();
        });

        Kit read = KitReader.read(kit);

        assertThat(read.bars()).extracting(b -> b.mark()).containsExactly("A1", "B1", "101");
        assertThat(read.bars()).allSatisfy(b -> assertThat(b.lengthMm()).isEqualTo(599.1));
        assertThat(read.bars()).allSatisfy(b -> assertThat(b.quantity()).isEqualTo(2));
        assertThat(read.bars().get(2).note()).as("a true/false cell").isEqualTo("true");
        assertThat(WorkbookSheet.plain(new java.math.BigDecimal("599.10000000000002"))).isEqualTo("599.1");
        assertThat(WorkbookSheet.plain(new java.math.BigDecimal("1.0E20"))).isEqualTo("100000000000000000000");
    }

    @Test
    void everyProblemNamesTheSheetAndTheSpreadsheetRow() {
        Path kit = kit(sheet -> {
            KitWorkbooks.fill(sheet, HEADER + "\n"
                    + "A1,CHS 48.3x3.2,-1,2,\n" // row 2
                    + ",,,,\n" // row 3: blank, skipped
                    + ",CHS 48.3x3.2,2400,2,\n" // row 4: mark blank
                    + "C1,CHS 48.3x3.2,2400,2,\n" // row 5: date, below
                    + "D1,CHS 48.3x3.2,,2,\n" // row 6: formula without a result, below
                    + "E1,CHS 48.3x3.2,,2,\n" // row 7: error, below
                    + "F1,CHS 48.3x3.2,599.1,2\n" // row 8: a value beside the table, below
                    + "A1,CHS 48.3x3.2,1000,2,\n"); // row 9: duplicate of row 2
            CellStyle date = sheet.getWorkbook().createCellStyle();
            date.setDataFormat((short) 14);
            sheet.getRow(4).getCell(2).setCellStyle(date);
            sheet.getRow(5).createCell(2).setCellFormula("A1*2");
            sheet.getRow(6).createCell(2).setCellErrorValue(FormulaError.DIV0.getCode());
            sheet.getRow(7).createCell(6).setCellValue("stray");
        });

        assertThat(problems(kit)).containsExactly(
                "kit.xlsx:bars:2: length_mm: -1 is negative (expected a cut length in millimetres above 0)",
                "kit.xlsx:bars:4: mark: the value is blank (expected the mark, the name of the bar type)",
                "kit.xlsx:bars:5: length_mm: the cell holds 2400 formatted as a date or time ('mm-dd-yy') (expected a"
                        + " number or text; format the cell as Number or Text and check its value)",
                "kit.xlsx:bars:6: length_mm: the formula =A1*2 has no saved result (expected a value; open the"
                        + " workbook in a spreadsheet program and save it, or type the value)",
                "kit.xlsx:bars:7: length_mm: the cell shows the error #DIV/0! (expected a value)",
                "kit.xlsx:bars:8: the value 'stray' stands in a column without a name (expected a header name for"
                        + " every column that holds values)",
                "kit.xlsx:bars:9: mark: mark A1 is already on row 2 (expected each mark on one row only)");
    }

    @Test
    void theBarsSheetIsRequiredAndASheetNameOneSlipAwayIsReported() {
        KitFiles.write(dir, "stock.csv", KitFiles.STOCK);
        KitWorkbooks.fromCsv(dir.resolve("kit.xlsx"), Map.of("Bars", HEADER + "\nA1,CHS 48.3x3.2,2400,2,\n",
                "structure", "structure,mark,count\nframe,A1,2\n"));
        assertThat(problems(dir)).containsExactly("kit.xlsx:structure: a sheet kitwright does not read (did you"
                + " mean structures? expected the sheets bars, structures and joints; other sheets are left alone)");

        KitWorkbooks.fromCsv(dir.resolve("kit.xlsx"), Map.of("notes", "anything"));
        assertThat(problems(dir)).containsExactly("kit.xlsx: the workbook has no sheet bars (expected a sheet named"
                + " bars with the columns mark section length_mm quantity, and the sheets structures and joints"
                + " when the kit has them; sheets found: notes)");
    }

    @Test
    void sheetNamesInAnyLetterCaseAreRead() throws Exception {
        KitFiles.write(dir, "stock.csv", KitFiles.STOCK);
        KitWorkbooks.write(dir.resolve("kit.xlsx"), workbook -> {
            KitWorkbooks.fill(workbook.createSheet("Bars"), HEADER + "\nA1,CHS 48.3x3.2,2400,,\n");
            KitWorkbooks.fill(workbook.createSheet("STRUCTURES"), "structure,mark,count\nframe,A1,3\n");
            workbook.createSheet("notes");
        });

        Kit kit = KitReader.read(dir);

        assertThat(kit.bars().get(0).quantity()).isEqualTo(3);
        assertThat(kit.files().sheets()).containsExactly("Bars", "STRUCTURES");
    }

    @Test
    void kitXlsxBesideBarsCsvIsRefusedNamingBoth() {
        KitFiles.kit(dir, HEADER + "\nA1,CHS 48.3x3.2,2400,2,\n");
        KitFiles.write(dir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN1,120,1.8,6\n");
        KitWorkbooks.fromCsv(dir.resolve("kit.xlsx"), Map.of("bars", HEADER + "\nA1,CHS 48.3x3.2,2400,2,\n"));

        assertThat(problems(dir)).containsExactly("kit.xlsx: the kit folder holds both kit.xlsx and bars.csv and"
                + " joints.csv, so which of them holds the kit is unclear (expected either kit.xlsx with the sheets"
                + " bars, structures and joints, or bars.csv, structures.csv and joints.csv; move or delete the one"
                + " not meant)");
    }

    @Test
    void aFileNamedXlsxThatIsNotAWorkbookIsAClearProblem() throws Exception {
        KitFiles.write(dir, "stock.csv", KitFiles.STOCK);
        KitFiles.write(dir, "kit.xlsx", HEADER + "\nA1,CHS 48.3x3.2,2400,2,\n");

        assertThat(problems(dir)).singleElement().asString().startsWith("kit.xlsx: the file is not an .xlsx"
                + " workbook");
    }

    @Test
    void aCatalogMayBeAWorkbookReadFromItsFirstSheet() throws Exception {
        Path csv = KitFiles.kit(dir.resolve("csv"), HEADER + "\nA1,CHS 48.3x3.2,2400,2,\n");
        Path xlsx = dir.resolve("xlsx");
        KitFiles.write(xlsx, "bars.csv", HEADER + "\nA1,CHS 48.3x3.2,2400,2,\n");
        KitFiles.write(xlsx, "kit.json", "{\"stockCatalog\": \"tubes.xlsx\", \"materials\": \"materials.xlsx\"}");
        KitWorkbooks.fromCsv(xlsx.resolve("tubes.xlsx"), new java.util.LinkedHashMap<>(Map.of("steel",
                KitFiles.STOCK)));
        KitWorkbooks.fromCsv(xlsx.resolve("materials.xlsx"), Map.of("Sheet1", KitFiles.MATERIALS));

        Kit twin = KitReader.read(csv);
        Kit kit = KitReader.read(xlsx);

        assertThat(kit.catalog().stock()).isEqualTo(twin.catalog().stock());
        assertThat(kit.catalog().sections()).isEqualTo(twin.catalog().sections());
        assertThat(kit.materials()).isEqualTo(twin.materials());
        assertThat(kit.catalog().file()).isEqualTo(xlsx.resolve("tubes.xlsx"));

        KitWorkbooks.write(xlsx.resolve("tubes.xlsx"), workbook -> {
            KitWorkbooks.fill(workbook.createSheet("steel"), KitFiles.STOCK.replace("3.2,3200", "3.2,-3200"));
            KitWorkbooks.fill(workbook.createSheet("old prices"), "anything");
        });
        assertThatThrownBy(() -> KitReader.read(xlsx)).isInstanceOf(InvalidInputException.class)
                .satisfies(e -> assertThat(((InvalidInputException) e).problems()).extracting(Problem::toString)
                        .containsExactly(xlsx.resolve("tubes.xlsx") + ":steel:4: length_mm: -3200 is negative"
                                + " (expected a stock length in millimetres above 0)"));
    }

    @Test
    void theSheetsCountAsInputsThatNoOutputMayReplace() {
        assertThat(RunInputs.ofKit(dir).paths()).contains(RunInputs.real(dir.resolve("kit.xlsx")));
        assertThat(Files.exists(dir.resolve("kit.xlsx"))).isFalse();
    }
}
