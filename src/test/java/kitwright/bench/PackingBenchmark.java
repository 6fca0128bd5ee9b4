package kitwright.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import kitwright.io.CrateCatalogReader;
import kitwright.io.KitReader;
import kitwright.io.VehicleCatalogReader;
import kitwright.loading.LoadPlan;
import kitwright.loading.RowLoadPlanner;
import kitwright.loading.Shipping;
import kitwright.ids.IdScheme;
import kitwright.cli.PackUpstream;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.Kit;
import kitwright.model.NestTolerance;
import kitwright.model.Section;
import kitwright.model.VehicleType;
import kitwright.nesting.Bundle;
import kitwright.nesting.FitRule;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;
import kitwright.nesting.NestingProblem;
import kitwright.nesting.Tube;
import kitwright.packing.CratePlan;
import kitwright.packing.LaneCratePacker;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.LoadPlanValidator;

/**
 * Crating and loading benchmark (not a unit test): the sample kits and generated kits up to 5,000 pieces, with the
 * shipped crate and vehicle catalogs. The sample kits go through the real cutting and nesting stages (as
 * {@code pack} runs them); the generated kits' pieces (12 marks of random section and length) through the nesting
 * stage with the worst-case fit rule and a 2 mm clearance.
 * Prints one row per kit: crates against the rounded-up box-volume bound and the mass bound, price against its
 * bound, trip cost against the fleet-cost LP and the whole-vehicle bound, and seconds (crating + loading, median
 * of three runs after a warm-up: wall clock, and CPU time of the calling thread, which CP-SAT with one worker runs
 * on; the three runs must give the same plans). Every plan is validated.
 *
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.PackingBenchmark
 * </pre>
 * {@code -Dbench.only=KIT} runs one kit; {@code -Dbench.crates=true} prints each crate's fill by mass and volume.
 * Targets (src/docs/packing.md): crates within 15 % of the box-volume bound, trip cost within 10 % of the
 * fleet-cost bound, under 10 s.
 */
public final class PackingBenchmark {
    private static final int RUNS = 3;
    /**
     * The wall-clock safety net of the chain: far above the work limits, so that a loaded machine does not cut a
     * step short and change the plan between runs (the seconds are measured, not limited).
     */
    private static final double SAFETY_SECONDS = 120;
    private static final double CLEARANCE_MM = 2.0;
    private static final double STEEL = 7850;
    private static final double ALUMINIUM = 2700;
    private static final double[][] STEEL_SECTIONS = {
        {114.3, 3.6}, {88.9, 3.2}, {76.1, 3.2}, {60.3, 3.2}, {48.3, 3.2}, {42.4, 2.6}, {33.7, 2.6}};
    private static final double[][] ALUMINIUM_SECTIONS = {{80, 4}, {60, 4}, {50, 3}, {40, 3}, {30, 2}};

    private PackingBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        List<CrateType> crates = CrateCatalogReader.read(Path.of("stock-catalogs", "crates.csv"));
        List<VehicleType> vehicles = VehicleCatalogReader.read(Path.of("stock-catalogs", "vehicles.csv"));
        List<Object[]> kits = new ArrayList<>();
        for (String name : new String[] {"cinema-6", "cinema-12", "cinema-20", "alu-kiosk"}) {
            Path dir = Path.of("sample-kits", name);
            if (Files.isDirectory(dir)) {
                Kit kit = KitReader.read(dir);
                int pieces = kit.bars().stream().mapToInt(b -> b.quantity()).sum();
                kits.add(new Object[] {name, pieces, PackUpstream.STAGES.bundles(kit).plan().bundles(), kit.joints()});
            }
        }
        for (int n : new int[] {500, 1000, 2000, 5000}) {
            kits.add(new Object[] {"steel-" + n, n, nested(generated(n, STEEL_SECTIONS, "steel", STEEL, n)),
                generatedJoints(n)});
            kits.add(new Object[] {"alu-" + n, n, nested(generated(n, ALUMINIUM_SECTIONS, "aluminium", ALUMINIUM,
                n + 7)), generatedJoints(n)});
        }
        run(kits.get(0), crates, vehicles); // warm-up: native libraries, JIT
        System.out.println("| kit | pieces | bundles | crates | crates / max(cylinder, mass) bound | crate price |"
                + " trips | trip cost | total | total bound | total / bound | status | crates first: crates, total |"
                + " seconds (wall) | seconds (CPU) |");
        System.out.println("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
        String only = System.getProperty("bench.only", "");
        for (Object[] kit : kits) {
            if (!only.isEmpty() && !only.equals(kit[0])) {
                continue;
            }
            System.out.println(run(kit, crates, vehicles));
        }
    }

