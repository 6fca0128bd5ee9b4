package kitwright.cutting;

import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.natives.SolverLibraries;

/**
 * The exact arc-flow model of cutting stock (Valério de Carvalho 1999, "Exact solution of bin-packing problems
 * using column generation and branch-and-bound", Annals of Operations Research 86), solved by CP-SAT.
 *
 * <p>Graph: nodes are the loads 0..C a stock piece can reach; an item arc (v, v + size_i) places a piece of type i,
 * a loss arc joins consecutive nodes. Every pattern is a path from 0 to the capacity C_k of its stock type. Only
 * paths placing pieces by decreasing size, at most b_i = min(r_i, C / size_i) of type i, are built (the symmetry
 * reduction of the paper), so the graph stays small for short stock and few marks.
 * <pre>
 *   min  sum_k c_k z_k
 *   s.t. sum_{a in A_i} f_a &gt;= r_i                                  for every item type i
 *        sum_{a into v} f_a - sum_{a out of v} f_a = sum_{k: C_k = v} z_k - [v = 0] sum_k z_k   for every node v
 *        0 &lt;= z_k &lt;= u_k,  f_a &gt;= 0 integer
 * </pre>
 * The model is complete: CP-SAT's OPTIMAL proves the plan optimal, INFEASIBLE proves that no plan exists within
 * the objective window given, and its best bound is a valid lower bound.
 */
final class ArcFlowModel {
    private ArcFlowModel() {
    }

    /**
     * @param packing    the best plan CP-SAT found, or null
     * @param optimal    proven optimal within the window
     * @param infeasible proven: no plan within the window
     * @param bound      proven lower bound in integer cost units
     */
    record Outcome(Packing packing, boolean optimal, boolean infeasible, double bound) {
    }

    /**
     * Solves the residual problem exactly within [lower, upper] (integer cost units), starting from a hint.
     *
     * @return the outcome, or null when the graph has more than {@code maxArcs} arcs
     */
    static Outcome solve(IntegerInstance instance, int[] demand, int[] available, Packing hint, long lower,
                         long upper, double deterministicTime, int maxArcs, Deadline deadline) {
        SolverLibraries.load(); // the model objects need the natives, not only the solver
        Graph graph = Graph.build(instance, demand, maxArcs);
        if (graph == null) {
            return null;
        }
        int total = instance.totalPieces(demand);
        CpModel model = new CpModel();
        IntVar[] flow = new IntVar[graph.arcCount()];
        for (int a = 0; a < flow.length; a++) {
            flow[a] = model.newIntVar(0, total, "f_" + a);
        }
        IntVar[] pieces = new IntVar[instance.stocks()];
        for (int k = 0; k < pieces.length; k++) {
            pieces[k] = model.newIntVar(0, instance.usable(k, demand, available), "z_" + k);
        }
        // demand: sum over the arcs of type i of f_a >= r_i
        for (int i = 0; i < instance.types(); i++) {
            if (demand[i] == 0) {
                continue;
            }
            LinearExprBuilder placed = LinearExpr.newBuilder();
            for (int a = 0; a < flow.length; a++) {
                if (graph.type[a] == i) {
                    placed.add(flow[a]);
                }
            }
            model.addGreaterOrEqual(placed, demand[i]);
        }
        // conservation: inflow - outflow = pieces ending here - pieces starting here
        LinearExprBuilder[] balance = new LinearExprBuilder[graph.nodes.length];
        for (int v = 0; v < balance.length; v++) {
            balance[v] = LinearExpr.newBuilder();
        }
        for (int a = 0; a < flow.length; a++) {
            balance[graph.head[a]].add(flow[a]);
            balance[graph.tail[a]].addTerm(flow[a], -1);
        }
        for (int k = 0; k < pieces.length; k++) {
            balance[graph.node(instance.capacity[k])].addTerm(pieces[k], -1);
            balance[0].add(pieces[k]);
        }
        for (LinearExprBuilder b : balance) {
            model.addEquality(b, 0);
        }
        long divisor = CpSatRun.costDivisor(instance);
        LinearExprBuilder cost = LinearExpr.newBuilder();
        for (int k = 0; k < pieces.length; k++) {
            cost.addTerm(pieces[k], instance.cost[k] / divisor);
        }
        model.addLinearConstraint(cost, ceilDiv(lower, divisor), Math.floorDiv(upper, divisor));
        model.minimize(cost);
        if (hint != null) {
            graph.hint(model, flow, pieces, hint, instance);
        }
        CpSolver solver = CpSatRun.solver(deterministicTime, deadline);
        CpSolverStatus status = solver.solve(model);
        if (status == CpSolverStatus.INFEASIBLE) {
            return new Outcome(null, false, true, upper + 1.0);
        }
        if (status != CpSolverStatus.OPTIMAL && status != CpSolverStatus.FEASIBLE) {
            return new Outcome(null, false, false, lower);
        }
        long[] f = new long[flow.length];
        for (int a = 0; a < f.length; a++) {
            f[a] = solver.value(flow[a]);
        }
        long[] z = new long[pieces.length];
        for (int k = 0; k < z.length; k++) {
            z[k] = solver.value(pieces[k]);
        }
        Packing packing = graph.decompose(instance, f, z);
        double bound = Math.max(lower, solver.bestObjectiveBound() * divisor);
        return new Outcome(packing, status == CpSolverStatus.OPTIMAL, false, bound);
    }

