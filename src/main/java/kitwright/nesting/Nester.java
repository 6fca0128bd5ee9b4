package kitwright.nesting;

import java.util.List;
import kitwright.cutting.CutPlan;
import kitwright.ids.IdScheme;
import kitwright.model.Kit;
import kitwright.model.KitSettings;

/**
 * The nesting stage, a pure function: a kit and its cutting plan in, the bundles out. Every cut piece becomes a
 * tube sized by the kit's fit rule ({@link FitRule}: kit.json {@code nestTolerance}, {@code nestClearanceMm}); the
 * tubes are nested by {@link PatternNester} with the kit's end allowance and bundle mass limit.
 */
public final class Nester {
    private Nester() {
    }

    /** The plan.json "nesting" record for a kit, with the default work limits. */
    public static NestPlan plan(Kit kit, CutPlan cutPlan) {
        return run(kit, cutPlan, NestingOptions.DEFAULT.withWallSeconds(kit.settings().timeLimitSeconds())).plan();
    }

    public static NestResult run(Kit kit, CutPlan cutPlan, NestingOptions options) {
        KitSettings s = kit.settings();
        FitRule rule = new FitRule(s.nestTolerance(), s.nestClearanceMm());
        List<Tube> tubes = TubeList.of(kit, cutPlan, rule);
        NestingProblem problem = new NestingProblem(tubes, s.nestClearanceMm(), s.nestEndAllowanceMm(),
                s.maxBundleMassKg(), IdScheme.of(kit));
        return run(problem, rule, options);
    }

    /** Nests literal tubes (their sizes already from {@code rule}). */
    public static NestResult run(NestingProblem problem, FitRule rule, NestingOptions options) {
        NestingSolution solution = new PatternNester(options).solve(problem);
        NestPlan plan = NestPlanAssembler.assemble(problem, solution, rule.tolerance());
        double loose = problem.totalEnvelopeVolumeMm3() / 1e9;
        double bundled = plan.bundles().stream()
                .mapToDouble(b -> Math.PI / 4 * b.envelopeDiameterMm() * b.envelopeDiameterMm() * b.lengthMm())
                .sum() / 1e9;
        boolean infeasible = solution.status() == kitwright.model.Status.INFEASIBLE;
        return new NestResult(plan, infeasible ? solution.reason() : null, rule.description(),
                problem.tubes().size(), loose, bundled, infeasible ? null : solution.reason());
    }
}
