package kitwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import kitwright.io.KitFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class CheckCommandTest {

    @ParameterizedTest(name = "check passes on sample-kits/{0}")
    @ValueSource(strings = {"cinema-6", "cinema-12", "cinema-20", "alu-kiosk", "acrylic-vitrine"})
    void checkPassesOnEverySampleKit(String kit) {
        CliRun run = CliRun.of("check", Path.of("sample-kits", kit).toString());

        assertThat(run.err()).isEmpty();
        assertThat(run.exitCode()).isEqualTo(ExitCode.OK.code());
        assertThat(run.out()).startsWith("Kit " + kit + ": ").contains("The kit is valid.");
    }

    /**
     * A hand-made kit: marks A (1000 mm) and B (2000 mm) of CHS 48.3x3.2 serve three structures with 200 + 100,
     * 180 + 70 and 120 + 80 members. The kit holds 200 A and 100 B: 300 bars for 750 members, reuse ratio 2.5 (the
     * domain notes' worked figure, section 6). Cut length 400 m; mass by hand pi x 45.1 x 3.2 x 7850e-6 x 400 =
     * 1423.7 kg (EN 10219-2 formula), joints 10 x 1.6 = 16 kg.
     */
    @Test
    void checkPrintsTheFiguresOfAHandMadeKit(@TempDir Path dir) {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,\nB,CHS 48.3x3.2,2000,102\n");
        KitFiles.write(dir, "structures.csv", """
                structure,mark,count
                pavilion,A,200
                pavilion,B,100
                stage,A,180
                stage,B,70
                tower,A,120
                tower,B,80
                """);
        KitFiles.write(dir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN90,90,1.6,10\n");

        CliRun run = CliRun.of("check", dir.toString());

        assertThat(run.exitCode()).isEqualTo(0);
        assertThat(run.out())
                .contains("2 marks, 302 bars in the kit")
                .contains("3 structures with 750 members in all; reuse ratio 2.48")
                .containsPattern("CHS 48\\.3x3\\.2 +steel +2 +302 +404\\.000 +1437\\.9")
                .containsPattern("A +CHS 48\\.3x3\\.2 +1000\\.0 +200 +200 +0 +711\\.8")
                .containsPattern("B +CHS 48\\.3x3\\.2 +2000\\.0 +102 +100 +2 +726\\.1")
                .containsPattern("pavilion +300")
                .contains("Joints: 1 type, 10 pieces, 16.0 kg")
                .contains("Kit mass: 1453.9 kg (bars 1437.9 kg, joints 16.0 kg)")
                .contains("Surplus bars (beyond what the structures need): B 2")
                .doesNotContain("Spares (bars");
    }

    @Test
    void theDomainNotesReuseFigureComesOutAsTwoAndAHalf(@TempDir Path dir) {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,1000,\nB,CHS 48.3x3.2,2000,\n");
        KitFiles.write(dir, "structures.csv",
                "structure,mark,count\npavilion,A,200\npavilion,B,100\nstage,A,180\nstage,B,70\ntower,A,120\n"
                        + "tower,B,80\n");

        CliRun run = CliRun.of("check", dir.toString());

        // domain notes section 6: a kit of 300 bars serving 750 members has a reuse ratio of 2.5
        assertThat(run.out()).contains("2 marks, 300 bars in the kit")
                .contains("reuse ratio 2.50 (members in all structures / bars in the kit)")
                .containsPattern("All sections +2 +300 +400\\.000 +1423\\.7");
    }

    @Test
    void checkWithoutArgumentsIsInvalidInput() {
        CliRun run = CliRun.of("check");

        assertThat(run.exitCode()).isEqualTo(ExitCode.INVALID_INPUT.code());
        assertThat(run.err()).contains("Missing required parameter: 'KIT_DIR'");
    }
}
