package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class KitReaderTest {
    private static final String STRUCTURES = """
            structure,mark,count
            pavilion,A1,12
            pavilion,B1,4
            stage,A1,8
            stage,B1,6
            """;

    @Test
    void quantityIsTheLargestCountOfAnyOneStructure(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,\nB1,CHS 33.7x2.6,1200,\n");
        KitFiles.write(dir, "structures.csv", STRUCTURES);

        Kit kit = KitReader.read(dir);

        assertThat(kit.bar("A1").orElseThrow().quantity()).isEqualTo(12);
        assertThat(kit.bar("B1").orElseThrow().quantity()).isEqualTo(6);
        assertThat(kit.bars()).allMatch(b -> b.surplus() == 0);
        assertThat(kit.structures()).hasSize(4);
    }

    @Test
    void jointRowsCountJointsAndSetNoBarQuantity(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,\nB1,CHS 33.7x2.6,1200,\n");
        KitFiles.write(dir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN1,90,1.5,20\n");
        KitFiles.write(dir, "structures.csv", STRUCTURES + "pavilion,N1,9\nstage,N1,14\n");

        Kit kit = KitReader.read(dir);

        assertThat(kit.bar("A1").orElseThrow().quantity()).isEqualTo(12);
        assertThat(kit.bar("B1").orElseThrow().quantity()).isEqualTo(6);
        assertThat(kit.bar("N1")).isEmpty();
        assertThat(kit.structures()).hasSize(6);
        assertThat(kit.barCounts()).hasSize(4).noneMatch(c -> c.mark().equals("N1"));
    }

    @Test
    void aStructureMarkInNeitherBarsNorJointsIsAnError(@TempDir Path dir) {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,\n");
        KitFiles.write(dir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN1,90,1.5,20\n");
        KitFiles.write(dir, "structures.csv", "structure,mark,count\npavilion,A1,12\npavilion,N2,3\n");

        assertThatThrownBy(() -> KitReader.read(dir))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .singleElement().asString().contains("structures.csv:3: mark: mark N2 is not in bars.csv"
                                + " or joints.csv"));
    }

    @Test
    void quantityIsTheSumWhenStructuresStandTogether(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,\nB1,CHS 33.7x2.6,1200,\n");
        KitFiles.write(dir, "structures.csv", STRUCTURES);
        KitFiles.write(dir, "kit.json", "{\"structuresStandTogether\": true}");

        Kit kit = KitReader.read(dir);

        assertThat(kit.bar("A1").orElseThrow().quantity()).isEqualTo(20);
        assertThat(kit.bar("B1").orElseThrow().quantity()).isEqualTo(10);
    }

    @Test
    void aLargerQuantityIsKeptAndTheSurplusIsSpares(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,15\nB1,CHS 33.7x2.6,1200,3\n");
        KitFiles.write(dir, "structures.csv", "structure,mark,count\npavilion,A1,12\n");

        Kit kit = KitReader.read(dir);

        Bar a1 = kit.bar("A1").orElseThrow();
        assertThat(a1.quantity()).isEqualTo(15);
        assertThat(a1.requiredQuantity()).isEqualTo(12);
        assertThat(a1.surplus()).isEqualTo(3);
        Bar b1 = kit.bar("B1").orElseThrow();
        assertThat(b1.requiredQuantity()).as("no structure uses B1: all spares").isZero();
    }

    @Test
    void withoutStructuresTheRequiredQuantityIsTheQuantity(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,7\n");

        Bar a1 = KitReader.read(dir).bar("A1").orElseThrow();

        assertThat(a1.requiredQuantity()).isEqualTo(7);
        assertThat(a1.surplus()).isZero();
    }

    @Test
    void cutLengthIsDerivedFromNodeToNodeMinusTheEndDeductions(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, """
                mark,section,length_mm,quantity,node_to_node_mm,tolerance_mm,note
                A1,CHS 48.3x3.2,,4,3000,0.5,top chord
                B1,CHS 33.7x2.6,1129.95,4,1200,,
                """);
        KitFiles.write(dir, "kit.json", "{\"endDeductionMm\": 35}");

        Kit kit = KitReader.read(dir);

        Bar a1 = kit.bar("A1").orElseThrow();
        assertThat(a1.lengthMm()).isEqualTo(2930.0);
        assertThat(a1.nodeToNodeMm()).isEqualTo(3000.0);
        assertThat(a1.toleranceMm()).isEqualTo(0.5);
        assertThat(a1.note()).isEqualTo("top chord");
        assertThat(kit.bar("B1").orElseThrow().lengthMm()).as("within 0.1 mm, kept as written").isEqualTo(1129.95);
    }

    @Test
    void withoutKitJsonEverySettingTakesItsDefault(@TempDir Path dir) throws Exception {
        Path kitDir = KitFiles.kit(dir.resolve("pavilion-kit"),
                "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,7\n");

        Kit kit = KitReader.read(kitDir);

        assertThat(kit.settings()).isEqualTo(KitSettings.defaults("pavilion-kit"));
        assertThat(kit.materials()).containsKey("steel");
        assertThat(kit.crates()).isEmpty();
        assertThat(kit.vehicles()).isEmpty();
        assertThat(kit.catalog().stock()).hasSize(4);
        assertThat(kit.dir()).isEqualTo(kitDir);
    }

    @Test
    void defaultedCatalogsBesideTheTubeCatalogMayBeAbsentButAreReadWhenPresent(@TempDir Path dir) throws Exception {
        Path kitDir = dir.resolve("kit");
        KitFiles.write(kitDir, "bars.csv", "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,7\n");
        KitFiles.write(kitDir, "kit.json", "{\"stockCatalog\": \"../catalogs/steel.csv\"}");
        KitFiles.write(dir, "catalogs/steel.csv", KitFiles.STOCK);

        Kit bare = KitReader.read(kitDir);
        assertThat(bare.materials()).as("no materials.csv beside the catalog: masses unknown").isEmpty();
        assertThat(bare.barMassKg(bare.bars().get(0))).isEmpty();

        KitFiles.write(dir, "catalogs/materials.csv", KitFiles.MATERIALS);
        KitFiles.write(dir, "catalogs/vehicles.csv", """
                vehicle,deck_length_mm,deck_width_mm,deck_height_mm,payload_kg,cost_per_trip,source
                van,3000,1700,1800,1000,150,common practice
                """);
        Kit full = KitReader.read(kitDir);
        assertThat(full.materials()).containsKey("steel");
        assertThat(full.vehicles()).hasSize(1);
        assertThat(full.catalog().file()).isEqualTo(dir.resolve("catalogs/steel.csv"));
    }

    @Test
    void looseFilesMakeAKitWithoutStructures(@TempDir Path dir) throws Exception {
        Path bars = KitFiles.write(dir, "my-bars.csv", "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,2400,7\n");
        Path stock = KitFiles.write(dir, "my-stock.csv", KitFiles.STOCK);

        Kit kit = KitReader.fromFiles(bars, stock, null, KitSettings.defaults("loose").withTrimMm(10));

        assertThat(kit.dir()).isNull();
        assertThat(kit.bars()).hasSize(1);
        assertThat(kit.materials()).isEmpty();
        assertThat(kit.settings().trimMm()).isEqualTo(10);
    }

    @Test
    void looseFilesAreCheckedAgainstTheTrimGiven(@TempDir Path dir) {
        Path bars = KitFiles.write(dir, "bars.csv", "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,11990,7\n");
        Path stock = KitFiles.write(dir, "stock.csv", KitFiles.STOCK);
        Path materials = KitFiles.write(dir, "materials.csv", KitFiles.MATERIALS);

        assertThatThrownBy(() -> KitReader.fromFiles(bars, stock, materials,
                KitSettings.defaults("loose").withTrimMm(10)))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .singleElement().asString()
                        .contains("bars.csv:2: length_mm: mark A1 is 11990 mm long, more than the usable 11980 mm"));
    }

    @Test
    void everyProblemOfEveryFileIsReportedAtOnce(@TempDir Path dir) {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA1,CHS 48.3x3.2,abc,7\nB1,CHS 48.3x3.2,100,-1\n");
        KitFiles.write(dir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN1,90,x,1\n");

        assertThatThrownBy(() -> KitReader.read(dir))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .extracting(p -> p.file().getFileName() + ":" + p.line() + ":" + p.column())
                        .containsExactly("bars.csv:2:length_mm", "bars.csv:3:quantity", "joints.csv:2:mass_kg"));
    }

    @Test
    void aMissingKitFolderIsOneProblem(@TempDir Path dir) {
        assertThatThrownBy(() -> KitReader.read(dir.resolve("nowhere")))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .singleElement().asString().endsWith("nowhere: folder not found (expected a kit folder"
                                + " holding bars.csv and kit.json)"));
    }
}
