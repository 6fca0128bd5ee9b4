package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.StockLength;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;
import kitwright.model.VehicleType;
import kitwright.plan.JointClearance;
import kitwright.plan.KitSummary;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The shipped catalogs and sample kits say what the README and sample-kits/README.md promise. */
class SampleDataTest {
    private static final Path CATALOGS = Path.of("stock-catalogs");
    private static final List<String> CINEMA = List.of("cinema-6", "cinema-12", "cinema-20");

    @Test
    void steelCatalogOffersTheEn10219SizesIn6And12Metres() throws Exception {
        Map<String, Material> materials = MaterialsReader.read(CATALOGS.resolve("materials.csv"));
        TubeCatalog steel = TubeCatalogReader.read(CATALOGS.resolve("steel-chs.csv"));

        for (String size : List.of("26.9x2.6", "33.7x2.6", "42.4x2.6", "48.3x3.2", "60.3x3.2", "76.1x3.2",
                "88.9x3.2", "114.3x3.6")) {
            List<Double> lengths = steel.stockFor("CHS " + size).stream().filter(s -> s.origin() == Origin.MILL)
                    .map(StockLength::lengthMm).toList();
            assertThat(lengths).as(size).containsExactly(6000.0, 12000.0);
        }
        assertThat(steel.sections().values()).allMatch(s -> s.material().equals("steel") && s.weldBeadMm() == 1.0);
        assertThat(materials).containsKeys("steel", "aluminium", "acrylic");
        assertThat(materials.get("steel").densityKgM3()).as("EN 1993-1-1 §3.2.6").isEqualTo(7850);
    }

    @Test
    void longerStockIsCheaperPerMetreAndRackOffcutsAreLimitedAndCheap() throws Exception {
        for (String file : List.of("steel-chs.csv", "aluminium-tube.csv", "acrylic-tube.csv")) {
            TubeCatalog catalog = TubeCatalogReader.read(CATALOGS.resolve(file));
            for (String section : catalog.sections().keySet()) {
                List<StockLength> mill = catalog.stockFor(section).stream()
                        .filter(s -> s.origin() == Origin.MILL).toList();
                for (int i = 1; i < mill.size(); i++) {
                    assertThat(perMetre(mill.get(i))).as(section).isLessThan(perMetre(mill.get(i - 1)));
                }
                double cheapestMill = mill.stream().mapToDouble(SampleDataTest::perMetre).min().orElseThrow();
                catalog.stockFor(section).stream().filter(s -> s.origin() == Origin.RACK).forEach(rack -> {
                    assertThat(rack.available()).isNotNull().isPositive();
                    assertThat(perMetre(rack)).isLessThan(cheapestMill);
                });
            }
        }
        assertThat(TubeCatalogReader.read(CATALOGS.resolve("steel-chs.csv")).stock())
                .anyMatch(s -> s.origin() == Origin.RACK);
    }

    @Test
    void aluminiumAndAcrylicCatalogsGiveTolerancesForNesting() throws Exception {
        TubeCatalog aluminium = TubeCatalogReader.read(CATALOGS.resolve("aluminium-tube.csv"));
        TubeCatalog acrylic = TubeCatalogReader.read(CATALOGS.resolve("acrylic-tube.csv"));

        assertThat(aluminium.stock()).allMatch(s -> s.lengthMm() == 6000);
        assertThat(acrylic.stock().stream().map(StockLength::lengthMm).collect(Collectors.toSet()))
                .containsExactlyInAnyOrder(2000.0, 3000.0);
        assertThat(aluminium.sections().values()).allMatch(s -> s.odToleranceMm() != null
                && s.wallTolerancePct() != null);
        assertThat(acrylic.sections().values()).allMatch(s -> s.odToleranceMm() != null
                && s.wallTolerancePct() != null);
    }