    private static long ceilDiv(long a, long b) {
        return -Math.floorDiv(-a, b);
    }

    /** The reduced arc-flow graph. Arc a runs from node tail[a] to head[a]; type[a] is -1 for a loss arc. */
    private static final class Graph {
        final int[] nodes; // loads, ascending
        final Map<Integer, Integer> nodeOf = new HashMap<>();
        int[] tail;
        int[] head;
        int[] type;

        private Graph(int[] nodes) {
            this.nodes = nodes;
            for (int v = 0; v < nodes.length; v++) {
                nodeOf.put(nodes[v], v);
            }
        }

        int arcCount() {
            return tail.length;
        }

        int node(int load) {
            return nodeOf.get(load);
        }

        static Graph build(IntegerInstance instance, int[] demand, int maxArcs) {
            int capacity = instance.maxCapacity;
            boolean[] reached = new boolean[capacity + 1];
            reached[0] = true;
            List<int[]> itemArcs = new ArrayList<>(); // {from load, type}
            for (int i = 0; i < instance.types(); i++) {
                int size = instance.size[i];
                int copies = size == 0 ? 0 : Math.min(demand[i], capacity / size);
                if (copies == 0) {
                    continue;
                }
                boolean[] start = new boolean[capacity + 1];
                for (int v = 0; v <= capacity; v++) {
                    if (reached[v]) {
                        // a run of 1..copies pieces of type i starting at load v
                        for (int t = 0; t < copies && v + (t + 1) * size <= capacity; t++) {
                            start[v + t * size] = true;
                        }
                    }
                }
                for (int v = 0; v + size <= capacity; v++) {
                    if (start[v]) {
                        itemArcs.add(new int[] {v, i});
                        if (itemArcs.size() > maxArcs) {
                            return null;
                        }
                    }
                }
                for (int v = 0; v + size <= capacity; v++) {
                    if (start[v]) {
                        reached[v + size] = true;
                    }
                }
            }
            for (int k = 0; k < instance.stocks(); k++) {
                reached[instance.capacity[k]] = true;
            }
            int[] nodes = java.util.stream.IntStream.rangeClosed(0, capacity).filter(v -> reached[v]).toArray();
            int arcs = itemArcs.size() + nodes.length - 1;
            if (arcs > maxArcs) {
                return null;
            }
            Graph g = new Graph(nodes);
            g.tail = new int[arcs];
            g.head = new int[arcs];
            g.type = new int[arcs];
            int a = 0;
            for (int[] arc : itemArcs) {
                g.tail[a] = g.node(arc[0]);
                g.head[a] = g.node(arc[0] + instance.size[arc[1]]);
                g.type[a] = arc[1];
                a++;
            }
            for (int v = 0; v + 1 < nodes.length; v++) {
                g.tail[a] = v;
                g.head[a] = v + 1;
                g.type[a] = -1;
                a++;
            }
            return g;
        }

