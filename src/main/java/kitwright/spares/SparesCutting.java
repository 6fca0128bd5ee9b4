package kitwright.spares;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.Deadline;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.MiscutAllowance;
import kitwright.model.Status;

/**
 * Puts the service-life spares into the cutting plan, cutting them from offcuts first and buying stock only for
 * the rest (src/docs/sources.md, common practice: offcuts long enough for a spare bar are free spares).
 *
 * <p><b>Method.</b> (1) Plan the kit's demand and fill its offcuts with up to the spares each mark needs; bars the
 * plan cuts beyond the demand anyway count as spares too. (2) While some mark is short, add the shortfall to that
 * mark's demand, re-plan, and fill the new plan's offcuts again with the spares still missing. Each round adds at
 * least one bar to the demand of a short mark and a plan with demand + r holds at least r spares, so the loop ends
 * after at most (total spares + 1) rounds; in practice one or two. Every round re-solves the changed sections, each
 * up to its own time limit, so the rounds are bounded twice: by a deterministic budget ({@link #MAX_ROUNDS}) and by
 * one wall-clock deadline for the whole loop (kit.json timeLimitSeconds, from the end of the first plan). The round
 * that reaches either buys every spare outright (a plan with demand + r cuts at least r spares), so the loop always
 * ends with the spares made.
 *
 * <p><b>Accounting.</b> A mark's bought spares are the bars added to its demand; the rest of its spares came from
 * offcuts. The spares' cost is the stock cost of the final plan minus that of the plan without spares. When a
 * re-plan has no feasible plan for a section that had one (limited stock), the previous plan is kept and the
 * shortfall is reported as missing.
 *
 * <p>Pure function over {@link CuttingSteps}: no state, no I/O.
 */
public final class SparesCutting {
    /** Re-plan rounds at most; the last one buys what is still short. */
    public static final int MAX_ROUNDS = 5;

    private SparesCutting() {
    }

    public static SparesCuttingResult apply(Kit kit, SparesPlan spares, CuttingSteps cutting) {
        return apply(kit, spares, cutting, MAX_ROUNDS);
    }

    /** As {@link #apply(Kit, SparesPlan, CuttingSteps)} with at most {@code maxRounds} (at least 1) re-plans. */
    static SparesCuttingResult apply(Kit kit, SparesPlan spares, CuttingSteps cutting, int maxRounds) {
        CutPlan base = cutting.plan(kit);
        Deadline deadline = Deadline.in(kit.settings().timeLimitSeconds());
        Map<String, Integer> need = new LinkedHashMap<>();
        for (Bar bar : kit.bars()) {
            MarkSpares m = spares.mark(bar.mark());
            need.put(bar.mark(), m == null ? 0 : m.toMake());
        }
        Map<String, Integer> added = zeros(kit);
        CutPlan plan = cutting.fillOffcuts(kit, base, shortfall(need, produced(base, kit)));
        int rounds = 0;
        Map<String, Integer> missing = zeros(kit);
        while (true) {
            Map<String, Integer> stillShort = shortfall(need, produced(plan, kit));
            if (stillShort.values().stream().allMatch(v -> v == 0)) {
                break;
            }
            Map<String, Integer> next = new LinkedHashMap<>(added);
            stillShort.forEach((mark, v) -> next.merge(mark, v, Integer::sum));
            boolean last = rounds + 1 >= maxRounds || deadline.passed();
            if (last) {
                // buy every spare outright: the re-plan then holds them all, whatever its offcuts do (a mark that
                // is not short now may lose its free spares in the re-plan)
                need.forEach((mark, n) -> next.merge(mark, n, Math::max));
            }
            Kit more = withExtraDemand(kit, next);
            CutPlan replanned = cutting.plan(more);
            if (lostFeasibility(plan, replanned)) {
                missing = stillShort;
                break;
            }
            rounds++;
            added = next;
            plan = cutting.fillOffcuts(more, replanned, shortfall(need, produced(replanned, kit)));
            if (last) {
                missing = shortfall(need, produced(plan, kit)); // none when the re-plan met its demand
                break;
            }
        }
        plan = withSparesOf(plan, kit);
        Map<String, Integer> extra = produced(plan, kit);
        List<SparesSupply> supply = new ArrayList<>();
        for (Bar bar : kit.bars()) {
            String mark = bar.mark();
            int bought = added.get(mark);
            MarkSpares m = spares.mark(mark);
            supply.add(new SparesSupply(mark, need.get(mark), Math.max(0, extra.get(mark) - bought), bought,
                    missing.get(mark), m == null ? 0 : m.expectedLosses()));
        }
        Double before = KitMetricsCalculator.stockCost(kit, base);
        Double after = KitMetricsCalculator.stockCost(kit, plan);
        Double extraCost = before == null || after == null ? null : after - before;
        return new SparesCuttingResult(plan, supply, extraCost, rounds);
    }

