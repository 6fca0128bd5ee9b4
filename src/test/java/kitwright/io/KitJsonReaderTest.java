package kitwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.stream.Stream;
import kitwright.model.JointBox;
import kitwright.model.KitSettings;
import kitwright.model.MiscutAllowance;
import kitwright.model.NestTolerance;
import kitwright.model.SparesPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class KitJsonReaderTest {

    @Test
    void everyKeyIsRead(@TempDir Path dir) throws Exception {
        Path file = KitFiles.write(dir, "kit.json", """
                {
                  "name": "tower",
                  "description": "a tower kit",
                  "stockCatalog": "../catalogs/steel.csv",
                  "materials": "/data/materials.csv",
                  "crateCatalog": "crates/timber.csv",
                  "vehicleCatalog": "trucks.csv",
                  "kerfMm": 3.0,
                  "trimMm": 8,
                  "minRemnantMm": 750,
                  "timeLimitSeconds": 30,
                  "structuresStandTogether": true,
                  "endDeductionMm": 42.5,
                  "nestTolerance": "nominal",
                  "nestClearanceMm": 3,
                  "nestEndAllowanceMm": 20,
                  "maxBundleMassKg": 50,
                  "jointBox": {"lengthMm": 800, "widthMm": 600, "heightMm": 400, "maxMassKg": 30},
                  "spares": {"lossRatePerCycle": 0.02, "cycles": 10, "serviceLevel": 0.95},
                  "miscutAllowance": {"piecesPerMark": 1, "percent": 2.5}
                }
                """);

        KitJson json = KitJsonReader.read(file, dir);

        KitSettings s = json.settings();
        assertThat(s).isEqualTo(new KitSettings("tower", "a tower kit", 3.0, 8, 750, 30, true, 42.5,
                NestTolerance.NOMINAL, 3, 20, 50.0, new JointBox(800, 600, 400, 30),
                new SparesPolicy(0.02, 10, 0.95), new MiscutAllowance(1, 2.5)));
        assertThat(json.stockCatalog()).isEqualTo(dir.getParent().resolve("catalogs/steel.csv"));
        assertThat(json.materialsFile()).isEqualTo(Path.of("/data/materials.csv"));
        assertThat(json.crateCatalogFile()).isEqualTo(dir.resolve("crates/timber.csv"));
        assertThat(json.vehicleCatalogFile()).isEqualTo(dir.resolve("trucks.csv"));
    }

    @Test
    void aMiscutAllowanceMayGiveEitherKeyAndAnEmptyOneAddsNothing(@TempDir Path dir) throws Exception {
        Path pieces = KitFiles.write(dir, "pieces.json", "{\"miscutAllowance\": {\"piecesPerMark\": 2}}");
        Path percent = KitFiles.write(dir, "percent.json", "{\"miscutAllowance\": {\"percent\": 5}}");
        Path empty = KitFiles.write(dir, "empty.json", "{\"miscutAllowance\": {}}");

        assertThat(KitJsonReader.read(pieces, dir).settings().miscutAllowance()).isEqualTo(new MiscutAllowance(2, 0));
        assertThat(KitJsonReader.read(percent, dir).settings().miscutAllowance()).isEqualTo(new MiscutAllowance(0, 5));
        assertThat(KitJsonReader.read(empty, dir).settings().miscutAllowance()).isEqualTo(MiscutAllowance.NONE);
    }

    @Test
    void anEmptyObjectGivesTheDefaultsAndCatalogsBesideTheTubeCatalog(@TempDir Path dir) throws Exception {
        Path kitDir = dir.resolve("kiosk");
        Path file = KitFiles.write(kitDir, "kit.json", "{}");

        KitJson json = KitJsonReader.read(file, kitDir);

        assertThat(json.settings()).isEqualTo(KitSettings.defaults("kiosk"));
        assertThat(json.stockCatalog()).isEqualTo(kitDir.resolve("stock.csv"));
        assertThat(json.materials()).isNull();
        assertThat(json.materialsFile()).isEqualTo(kitDir.resolve("materials.csv"));
        assertThat(json.crateCatalogFile()).isEqualTo(kitDir.resolve("crates.csv"));
        assertThat(json.vehicleCatalogFile()).isEqualTo(kitDir.resolve("vehicles.csv"));
    }

    @Test
    void aPartialJointBoxKeepsTheOtherDefaultsAndNullMeansNotGiven(@TempDir Path dir) throws Exception {
        Path file = KitFiles.write(dir, "kit.json",
                "{\"jointBox\": {\"maxMassKg\": 20}, \"maxBundleMassKg\": null, \"kerfMm\": null}");

        KitSettings s = KitJsonReader.read(file, dir).settings();

        assertThat(s.jointBox()).isEqualTo(new JointBox(600, 400, 300, 20));
        assertThat(s.maxBundleMassKg()).isNull();
        assertThat(s.kerfMm()).isEqualTo(KitSettings.DEFAULT_KERF_MM);
    }

    @Test
    void problemsCarryTheParserLineAndTheKey(@TempDir Path dir) {
        Path file = KitFiles.write(dir, "kit.json", """
                {
                  "name": "x",
                  "jointBox": {
                    "lengthMm": 0,
                    "depthMm": 300
                  },
                  "timeLimitSeconds": 0
                }
                """);

        assertThatThrownBy(() -> KitJsonReader.read(file, dir))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .extracting(p -> p.line() + " " + p.column())
                        .containsExactly("4 jointBox.lengthMm", "5 jointBox.depthMm", "7 timeLimitSeconds"));
    }

    @Test
    void aFileThatIsNotAnObjectSaysWhatItHolds(@TempDir Path dir) {
        Path file = KitFiles.write(dir, "kit.json", "[1, 2]");

        assertThatThrownBy(() -> KitJsonReader.read(file, dir))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .singleElement().asString()
                        .endsWith("kit.json:1: the file holds a list (expected a JSON object such as"
                                + " {\"kerfMm\": 2.0})"));
    }

    static Stream<Arguments> jsonSlips() {
        return Stream.of(
                Arguments.of("a comment",
                        "{\"kerfMm\": 2.0, // band saw\n\"trimMm\": 5}", "a comment (JSON has no comments"),
                Arguments.of("NaN", "{\"kerfMm\": NaN}", "Non-standard token 'NaN'"),
                Arguments.of("a trailing comma", "{\"kerfMm\": 2.0,\n}",
                        "with no comma after the last entry"),
                Arguments.of("single quotes", "{'kerfMm': 2.0}",
                        "keys go in double quotes"),
                Arguments.of("two objects", "{}\n{}",
                        "more text after the closing }"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("jsonSlips")
    void brokenJsonIsToldInPlainWordsWithoutTheParserAdviceToProgrammers(String slip, String text, String told,
                                                                         @TempDir Path dir) {
        Path file = KitFiles.write(dir, "kit.json", text);
        assertThatThrownBy(() -> KitJsonReader.read(file, dir))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .singleElement().asString().contains("the file is not valid JSON: ").contains(told)
                        .doesNotContain("Feature").doesNotContain("enable").doesNotContain("`"));
    }
}
