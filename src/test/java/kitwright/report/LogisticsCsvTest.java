package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import kitwright.loading.LoadPlan;
import kitwright.loading.RowLoadPlanner;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.VehicleType;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import kitwright.packing.CratePlan;
import kitwright.packing.Fixtures;
import kitwright.packing.LaneCratePacker;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.CsvOutput;
import kitwright.validate.LoadPlanValidator;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LogisticsCsvTest {

    private static List<CSVRecord> read(String csv) throws Exception {
        return CsvOutput.records(csv);
    }

    @Test
    @DisplayName("packing lists and manifests: every bundle, box and crate once; marks counted through the nests")
    void sheets() throws Exception {
        // 20 bundles of a host A carrying a guest B; a mark with a comma and quotes survives the CSV
        List<Bundle> bundles = new java.util.ArrayList<>();
        for (int i = 1; i <= 20; i++) {
            NestedTube guest = new NestedTube("B,\"x\"", 40, 34, 1500, 0, 0, 10, List.of());
            bundles.add(new Bundle("B" + i, 1600, 60, 9, new NestedTube("A", 60, 54, 1600, 0, 0, 0, List.of(guest))));
        }
        List<Joint> joints = List.of(new Joint("N1", 100, 1, 40));
        List<CrateType> types = List.of(Fixtures.crate("c", 1700, 450, 350, 20, 150, 10.0));
        CratePlan crates = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 5, 2)).pack(bundles, joints, types,
                JointBox.DEFAULT);
        CratePlanValidator.check(crates, bundles, joints, types, JointBox.DEFAULT);
        List<VehicleType> vehicles = List.of(new VehicleType("truck", 6200, 2450, 2400, 2800, 400, "invented"));
        LoadPlan loads = new RowLoadPlanner().load(crates, types, vehicles);
        LoadPlanValidator.check(loads, crates, types, vehicles);

        String lists = LogisticsCsv.packingLists(crates, bundles);
        assertThat(lists).startsWith(
                "\uFEFFcrate,type,marks,bundles,bundle_ids,boxes,box_ids,gross_kg,max_gross_kg\r\n");
        List<CSVRecord> rows = read(lists);
        assertThat(rows).hasSize(crates.crates().size());
        Set<String> seen = new HashSet<>();
        int a = 0;
        for (CSVRecord r : rows) {
            for (String id : (r.get("bundle_ids") + " " + r.get("box_ids")).trim().split(" +")) {
                assertThat(seen.add(id)).as("%s listed once", id).isTrue();
            }
            assertThat(Integer.parseInt(r.get("bundles"))).isEqualTo(r.get("bundle_ids").isEmpty() ? 0
                    : r.get("bundle_ids").split(" ").length);
            for (String part : r.get("marks").split("; ")) {
                if (part.startsWith("A x ")) {
                    a += Integer.parseInt(part.substring(4));
                }
            }
        }
        assertThat(seen).hasSize(20 + crates.boxes().size());
        assertThat(a).isEqualTo(20);
        assertThat(lists).contains("B,\"\"x\"\" x ");
        assertThat(lists.substring(1)).as("plain ASCII after the byte-order mark").matches("\\p{ASCII}*");

        List<CSVRecord> manifest = read(LogisticsCsv.manifests(loads));
        assertThat(manifest).hasSize(loads.vehicles().size());
        assertThat(manifest.stream().mapToInt(r -> Integer.parseInt(r.get("crates"))).sum())
                .isEqualTo(crates.crates().size());
        assertThat(Double.parseDouble(manifest.get(0).get("mass_kg"))).isLessThanOrEqualTo(2800);
        assertThat(manifest.get(0).get("front_support")).isEqualTo("axle loads not checked");

        String loadLists = LogisticsCsv.loadLists(loads, crates);
        assertThat(loadLists).startsWith("\uFEFFvehicle,loading_step,unloading_step,crate,outer_length_mm,"
                + "outer_width_mm,outer_height_mm,gross_kg\r\n");
        List<CSVRecord> steps = read(loadLists);
        assertThat(steps).hasSize(crates.crates().size());
        int n = loads.vehicles().get(0).crates().size();
        assertThat(steps.get(0).get("loading_step")).isEqualTo("1");
        assertThat(steps.get(0).get("unloading_step")).isEqualTo(String.valueOf(n));
        assertThat(steps.stream().map(r -> r.get("crate")).collect(java.util.stream.Collectors.toSet()))
                .hasSize(crates.crates().size());
    }
}
