package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Kit;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.PlanFiles;
import kitwright.validate.PlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check} states the service-life spares that {@code plan} makes, on the same line with the same numbers. */
class SparesLineTest {
    private static final String PREFIX = "Service-life spares:";

    private static String sparesLine(String console) {
        return console.lines().filter(l -> l.startsWith(PREFIX)).reduce((a, b) -> {
            throw new AssertionError("two spares lines: " + a + " / " + b);
        }).orElseThrow(() -> new AssertionError("no line starting '" + PREFIX + "' in:\n" + console));
    }

    @Test
    @DisplayName("alu-kiosk: check and plan print the same 'Service-life spares: 54 bars to make (...)' line,"
            + " with plan.json's numbers")
    void checkAndPlanPrintTheSameSpares(@TempDir Path dir) throws Exception {
        Path kitDir = Path.of("sample-kits", "alu-kiosk");
        Path out = dir.resolve("plan");
        Kit kit = KitReader.read(kitDir);
        PlanResult result = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
        PlanValidator.validate(result, PlanFiles.of(result, java.time.LocalDate.of(2026, 12, 3)));

        CliRun check = CliRun.of("check", kitDir.toString());
        CliRun plan = CliRun.of("plan", kitDir.toString(), "--out", out.toString(), "--date", "2026-12-03");

        assertThat(check.exitCode()).as(check.err()).isZero();
        assertThat(plan.exitCode()).as(plan.err()).isZero();
        String line = sparesLine(check.out());
        assertThat(sparesLine(plan.out())).isEqualTo(line);
        assertThat(sparesLine(PlanSummaryText.format(result))).isEqualTo(line);

        JsonNode spares = PrettyJson.mapper().readTree(Files.readString(out.resolve("plan.json"))).get("spares");
        int toMake = spares.get("totals").get("toMake").asInt();
        assertThat(toMake).isEqualTo(54);
        assertThat(line).startsWith(PREFIX + " " + toMake + " bars to make (2 % of the bars in service lost per"
                + " cycle, 20 cycles, kit level 95 %; " + spares.get("totals").get("sparesNeeded").asInt()
                + " needed, " + spares.get("totals").get("alreadyInKit").asInt() + " surplus bars")
                .endsWith(String.format(Locale.ROOT, "every mark covered with probability %.1f %%)",
                        100 * spares.get("kitLevel").asDouble()));
        int cut = result.cutting().sections().stream().flatMap(s -> s.spares().stream())
                .mapToInt(kitwright.cutting.Spare::count).sum();
        assertThat(cut).as("spares the plan cuts").isGreaterThanOrEqualTo(toMake);
    }

    @Test
    @DisplayName("A kit without a spares policy: check says so on the spares line")
    void withoutAPolicy() {
        CliRun check = CliRun.of("check", "sample-kits/cinema-6");
        assertThat(check.exitCode()).as(check.err()).isZero();
        assertThat(sparesLine(check.out())).isEqualTo("Service-life spares: none (kit.json sets no spares policy)");
    }
}
