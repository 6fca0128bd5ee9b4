package kitwright.loading;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.CrateType;
import kitwright.model.VehicleType;
import kitwright.packing.CratingDemand;

/**
 * A proven lower bound on crate price plus trip cost over every crate plan and every loading of it, for the
 * crates and vehicles chosen together ({@link Shipping}).
 *
 * <p>Method. The crate plans are split into families by the set S of crate types they use (every plan belongs to
 * exactly one). For each S a small integer program (SCIP, its proven bound at a node limit) relaxes every plan of
 * the family; the bound is the least of the families' bounds. Variables: y_t crates of type t (y_t &gt;= 1 for t
 * in S, absent otherwise), x_tv crates of type t riding on vehicles of type v (only where a crate of type t fits
 * that vehicle: footprint either way round, height within the load height, tare within the payload), z_v trips of
 * type v, all integer; w_tv, the mass of items in the crates of type t on vehicles of type v (continuous).
 * <pre>
 * minimise   sum_t price_t y_t + sum_v cost_v z_v
 * subject to sum_v x_tv = y_t                                    (every crate rides once)
 *            w_tv &lt;= (maxGross_t - tare_t) x_tv                  (contents within each crate's net capacity)
 *            sum_tv w_tv = item mass
 *            for every inner length l_k of S (ascending, l_0 = 0; boxes count in k = 0 only, as they may turn):
 *              sum_{t: L_t &gt;= l_k} innerVolume_t y_t &gt;= solid volume of the items longer than l_(k-1)
 *              sum_{t: L_t &gt;= l_k} sum_v w_tv  &gt;= mass of the items longer than l_(k-1)
 *            for every vehicle type v:
 *              sum_t (w_tv + tare_t x_tv)           &lt;= payload_v z_v        (gross mass)
 *              sum_t outerVolume_t x_tv               &lt;= deck volume_v z_v   (to the load height)
 *              the floor, stacking and top-load rows of {@link #stacking}
 * </pre>
 * Proof that every plan of family S is feasible for it: take y, x, z as its counts and w as its contents. An item
 * longer than l_(k-1) lies lengthwise in a crate at least as long inside, so in a type with L_t &gt;= l_k; the items
 * in a crate take no more than its inner volume (their solid volumes) and its net capacity. A vehicle's crates
 * weigh at most its payload and fill at most its volume up to the load height. A crate that is not stackable carries
 * nothing, so it tops a stack whose base covers at least its footprint (crates stand only fully on a crate below);
 * the stacks' bases do not overlap, so those footprints sum to at most the deck area; the rest of the stacking rows
 * is proved at {@link #stacking}. Hence the plan's total is at
 * least the program's optimum, which is at least SCIP's proven bound, which is at least the least over the families.
 * Families whose crate types cannot hold some bundle (longer than every type of S) are empty and skipped.
 *
 * <p>Catalogs of more than {@value #MAX_FAMILY_TYPES} crate types are taken as one family (y_t &gt;= 0), which is the
 * same relaxation without the "each type of S at least once" step.
 */
final class ShippingCostBound {
    private static final double EPS = 1e-9;
    static final int MAX_FAMILY_TYPES = 6;
    /** SCIP nodes per family: a deterministic work limit; the deadline is a safety net. */
    private static final int MAX_NODES = 5_000;
    private static final double M3 = 1e9;
    private static final double M2 = 1e6;

    private ShippingCostBound() {
    }

    /** The bound over every plan whose crate types are all among {@code usable} (indices into the catalog). */
    static double compute(CratingDemand demand, List<CrateType> crates, List<Integer> usable,
                          List<VehicleType> vehicles, Deadline deadline) {
        return compute(demand, crates, usable, vehicles, deadline, Integer.MAX_VALUE);
    }

