package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import kitwright.io.PrettyJson;
import kitwright.spares.SparesKits;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code plan} on a kit with a spares policy: the console line, plan.json and the report agree. */
class PlanSparesCommandTest {

    @Test
    void planPrintsTheSparesAndWritesThemIntoPlanJsonAndTheReport(@TempDir Path dir) throws Exception {
        Path kit = SparesKits.write(dir, "kit", "{\"lossRatePerCycle\": 0.05, \"cycles\": 4, \"serviceLevel\": 0.9}");
        Path out = dir.resolve("out");

        CliRun run = CliRun.of("plan", kit.toString(), "--out", out.toString(), "--date", "2025-06-30");

        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.OK.code());
        WrittenPlans.planFolder(kit, out, java.time.LocalDate.of(2025, 6, 30));
        JsonNode spares = PrettyJson.mapper().readTree(out.resolve("plan.json").toFile()).get("spares");
        JsonNode totals = spares.get("totals");
        String line = "Service-life spares: " + totals.get("toMake").asInt() + " bars to make (5 % of the bars in"
                + " service lost per cycle, 4 cycles, kit level 90 %; " + totals.get("sparesNeeded").asInt()
                + " needed, " + totals.get("alreadyInKit").asInt() + " surplus bars in the kit count towards them;"
                + " every mark covered with probability "
                + String.format(java.util.Locale.ROOT, "%.1f", 100 * spares.get("kitLevel").asDouble()) + " %)"
                + System.lineSeparator() + "  " + totals.get("fromOffcuts").asInt() + " cut from offcuts, "
                + totals.get("bought").asInt() + " bought, extra stock cost "
                + String.format(java.util.Locale.ROOT, "%.2f", spares.get("extraCost").asDouble()) + ".";
        assertThat(run.out()).contains(line).doesNotContain("MISSING");
        assertThat(totals.get("toMake").asInt()).isPositive();
        assertThat(Files.readString(out.resolve("report.html"))).contains("<tr data-spares-mark=\"A\">");
    }
}