    @SuppressWarnings("unchecked")
    private static String run(Object[] kit, List<CrateType> crates, List<VehicleType> vehicles) {
        int pieces = (Integer) kit[1];
        List<Bundle> bundles = (List<Bundle>) kit[2];
        List<Joint> joints = (List<Joint>) kit[3];
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        double[] wall = new double[RUNS];
        double[] cpuTimes = new double[RUNS];
        CratePlan plan = null;
        LoadPlan load = null;
        Shipping.Setting setting = new Shipping.Setting(crates, vehicles, JointBox.DEFAULT, IdScheme.FIRST_CHOICE,
                SAFETY_SECONDS);
        for (int run = 0; run < RUNS; run++) {
            long cpu = threads.getCurrentThreadCpuTime();
            long start = System.nanoTime();
            Shipping.Shipment shipment = Shipping.plan(bundles, joints, setting);
            wall[run] = (System.nanoTime() - start) / 1e9;
            cpuTimes[run] = (threads.getCurrentThreadCpuTime() - cpu) / 1e9;
            System.err.printf(Locale.ROOT, "%s: crating and loading %.2f s%n", kit[0], wall[run]);
            if (plan != null && (!plan.equals(shipment.crates()) || !load.equals(shipment.loads()))) {
                throw new IllegalStateException(kit[0] + ": a second run gave another plan");
            }
            plan = shipment.crates();
            load = shipment.loads();
        }
        java.util.Arrays.sort(wall);
        java.util.Arrays.sort(cpuTimes);
        double seconds = wall[RUNS / 2];
        double cpuSeconds = cpuTimes[RUNS / 2];
        CratePlanValidator.check(plan, bundles, joints, crates, JointBox.DEFAULT);
        if (Boolean.getBoolean("bench.crates")) {
            printCrates((String) kit[0], plan, crates);
        }
        LoadPlanValidator.check(load, plan, crates, vehicles);
        // the crates-first chain of before (least crate price, then the least trip cost for those crates)
        CratePlan first = new LaneCratePacker().pack(bundles, joints, crates, JointBox.DEFAULT);
        LoadPlan firstLoads = new RowLoadPlanner().load(first, crates, vehicles);
        LoadPlanValidator.check(firstLoads, first, crates, vehicles);
        double firstTotal = price(first, crates) + firstLoads.tripCost();
        double price = price(plan, crates);
        int countBound = Math.max(plan.bounds().cylinderVolumeCrates(), plan.bounds().massCrates());
        return String.format(Locale.ROOT, "| %s | %d | %d | %d | %.3f | %.0f | %d | %.0f | %.0f | %.0f | %.3f | %s |"
                + " %d, %.0f | %.2f | %.2f |", kit[0], pieces, bundles.size(), plan.crates().size(),
                plan.crates().size() / (double) Math.max(1, countBound), price, load.vehicles().size(),
                load.tripCost(), load.totalCost(), load.totalLowerBound(),
                load.totalCost() / load.totalLowerBound(), load.status(), first.crates().size(), firstTotal, seconds,
                cpuSeconds);
    }

    private static double price(CratePlan plan, List<CrateType> crates) {
        return plan.crates().stream().mapToDouble(c -> priceOf(crates, c.type())).sum();
    }

    /** With -Dbench.crates=true: each crate's fill by mass and by bounding-box volume, on standard error. */
    private static void printCrates(String name, CratePlan plan, List<CrateType> crates) {
        for (var c : plan.crates()) {
            CrateType type = crates.stream().filter(x -> x.name().equals(c.type())).findFirst().orElseThrow();
            double net = type.maxGrossKg() - type.tareKg();
            double inner = type.innerLengthMm() * type.innerWidthMm() * type.innerHeightMm();
            double box = c.items().stream().mapToDouble(i -> i.lengthMm() * i.widthMm() * i.heightMm()).sum();
            System.err.printf(Locale.ROOT, "  %s %s %s: %.0f of %.0f kg (%.0f %%), box volume %.0f %%, %d bundles,"
                    + " %d boxes%n", name, c.id(), c.type(), c.grossKg() - type.tareKg(), net,
                    100 * (c.grossKg() - type.tareKg()) / net, 100 * box / inner,
                    c.items(kitwright.packing.ItemKind.BUNDLE).size(), c.items(kitwright.packing.ItemKind.BOX).size());
        }
    }

    private static double priceOf(List<CrateType> crates, String type) {
        return crates.stream().filter(c -> c.name().equals(type)).findFirst().orElseThrow().price();
    }

    /** n cut pieces in 12 marks of random section and length (500 to 6000 mm), fixed seed. */
    private static List<Tube> generated(int n, double[][] sections, String material, double density, long seed) {
        Random random = new Random(seed);
        FitRule rule = new FitRule(NestTolerance.WORST_CASE, CLEARANCE_MM);
        int marks = 12;
        Object[][] mark = new Object[marks][];
        for (int m = 0; m < marks; m++) {
            double[] s = sections[random.nextInt(sections.length)];
            Section section = new Section(material + " " + s[0] + "x" + s[1], material, s[0], s[1], null,
                    "steel".equals(material) ? null : 0.4, "steel".equals(material) ? null : 10.0);
            mark[m] = new Object[] {section, 500.0 + random.nextInt(56) * 100};
        }
        List<Tube> tubes = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Section s = (Section) mark[i % marks][0];
            double length = (Double) mark[i % marks][1];
            var envelope = rule.envelope(s);
            tubes.add(new Tube(i, "M" + (i % marks), s.name(), envelope.outerDiameterMm(), envelope.boreMm(), length,
                    s.massPerMetreKg(density) * length / 1000));
        }
        return tubes;
    }

    private static List<Bundle> nested(List<Tube> tubes) {
        NestingProblem problem = new NestingProblem(tubes, CLEARANCE_MM, 10, null);
        return Nester.run(problem, new FitRule(NestTolerance.WORST_CASE, CLEARANCE_MM), NestingOptions.DEFAULT)
                .plan().bundles();
    }

    private static List<Joint> generatedJoints(int pieces) {
        return List.of(new Joint("N90", 90, 1.6, pieces / 4), new Joint("N110", 110, 2.6, pieces / 8),
                new Joint("N140", 140, 4.8, pieces / 20));
    }
}
