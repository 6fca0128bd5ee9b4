package kitwright.metrics;

import static kitwright.metrics.MetricsFixtures.CHS_48;
import static kitwright.metrics.MetricsFixtures.CHS_60;
import static kitwright.metrics.MetricsFixtures.pattern;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class KitMetricsCalculatorTest {
    private static final Cut A = new Cut("A", 2900);
    private static final Cut B = new Cut("B", 1800);
    private static final Cut C = new Cut("C", 2950);

    /**
     * 3 x 12 m (4 A each, 382 mm scrap), 1 x 6 m (2 B, 2386 mm remnant), 1 rack 2.5 m (1 B, 688 mm remnant);
     * 2 x 6 m of CHS 60.3 (2 C each, 86 mm scrap). Checked by the shared cut validator against the fixture kit.
     *
     * <p>Value and bound by hand. CHS 48.3: 3 x 110 + 60 + 0 = 390. An A (2900 + 2 kerf) goes four to a 12 m piece
     * (4 x 2902 = 11 608 &lt;= 12 000 - 10 + 2) at 27.50 each, two to a 6 m piece (3 x 2902 &gt; 5992) at 30.00, and
     * not into a 2.5 m rack piece; so 12 A cost at least 12 x 27.50 = 330, and the three B could go free into the
     * three rack pieces: bound 330, the plan FEASIBLE with a gap of 60 / 390. CHS 60.3: two C a 6 m piece
     * (2 x 2952 &lt;= 5992 &lt; 3 x 2952), so four C need two pieces: 160, OPTIMAL.
     */
    static CutPlan plan() {
        CutPlan plan = new CutPlan(List.of(
                section(CHS_48, 390, 330, pattern(12000, Origin.MILL, 3, A, A, A, A),
                        pattern(6000, Origin.MILL, 1, B, B), pattern(2500, Origin.RACK, 1, B)),
                section(CHS_60, 160, 160, pattern(6000, Origin.MILL, 2, C, C))));
        CutPlanValidator.validate(MetricsFixtures.kit(Map.of()), plan);
        return plan;
    }

    static SectionCutPlan section(String name, double value, double bound, kitwright.cutting.CutPattern... patterns) {
        int pieces = 0;
        for (var p : patterns) {
            pieces += p.count();
        }
        double gap = (value - bound) / value;
        return new SectionCutPlan(name, 2, 5, 500, "cost", gap > 0 ? Status.FEASIBLE : Status.OPTIMAL, null, value,
                bound, gap, pieces, List.of(patterns), List.of());
    }

    @Test
    @DisplayName("The fixture's offcuts follow the saw model (offcut = stock - 2 trim - lengths - pieces x kerf), "
            + "hand-computed")
    void fixtureFollowsTheSawModel() {
        // hand-computed, not by the fixture's formula: 12000 - 10 - 4 x 2900 - 4 x 2 = 382 (scrap, below 500);
        // 6000 - 10 - 2 x 1800 - 2 x 2 = 2386; 2500 - 10 - 1800 - 2 = 688 (remnant); 6000 - 10 - 5900 - 4 = 86
        List<kitwright.cutting.CutPattern> p = plan().sections().get(0).patterns();
        assertThat(p.get(0).offcutMm()).isEqualTo(382.0);
        assertThat(p.get(0).offcutKind()).isEqualTo("scrap");
        assertThat(p.get(1).offcutMm()).isEqualTo(2386.0);
        assertThat(p.get(1).offcutKind()).isEqualTo("remnant");
        assertThat(p.get(2).offcutMm()).isEqualTo(688.0);
        assertThat(p.get(2).offcutKind()).isEqualTo("remnant");
        assertThat(plan().sections().get(1).patterns().get(0).offcutMm()).isEqualTo(86.0);
        // and the shared validator, which recomputes every offcut from the saw model, rejects one 1 mm off
        kitwright.cutting.CutPattern first = p.get(0);
        CutPlan wrong = new CutPlan(List.of(section(CHS_48, 390, 330, new kitwright.cutting.CutPattern(12000,
                Origin.MILL, 3, first.cuts(), 383, "scrap"), p.get(1), p.get(2)), plan().sections().get(1)));
        org.assertj.core.api.Assertions.assertThatThrownBy(
                () -> CutPlanValidator.validate(MetricsFixtures.kit(Map.of()), wrong))
                .isInstanceOf(AssertionError.class).hasMessageContaining("offcut");
    }

    @Test
    @DisplayName("Embodied carbon = bought mass x the material's factor from materials.csv (rack offcuts excluded)")
    void embodiedCarbonIsBoughtMassTimesFactor() {
        Map<String, Material> materials = MetricsFixtures.materials();
        KitMetrics m = KitMetricsCalculator.of(MetricsFixtures.kit(materials), plan());
        // Bought: 42 m of CHS 48.3x3.2 and 12 m of CHS 60.3x3.2; the 2.5 m rack piece is not bought.
        // EN 10219-2 table masses (from memory, src/docs/sources.md): 3.56 kg/m and 4.51 kg/m, each to 0.01 kg/m.
        double tableMass = 42 * 3.56 + 12 * 4.51;
        assertThat(m.boughtMassKg()).isCloseTo(tableMass, within(54 * 0.01));
        // The factor and its source are the ones in stock-catalogs/materials.csv (read by the project's reader).
        Material steel = materials.get("steel");
        assertThat(m.co2eKg()).isCloseTo(m.boughtMassKg() * steel.co2eKgPerKg(), within(1e-9));
        assertThat(m.co2eKg()).isCloseTo((42 * 3.56 + 12 * 4.51) * steel.co2eKgPerKg(),
                within(54 * 0.01 * steel.co2eKgPerKg()));
        assertThat(m.carbon()).singleElement().satisfies(c -> {
            assertThat(c.material()).isEqualTo("steel");
            assertThat(c.co2eKgPerKg()).isEqualTo(steel.co2eKgPerKg());
            assertThat(c.source()).isEqualTo(steel.source()).contains("EN 1993-1-1").containsIgnoringCase("CO2e");
            assertThat(c.boughtMassKg()).isEqualTo(m.boughtMassKg());
        });
        assertThat(m.boughtPieces()).isEqualTo(6);
        assertThat(m.boughtLengthMm()).isEqualTo(54000.0);
    }

    @Test
    @DisplayName("Stock, cost and offcut percentages of the stock length cut")
    void stockCostAndWaste() {
        KitMetrics m = KitMetricsCalculator.of(MetricsFixtures.kit(MetricsFixtures.materials()), plan());
        assertThat(m.stockPieces()).isEqualTo(7);
        assertThat(m.stockLengthMm()).isEqualTo(56500.0);
        assertThat(m.cost()).isEqualTo(3 * 110 + 60 + 0 + 2 * 80.0);
        // offcut 3*382 + 2386 + 688 + 2*86 = 4392; scrap 1146 + 172 = 1318; remnant 3074
        assertThat(m.offcutPct()).isCloseTo(100.0 * 4392 / 56500, within(1e-9));
        assertThat(m.scrapPct()).isCloseTo(100.0 * 1318 / 56500, within(1e-9));
        assertThat(m.remnantPct()).isCloseTo(100.0 * 3074 / 56500, within(1e-9));
        assertThat(m.scrapPct() + m.remnantPct()).isCloseTo(m.offcutPct(), within(1e-9));
    }

    @Test
    @DisplayName("Kit mass = bars x cut length x mass per metre + joints")
    void kitMass() {
        Map<String, Material> materials = MetricsFixtures.materials();
        Kit kit = MetricsFixtures.kit(materials);
        double m48 = Math.PI * (48.3 - 3.2) * 3.2 * 7850e-6;
        double m60 = Math.PI * (60.3 - 3.2) * 3.2 * 7850e-6;
        double expected = (12 * 2.9 + 3 * 1.8) * m48 + 4 * 2.95 * m60 + 8 * 1.5;
        assertThat(KitMetricsCalculator.of(kit, plan()).kitMassKg()).isCloseTo(expected, within(1e-9));
    }

    @Test
    @DisplayName("Reuse ratio from structures on a hand-made case: 300 bars serving 750 members = 2.5 (src/docs/sources.md)")
    void reuseRatio() {
        // Kit quantity per mark is the largest count any one structure needs: A 200, B 100 -> 300 bars.
        Kit base = MetricsFixtures.kit(Map.of());
        Kit kit = new Kit(null, KitSettings.defaults("reuse"),
                List.of(MetricsFixtures.bar("A", CHS_48, 2000, 200, 200),
                        MetricsFixtures.bar("B", CHS_48, 1500, 100, 100)),
                MetricsFixtures.structures("pavilion", "A", 200, "pavilion", "B", 100,
                        "stage roof", "A", 150, "stage roof", "B", 100,
                        "tower", "A", 200),
                List.of(), base.catalog(), Map.of(), List.of(), List.of());
        KitMetrics m = KitMetricsCalculator.of(kit, new CutPlan(List.of()));
        assertThat(m.bars()).isEqualTo(300);
        assertThat(m.members()).isEqualTo(750);
        assertThat(m.reuseRatio()).isEqualTo(2.5);
    }

    @Test
    @DisplayName("Reuse ratio from structures.csv read by the kit reader: 300 bars serving 750 members = 2.5")
    void reuseRatioFromStructuresCsv(@TempDir Path dir) throws Exception {
        Path catalog = Path.of("stock-catalogs", "steel-chs.csv").toAbsolutePath();
        Files.writeString(dir.resolve("kit.json"), "{\"name\": \"reuse\", \"stockCatalog\": \""
                + catalog.toString().replace("\\", "/") + "\"}\n");
        // Quantities left blank: the reader takes the largest count any one structure needs (A 200, B 100).
        Files.writeString(dir.resolve("bars.csv"), "mark,section,length_mm,quantity\n"
                + "A,CHS 48.3x3.2,2000,\nB,CHS 48.3x3.2,1500,\n");
        Files.writeString(dir.resolve("structures.csv"), "structure,mark,count\n"
                + "pavilion,A,200\npavilion,B,100\nstage roof,A,150\nstage roof,B,100\ntower,A,200\n");
        Kit kit = KitReader.read(dir);
        KitMetrics m = KitMetricsCalculator.of(kit, new CutPlan(List.of()));
        assertThat(m.bars()).isEqualTo(300);
        assertThat(m.members()).isEqualTo(750);
        assertThat(m.reuseRatio()).as("src/docs/sources.md worked figure").isEqualTo(2.5);
    }

    @Test
    @DisplayName("Without structures.csv there are no members and no reuse ratio (null, as check has it);"
            + " without materials masses are null")
    void withoutStructuresOrMaterials() {
        Kit kit = new Kit(null, KitSettings.defaults("plain"),
                List.of(MetricsFixtures.bar("A", CHS_48, 2900, 12, 10), MetricsFixtures.bar("B", CHS_48, 1800, 3, 3)),
                List.of(), List.of(), MetricsFixtures.catalog(), Map.of(), List.of(), List.of());
        KitMetrics m = KitMetricsCalculator.of(kit, plan());
        assertThat(m.members()).isNull();
        assertThat(m.reuseRatio()).isNull();
        assertThat(m.kitMassKg()).isNull();
        assertThat(m.usedStockMassKg()).isNull();
        assertThat(m.boughtMassKg()).isNull();
        assertThat(m.co2eKg()).isNull();
        assertThat(m.carbon()).isEmpty();
    }

    @Test
    @DisplayName("An unpriced rack offcut costs nothing; an unpriced mill row makes the cost unknown")
    void unpricedRows() {
        Kit kit = MetricsFixtures.kit(Map.of());
        java.util.function.Function<List<kitwright.model.StockLength>, Kit> with = rows -> new Kit(null,
                kit.settings(), kit.bars(), List.of(), List.of(), new kitwright.model.TubeCatalog(
                        kit.catalog().file(), kit.catalog().sections(), rows), Map.of(), List.of(), List.of());
        List<kitwright.model.StockLength> rows = new java.util.ArrayList<>(kit.catalog().stock());
        rows.set(2, new kitwright.model.StockLength(CHS_48, 2500, null, 3, Origin.RACK));
        assertThat(KitMetricsCalculator.stockCost(with.apply(rows), plan())).isEqualTo(550.0);
        rows.set(0, new kitwright.model.StockLength(CHS_48, 6000, null, null, Origin.MILL));
        assertThat(KitMetricsCalculator.stockCost(with.apply(rows), plan())).isNull();
    }

    @Test
    @DisplayName("Used stock mass = mill and rack pieces cut; bought mass = mill only (EN 10219-2 table masses)")
    void usedStockMassCountsTheRackOffcutsTaken() {
        KitMetrics m = KitMetricsCalculator.of(MetricsFixtures.kit(MetricsFixtures.materials()), plan());
        // Cut: 42 m mill + 2.5 m rack of CHS 48.3x3.2, 12 m mill of CHS 60.3x3.2. EN 10219-2 table masses
        // (from memory, src/docs/sources.md): 3.56 kg/m and 4.51 kg/m, each to 0.01 kg/m.
        assertThat(m.usedStockMassKg()).isCloseTo(44.5 * 3.56 + 12 * 4.51, within(56.5 * 0.01));
        assertThat(m.usedStockMassKg() - m.boughtMassKg()).as("the 2.5 m rack piece")
                .isCloseTo(2.5 * 3.56, within(2.5 * 0.01));
    }

    @Test
    @DisplayName("Kit mass counts the spare bars a plan cuts beyond bars.csv, as the bundles carry them")
    void kitMassCountsTheSparesCut() {
        Kit kit = MetricsFixtures.kit(MetricsFixtures.materials());
        SectionCutPlan plain = plan().sections().get(0);
        List<kitwright.cutting.CutPattern> patterns = new java.util.ArrayList<>(plain.patterns());
        patterns.add(MetricsFixtures.pattern(6000, Origin.MILL, 1, A, A)); // the two spares of A
        CutPlan withSpares = new CutPlan(List.of(new SectionCutPlan(plain.section(), 2, 5, 500, "cost",
                Status.OPTIMAL, null, 450.0, 450.0, 0.0, plain.stockPieces() + 1, patterns,
                List.of(new kitwright.cutting.Spare("A", 2))), new SectionCutPlan(CHS_60, 2, 5, 500, "cost",
                Status.OPTIMAL, null, 160.0, 160.0, 0.0, 2, plan().sections().get(1).patterns(), List.of())));
        kitwright.validate.CutPlanValidator.validate(kit, withSpares);
        double m48 = Math.PI * (48.3 - 3.2) * 3.2 * 7850e-6; // EN 10219-2 mass formula, steel 7850 kg/m3
        assertThat(KitMetricsCalculator.of(kit, withSpares).kitMassKg() - KitMetricsCalculator.of(kit, plan())
                .kitMassKg()).isCloseTo(2 * 2.9 * m48, within(1e-9));
    }
}
