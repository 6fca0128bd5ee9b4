package kitwright.nesting;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import kitwright.model.NestTolerance;

/**
 * Turns placements into the plan.json records: one {@link Bundle} per bundle's host, guests nested under their
 * hosts. Bundles are ordered widest host first, then longest, then by mark and layout, and numbered in that order
 * with the problem's bundle ids (BDL-1, BDL-2, ... unless a mark reads like them, {@link kitwright.ids.IdScheme});
 * guests are ordered by offset, then centre. Same input, same bytes.
 */
final class NestPlanAssembler {
    private NestPlanAssembler() {
    }

    static NestPlan assemble(NestingProblem problem, NestingSolution solution, NestTolerance tolerance) {
        List<Tube> tubes = problem.tubes();
        List<List<Placement>> guestsOf = new ArrayList<>();
        for (int i = 0; i < tubes.size(); i++) {
            guestsOf.add(new ArrayList<>());
        }
        for (Placement p : solution.placements()) {
            if (!p.isBundle()) {
                guestsOf.get(p.host()).add(p);
            }
        }
        List<Bundle> unnamed = new ArrayList<>();
        for (Placement p : solution.placements()) {
            if (p.isBundle()) {
                NestedTube host = tree(tubes, guestsOf, p);
                unnamed.add(new Bundle("", host.lengthMm(), host.outerDiameterMm(), mass(tubes, guestsOf, p.tube()),
                        host));
            }
        }
        unnamed.sort(Comparator.comparingDouble(Bundle::envelopeDiameterMm).reversed()
                .thenComparing(Comparator.comparingDouble(Bundle::lengthMm).reversed())
                .thenComparing(b -> b.host().mark())
                .thenComparing(b -> b.host().toString()));
        List<Bundle> bundles = new ArrayList<>();
        for (int i = 0; i < unnamed.size(); i++) {
            Bundle b = unnamed.get(i);
            String id = problem.ids().bundle(i + 1);
            bundles.add(new Bundle(id, b.lengthMm(), b.envelopeDiameterMm(), b.massKg(), b.host()));
        }
        return new NestPlan(tolerance, problem.clearanceMm(), solution.status(), solution.lowerBound(), bundles);
    }

    private static NestedTube tree(List<Tube> tubes, List<List<Placement>> guestsOf, Placement p) {
        Tube t = tubes.get(p.tube());
        List<Placement> guests = new ArrayList<>(guestsOf.get(p.tube()));
        guests.sort(Comparator.comparingDouble(Placement::offsetMm).thenComparingDouble(Placement::centerXMm)
                .thenComparingDouble(Placement::centerYMm).thenComparingInt(Placement::tube));
        List<NestedTube> nested = new ArrayList<>();
        for (Placement g : guests) {
            nested.add(tree(tubes, guestsOf, g));
        }
        return new NestedTube(t.mark(), t.outerDiameterMm(), t.boreMm(), t.lengthMm(), p.centerXMm(),
                p.centerYMm(), p.offsetMm(), nested);
    }

    private static double mass(List<Tube> tubes, List<List<Placement>> guestsOf, int tube) {
        double sum = tubes.get(tube).massKg();
        for (Placement g : guestsOf.get(tube)) {
            sum += mass(tubes, guestsOf, g.tube());
        }
        return sum;
    }
}
