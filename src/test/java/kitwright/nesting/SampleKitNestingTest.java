package kitwright.nesting;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitReader;
import kitwright.io.PrettyJson;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.NestTolerance;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

public class SampleKitNestingTest {

    /**
     * A stand-in for the cutting stage: every bar of the kit sawn from its own piece of the longest stock length.
     * Nesting only reads the cuts, so this is enough to nest every piece of a kit.
     */
    public static CutPlan oneBarPerStockPiece(Kit kit) {
        List<SectionCutPlan> sections = new ArrayList<>();
        for (String section : kit.usedSections()) {
            List<CutPattern> patterns = new ArrayList<>();
            double stock = kit.catalog().longestLengthMm(section);
            for (Bar bar : kit.bars()) {
                if (bar.section().equals(section)) {
                    patterns.add(new CutPattern(stock, Origin.MILL, bar.quantity(),
                            List.of(new Cut(bar.mark(), bar.lengthMm())), 0, "scrap"));
                }
            }
            sections.add(new SectionCutPlan(section, 2, 5, 500, "length", Status.FEASIBLE, null, 0.0, 0.0, 0.0,
                    patterns.stream().mapToInt(CutPattern::count).sum(), patterns, List.of()));
        }
        return new CutPlan(sections);
    }

    static Path sample(String name) {
        return Path.of("sample-kits", name);
    }

    @ParameterizedTest(name = "{0}: every piece nested once, valid worst-case nests, same bytes twice")
    @ValueSource(strings = {"cinema-6", "cinema-12", "cinema-20", "alu-kiosk", "acrylic-vitrine"})
    void sampleKits(String name) throws Exception {
        Kit kit = KitReader.read(sample(name));
        CutPlan cuts = oneBarPerStockPiece(kit);
        NestPlan plan = Nester.plan(kit, cuts);
        NestPlanValidator.validate(kit, cuts, plan);
        int pieces = kit.bars().stream().mapToInt(Bar::quantity).sum();
        assertThat(plan.bundles().size()).isLessThan(pieces);
        assertThat(plan.tolerance()).isEqualTo(NestTolerance.WORST_CASE);
        assertThat(PrettyJson.write(Nester.plan(kit, cuts))).isEqualTo(PrettyJson.write(plan));
    }

    @ParameterizedTest(name = "{0}: nominal sizes nest too, and the plan says nominal")
    @ValueSource(strings = {"cinema-12", "alu-kiosk"})
    void nominalRule(String name) throws Exception {
        Kit kit = KitReader.read(sample(name));
        kit = kit.withSettings(kit.settings().withNestTolerance(NestTolerance.NOMINAL));
        CutPlan cuts = oneBarPerStockPiece(kit);
        NestPlan plan = Nester.plan(kit, cuts);
        NestPlanValidator.validate(kit, cuts, plan);
        assertThat(plan.tolerance()).isEqualTo(NestTolerance.NOMINAL);
    }

    @org.junit.jupiter.api.Test
    @DisplayName("plan.json keys are exactly the issue's contract")
    void jsonContract() throws Exception {
        Kit kit = KitReader.read(sample("cinema-6"));
        JsonNode json = PrettyJson.mapper().readTree(PrettyJson.write(Nester.plan(kit, oneBarPerStockPiece(kit))));
        assertThat(iterable(json.fieldNames()))
                .containsExactly("tolerance", "clearanceMm", "status", "lowerBound", "bundles");
        assertThat(json.get("tolerance").asText()).isEqualTo("worst-case");
        JsonNode bundle = json.get("bundles").get(0);
        assertThat(iterable(bundle.fieldNames()))
                .containsExactly("id", "lengthMm", "envelopeDiameterMm", "massKg", "host");
        assertThat(iterable(bundle.get("host").fieldNames())).containsExactly("mark", "outerDiameterMm", "boreMm",
                "lengthMm", "centerXMm", "centerYMm", "offsetMm", "guests");
    }

    private static List<String> iterable(java.util.Iterator<String> names) {
        List<String> out = new ArrayList<>();
        names.forEachRemaining(out::add);
        return out;
    }
}