    /**
     * The bound over every such plan of at most {@code maxCrates} crates (sum_t y_t &lt;= maxCrates added to each
     * family); +infinity when the programme proves that no such plan exists.
     */
    static double compute(CratingDemand demand, List<CrateType> crates, List<Integer> usable,
                          List<VehicleType> vehicles, Deadline deadline, int maxCrates) {
        return compute(demand, crates, usable, vehicles, deadline, maxCrates, new java.util.HashMap<>());
    }

    /**
     * As above, each family's bound taken from {@code known} when there (keyed by its crate types, for the same
     * demand, catalogs and crate limit) and put there when solved, so that the calls of one shipment solve each
     * family once.
     */
    static double compute(CratingDemand demand, List<CrateType> crates, List<Integer> usable,
                          List<VehicleType> vehicles, Deadline deadline, int maxCrates,
                          java.util.Map<List<Integer>, Double> known) {
        if (demand.isEmpty()) {
            return 0;
        }
        if (usable.size() > MAX_FAMILY_TYPES) {
            return known.computeIfAbsent(List.copyOf(usable),
                    k -> family(demand, crates, k, false, vehicles, deadline, maxCrates));
        }
        double least = Double.POSITIVE_INFINITY;
        for (int mask = 1; mask < (1 << usable.size()); mask++) {
            List<Integer> set = new ArrayList<>();
            for (int i = 0; i < usable.size(); i++) {
                if ((mask & (1 << i)) != 0) {
                    set.add(usable.get(i));
                }
            }
            least = Math.min(least, known.computeIfAbsent(List.copyOf(set),
                    k -> family(demand, crates, k, true, vehicles, deadline, maxCrates)));
        }
        return least;
    }

