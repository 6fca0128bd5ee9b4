package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TimeZone;
import kitwright.io.KitReader;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.validate.CsvOutput;
import kitwright.validate.PlanValidator;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;

/**
 * plan.xlsx read back with Apache POI, a different library from FastExcel that writes it: one sheet per CSV of
 * the plan folder, named as the file, each holding exactly the CSV's rows, numbers as numbers, header frozen.
 */
class PlanWorkbookTest {
    private static final LocalDate DATE = LocalDate.of(2026, 12, 3);
    /** Columns that hold only figures in every plan (their cells must be numeric cells). */
    private static final Set<String> FIGURES = Set.of("stock_piece", "stock_length_mm", "sequence", "length_mm",
            "start_mm", "pieces", "gross_kg", "max_gross_kg", "mass_kg", "payload_kg", "wall_mm");
    /** Columns that hold names (their cells must be text cells). */
    private static final Set<String> NAMES = Set.of("section", "kind", "origin", "crate", "vehicle");

    @Test
    void everySheetHoldsExactlyItsCsvWithNumbersAsNumbersAndTheHeaderFrozen() throws Exception {
        PlanResult result = Planner.run(KitReader.read(Path.of("sample-kits/cinema-6")), Planner.Options.DEFAULT,
                PlanProgress.NONE);
        Map<String, String> files = PlanFiles.of(result, DATE);
        PlanValidator.validate(result, files);
        byte[] xlsx = PlanFiles.written(result, DATE).get(PlanWorkbook.FILE);

        List<String> csvs = files.keySet().stream().filter(n -> n.endsWith(".csv")).toList();
        int numbers = 0;
        try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(xlsx))) {
            List<String> sheets = new ArrayList<>();
            workbook.forEach(s -> sheets.add(s.getSheetName()));
            assertThat(sheets).containsExactlyElementsOf(csvs.stream().map(n -> n.replace(".csv", "")).toList());
            assertThat(sheets).startsWith("order", "rack-pull", "cut-list").contains("packing-lists", "manifests", "load-lists");
            for (String csv : csvs) {
                numbers += compare(workbook.getSheet(csv.replace(".csv", "")), files.get(csv));
            }
        }
        assertThat(numbers).as("numeric cells across the workbook").isGreaterThan(100);
    }

    /** Compares a sheet with its CSV cell by cell; returns the number of numeric cells. */
    private static int compare(Sheet sheet, String csv) {
        List<String> header = List.of(CsvOutput.lines(csv).get(0).split(",", -1));
        List<CSVRecord> records = CsvOutput.records(csv);
        String name = sheet.getSheetName();
        assertThat(sheet.getLastRowNum()).as(name + ": header and one row per record, no totals row")
                .isEqualTo(records.size());
        PaneInformation pane = sheet.getPaneInformation();
        assertThat(pane).as(name + " frozen").isNotNull();
        assertThat(pane.isFreezePane()).as(name + " frozen").isTrue();
        assertThat(pane.getHorizontalSplitPosition()).as(name + ": the header row frozen").isEqualTo((short) 1);
        Row top = sheet.getRow(0);
        for (int c = 0; c < header.size(); c++) {
            assertThat(top.getCell(c).getStringCellValue()).as(name + " header").isEqualTo(header.get(c));
        }
        int numbers = 0;
        for (int r = 0; r < records.size(); r++) {
            Row row = sheet.getRow(r + 1);
            for (int c = 0; c < header.size(); c++) {
                String expected = records.get(r).get(c);
                Cell cell = row == null ? null : row.getCell(c);
                String at = name + "!" + header.get(c) + (r + 2);
                if (expected.isEmpty()) {
                    assertThat(cell == null || cell.getCellType() == CellType.BLANK).as(at + " empty").isTrue();
                    continue;
                }
                assertThat(cell).as(at).isNotNull();
                if (cell.getCellType() == CellType.NUMERIC) {
                    numbers++;
                    assertThat(BigDecimal.valueOf(cell.getNumericCellValue())).as(at)
                            .isEqualByComparingTo(new BigDecimal(expected));
                    assertThat(NAMES).as(at + " is a name, kept as text").doesNotContain(header.get(c));
                } else {
                    assertThat(cell.getCellType()).as(at).isEqualTo(CellType.STRING);
                    assertThat(cell.getStringCellValue()).as(at).isEqualTo(expected);
                    assertThat(FIGURES).as(at + " is a figure, written as a number").doesNotContain(header.get(c));
                }
            }
        }
        return numbers;
    }

    @Test
    void theWorkbookIsByteIdenticalForTheSameFilesAndDateInAnyTimeZone() throws Exception {
        Map<String, String> files = Map.of("order.csv", CsvFile.text(List.of("section", "pieces"),
                List.of(List.of("CHS 48.3x3.2", "12"), List.of("CHS 60.3x3.2", "007"))));
        byte[] first = PlanWorkbook.of(files, DATE);
        TimeZone zone = TimeZone.getDefault();
        try {
            TimeZone.setDefault(TimeZone.getTimeZone("Pacific/Kiritimati"));
            Thread.sleep(5); // a writer that stamped the clock would now differ
            assertThat(PlanWorkbook.of(files, DATE)).isEqualTo(first);
        } finally {
            TimeZone.setDefault(zone);
        }
        assertThat(PlanWorkbook.of(files, DATE.plusDays(1))).isNotEqualTo(first);
        try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(first))) {
            assertThat(workbook.getProperties().getCoreProperties().getCreated().toInstant())
                    .isEqualTo(DATE.atStartOfDay(java.time.ZoneOffset.UTC).toInstant());
            Sheet order = workbook.getSheet("order");
            // "007" is no plain number, so the column stays text: a leading zero is never lost
            assertThat(order.getRow(1).getCell(1).getCellType()).isEqualTo(CellType.STRING);
            assertThat(order.getRow(2).getCell(1).getStringCellValue()).isEqualTo("007");
        }
    }
}
