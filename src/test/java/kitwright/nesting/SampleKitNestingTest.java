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
import kitwright.model.StockLength;
import kitwright.validate.CutPlanValidator;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

public class SampleKitNestingTest {

    /**
     * A stand-in for the cutting stage: every bar of the kit sawn from its own piece of the section's longest mill
     * stock, offcuts by the saw model, value by the validator's objective, bound 0 (FEASIBLE). Nesting only reads the
     * cuts, so this is enough to nest every piece of a kit; the shared cut validator checks it before use.
     */
    public static CutPlan oneBarPerStockPiece(Kit kit) {
        var settings = kit.settings();
        List<SectionCutPlan> sections = new ArrayList<>();
        for (String section : kit.usedSections()) {
            List<StockLength> rows = kit.catalog().stockFor(section);
            StockLength stock = rows.stream().filter(r -> r.origin() == Origin.MILL)
                    .max(java.util.Comparator.comparingDouble(StockLength::lengthMm)).orElseThrow();
            boolean priced = rows.stream().filter(r -> r.origin() == Origin.MILL).allMatch(r -> r.price() != null)
                    && rows.stream().anyMatch(r -> r.price() != null && r.price() > 0);
            List<CutPattern> patterns = new ArrayList<>();
            double value = 0;
            for (Bar bar : kit.bars()) {
                if (bar.section().equals(section)) {
                    double offcut = Math.max(0, stock.lengthMm() - 2 * settings.trimMm() - bar.lengthMm()
                            - settings.kerfMm());
                    patterns.add(new CutPattern(stock.lengthMm(), Origin.MILL, bar.quantity(),
                            List.of(new Cut(bar.mark(), bar.lengthMm())), offcut,
                            offcut > 0 && offcut >= settings.minRemnantMm() ? "remnant" : "scrap"));
                    value += bar.quantity() * (priced ? stock.price() : stock.lengthMm());
                }
            }
            sections.add(new SectionCutPlan(section, settings.kerfMm(), settings.trimMm(), settings.minRemnantMm(),
                    priced ? "cost" : "length", Status.FEASIBLE, null, value, 0.0, 1.0,
                    patterns.stream().mapToInt(CutPattern::count).sum(), patterns, List.of()));
        }
        CutPlan plan = new CutPlan(sections);
        CutPlanValidator.validate(kit, plan);
        return plan;
    }

    /**
     * A lower bound on the bundles, counted without the nesting code: a piece that fits in no other piece (worst-case
     * outside diameter + clearance above every other piece's worst-case bore, or longer than every such piece less
     * its two end allowances) is the host of a bundle of its own. Sizes are the shared validator's rule.
     */
    static int piecesWithoutAHost(Kit kit, CutPlan cuts) {
        var s = kit.settings();
        List<double[]> pieces = new ArrayList<>(); // outside, bore, length
        for (SectionCutPlan sp : cuts.sections()) {
            double[] sizes = NestPlanValidator.sizes(kit.catalog().section(sp.section()).orElseThrow(),
                    s.nestTolerance());
            for (CutPattern p : sp.patterns()) {
                for (Cut c : p.cuts()) {
                    for (int i = 0; i < p.count(); i++) {
                        pieces.add(new double[] {sizes[0], sizes[1], c.lengthMm()});
                    }
                }
            }
        }
        int alone = 0;
        for (double[] p : pieces) {
            boolean host = pieces.stream().anyMatch(q -> q != p && p[0] + s.nestClearanceMm() <= q[1]
                    && p[2] <= q[2] - 2 * s.nestEndAllowanceMm());
            alone += host ? 0 : 1;
        }
        return alone;
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
        int alone = piecesWithoutAHost(kit, cuts);
        assertThat(alone).isPositive();
        assertThat(plan.bundles().size()).as("at least the %d pieces that fit in no other piece", alone)
                .isGreaterThanOrEqualTo(alone).isLessThan(pieces);
        assertThat(plan.lowerBound()).as("the plan's bound is no weaker than the hand count").isGreaterThanOrEqualTo(
                alone - 1e-9);
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
