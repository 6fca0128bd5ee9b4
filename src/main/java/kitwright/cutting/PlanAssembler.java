package kitwright.cutting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.Status;

/**
 * Turns a solver packing into the plan records: marks for item types, saw order, offcuts, value and gap.
 *
 * <p>Identical stock pieces are grouped (stock type in catalog order, then most repeated first); pieces of an item
 * type are handed to its marks in the order the marks were given. Within a pattern the cuts run longest first from
 * the first trim line. Offcut = L - 2*trim - sum(lengths) - n*kerf, floored at 0; it is a remnant when positive
 * and at least the minimum remnant length, scrap otherwise.
 */
final class PlanAssembler {
    private PlanAssembler() {
    }

    /** A plan for a packing that cuts exactly the demand; {@code bound} in integer cost units. */
    static SectionCutPlan plan(IntegerInstance instance, Packing packing, Status status, long bound) {
        SectionProblem problem = instance.problem;
        List<CutPattern> patterns = patterns(instance, packing);
        double value = value(problem, packing);
        double lowerBound = status == Status.OPTIMAL ? value : Math.min(value, instance.value(bound));
        double gap = value > 0 ? (value - lowerBound) / value : 0;
        int pieces = patterns.stream().mapToInt(CutPattern::count).sum();
        return new SectionCutPlan(problem.section(), problem.kerfMm(), problem.trimMm(), problem.minRemnantMm(),
                problem.objective(), status, null, value, lowerBound, gap, pieces, patterns, List.of());
    }

    /** The plan of a section that cannot be cut. */
    static SectionCutPlan infeasible(SectionProblem problem, String reason) {
        return new SectionCutPlan(problem.section(), problem.kerfMm(), problem.trimMm(), problem.minRemnantMm(),
                problem.objective(), Status.INFEASIBLE, reason, null, null, null, 0, List.of(), List.of());
    }

    /** Objective value: sum of price x pieces (cost) or stock length x pieces (length), per stock row. */
    static double value(SectionProblem problem, Packing packing) {
        boolean cost = problem.objective().equals("cost");
        int[] used = packing.used(problem.stock().size());
        double value = 0;
        for (int k = 0; k < used.length; k++) {
            StockOption s = problem.stock().get(k);
            value += used[k] * (cost ? (s.price() == null ? 0 : s.price()) : s.lengthMm());
        }
        return value;
    }

    static List<CutPattern> patterns(IntegerInstance instance, Packing packing) {
        Map<Pattern, Integer> groups = new LinkedHashMap<>();
        for (Pattern p : packing.pieces()) {
            groups.merge(p, 1, Integer::sum);
        }
        List<Map.Entry<Pattern, Integer>> ordered = new ArrayList<>(groups.entrySet());
        ordered.sort(Comparator.<Map.Entry<Pattern, Integer>>comparingInt(e -> e.getKey().stock())
                .thenComparing(e -> -e.getValue())
                .thenComparing((a, b) -> -Arrays.compare(a.getKey().counts(), b.getKey().counts())));
        List<Demand> demands = instance.problem.demands();
        int[] cursor = new int[instance.types()];
        int[][] left = new int[instance.types()][];
        for (int i = 0; i < instance.types(); i++) {
            left[i] = Arrays.stream(instance.marks[i]).map(d -> demands.get(d).quantity()).toArray();
        }
        List<CutPattern> out = new ArrayList<>();
        for (Map.Entry<Pattern, Integer> e : ordered) {
            Pattern p = e.getKey();
            List<Cut> previous = null;
            int run = 0;
            for (int n = 0; n < e.getValue(); n++) {
                List<Cut> cuts = new ArrayList<>();
                for (int i = 0; i < instance.types(); i++) {
                    for (int c = 0; c < p.count(i); c++) {
                        while (cursor[i] < left[i].length - 1 && left[i][cursor[i]] == 0) {
                            cursor[i]++;
                        }
                        Demand d = demands.get(instance.marks[i][cursor[i]]);
                        left[i][cursor[i]]--;
                        cuts.add(new Cut(d.mark(), d.lengthMm()));
                    }
                }
                if (cuts.equals(previous)) {
                    run++;
                } else {
                    if (previous != null) {
                        out.add(pattern(instance.problem, p.stock(), run, previous));
                    }
                    previous = cuts;
                    run = 1;
                }
            }
            out.add(pattern(instance.problem, p.stock(), run, previous));
        }
        return out;
    }

    static CutPattern pattern(SectionProblem problem, int stock, int count, List<Cut> cuts) {
        StockOption s = problem.stock().get(stock);
        double offcut = offcut(problem.kerfMm(), problem.trimMm(), s.lengthMm(), cuts);
        return new CutPattern(s.lengthMm(), s.origin(), count, cuts, offcut,
                offcutKind(offcut, problem.minRemnantMm()));
    }

    /** L - 2*trim - sum(lengths) - n*kerf, floored at 0, in exact decimals ({@link SawArithmetic#offcut}). */
    static double offcut(double kerfMm, double trimMm, double stockLengthMm, List<Cut> cuts) {
        return SawArithmetic.offcut(kerfMm, trimMm, stockLengthMm, cuts);
    }

    static String offcutKind(double offcutMm, double minRemnantMm) {
        return offcutMm > 0 && offcutMm >= minRemnantMm ? "remnant" : "scrap";
    }
}
