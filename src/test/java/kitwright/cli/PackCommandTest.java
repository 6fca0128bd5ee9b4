package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class PackCommandTest {
    @TempDir
    Path temp;

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        CommandLine cl = KitwrightCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    @DisplayName("pack a sample kit: lists, manifests, drawings and JSON written, byte-identical on a second run")
    void packSampleKit() throws Exception {
        Path first = temp.resolve("first");
        Run run = run("pack", "sample-kits/cinema-6", "--out", first.toString(), "--json",
                temp.resolve("first.json").toString());
        assertThat(run.code()).as(run.err()).isZero();
        WrittenPlans.logisticsFolder(Path.of("sample-kits", "cinema-6"), first);
        assertThat(run.out()).contains("Crates: ").contains("lower bound").contains("Trips: ")
                .contains("EN 12195-1");
        assertThat(run.out()).as("plain ASCII on the console, numbers without digit groups")
                .matches("\\p{ASCII}*").containsPattern("centre of gravity \\d+(\\.\\d)? mm");
        assertThat(first.resolve("packing-lists.csv")).exists();
        assertThat(first.resolve("manifests.csv")).exists();
        assertThat(first.resolve("load-lists.csv")).exists();
        assertThat(Files.list(first.resolve("drawings")).map(p -> p.getFileName().toString()).toList())
                .anyMatch(n -> n.startsWith("crate-CRT-1")).anyMatch(n -> n.startsWith("deck-TRIP-1"));
        JsonNode json = new ObjectMapper().readTree(temp.resolve("first.json").toFile());
        List<String> keys = new ArrayList<>();
        json.fieldNames().forEachRemaining(keys::add);
        assertThat(keys).containsExactly("crates", "loads");

        Path second = temp.resolve("second");
        assertThat(run("pack", "sample-kits/cinema-6", "--out", second.toString(), "--json",
                temp.resolve("second.json").toString()).code()).isZero();
        assertThat(Files.readString(second.resolve("packing-lists.csv")))
                .isEqualTo(Files.readString(first.resolve("packing-lists.csv")));
        assertThat(Files.readString(second.resolve("manifests.csv")))
                .isEqualTo(Files.readString(first.resolve("manifests.csv")));
        assertThat(Files.readString(temp.resolve("second.json")))
                .isEqualTo(Files.readString(temp.resolve("first.json")));
    }

    @Test
    @DisplayName("--for STRUCTURE packs one structure; an unknown one is an input error naming the known ones")
    void forStructure() {
        Run run = run("pack", "sample-kits/cinema-6", "--for", "lighting-mast");
        assertThat(run.code()).as(run.err()).isZero();
        assertThat(run.out()).contains("packed for structure 'lighting-mast'");
        Run bad = run("pack", "sample-kits/cinema-6", "--for", "bridge");
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).contains("command line: --for: structure 'bridge' is not in structures.csv")
                .contains("lighting-mast");
    }

    @Test
    @DisplayName("a bundle no crate takes: exit 3, the reason on stderr, nothing written")
    void noFeasiblePlan() throws Exception {
        Path kit = temp.resolve("kit");
        Files.createDirectories(kit);
        Files.copy(Path.of("sample-kits/alu-kiosk/bars.csv"), kit.resolve("bars.csv"));
        Files.writeString(kit.resolve("crates.csv"), "crate,inner_length_mm,inner_width_mm,inner_height_mm,"
                + "outer_length_mm,outer_width_mm,outer_height_mm,tare_kg,max_gross_kg,stackable,max_top_load_kg,price\n"
                + "tiny,1000,600,500,1080,680,580,20,300,yes,300,40\n", StandardCharsets.UTF_8);
        Files.writeString(kit.resolve("kit.json"), "{\"stockCatalog\": \""
                + Path.of("stock-catalogs/aluminium-tube.csv").toAbsolutePath() + "\", \"crateCatalog\": \"crates.csv\","
                + " \"vehicleCatalog\": \"" + Path.of("stock-catalogs/vehicles.csv").toAbsolutePath() + "\"}",
                StandardCharsets.UTF_8);
        Path out = temp.resolve("out");
        Run run = run("pack", kit.toString(), "--out", out.toString());
        assertThat(run.code()).as(run.out() + run.err()).isEqualTo(3);
        assertThat(run.err()).contains("no crate plan").contains("fits no crate type");
        assertThat(out).doesNotExist();
    }

    @Test
    @DisplayName("crates but no vehicle that takes them: the packing lists are still printed and written, exit 3"
            + " with the reason")
    void cratesWithoutVehicle() throws Exception {
        Path kit = temp.resolve("kit");
        Files.createDirectories(kit);
        Files.copy(Path.of("sample-kits/alu-kiosk/bars.csv"), kit.resolve("bars.csv"));
        Files.writeString(kit.resolve("vehicles.csv"), "vehicle,deck_length_mm,deck_width_mm,deck_height_mm,"
                + "payload_kg,cost_per_trip,source\nhand-cart,1200,800,1000,150,10,invented\n", StandardCharsets.UTF_8);
        Files.writeString(kit.resolve("kit.json"), "{\"stockCatalog\": \""
                + Path.of("stock-catalogs/aluminium-tube.csv").toAbsolutePath() + "\", \"crateCatalog\": \""
                + Path.of("stock-catalogs/crates.csv").toAbsolutePath() + "\", \"vehicleCatalog\": \"vehicles.csv\"}",
                StandardCharsets.UTF_8);
        Path out = temp.resolve("out");
        Path json = temp.resolve("plan.json");
        Run run = run("pack", kit.toString(), "--out", out.toString(), "--json", json.toString());
        assertThat(run.code()).as(run.out() + run.err()).isEqualTo(3);
        assertThat(run.err()).contains("no load plan: crate CRT-1").contains("fits no vehicle");
        assertThat(run.out()).contains("Crates: 1").contains("Trips: none planned; INFEASIBLE: crate CRT-1")
                .doesNotContain("INFEASIBLE, gap");
        assertThat(Files.readString(out.resolve("packing-lists.csv"))).contains("CRT-1,");
        assertThat(new ObjectMapper().readTree(json.toFile()).path("loads").path("status").asText())
                .isEqualTo("INFEASIBLE");
    }

    @Test
    @DisplayName("an axle limit no place along the deck keeps: exit 3 naming it, the packing lists still written")
    void axleLimitNamed() throws Exception {
        Path kit = temp.resolve("kit");
        Files.createDirectories(kit);
        Files.copy(Path.of("sample-kits/alu-kiosk/bars.csv"), kit.resolve("bars.csv"));
        // an invented truck whose rear axle takes 1 kg above its unladen load
        Files.writeString(kit.resolve("vehicles.csv"), "vehicle,deck_length_mm,deck_width_mm,deck_height_mm,"
                + "payload_kg,cost_per_trip,source,front_support_mm,rear_support_mm,unladen_front_kg,unladen_rear_kg,"
                + "max_front_kg,max_rear_kg\ntruck,6200,2450,2400,2800,420,invented,-1150,3450,2700,2000,3600,2001\n",
                StandardCharsets.UTF_8);
        Files.writeString(kit.resolve("kit.json"), "{\"stockCatalog\": \""
                + Path.of("stock-catalogs/aluminium-tube.csv").toAbsolutePath() + "\", \"crateCatalog\": \""
                + Path.of("stock-catalogs/crates.csv").toAbsolutePath() + "\", \"vehicleCatalog\": \"vehicles.csv\"}",
                StandardCharsets.UTF_8);
        Path out = temp.resolve("out");
        Run run = run("pack", kit.toString(), "--out", out.toString());
        assertThat(run.code()).as(run.out() + run.err()).isEqualTo(3);
        assertThat(run.err()).contains("axle limit").contains("rear axle load").contains("2001 kg limit");
        assertThat(Files.readString(out.resolve("packing-lists.csv"))).contains("CRT-1,");
    }

    @Test
    @DisplayName("a section that cannot be cut: what can be packed is, exit 3 with the reason; --for needing it: exit 3")
    void sectionNotCut() throws Exception {
        Path kit = temp.resolve("kit");
        Files.createDirectories(kit);
        Files.copy(Path.of("sample-kits/alu-kiosk/bars.csv"), kit.resolve("bars.csv"));
        // One 6 m length of AL 30x2 for 28 bars of 600 and 900 mm (22.8 m): the section cannot be cut.
        Files.writeString(kit.resolve("stock.csv"), Files.readString(Path.of("stock-catalogs/aluminium-tube.csv"))
                .replace("AL 30x2,aluminium,30,2,6000,19.38,,mill", "AL 30x2,aluminium,30,2,6000,19.38,1,mill"));
        for (String catalog : List.of("materials.csv", "crates.csv", "vehicles.csv")) {
            Files.copy(Path.of("stock-catalogs", catalog), kit.resolve(catalog));
        }
        Run run = run("pack", kit.toString());
        assertThat(run.code()).as(run.err()).isEqualTo(3);
        assertThat(run.err()).contains("section AL 30x2 could not be cut");
        assertThat(run.out()).contains("Crates: ");

        Files.writeString(kit.resolve("structures.csv"), "structure,mark,count\nkiosk,K4,20\nkiosk,K1,8\n"
                + "kiosk,K2,16\nkiosk,K3,12\nkiosk,K5,8\n");
        Run share = run("pack", kit.toString(), "--for", "kiosk");
        assertThat(share.code()).as(share.err()).isEqualTo(3);
        assertThat(share.err()).contains("no plan for kiosk").contains("section AL 30x2 could not be cut");
    }

    @Test
    @DisplayName("bad output paths are refused before any planning: exit 2, nothing written")
    void badOutputPaths() throws Exception {
        Path folder = Files.createDirectories(temp.resolve("folder.json"));
        Run json = run("pack", "sample-kits/alu-kiosk", "--json", folder.toString());
        assertThat(json.code()).as(json.err()).isEqualTo(2);
        assertThat(json.err()).contains("this is a folder").doesNotContain("pack: cutting");
        assertThat(folder).isEmptyDirectory();

        Path file = Files.writeString(temp.resolve("notes.txt"), "mine");
        Run out = run("pack", "sample-kits/alu-kiosk", "--out", file.resolve("out").toString());
        assertThat(out.code()).isEqualTo(2);
        assertThat(out.err()).contains("notes.txt is a file").doesNotContain("pack: cutting");
        assertThat(file).hasContent("mine");
    }

    @Test
    @DisplayName("--help teaches: options, defaults, outputs and the caution")
    void help() {
        Run run = run("pack", "--help");
        assertThat(run.code()).isZero();
        String text = run.out().replaceAll("\\s+", " ");
        assertThat(text).contains("--for=STRUCTURE").contains("--out=DIR").contains("--json=FILE")
                .contains("600 x 400 x 300 mm, 25 kg").contains("EN 12195-1");
    }
}