    @Test
    void vehiclesCarryTheDomainNotesSizesAndTheirSources() throws Exception {
        List<VehicleType> vehicles = VehicleCatalogReader.read(CATALOGS.resolve("vehicles.csv"));

        // ISO 668 containers, inside sizes and payloads as the domain notes give them (common practice)
        assertThat(vehicles).anyMatch(v -> v.deckLengthMm() == 5898 && v.payloadKg() == 28200
                && v.source().contains("ISO 668"));
        assertThat(vehicles).anyMatch(v -> v.deckLengthMm() == 12032 && v.payloadKg() == 26700
                && v.source().contains("ISO 668"));
        assertThat(vehicles).anyMatch(v -> v.deckLengthMm() == 13600 && v.source().contains("96/53/EC"));
        assertThat(vehicles).allMatch(v -> !v.source().isBlank());
        assertThat(CrateCatalogReader.read(CATALOGS.resolve("crates.csv"))).hasSizeGreaterThanOrEqualTo(3);
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"cinema-6", "cinema-12", "cinema-20", "alu-kiosk", "acrylic-vitrine"})
    void everySampleKitSaysItIsInventedAndStaysSmall(String name) throws Exception {
        Kit kit = KitReader.read(Path.of("sample-kits", name));

        assertThat(kit.settings().description()).contains("Invented demo data");
        assertThat(KitSummary.of(kit).bars()).isLessThan(1000);
        assertThat(kit.materials()).isNotEmpty();
    }

    @Test
    void theCinemaOptionsReshapeTheSameStructuresToTheirOwnMarks() throws Exception {
        Set<String> nestingChain = Set.of("CHS 88.9x3.2", "CHS 76.1x3.2", "CHS 60.3x3.2", "CHS 48.3x3.2",
                "CHS 33.7x2.6");
        Map<String, Integer> firstMembers = null;
        for (String name : CINEMA) {
            Kit kit = KitReader.read(Path.of("sample-kits", name));
            KitSummary summary = KitSummary.of(kit);
            Map<String, Integer> members = kit.structures().stream().collect(Collectors.groupingBy(
                    StructureCount::structure, Collectors.summingInt(StructureCount::count)));
            if (firstMembers == null) {
                firstMembers = members;
            }
            assertThat(members).as(name + ": members per structure").isEqualTo(firstMembers);
            assertThat(summary.bars()).as(name + ": bars").isBetween(200, 600);
            assertThat(kit.bars()).allMatch(b -> nestingChain.contains(b.section())
                    && b.lengthMm() >= 600 && b.lengthMm() <= 3000);
            // every member is exactly its mark's length: node to node minus the deduction at each end
            assertThat(kit.bars()).allSatisfy(b -> assertThat(b.lengthMm()).as(name + " " + b.mark())
                    .isEqualTo(b.nodeToNodeMm() - b.startDeductionMm() - b.endDeductionMm()));
            assertThat(kit.joints()).isNotEmpty();
        }
        assertThat(firstMembers).containsOnlyKeys("screen-frame", "ticket-canopy", "lighting-mast");
        List<Integer> marks = CINEMA.stream().map(n -> read(n).bars().size()).toList();
        assertThat(marks).containsExactly(6, 12, 20);
    }

    @Test
    void cinemaBarEndsClearTheirSpheresByTheInventedEndCone() throws Exception {
        // sample-kits/README.md: each tube end is a 40 mm end cone (the samples' invented joint system) on a sphere,
        // so a deduction is a joint's radius + 40 mm; every bar end then clears even the smallest sphere
        for (String name : CINEMA) {
            Kit kit = KitReader.read(Path.of("sample-kits", name));
            Set<Double> deductions = kit.joints().stream().map(j -> j.diameterMm() / 2 + 40)
                    .collect(Collectors.toSet());
            assertThat(kit.bars()).allSatisfy(b -> assertThat(List.of(b.startDeductionMm(), b.endDeductionMm()))
                    .as(name + " " + b.mark()).allMatch(deductions::contains));
            assertThat(JointClearance.warnings(kit)).as(name).isEmpty();
        }
    }

    @Test
    void sampleReadmeTellsTheCinemaOptionsAsTheDataHasThem() throws Exception {
        String readme = Files.readString(Path.of("sample-kits", "README.md"));
        for (String name : CINEMA) {
            KitSummary summary = KitSummary.of(read(name));
            assertThat(readme).as(name + " row").containsPattern("\\| `" + name + "` \\| " + summary.marks()
                    + " \\| " + summary.bars() + " \\| " + String.format(Locale.ROOT, "%.2f", summary.reuseRatio())
                    + " \\|");
            for (Joint joint : read(name).joints()) {
                assertThat(readme).contains(String.format(Locale.ROOT, "%.0f mm at an %s",
                        joint.diameterMm() / 2 + 40, joint.mark()));
            }
        }
        // a kit of parts: each option re-shapes the structures, a bar never fills a shorter member
        assertThat(readme).contains("every member is exactly the length of one of that option's marks")
                .doesNotContain("same members").doesNotContain("longest member").doesNotContain("35 mm");
    }

    private static Kit read(String name) {
        try {
            return KitReader.read(Path.of("sample-kits", name));
        } catch (InvalidInputException e) {
            throw new AssertionError(e.problems().toString(), e);
        }
    }

    private static double perMetre(StockLength stock) {
        return stock.price() / (stock.lengthMm() / 1000);
    }
}
