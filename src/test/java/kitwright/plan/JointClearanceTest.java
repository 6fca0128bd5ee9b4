package kitwright.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import kitwright.cli.CliRun;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * check warns when a bar end leaves less than the smallest joint's radius between the node centre and the tube end.
 * Hand-made kit, invented data: joints of 90 and 140 mm (radius of the smallest 45 mm); the per-end deductions of
 * bars.csv over kit.json's endDeductionMm (20 mm here). Each warned case is computed by hand below.
 */
class JointClearanceTest {

    private static final String BARS = """
            mark,section,length_mm,quantity,node_to_node_mm,start_deduction_mm,end_deduction_mm,tolerance_mm
            OK,CHS 48.3x3.2,,4,1000,45,45,
            EXACT,CHS 48.3x3.2,,4,1000,46,46,2
            SHORTEND,CHS 48.3x3.2,,4,1000,85,30,
            TOLERANCE,CHS 48.3x3.2,,4,1000,45,45,0.5
            DEFAULT,CHS 48.3x3.2,,4,1000,,,
            NOLENGTH,CHS 48.3x3.2,900,4,,,,
            """;

    @Test
    void warnsOfEachEndInsideTheSmallestJointAndOfNoOther(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, BARS);
        KitFiles.write(dir, "kit.json", "{\"endDeductionMm\": 20}");
        KitFiles.write(dir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN140,140,4.8,4\nN90,90,1.6,4\n");

        var warnings = JointClearance.warnings(KitReader.read(dir));

        // OK: 45 mm each end = the radius, the cut length exact: no warning (less means strictly less).
        // EXACT: 1000 - 46 - 46 = 908 mm + 2 mm tolerance = 910 mm leaves 45 mm at each end: no warning.
        // SHORTEND: the end leaves 30 mm < 45 mm. TOLERANCE: 910.5 mm at most leaves 44.75 mm at each end.
        // DEFAULT: kit.json's 20 mm at each end. NOLENGTH: no node-to-node length, nothing to measure against.
        assertThat(warnings).hasSize(5);
        assertThat(warnings.get(0)).startsWith("mark SHORTEND: its end leaves 30 mm from the node centre")
                .contains("smallest joint N90").contains("at least 45 mm at that end");
        assertThat(warnings.get(1)).startsWith("mark TOLERANCE: its start leaves 44.75 mm")
                .contains("cut length 910 mm + tolerance 0.5").contains("at least 45.25 mm");
        assertThat(warnings.get(2)).startsWith("mark TOLERANCE: its end leaves 44.75 mm");
        assertThat(warnings.get(3)).startsWith("mark DEFAULT: its start leaves 20 mm");
        assertThat(warnings.get(4)).startsWith("mark DEFAULT: its end leaves 20 mm");

        CliRun check = CliRun.of("check", dir.toString());
        assertThat(check.exitCode()).as("a warning, not a problem").isZero();
        assertThat(check.out().lines().filter(l -> l.startsWith("Warning: mark "))).hasSize(5);
    }

    @Test
    void noJointsNoWarning(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, BARS);
        KitFiles.write(dir, "kit.json", "{\"endDeductionMm\": 20}");
        assertThat(JointClearance.warnings(KitReader.read(dir))).isEmpty();
    }

    @Test
    void theCinemaSamplesLeaveEveryEndOutsideItsJoint() throws Exception {
        for (String sample : new String[] {"cinema-6", "cinema-12", "cinema-20"}) {
            assertThat(JointClearance.warnings(KitReader.read(Path.of("sample-kits", sample)))).as(sample).isEmpty();
        }
    }
}
