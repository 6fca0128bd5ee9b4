package kitwright.validate;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.loading.LoadPlan;
import kitwright.loading.VehicleLoad;
import kitwright.model.Kit;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;
import kitwright.nesting.NestedTube;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.report.LogisticsCsv;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The whole-plan validator must reject a plan broken at any seam between the stages, or it proves nothing. */
class PlanValidatorTest {
    private static PlanResult good;

    @BeforeAll
    static void plan(@TempDir Path dir) throws Exception {
        Path kitDir = KitFiles.kit(dir, """
                mark,section,length_mm,quantity
                A,CHS 48.3x3.2,1900,6
                E,CHS 33.7x2.6,1500,5
                """);
        KitFiles.write(kitDir, "joints.csv", "mark,diameter_mm,mass_kg,quantity\nN90,90,1.6,12\n");
        KitFiles.write(kitDir, "crates.csv", Files.readString(Path.of("stock-catalogs", "crates.csv")));
        KitFiles.write(kitDir, "vehicles.csv", Files.readString(Path.of("stock-catalogs", "vehicles.csv")));
        Kit kit = KitReader.read(kitDir);
        good = Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE);
    }

    private static PlanResult with(NestPlan nesting, CratePlan crates, LoadPlan loads) {
        NestResult n = good.nesting();
        return new PlanResult(good.kit(), good.summary(), good.cutting(), good.spares(), good.figures(),
                new NestResult(nesting, n.reason(), n.rule(), n.pieces(), n.looseVolumeM3(), n.bundledVolumeM3()),
                crates, loads, good.stageSeconds());
    }

    private static Map<String, String> files(PlanResult result) {
        Map<String, String> files = new HashMap<>();
        files.put(LogisticsCsv.PACKING_LISTS, LogisticsCsv.packingLists(result.crates(),
                result.nesting().plan().bundles()));
        files.put(LogisticsCsv.MANIFESTS, LogisticsCsv.manifests(result.loads()));
        return files;
    }

    private static void rejects(PlanResult plan, Map<String, String> files, String fragment) {
        assertThatThrownBy(() -> PlanValidator.validate(plan, files)).isInstanceOf(AssertionError.class)
                .hasMessageContaining(fragment);
    }

    @Test
    @DisplayName("accepts the planner's plan with its packing lists and manifests")
    void accepts() {
        assertThatCode(() -> PlanValidator.validate(good)).doesNotThrowAnyException();
    }

    @Test
    @DisplayName("rejects a cut piece left out of the bundles")
    void rejectsAMissingTube() {
        NestPlan n = good.nesting().plan();
        List<Bundle> bundles = new ArrayList<>(n.bundles());
        Bundle b = bundles.stream().filter(x -> !x.host().guests().isEmpty()).findFirst().orElseThrow();
        NestedTube h = b.host();
        NestedTube emptied = new NestedTube(h.mark(), h.outerDiameterMm(), h.boreMm(), h.lengthMm(), 0, 0, 0,
                List.of());
        bundles.set(bundles.indexOf(b), new Bundle(b.id(), b.lengthMm(), b.envelopeDiameterMm(), b.massKg(), emptied));
        PlanResult broken = with(new NestPlan(n.tolerance(), n.clearanceMm(), n.status(), n.lowerBound(), bundles),
                good.crates(), good.loads());
        rejects(broken, Map.of(), "missing from the plan");
    }

    @Test
    @DisplayName("rejects a crate left off the vehicles and a crate loaded twice")
    void rejectsCratesNotLoadedOnce() {
        LoadPlan l = good.loads();
        VehicleLoad v = l.vehicles().get(0);
        VehicleLoad twice = new VehicleLoad("V9", v.type(), v.deckLengthMm(), v.deckWidthMm(), v.deckHeightMm(),
                v.payloadKg(), v.massKg(), v.centreOfGravityMm(), v.crates(), v.costPerTrip(), v.floorLengthMm());
        List<VehicleLoad> doubled = new ArrayList<>(l.vehicles());
        doubled.add(twice);
        rejects(with(good.nesting().plan(), good.crates(), new LoadPlan(l.status(), l.lowerBound(), doubled,
                l.tripCost() + v.costPerTrip(), l.bounds(), null)), Map.of(), "expected exactly 1");
        rejects(with(good.nesting().plan(), good.crates(), new LoadPlan(l.status(), 0, List.of(), 0, l.bounds(),
                null)), Map.of(), "expected exactly 1");
    }

    @Test
    @DisplayName("rejects a crate plan that lost a bundle")
    void rejectsALostBundle() {
        CratePlan c = good.crates();
        Crate first = c.crates().get(0);
        List<Crate> crates = new ArrayList<>(c.crates());
        var items = first.items().stream().filter(i -> i.kind() == kitwright.packing.ItemKind.BUNDLE).skip(1).toList();
        List<kitwright.packing.CrateItem> kept = new ArrayList<>(items);
        kept.addAll(first.items(kitwright.packing.ItemKind.BOX));
        double gross = first.tareKg() + kept.stream().mapToDouble(kitwright.packing.CrateItem::massKg).sum();
        crates.set(0, new Crate(first.id(), first.type(), first.innerLengthMm(), first.innerWidthMm(),
                first.innerHeightMm(), first.outerLengthMm(), first.outerWidthMm(), first.outerHeightMm(),
                first.tareKg(), first.maxGrossKg(), gross, kept));
        rejects(with(good.nesting().plan(), new CratePlan(c.status(), c.lowerBound(), crates, c.boxes(), c.bounds(),
                null), good.loads()), Map.of(), "expected exactly 1");
    }

    @Test
    @DisplayName("rejects packing lists whose marks, counts or masses differ from the crates, and a wrong manifest")
    void rejectsWrongPackingListsAndManifests() {
        Map<String, String> files = files(good);
        String lists = files.get(LogisticsCsv.PACKING_LISTS);
        Map<String, String> wrongCount = new HashMap<>(files);
        wrongCount.put(LogisticsCsv.PACKING_LISTS, lists.replace("A x 6", "A x 5"));
        rejects(good, wrongCount, "packing list of CRT-1: marks");
        Map<String, String> noJoints = new HashMap<>(files);
        noJoints.put(LogisticsCsv.PACKING_LISTS, lists.replace("; N90 x 12", ""));
        rejects(good, noJoints, "marks");
        String manifests = files.get(LogisticsCsv.MANIFESTS);
        String row = manifests.lines().skip(1).findFirst().orElseThrow();
        String[] cells = row.split(",");
        cells[4] = String.valueOf(Double.parseDouble(cells[4]) + 5);
        Map<String, String> heavier = new HashMap<>(files);
        heavier.put(LogisticsCsv.MANIFESTS, manifests.replace(row, String.join(",", cells)));
        rejects(good, heavier, "manifest of TRIP-1: mass");
    }

    @Test
    @DisplayName("rejects packing lists and manifests whose ids are out of number order")
    void rejectsIdsOutOfNumberOrder() {
        Map<String, String> files = files(good);
        String lists = files.get(LogisticsCsv.PACKING_LISTS);
        Crate crate = good.crates().crates().stream().filter(c -> c.items(kitwright.packing.ItemKind.BUNDLE).size() > 1)
                .findFirst().orElseThrow();
        String ids = kitwright.report.CrateContents.refs(crate, kitwright.packing.ItemKind.BUNDLE);
        List<String> reversed = new ArrayList<>(List.of(ids.split(" ")));
        java.util.Collections.reverse(reversed);
        Map<String, String> unordered = new HashMap<>(files);
        unordered.put(LogisticsCsv.PACKING_LISTS, lists.replace(ids, String.join(" ", reversed)));
        rejects(good, unordered, "packing list of " + crate.id() + ": ids in number order");
    }

    @Test
    @DisplayName("rejects a trip id that reads like a mark (mark E, trip e-01) and an id given twice")
    void rejectsAnIdLikeAMark() {
        LoadPlan l = good.loads();
        List<VehicleLoad> renamed = new ArrayList<>(l.vehicles());
        VehicleLoad v = renamed.get(0);
        renamed.set(0, new VehicleLoad("e-01", v.type(), v.deckLengthMm(), v.deckWidthMm(), v.deckHeightMm(),
                v.payloadKg(), v.massKg(), v.centreOfGravityMm(), v.crates(), v.costPerTrip(), v.floorLengthMm()));
        rejects(with(good.nesting().plan(), good.crates(), new LoadPlan(l.status(), l.lowerBound(), renamed,
                l.tripCost(), l.bounds(), null)), Map.of(), "trip e-01 reads like mark E");
        renamed.set(0, new VehicleLoad(good.crates().crates().get(0).id(), v.type(), v.deckLengthMm(),
                v.deckWidthMm(), v.deckHeightMm(), v.payloadKg(), v.massKg(), v.centreOfGravityMm(), v.crates(),
                v.costPerTrip(), v.floorLengthMm()));
        rejects(with(good.nesting().plan(), good.crates(), new LoadPlan(l.status(), l.lowerBound(), renamed,
                l.tripCost(), l.bounds(), null)), Map.of(), "given twice");
    }
}