    /**
     * Bars cut beyond the kit's quantity and its miscut allowance, per mark (never negative; sections without a
     * plan cut nothing).
     */
    static Map<String, Integer> produced(CutPlan plan, Kit kit) {
        Map<String, Integer> cut = zeros(kit);
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern p : section.patterns()) {
                for (Cut c : p.cuts()) {
                    cut.computeIfPresent(c.mark(), (mark, n) -> n + p.count());
                }
            }
        }
        Map<String, Integer> beyond = zeros(kit);
        for (Bar bar : kit.bars()) {
            beyond.put(bar.mark(), Math.max(0, cut.get(bar.mark()) - bar.quantity() - kit.allowance(bar)));
        }
        return beyond;
    }

    /**
     * The plan with each section's spares counted against the kit's own quantities, so that bars bought as spares
     * (added to the demand of a re-plan) are listed as spares too, as the cutting JSON contract means them.
     */
    static CutPlan withSparesOf(CutPlan plan, Kit kit) {
        List<SectionCutPlan> sections = new ArrayList<>();
        for (SectionCutPlan s : plan.sections()) {
            Map<String, Integer> cut = new LinkedHashMap<>();
            for (CutPattern p : s.patterns()) {
                for (Cut c : p.cuts()) {
                    cut.merge(c.mark(), p.count(), Integer::sum);
                }
            }
            List<Spare> spares = new ArrayList<>();
            for (Bar bar : kit.bars()) {
                int beyond = cut.getOrDefault(bar.mark(), 0) - bar.quantity() - kit.allowance(bar);
                if (bar.section().equals(s.section()) && beyond > 0) {
                    spares.add(new Spare(bar.mark(), beyond));
                }
            }
            sections.add(new SectionCutPlan(s.section(), s.kerfMm(), s.trimMm(), s.minRemnantMm(), s.objective(),
                    s.status(), s.reason(), s.value(), s.lowerBound(), s.gap(), s.stockPieces(), s.patterns(),
                    spares));
        }
        return new CutPlan(sections);
    }

    private static Map<String, Integer> shortfall(Map<String, Integer> need, Map<String, Integer> have) {
        Map<String, Integer> result = new LinkedHashMap<>();
        need.forEach((mark, n) -> result.put(mark, Math.max(0, n - have.getOrDefault(mark, 0))));
        return result;
    }

    private static boolean lostFeasibility(CutPlan before, CutPlan after) {
        long was = before.sections().stream().filter(s -> s.status() == Status.INFEASIBLE).count();
        long is = after.sections().stream().filter(s -> s.status() == Status.INFEASIBLE).count();
        return is > was;
    }

    /**
     * The kit with {@code extra} bars added to each mark's cutting demand (the structures' need unchanged). The
     * miscut allowance is folded into the quantity and the policy dropped, so that a share in percent is not taken
     * again of the larger quantity: the demand is exactly quantity + allowance + extra. The order of the marks by
     * quantity stays the same, as the allowance never falls when the quantity grows.
     */
    static Kit withExtraDemand(Kit kit, Map<String, Integer> extra) {
        List<Bar> bars = kit.bars().stream()
                .map(b -> new Bar(b.mark(), b.section(), b.lengthMm(),
                        b.quantity() + kit.allowance(b) + extra.getOrDefault(b.mark(), 0),
                        b.requiredQuantity(), b.nodeToNodeMm(), b.toleranceMm(), b.note()))
                .toList();
        return new Kit(kit.dir(), kit.settings().withMiscutAllowance(MiscutAllowance.NONE), bars, kit.structures(),
                kit.joints(), kit.catalog(), kit.materials(), kit.crates(), kit.vehicles(), kit.files());
    }

    private static Map<String, Integer> zeros(Kit kit) {
        Map<String, Integer> map = new LinkedHashMap<>();
        kit.bars().forEach(b -> map.put(b.mark(), 0));
        return map;
    }
}