    /** The family's bound; +infinity when no plan of it exists; 0 when the solver proves nothing. */
    private static double family(CratingDemand demand, List<CrateType> crates, List<Integer> set, boolean eachOnce,
                                 List<VehicleType> vehicles, Deadline deadline, int maxCrates) {
        double longestInside = set.stream().mapToDouble(t -> crates.get(t).innerLengthMm()).max().orElse(0);
        if (demand.items().stream().anyMatch(i -> i.bundle() && i.lengthMm() > longestInside + 1e-6)) {
            return Double.POSITIVE_INFINITY;
        }
        if (deadline.passed()) {
            return 0; // the clock has stopped the stage: 0 is a valid bound, and the same on every machine
        }
        kitwright.natives.SolverLibraries.load();
        MPSolver solver = MPSolver.createSolver("SCIP");
        if (solver == null) {
            return 0;
        }
        try {
            int n = set.size();
            int m = vehicles.size();
            MPObjective objective = solver.objective();
            objective.setMinimization();
            MPVariable[] y = new MPVariable[n];
            MPVariable[][] x = new MPVariable[n][m];
            MPVariable[][] w = new MPVariable[n][m];
            MPVariable[] z = new MPVariable[m];
            for (int v = 0; v < m; v++) {
                z[v] = solver.makeIntVar(0, Double.POSITIVE_INFINITY, "trips_" + v);
                objective.setCoefficient(z[v], vehicles.get(v).costPerTrip());
            }
            MPConstraint allMass = solver.makeConstraint(demand.massKg(), demand.massKg(), "item_mass");
            for (int i = 0; i < n; i++) {
                CrateType c = crates.get(set.get(i));
                y[i] = solver.makeIntVar(eachOnce ? 1 : 0, Double.POSITIVE_INFINITY, "crates_" + i);
                objective.setCoefficient(y[i], c.price());
                // sum_v x_tv = y_t
                MPConstraint rides = solver.makeConstraint(0, 0, "rides_" + i);
                rides.setCoefficient(y[i], -1);
                for (int v = 0; v < m; v++) {
                    boolean fits = rides(c, vehicles.get(v));
                    x[i][v] = solver.makeIntVar(0, fits ? Double.POSITIVE_INFINITY : 0, "on_" + i + "_" + v);
                    w[i][v] = solver.makeNumVar(0, fits ? Double.POSITIVE_INFINITY : 0, "mass_" + i + "_" + v);
                    rides.setCoefficient(x[i][v], 1);
                    // w_tv <= net_t x_tv
                    MPConstraint net = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "net_" + i + "_" + v);
                    net.setCoefficient(w[i][v], 1);
                    net.setCoefficient(x[i][v], -Math.max(0, c.maxGrossKg() - c.tareKg()));
                    allMass.setCoefficient(w[i][v], 1);
                }
            }
            lengthClasses(solver, demand, crates, set, y, w);
            if (maxCrates < Integer.MAX_VALUE) {
                // sum_t y_t <= maxCrates
                MPConstraint count = solver.makeConstraint(Double.NEGATIVE_INFINITY, maxCrates, "crate_count");
                for (MPVariable crateCount : y) {
                    count.setCoefficient(crateCount, 1);
                }
            }
            for (int v = 0; v < m; v++) {
                VehicleType t = vehicles.get(v);
                MPConstraint gross = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "payload_" + v);
                MPConstraint volume = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "volume_" + v);
                gross.setCoefficient(z[v], -(t.payloadKg() + DeckFiller.PAYLOAD_TOLERANCE_KG));
                volume.setCoefficient(z[v], -t.deckLengthMm() * t.deckWidthMm() * t.loadHeightMm() / M3);
                for (int i = 0; i < n; i++) {
                    CrateType c = crates.get(set.get(i));
                    gross.setCoefficient(w[i][v], 1);
                    gross.setCoefficient(x[i][v], c.tareKg());
                    volume.setCoefficient(x[i][v], c.outerLengthMm() * c.outerWidthMm() * c.outerHeightMm() / M3);
                }
            }
            for (int v = 0; v < m; v++) {
                stacking(solver, crates, set, vehicles.get(v), v, x, w, z[v]);
            }
            solver.setSolverSpecificParametersAsString("limits/nodes = " + MAX_NODES + "\n");
            solver.setTimeLimit((long) Math.ceil(deadline.remainingSeconds() * 1000));
            MPSolver.ResultStatus status = solver.solve();
            if (status == MPSolver.ResultStatus.INFEASIBLE) {
                return Double.POSITIVE_INFINITY;
            }
            boolean solved = status == MPSolver.ResultStatus.OPTIMAL || status == MPSolver.ResultStatus.FEASIBLE;
            return solved ? Math.max(0, objective.bestBound()) : 0;
        } finally {
            solver.delete();
        }
    }

    /** Volume and mass per inner length class, as in the crate price bound of the packing stage. */
    private static void lengthClasses(MPSolver solver, CratingDemand demand, List<CrateType> crates,
                                      List<Integer> set, MPVariable[] y, MPVariable[][] w) {
        double[] lengths = set.stream().mapToDouble(t -> crates.get(t).innerLengthMm()).distinct().sorted()
                .toArray();
        double previous = 0;
        for (int k = 0; k < lengths.length; k++) {
            double volume = 0;
            double mass = 0;
            for (CratingDemand.Item item : demand.items()) {
                boolean longer = item.bundle() ? item.lengthMm() > previous + EPS : k == 0;
                if (longer) {
                    volume += item.count() * item.solidVolumeMm3() / M3;
                    mass += item.count() * item.massKg();
                }
            }
            MPConstraint byVolume = solver.makeConstraint(volume, Double.POSITIVE_INFINITY, "volume_class_" + k);
            MPConstraint byMass = solver.makeConstraint(mass, Double.POSITIVE_INFINITY, "mass_class_" + k);
            for (int i = 0; i < set.size(); i++) {
                CrateType c = crates.get(set.get(i));
                if (c.innerLengthMm() >= lengths[k] - EPS) {
                    byVolume.setCoefficient(y[i], c.innerLengthMm() * c.innerWidthMm() * c.innerHeightMm() / M3);
                    for (MPVariable mass_ : w[i]) {
                        byMass.setCoefficient(mass_, 1);
                    }
                }
            }
            previous = lengths[k];
        }
    }

    /**
     * What the stacking rules imply for the crates of the family on vehicle type v. A crate stands on the floor or
     * directly on one stackable crate at least as long and as wide (either way round, to be safe), within the load
     * height together, and within the top load of every crate below. So the x_tv crates split into f_tv on the floor
     * (integer) and u_tv on another crate, and their contents' mass w_tv into wf + wu:
     * <pre>
     *   x_tv = f_tv + u_tv;   w_tv - wu_tv &lt;= net_t f_tv;   wu_tv &lt;= min(net_t, topMax_t - tare_t) u_tv
     *   u_tv = 0 where no type of the family can carry t (topMax_t: the largest top load of those that can)
     *   sum_t (tare_t u_tv + wu_tv) &lt;= sum_{o stackable} topLoad_o x_ov      (each upper crate weighs on the one
     *                                                                       below it, within its top load)
     *   floor crates:          sum_t footprint_t f_tv &lt;= deck area z_v;   f_tv &lt;= sideBySide_tv z_v;   lanes of f
     *   not stackable crates:  the same with x_tv (each tops its own stack, so they never overlap seen from above)
     * </pre>
     * sideBySide is the grid count for equal rectangles of fixed orientation ({@link StackingRules#sideBySide});
     * the lanes are those of crates that fit one way only ({@link FloorLanes}).
     */
    private static void stacking(MPSolver solver, List<CrateType> crates, List<Integer> set, VehicleType vehicle,
                                 int v, MPVariable[][] x, MPVariable[][] w, MPVariable trips) {
        int n = set.size();
        List<CrateClass> classes = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            CrateType c = crates.get(set.get(i));
            classes.add(new CrateClass(i, c.outerLengthMm(), c.outerWidthMm(), c.outerHeightMm(), c.tareKg(),
                    c.stackable(), c.maxTopLoadKg(), 2));
        }
        MPVariable[] onFloor = new MPVariable[n];
        MPConstraint carried = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "v" + v + "_top_load");
        for (int i = 0; i < n; i++) {
            CrateType c = crates.get(set.get(i));
            boolean rides = rides(c, vehicle);
            double topMax = Double.NEGATIVE_INFINITY;
            for (CrateClass o : classes) {
                if (o.stackable() && carries(o, classes.get(i), vehicle.loadHeightMm())) {
                    topMax = Math.max(topMax, o.maxTopLoadKg());
                }
            }
            double net = Math.max(0, c.maxGrossKg() - c.tareKg());
            boolean up = rides && topMax >= c.tareKg() - EPS;
            onFloor[i] = solver.makeIntVar(0, rides ? Double.POSITIVE_INFINITY : 0, "floor_" + i + "_" + v);
            MPVariable upper = solver.makeNumVar(0, up ? Double.POSITIVE_INFINITY : 0, "upper_" + i + "_" + v);
            MPVariable upperMass = solver.makeNumVar(0, up ? Double.POSITIVE_INFINITY : 0, "upper_mass_" + i + "_" + v);
            // x_tv = f_tv + u_tv
            MPConstraint split = solver.makeConstraint(0, 0, "split_" + i + "_" + v);
            split.setCoefficient(x[i][v], 1);
            split.setCoefficient(onFloor[i], -1);
            split.setCoefficient(upper, -1);
            // w_tv - wu_tv <= net_t f_tv
            MPConstraint floorMass = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "floor_mass_" + i + "_" + v);
            floorMass.setCoefficient(w[i][v], 1);
            floorMass.setCoefficient(upperMass, -1);
            floorMass.setCoefficient(onFloor[i], -net);
            // wu_tv <= min(net_t, topMax_t - tare_t) u_tv
            MPConstraint upperNet = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, "upper_net_" + i + "_" + v);
            upperNet.setCoefficient(upperMass, 1);
            upperNet.setCoefficient(upper, -(up ? Math.max(0, Math.min(net, topMax - c.tareKg())) : 0));
            carried.setCoefficient(upper, c.tareKg());
            carried.setCoefficient(upperMass, 1);
            if (c.stackable()) {
                carried.setCoefficient(x[i][v], -c.maxTopLoadKg());
            }
        }
        MPVariable[] all = new MPVariable[n];
        for (int i = 0; i < n; i++) {
            all[i] = x[i][v];
        }
        List<CrateClass> tops = classes.stream().filter(c -> !c.stackable()).toList();
        apart(solver, classes, onFloor, vehicle, trips, "v" + v + "_floor_");
        apart(solver, tops, all, vehicle, trips, "v" + v + "_tops_");
    }

    /** Whether {@code lower} may carry {@code upper} by size and height, either way round. */
    private static boolean carries(CrateClass lower, CrateClass upper, double loadHeight) {
        boolean straight = upper.lengthMm() <= lower.lengthMm() + EPS && upper.widthMm() <= lower.widthMm() + EPS;
        boolean turned = upper.widthMm() <= lower.lengthMm() + EPS && upper.lengthMm() <= lower.widthMm() + EPS;
        return (straight || turned) && upper.heightMm() + lower.heightMm() <= loadHeight + EPS;
    }

    /**
     * Crates of the given classes that never overlap seen from above, count[c.index()] of them on the z vehicles:
     * footprints within the deck area, at most sideBySide of a class per vehicle, and their lanes.
     */
    private static void apart(MPSolver solver, List<CrateClass> group, MPVariable[] count, VehicleType vehicle,
                              MPVariable trips, String name) {
        List<CrateClass> riding = group.stream().filter(c -> DeckFiller.fitsVehicle(c, vehicle)).toList();
        if (riding.isEmpty()) {
            return;
        }
        MPConstraint area = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, name + "area");
        area.setCoefficient(trips, -vehicle.deckLengthMm() * vehicle.deckWidthMm() / M2);
        double narrowest = Double.POSITIVE_INFINITY;
        for (CrateClass c : riding) {
            area.setCoefficient(count[c.index()], c.footprint() / M2);
            MPConstraint side = solver.makeConstraint(Double.NEGATIVE_INFINITY, 0, name + "side_" + c.index());
            side.setCoefficient(count[c.index()], 1);
            side.setCoefficient(trips, -StackingRules.sideBySide(c, vehicle));
            if (StackingRules.fixedOrientation(c, vehicle)) {
                narrowest = Math.min(narrowest, c.acrossDeck(StackingRules.turned(c, vehicle)));
            }
        }
        List<CrateClass> fixed = riding.stream().filter(c -> StackingRules.fixedOrientation(c, vehicle)).toList();
        MPVariable[] onV = fixed.stream().map(c -> count[c.index()]).toArray(MPVariable[]::new);
        FloorLanes.add(solver, fixed, onV, vehicle, Math.floor(vehicle.deckWidthMm() / narrowest + 1e-9), trips,
                name);
    }

    /** Whether one crate of the type, empty, can ride on the vehicle at all. */
    static boolean rides(CrateType c, VehicleType v) {
        boolean straight = c.outerLengthMm() <= v.deckLengthMm() + 1e-6 && c.outerWidthMm() <= v.deckWidthMm() + 1e-6;
        boolean turned = c.outerWidthMm() <= v.deckLengthMm() + 1e-6 && c.outerLengthMm() <= v.deckWidthMm() + 1e-6;
        return (straight || turned) && c.outerHeightMm() <= v.loadHeightMm() + 1e-6
                && c.tareKg() <= v.payloadKg() + DeckFiller.PAYLOAD_TOLERANCE_KG;
    }
}
