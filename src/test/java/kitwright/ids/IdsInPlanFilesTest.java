package kitwright.ids;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.LogisticsCsv;
import kitwright.report.PlanFiles;
import kitwright.validate.PlanValidator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A kit (invented) whose marks take the shapes of the old ids (C1, C2, B1, B001, JB1, V1) and of the scheme's first
 * choices (BDL1, CRT-1, box1, Trip 1), planned whole: the ids of its bundles, joint boxes, crates and trips equal
 * none of its marks and read like none, and every list of ids the plan prints is in number order. Small crates put
 * three crates on one truck and some 70 bundles in a crate, so that lists of more than nine ids are printed.
 */
class IdsInPlanFilesTest {
    private static final List<String> MARKS = List.of("C1", "C2", "B1", "B001", "JB1", "V1", "BDL1", "CRT-1", "box1",
            "Trip 1");
    private static PlanResult plan;
    private static Map<String, String> files;

    @BeforeAll
    static void planTheKit(@TempDir Path dir) throws Exception {
        Path kit = KitFiles.kit(dir, """
                mark,section,length_mm,quantity
                C1,CHS 48.3x3.2,1900,60
                C2,CHS 33.7x2.6,1800,60
                B1,CHS 48.3x3.2,1500,40
                B001,CHS 33.7x2.6,1400,40
                JB1,CHS 48.3x3.2,1200,16
                V1,CHS 33.7x2.6,1000,16
                BDL1,CHS 48.3x3.2,900,10
                CRT-1,CHS 33.7x2.6,800,10
                """);
        KitFiles.write(kit, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nbox1,90,1.6,30\nTrip 1,60,0.8,40\n");
        KitFiles.write(kit, "crates.csv", Files.readString(Path.of("stock-catalogs", "crates.csv")).lines()
                .filter(l -> l.startsWith("crate,") || l.startsWith("timber-2100,"))
                .reduce("", (a, l) -> a + l + "\n"));
        KitFiles.write(kit, "vehicles.csv", Files.readString(Path.of("stock-catalogs", "vehicles.csv")));
        KitFiles.write(kit, "kit.json", "{\"stockCatalog\": \"stock.csv\", \"materials\": \"materials.csv\","
                + " \"crateCatalog\": \"crates.csv\", \"vehicleCatalog\": \"vehicles.csv\"}");
        plan = Planner.run(KitReader.read(kit), Planner.Options.DEFAULT, PlanProgress.NONE);
        PlanValidator.validate(plan);
        files = PlanFiles.of(plan, LocalDate.of(2026, 12, 3));
    }

    @Test
    @DisplayName("no bundle, joint box, crate or trip id equals or reads like a mark of the kit")
    void idsAreNotMarks() {
        List<String> ids = new ArrayList<>();
        plan.nesting().plan().bundles().forEach(b -> ids.add(b.id()));
        plan.crates().boxes().forEach(x -> ids.add(x.id()));
        plan.crates().crates().forEach(c -> ids.add(c.id()));
        plan.loads().vehicles().forEach(v -> ids.add(v.id()));
        assertThat(plan.crates().crates()).hasSizeGreaterThan(2);
        assertThat(plan.crates().boxes()).hasSizeGreaterThan(1);
        for (String id : ids) {
            for (String mark : MARKS) {
                assertThat(id).isNotEqualToIgnoringCase(mark);
                assertThat(PlanValidator.letters(id)).as("%s reads like mark %s", id, mark)
                        .isNotEqualTo(PlanValidator.letters(mark));
            }
        }
    }

    @Test
    @DisplayName("packing-lists.csv and manifests.csv: rows and every id list in number order")
    void csvListsInNumberOrder() throws Exception {
        List<CSVRecord> lists = read(files.get(LogisticsCsv.PACKING_LISTS));
        inNumberOrder("crates", lists.stream().map(r -> r.get("crate")).toList());
        assertThat(lists.stream().mapToInt(r -> Integer.parseInt(r.get("bundles"))).max().orElse(0))
                .isGreaterThan(9);
        for (CSVRecord row : lists) {
            inNumberOrder(row.get("crate"), words(row.get("bundle_ids")));
            inNumberOrder(row.get("crate"), words(row.get("box_ids")));
        }
        List<CSVRecord> manifests = read(files.get(LogisticsCsv.MANIFESTS));
        inNumberOrder("trips", manifests.stream().map(r -> r.get("vehicle")).toList());
        assertThat(manifests.stream().mapToInt(r -> Integer.parseInt(r.get("crates"))).max().orElse(0))
                .isGreaterThan(1);
        for (CSVRecord row : manifests) {
            inNumberOrder(row.get("vehicle"), words(row.get("crate_ids")));
        }
    }

    @Test
    @DisplayName("the report: crate and trip rows, each trip's crates and the bundle index in number order")
    void reportListsInNumberOrder() {
        String html = files.get(PlanFiles.REPORT_HTML);
        List<String> crates = all(html, "<tr data-crate=\"([^\"]+)\"");
        assertThat(crates).hasSize(plan.crates().crates().size());
        inNumberOrder("crate rows", crates);
        List<String> trips = all(html,
                "<tr data-vehicle=\"[^\"]+\"><td[^>]*>[^<]*</td><td[^>]*>[^<]*</td><td>([^<]*)</td>");
        assertThat(trips).hasSize(plan.loads().vehicles().size());
        trips.forEach(t -> inNumberOrder("a trip's crates", words(t)));
        List<String> ranges = all(html, "<a href=\"#bundle-[^\"]+\">([^<]+)</a>");
        List<String> ends = new ArrayList<>();
        ranges.forEach(r -> ends.addAll(List.of(r.split(" to "))));
        assertThat(ends).hasSizeGreaterThan(2);
        inNumberOrder("bundle index", ends);
        for (String alike : all(html, "Packed the same way: ([^<]+)<")) {
            inNumberOrder("crates packed alike", List.of(alike.split(", ")));
        }
    }

    private static void inNumberOrder(String what, List<String> ids) {
        assertThat(PlanValidator.inNumberOrder(ids)).as("%s in number order: %s", what, ids).isTrue();
    }

    private static List<String> all(String text, String regex) {
        List<String> found = new ArrayList<>();
        Matcher m = Pattern.compile(regex).matcher(text);
        while (m.find()) {
            found.add(m.group(1));
        }
        return found;
    }

    private static List<CSVRecord> read(String csv) throws Exception {
        return kitwright.validate.CsvOutput.records(csv);
    }

    private static List<String> words(String text) {
        return text.isBlank() ? List.of() : List.of(text.split(" "));
    }
}
