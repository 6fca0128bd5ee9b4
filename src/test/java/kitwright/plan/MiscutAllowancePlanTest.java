package kitwright.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Consumer;
import kitwright.cli.CliRun;
import kitwright.cli.ExitCode;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.model.MiscutAllowance;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import kitwright.report.PlanFiles;
import kitwright.report.labels.LabelSet;
import kitwright.spares.SparesKits;
import kitwright.validate.PlanValidator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The miscut allowance through the whole chain, on the small steel kit of {@link SparesKits} (invented data: A 10 x
 * 1450 mm and B 6 x 2400 mm on CHS 48.3x3.2, C 12 x 950 mm on CHS 33.7x2.6, 14 joints of 0.8 kg) with kit.json's
 * {@code "miscutAllowance": {"piecesPerMark": 1, "percent": 10}}: A gets max(1, ceil(1.0)) = 1, B max(1, ceil(0.6))
 * = 1, C max(1, ceil(1.2)) = 2 extra pieces, 4 in all (hand-computed). Every plan passes the plan validator (with the
 * saw sheet's kinds) before anything else is asserted.
 */
class MiscutAllowancePlanTest {
    private static final LocalDate DATE = LocalDate.of(2026, 12, 3);
    private static final String ALLOWANCE = "\"miscutAllowance\": {\"piecesPerMark\": 1, \"percent\": 10}";
    private static final Map<String, Integer> QUANTITY = Map.of("A", 10, "B", 6, "C", 12);
    private static final Map<String, Integer> EXTRA = Map.of("A", 1, "B", 1, "C", 2);

    @Test
    void theAllowanceIsCutLabelledBundledCratedAndWeighed(@TempDir Path dir) throws Exception {
        Kit kit = KitReader.read(kitWithAllowance(dir, null));
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> files = PlanFiles.of(result, DATE);
        PlanValidator.validate(result, files);

        Map<String, Map<String, Integer>> kinds = kindsByMark(files.get("cut-list.csv"));
        assertThat(kinds.get("allowance")).isEqualTo(new TreeMap<>(EXTRA));
        assertThat(kinds.get("cut")).isEqualTo(new TreeMap<>(QUANTITY));
        assertThat(kinds).doesNotContainKey("spare");

        Map<String, Integer> labelled = new TreeMap<>();
        LabelSet labels = LabelSet.of(kit, result.cutting(), result.nesting().plan().bundles(), result.crates(),
                DATE.toString());
        labels.pieces().stream().filter(p -> p.kind().equals("allowance"))
                .forEach(p -> labelled.merge(p.mark(), 1, Integer::sum));
        assertThat(labelled).isEqualTo(new TreeMap<>(EXTRA));
        assertThat(labels.pieces()).allSatisfy(p -> assertThat(p.bundle()).isNotEmpty())
                .allSatisfy(p -> assertThat(p.crate()).isNotEmpty());
        assertThat(files.get("labels.html").split("<div class=\"label-band\">allowance</div>", -1)).hasSize(5);

        Map<String, Integer> bundled = new TreeMap<>();
        for (Bundle b : result.nesting().plan().bundles()) {
            walk(b.host(), t -> bundled.merge(t.mark(), 1, Integer::sum));
        }
        assertThat(bundled).isEqualTo(Map.of("A", 11, "B", 7, "C", 14));

        // The kit mass is what the bundles weigh plus the joints (14 x 0.8 kg), the allowance included.
        double bundles = result.nesting().plan().bundles().stream().mapToDouble(Bundle::massKg).sum();
        assertThat(result.figures().kitMassKg()).isCloseTo(bundles + 14 * 0.8, within(1e-6));
        // The allowance adds 1.45 m + 2.4 m of CHS 48.3x3.2 at 3.56 kg/m and 2 x 0.95 m of CHS 33.7x2.6 at
        // 1.99 kg/m (EN 10219-2 table masses, src/docs/sources.md "Tube sections"), to the tables' 0.005 kg/m.
        Kit without = kit.withSettings(kit.settings().withMiscutAllowance(MiscutAllowance.NONE));
        PlanResult plain = Planner.run(without, Planner.Options.DEFAULT, PlanProgress.NONE);
        PlanValidator.validate(plain, PlanFiles.of(plain, DATE));
        assertThat(result.figures().kitMassKg() - plain.figures().kitMassKg())
                .isCloseTo(1.45 * 3.56 + 2.4 * 3.56 + 1.9 * 1.99, within(5.75 * 0.005));
        assertThat(result.summary().kitMassKg()).isCloseTo(result.figures().kitMassKg(), within(0.001));

        for (String file : new String[] {"summary.json", "plan.json"}) {
            JsonNode root = PrettyJson.mapper().readTree(files.get(file));
            JsonNode summary = file.equals("plan.json") ? root.get("summary") : root;
            assertThat(summary.get("allowance").asInt()).as(file).isEqualTo(4);
            Map<String, Integer> perMark = new TreeMap<>();
            summary.get("markList").forEach(m -> perMark.put(m.get("mark").asText(), m.get("allowance").asInt()));
            assertThat(perMark).as(file).isEqualTo(new TreeMap<>(EXTRA));
            assertThat(summary.get("bars").asInt()).as(file + ": the kit's own bars unchanged").isEqualTo(28);
        }
        assertThat(files.get("report.html")).contains("Miscut allowance</div><div class=\"figure-value\">4 pieces")
                .contains("A \u00D7\u20091, B \u00D7\u20091, C \u00D7\u20092")
                .contains("Miscut allowance cut beyond the kit: C \u00D7\u20092")
                .contains("Of the pieces cut from this stock, 4 pieces are miscut allowance for saw errors, beyond the"
                        + " kit&#39;s bars: A \u00D7\u20091, B \u00D7\u20091, C \u00D7\u20092.");
    }

    @Test
    void serviceLifeSparesComeOnTopOfTheAllowance(@TempDir Path dir) throws Exception {
        Kit kit = KitReader.read(kitWithAllowance(dir,
                "{\"lossRatePerCycle\": 0.05, \"cycles\": 10, \"serviceLevel\": 0.9}"));
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        Map<String, String> files = PlanFiles.of(result, DATE);
        PlanValidator.validate(result, files);

        Map<String, Map<String, Integer>> kinds = kindsByMark(files.get("cut-list.csv"));
        assertThat(kinds.get("allowance")).isEqualTo(new TreeMap<>(EXTRA));
        Map<String, Integer> spares = new TreeMap<>();
        result.spares().supply().stream().filter(s -> s.cut() > 0).forEach(s -> spares.put(s.mark(), s.cut()));
        assertThat(result.spares().bought()).as("this policy buys stock for spares").isPositive();
        assertThat(kinds.get("spare")).as("spares beyond quantity and allowance, as the spares stage made them")
                .isEqualTo(spares);
        result.spares().supply().forEach(s -> assertThat(s.cut()).as(s.mark()).isGreaterThanOrEqualTo(s.needed()));
    }

    @Test
    void checkAndPlanShowTheAllowanceApart(@TempDir Path dir) throws Exception {
        Path kit = kitWithAllowance(dir, null);

        CliRun check = CliRun.of("check", kit.toString());
        CliRun plan = CliRun.of("plan", kit.toString(), "--out", dir.resolve("out").toString(), "--date",
                DATE.toString());

        assertThat(check.exitCode()).isEqualTo(ExitCode.OK.code());
        assertThat(check.out()).contains("Miscut allowance (extra pieces for saw errors, cut beyond the quantity):"
                + " 4 pieces (A 1, B 1, C 2)").contains("with the 4 miscut allowance pieces");
        assertThat(plan.exitCode()).isEqualTo(ExitCode.OK.code());
        assertThat(plan.out()).contains("CHS 48.3x3.2: miscut allowance cut: A 1, B 1")
                .contains("CHS 33.7x2.6: miscut allowance cut: C 2");
        assertThat(Files.readString(dir.resolve("out").resolve("cut-list.csv"))).contains(",allowance,C,");
    }

    /** The kit folder of {@link SparesKits} with the allowance added to its kit.json. */
    private static Path kitWithAllowance(Path dir, String spares) throws IOException {
        Path kit = SparesKits.write(dir, "kiosk", spares);
        Path json = kit.resolve("kit.json");
        String text = Files.readString(json);
        Files.writeString(json, text.replace("\"timeLimitSeconds\": 5", "\"timeLimitSeconds\": 5,\n  " + ALLOWANCE));
        return kit;
    }

    /** Pieces per kind and mark in a saw sheet. */
    static Map<String, Map<String, Integer>> kindsByMark(String csv) throws IOException {
        Map<String, Map<String, Integer>> kinds = new TreeMap<>();
        for (CSVRecord r : CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(csv))) {
            if (!r.get("mark").isEmpty()) {
                kinds.computeIfAbsent(r.get("kind"), k -> new TreeMap<>()).merge(r.get("mark"), 1, Integer::sum);
            }
        }
        return kinds;
    }

    private static void walk(NestedTube tube, Consumer<NestedTube> visit) {
        visit.accept(tube);
        tube.guests().forEach(g -> walk(g, visit));
    }
}
