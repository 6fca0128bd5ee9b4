package kitwright.tour;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.cli.CliRun;
import kitwright.cli.ExitCode;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.PlanFiles;
import kitwright.report.tour.LegsCsv;
import kitwright.validate.CsvOutput;
import kitwright.validate.PlanValidator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Tour legs on a small literal kit: a pavilion with joint rows, a stage without, toured pavilion, stage, pavilion.
 * Every plan passes the plan validator (with the tour validator, which re-derives each leg's contents from the
 * kit's rows) before anything else is asserted; the contents are then counted once more here from the CSV text
 * of structures.csv and joints.csv, without the kit reader.
 */
class TourLegsTest {
    private static final LocalDate DATE = LocalDate.of(2026, 12, 3);
    static final String BARS = """
            mark,section,length_mm,quantity
            A,CHS 48.3x3.2,1900,
            E,CHS 33.7x2.6,1500,
            """;
    static final String STRUCTURES = """
            structure,mark,count
            pavilion,A,6
            pavilion,E,4
            pavilion,J1,10
            stage,A,3
            stage,E,5
            """;
    static final String JOINTS = """
            mark,diameter_mm,mass_kg,quantity
            J1,90,1.6,12
            J2,110,2.6,4
            """;

    @TempDir
    static Path dir;
    static Path kitDir;
    static Kit kit;
    static PlanResult result;
    static Map<String, String> files;

    @BeforeAll
    static void plan() throws Exception {
        kitDir = KitFiles.kit(dir.resolve("kit"), BARS);
        KitFiles.write(kitDir, "structures.csv", STRUCTURES);
        KitFiles.write(kitDir, "joints.csv", JOINTS);
        KitFiles.write(kitDir, "kit.json", "{\"tour\": [\"pavilion\", \"stage\", \"pavilion\"]}");
        KitFiles.write(kitDir, "crates.csv", Files.readString(Path.of("stock-catalogs", "crates.csv")));
        KitFiles.write(kitDir, "vehicles.csv", Files.readString(Path.of("stock-catalogs", "vehicles.csv")));
        kit = KitReader.read(kitDir);
        result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        files = PlanFiles.of(result, DATE);
        PlanValidator.validate(result, files);
    }

    @Test
    @DisplayName("four legs in tour order, from the depot and back, each with the structure it arrives for")
    void legsInTourOrder() {
        assertThat(result.tour().legs()).extracting(Leg::route).containsExactly("depot \u2192 pavilion",
                "pavilion \u2192 stage", "stage \u2192 pavilion", "pavilion \u2192 depot");
        assertThat(result.tour().legs()).extracting(Leg::structure)
                .containsExactly("pavilion", "stage", "pavilion", "pavilion");
        assertThat(result.tour().legs()).allSatisfy(l -> assertThat(l.shipment().status())
                .isIn(Status.OPTIMAL, Status.FEASIBLE));
    }

    @Test
    @DisplayName("each leg's crates hold its structure's bars and joints, counted from the CSV text itself")
    void cratesHoldExactlyTheStructuresParts() throws Exception {
        for (Leg leg : result.tour().legs()) {
            Map<String, Integer> expected = new TreeMap<>();
            boolean jointRows = false;
            for (CSVRecord r : csv(STRUCTURES)) {
                if (r.get("structure").equals(leg.structure())) {
                    expected.merge(r.get("mark"), Integer.parseInt(r.get("count")), Integer::sum);
                    jointRows |= r.get("mark").startsWith("J");
                }
            }
            if (!jointRows) { // the documented assumption: a structure without joint rows takes every joint
                for (CSVRecord r : csv(JOINTS)) {
                    expected.merge(r.get("mark"), Integer.parseInt(r.get("quantity")), Integer::sum);
                }
            }
            assertThat(crated(leg.shipment())).as("leg " + leg.number()).isEqualTo(expected);
            assertThat(leg.shipment().jointsAssumed()).as("leg " + leg.number()).isEqualTo(!jointRows);
        }
        // pavilion: 6 A + 4 E and its 10 J1 (of 12); stage: 3 A + 5 E and all 12 J1 and 4 J2
        assertThat(crated(result.tour().legs().get(0).shipment())).containsExactlyEntriesOf(
                new TreeMap<>(Map.of("A", 6, "E", 4, "J1", 10)));
        assertThat(crated(result.tour().legs().get(1).shipment())).containsExactlyEntriesOf(
                new TreeMap<>(Map.of("A", 3, "E", 5, "J1", 12, "J2", 4)));
    }

    @Test
    @DisplayName("legs of the same structure share one plan: planned once, the same crates and loads")
    void equalLegsShareOnePlan() throws Exception {
        List<Leg> legs = result.tour().legs();
        assertThat(legs).extracting(Leg::sameAs).containsExactly(1, 2, 1, 1);
        assertThat(legs.get(2).shipment()).isSameAs(legs.get(0).shipment());
        assertThat(legs.get(3).shipment()).isSameAs(legs.get(0).shipment());
        assertThat(result.tour().distinctShipments()).isEqualTo(2);
        JsonNode json = PrettyJson.mapper().readTree(files.get("plan.json")).get("legs");
        assertThat(json).hasSize(4);
        assertThat(withoutRoute(json.get(2))).isEqualTo(withoutRoute(json.get(0)));
        assertThat(withoutRoute(json.get(3))).isEqualTo(withoutRoute(json.get(0)));
        assertThat(withoutRoute(json.get(1))).isNotEqualTo(withoutRoute(json.get(0)));
    }

    @Test
    @DisplayName("plan.json legs carry the keys a planner reads; legs.csv one row per leg, the leg CSVs per leg")
    void jsonAndCsv() throws Exception {
        JsonNode legs = PrettyJson.mapper().readTree(files.get("plan.json")).get("legs");
        JsonNode vehicleKeys = PrettyJson.mapper().readTree(files.get("plan.json")).get("loads").get("vehicles")
                .get(0);
        for (JsonNode leg : legs) {
            assertThat(KitFiles.listOf(leg.fieldNames())).containsExactly("leg", "from", "to", "structure", "status",
                    "crateCost", "tripCost", "totalCost", "totalLowerBound", "cratesLowerBound", "tripsLowerBound",
                    "sameAsLeg", "jointsAssumed", "bars", "joints", "bundles", "crates", "vehicles");
            assertThat(leg.get("totalCost").asDouble()).isCloseTo(leg.get("crateCost").asDouble()
                    + leg.get("tripCost").asDouble(), org.assertj.core.data.Offset.offset(1e-6));
            assertThat(leg.get("totalLowerBound").asDouble()).isLessThanOrEqualTo(leg.get("totalCost").asDouble()
                    + 1e-6);
            assertThat(KitFiles.listOf(leg.get("vehicles").get(0).fieldNames()))
                    .containsExactlyElementsOf(KitFiles.listOf(vehicleKeys.fieldNames()));
        }
        String legsCsv = files.get(LegsCsv.LEGS);
        CsvOutput.checkLayout(legsCsv);
        List<CSVRecord> rows = CsvOutput.records(legsCsv);
        assertThat(rows).hasSize(4);
        assertThat(rows).extracting(r -> r.get("from") + ">" + r.get("to")).containsExactly("depot>pavilion",
                "pavilion>stage", "stage>pavilion", "pavilion>depot");
        assertThat(rows).extracting(r -> r.get("joints_assumed")).containsExactly("no", "yes", "no", "no");
        for (int i = 0; i < rows.size(); i++) {
            assertThat(Double.parseDouble(rows.get(i).get("total_cost")))
                    .isEqualTo(legs.get(i).get("totalCost").asDouble());
        }
        List<CSVRecord> loading = CsvOutput.records(files.get(LegsCsv.LOAD_LISTS));
        for (Leg leg : result.tour().legs()) {
            long crates = leg.shipment().loads().vehicles().stream().mapToLong(v -> v.crates().size()).sum();
            assertThat(loading.stream().filter(r -> r.get("leg").equals(String.valueOf(leg.number()))).count())
                    .as("load list rows of leg " + leg.number()).isEqualTo(crates);
        }
        List<CSVRecord> packing = CsvOutput.records(files.get(LegsCsv.PACKING_LISTS));
        assertThat(packing).hasSize(result.tour().legs().stream()
                .mapToInt(l -> l.shipment().crates().crates().size()).sum());
        String html = files.get("report.html");
        assertThat(html).contains("<section id=\"tour\"", "<section id=\"leg-1\"", "<section id=\"leg-4\"")
                .contains("Same shipment as leg 1").contains("Rows holding joint boxes go nearest the doors");
    }

    @Test
    @DisplayName("the same kit and date plan the same bytes, legs included; without a tour no legs at all")
    void deterministicAndAbsentWithoutTour() throws Exception {
        PlanResult again = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> second = PlanFiles.of(again, DATE);
        PlanValidator.validate(again, second);
        assertThat(second).isEqualTo(files);

        Kit plain = kit.withSettings(kit.settings().withTour(List.of()));
        PlanResult without = Planner.run(plain, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> plainFiles = PlanFiles.of(without, DATE);
        PlanValidator.validate(without, plainFiles);
        assertThat(without.tour()).isNull();
        assertThat(PrettyJson.mapper().readTree(plainFiles.get("plan.json")).has("legs")).isFalse();
        assertThat(plainFiles).doesNotContainKeys(LegsCsv.LEGS, LegsCsv.PACKING_LISTS, LegsCsv.LOAD_LISTS);
        assertThat(plainFiles.get("plan.json")).isEqualTo(files.get("plan.json")
                .replaceAll("(?s),\\s*\"legs\": \\[.*\\](?=,\\s*\"spares\")", ""));
    }

    @Test
    @DisplayName("plan on the command line: legs printed with the assumed joints, the leg files written")
    void commandLine(@TempDir Path scratch) throws Exception {
        Path out = scratch.resolve("plan");
        CliRun run = CliRun.of("plan", kitDir.toString(), "--out", out.toString(), "--date", DATE.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.OK.code());
        assertThat(Files.readString(out.resolve("plan.json"), StandardCharsets.UTF_8)).isEqualTo(files.get("plan.json"));
        assertThat(Files.exists(out.resolve(LegsCsv.LEGS))).isTrue();
        assertThat(run.out()).contains("Tour: 4 legs, 2 distinct shipments (legs.csv):")
                .contains("Leg 1 depot -> pavilion: ").contains("Leg 4 pavilion -> depot: ")
                .contains("Assumed: structures.csv names no joint marks for stage, so its legs are assumed to carry"
                        + " every joint of joints.csv (16 joints).");
        assertThat(run.err()).contains("plan: tour legs: 4 legs");
    }

    @Test
    @DisplayName("the cinema-12 sample on the command line: five legs in kit.json's order, legs.csv and plan.json agree")
    void sampleKitEndToEnd(@TempDir Path scratch) throws Exception {
        Path sample = Path.of("sample-kits", "cinema-12");
        Path out = scratch.resolve("cinema-12");
        CliRun run = CliRun.of("plan", sample.toString(), "--out", out.toString(), "--date", DATE.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.OK.code());
        List<String> tour = new ArrayList<>();
        PrettyJson.mapper().readTree(sample.resolve("kit.json").toFile()).get("tour")
                .forEach(n -> tour.add(n.asText()));
        List<String> stops = new ArrayList<>(List.of("depot"));
        stops.addAll(tour);
        stops.add("depot");
        JsonNode legs = PrettyJson.mapper().readTree(out.resolve("plan.json").toFile()).get("legs");
        List<CSVRecord> rows = CsvOutput.records(Files.readString(out.resolve(LegsCsv.LEGS), StandardCharsets.UTF_8));
        assertThat(legs).hasSize(tour.size() + 1);
        assertThat(rows).hasSize(tour.size() + 1);
        for (int i = 0; i < legs.size(); i++) {
            JsonNode leg = legs.get(i);
            assertThat(leg.get("from").asText() + ">" + leg.get("to").asText()).isEqualTo(stops.get(i) + ">"
                    + stops.get(i + 1));
            assertThat(rows.get(i).get("from") + ">" + rows.get(i).get("to")).isEqualTo(stops.get(i) + ">"
                    + stops.get(i + 1));
            assertThat(leg.get("status").asText()).isIn("OPTIMAL", "FEASIBLE");
            assertThat(rows.get(i).get("status")).isEqualTo(leg.get("status").asText());
        }
        assertThat(run.out()).contains("Tour: 5 legs, 3 distinct shipments");
    }

    /** Tubes and joints of a shipment's crates by mark, counted through bundles and boxes. */
    static Map<String, Integer> crated(LegShipment s) {
        Map<String, kitwright.nesting.Bundle> bundles = new java.util.HashMap<>();
        s.nesting().plan().bundles().forEach(b -> bundles.put(b.id(), b));
        Map<String, kitwright.packing.JointBoxLoad> boxes = new java.util.HashMap<>();
        s.crates().boxes().forEach(b -> boxes.put(b.id(), b));
        Map<String, Integer> marks = new TreeMap<>();
        for (kitwright.packing.Crate c : s.crates().crates()) {
            for (kitwright.packing.CrateItem i : c.items()) {
                if (i.kind() == kitwright.packing.ItemKind.BUNDLE) {
                    List<kitwright.nesting.NestedTube> open = new ArrayList<>(List.of(bundles.get(i.ref()).host()));
                    while (!open.isEmpty()) {
                        var t = open.remove(open.size() - 1);
                        marks.merge(t.mark(), 1, Integer::sum);
                        open.addAll(t.guests());
                    }
                } else {
                    boxes.get(i.ref()).joints().forEach(j -> marks.merge(j.mark(), j.count(), Integer::sum));
                }
            }
        }
        return marks;
    }

    private static List<CSVRecord> csv(String text) throws Exception {
        return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(new StringReader(text))
                .getRecords();
    }

    private static JsonNode withoutRoute(JsonNode leg) {
        ObjectNode copy = leg.deepCopy();
        copy.remove(List.of("leg", "from", "to"));
        return copy;
    }
}