        /** Out-arcs per node: item arcs by type order, then the loss arc. */
        int[][] outArcs() {
            List<List<Integer>> out = new ArrayList<>();
            for (int v = 0; v < nodes.length; v++) {
                out.add(new ArrayList<>());
            }
            for (int a = 0; a < tail.length; a++) {
                out.get(tail[a]).add(a);
            }
            int[][] result = new int[nodes.length][];
            for (int v = 0; v < nodes.length; v++) {
                result[v] = out.get(v).stream().sorted((x, y) -> {
                    int tx = type[x] < 0 ? Integer.MAX_VALUE : type[x];
                    int ty = type[y] < 0 ? Integer.MAX_VALUE : type[y];
                    return Integer.compare(tx, ty);
                }).mapToInt(Integer::intValue).toArray();
            }
            return result;
        }

        /** Hints the flow of a known plan: each stock piece as the path of its pieces by decreasing size. */
        void hint(CpModel model, IntVar[] flow, IntVar[] pieces, Packing plan, IntegerInstance instance) {
            Map<Long, Integer> itemArc = new HashMap<>();
            for (int a = 0; a < tail.length; a++) {
                if (type[a] >= 0) {
                    itemArc.put((long) tail[a] * instance.types() + type[a], a);
                }
            }
            long[] f = new long[tail.length];
            long[] z = new long[pieces.length];
            for (Pattern p : plan.pieces()) {
                int load = 0;
                for (int i = 0; i < instance.types(); i++) {
                    for (int c = 0; c < p.count(i); c++) {
                        Integer a = itemArc.get((long) node(load) * instance.types() + i);
                        if (a == null) {
                            return; // the plan leaves the reduced graph: no hint
                        }
                        f[a]++;
                        load += instance.size[i];
                    }
                }
                // loss arcs from the load to the capacity: consecutive nodes (they are arcs v -> v+1 by index)
                int end = node(instance.capacity[p.stock()]);
                for (int v = node(load); v < end; v++) {
                    f[itemArcCount() + v]++;
                }
                z[p.stock()]++;
            }
            for (int a = 0; a < f.length; a++) {
                model.addHint(flow[a], f[a]);
            }
            for (int k = 0; k < z.length; k++) {
                model.addHint(pieces[k], z[k]);
            }
        }

        private int itemArcCount() {
            return tail.length - (nodes.length - 1);
        }

        /** Splits an integer flow into stock pieces: follow positive arcs from 0, stop where a piece may end. */
        Packing decompose(IntegerInstance instance, long[] flow, long[] pieces) {
            long[] f = flow.clone();
            long[] z = pieces.clone();
            int[][] out = outArcs();
            List<Pattern> result = new ArrayList<>();
            long total = Arrays.stream(z).sum();
            for (long n = 0; n < total; n++) {
                int v = 0;
                int[] counts = new int[instance.types()];
                int stock = -1;
                while (stock < 0) {
                    for (int k = 0; k < z.length; k++) {
                        if (z[k] > 0 && instance.capacity[k] == nodes[v]) {
                            stock = k;
                            break;
                        }
                    }
                    if (stock >= 0) {
                        break;
                    }
                    int next = -1;
                    for (int a : out[v]) {
                        if (f[a] > 0) {
                            next = a;
                            break;
                        }
                    }
                    if (next < 0) {
                        throw new IllegalStateException("arc flow does not decompose at load " + nodes[v]);
                    }
                    f[next]--;
                    if (type[next] >= 0) {
                        counts[type[next]]++;
                    }
                    v = head[next];
                }
                z[stock]--;
                Pattern pattern = new Pattern(stock, counts);
                if (!pattern.isEmpty()) { // an empty path is a free stock piece left unused
                    result.add(pattern);
                }
            }
            return new Packing(result);
        }
    }
}
