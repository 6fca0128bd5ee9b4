package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import kitwright.io.KitFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * No user file is ever overwritten or deleted: {@code --json FILE} and {@code --out DIR} are never inputs of the
 * run, never hold one, and replace only what kitwright wrote (README, output folders). Every refusal comes before any
 * planning (no progress lines), exit code 2, with the input untouched.
 */
class OutputGuardsTest {
    private static final String BARS = "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,4\n";

    @TempDir
    Path dir;

    @Test
    void jsonOntoAnInputOfTheRunIsRefusedEvenWithForce() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);

        CliRun run = CliRun.of("cut", kit.toString(), "--json", kit.resolve("bars.csv").toString(), "--force");
        CliRun catalog = CliRun.of("cut", "--bars", kit.resolve("bars.csv").toString(), "--stock",
                kit.resolve("stock.csv").toString(), "--json", kit.resolve("stock.csv").toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("bars.csv: this is an input of the run").doesNotContain("lower bound");
        assertThat(catalog.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(catalog.err()).contains("stock.csv: this is an input of the run");
        assertThat(kit.resolve("bars.csv")).hasContent(BARS.strip());
        assertThat(kit.resolve("stock.csv")).hasContent(KitFiles.STOCK.strip());
    }

    @Test
    void jsonOntoAFileKitwrightDidNotWriteNeedsForce() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);
        Path notes = Files.writeString(dir.resolve("notes.json"), "{\"sections\": []}\n");

        CliRun refused = CliRun.of("nest", kit.toString(), "--json", notes.toString());

        assertThat(refused.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(refused.err()).contains("notes.json: the file exists and was not written by kitwright")
                .contains("give --force").doesNotContain("nest:");
        assertThat(notes).hasContent("{\"sections\": []}");

        CliRun forced = CliRun.of("nest", kit.toString(), "--json", notes.toString(), "--force");

        assertThat(forced.exitCode()).as(forced.err()).isZero();
        assertThat(Files.readString(notes)).startsWith("{\n  \"tolerance\": ");
    }

    @Test
    void jsonKitwrightWroteIsReplacedByTheNextRunOfAnyCommand() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);
        Path json = dir.resolve("plan.json");

        assertThat(CliRun.of("cut", kit.toString(), "--json", json.toString()).exitCode()).isZero();
        CliRun again = CliRun.of("cut", kit.toString(), "--json", json.toString(), "--kerf", "3");
        CliRun nest = CliRun.of("nest", kit.toString(), "--json", json.toString());

        assertThat(again.exitCode()).as(again.err()).isZero();
        assertThat(nest.exitCode()).as(nest.err()).isZero();
        assertThat(Files.readString(json)).startsWith("{\n  \"tolerance\": ");
    }

    @Test
    void jsonInsideTheOutputFolderIsRefused() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);
        Path out = dir.resolve("out");

        CliRun run = CliRun.of("cut", kit.toString(), "--out", out.toString(), "--json",
                out.resolve("cut.json").toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("cut.json: the file lies inside --out");
        assertThat(out).doesNotExist();
    }

    @Test
    void anOutputFolderHoldingTheKitIsRefusedAndTheKitKept() throws Exception {
        Path previous = dir.resolve("prev");
        Path kit = KitFiles.kit(previous.resolve("mykit"), BARS);
        Files.writeString(previous.resolve(".kitwright-output"), "# kitwright output folder\nmykit/bars.csv\n"
                + "mykit/stock.csv\nmykit/materials.csv\n");

        CliRun plan = CliRun.of("plan", kit.toString(), "--out", previous.toString());
        CliRun viaDots = CliRun.of("plan", kit.toString(), "--out", kit.resolve("..").toString());
        CliRun itself = CliRun.of("cut", kit.toString(), "--out", kit.toString());

        assertThat(plan.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(plan.err()).contains("prev: the folder holds ").contains("an input of the run")
                .doesNotContain("plan: cutting");
        assertThat(viaDots.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(itself.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(kit.resolve("bars.csv")).hasContent(BARS.strip());
    }

    @Test
    void anOutputFolderHoldingACatalogOfTheKitIsRefused() throws Exception {
        Path catalogs = dir.resolve("catalogs");
        KitFiles.write(catalogs, "stock.csv", KitFiles.STOCK);
        KitFiles.write(catalogs, "materials.csv", KitFiles.MATERIALS);
        Path kit = KitFiles.write(dir.resolve("kit"), "bars.csv", BARS).getParent();
        KitFiles.write(kit, "kit.json", "{\"stockCatalog\": \"../catalogs/stock.csv\"}");
        Files.writeString(catalogs.resolve(".kitwright-output"), "# kitwright output folder\nstock.csv\n"
                + "materials.csv\n");

        CliRun run = CliRun.of("plan", kit.toString(), "--out", catalogs.toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("stock.csv, an input of the run");
        assertThat(catalogs.resolve("stock.csv")).hasContent(KitFiles.STOCK.strip());
    }

    @Test
    void aDanglingSymbolicLinkAsOutIsToldBeforePlanning() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);
        Path link = Files.createSymbolicLink(dir.resolve("out"), dir.resolve("gone"));

        CliRun run = CliRun.of("plan", kit.toString(), "--out", link.toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("out: this is a symbolic link to " + dir.resolve("gone")
                + ", which does not exist").doesNotContain("plan: cutting").doesNotContain("\tat ");
        assertThat(Files.isSymbolicLink(link)).isTrue();
    }

    @Test
    void anEmptyMarkerOrAMarkerFolderDoesNotMakeAFolderKitwrights() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);
        Path emptyMarker = Files.createDirectories(dir.resolve("a"));
        Files.writeString(emptyMarker.resolve(".kitwright-output"), "");
        Files.writeString(emptyMarker.resolve("letter.txt"), "keep");
        Path markerFolder = Files.createDirectories(dir.resolve("b").resolve(".kitwright-output"));
        Files.writeString(markerFolder.resolveSibling("letter.txt"), "keep");

        CliRun first = CliRun.of("plan", kit.toString(), "--out", emptyMarker.toString());
        CliRun second = CliRun.of("plan", kit.toString(), "--out", markerFolder.getParent().toString());

        assertThat(first.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(first.err()).contains("its .kitwright-output is not a marker kitwright wrote");
        assertThat(second.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(emptyMarker.resolve("letter.txt")).hasContent("keep");
        assertThat(markerFolder.resolveSibling("letter.txt")).hasContent("keep");
    }

    @Test
    void aFileTheUserAddedToAPlanFolderStopsTheNextRun() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);
        Path out = dir.resolve("out");
        assertThat(CliRun.of("plan", kit.toString(), "--out", out.toString()).exitCode()).isZero();
        assertThat(Files.readString(out.resolve(".kitwright-output"))).contains("\nreport.html\n", "\ncut-list.csv\n");
        Files.writeString(out.resolve("my-notes.txt"), "keep");

        CliRun run = CliRun.of("plan", kit.toString(), "--out", out.toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("the folder holds files kitwright did not write: my-notes.txt");
        assertThat(out.resolve("my-notes.txt")).hasContent("keep");
        Files.delete(out.resolve("my-notes.txt"));
        assertThat(CliRun.of("plan", kit.toString(), "--out", out.toString()).exitCode()).isZero();
    }

    @Test
    void compareOfOneKitTwiceIsRefused() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);

        CliRun run = CliRun.of("compare", kit.toString(), dir.resolve("x/../kit").toString(), "--out",
                dir.resolve("cmp").toString());

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("command line: KIT_DIR: the kit " + dir.resolve("x/../kit") + " is given twice");
        assertThat(dir.resolve("cmp")).doesNotExist();
    }

    @Test
    void aKerfOptionLongerThanTheStockIsInvalidInput() throws Exception {
        Path kit = KitFiles.kit(dir.resolve("kit"), BARS);

        CliRun run = CliRun.of("cut", kit.toString(), "--kerf", "13000");

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("command line: --kerf: the kerf 13000 mm is not shorter than the stock"
                + " length 3200 mm of CHS 48.3x3.2");
    }
}
