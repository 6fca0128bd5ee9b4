package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.model.StockLength;
import kitwright.report.cutting.CutListCsv;
import kitwright.validate.CutPlanValidator;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/**
 * Saw arithmetic with hundredths of a millimetre, checked in exact decimals: fractional kerf (0.01-4 mm), trim
 * (0-12 mm) and lengths to 0.01 mm, with the stock length built to sit a few hundredths over or under a fill.
 * Every plan goes through the shared validator, which recomputes fits, starts and offcuts in BigDecimal.
 */
class ExactSawArithmeticProperties {
    static final String SECTION = "CHS 48.3x3.2";
    /** Small work limits: these sections have at most 9 pieces. */
    static final SearchLimits LIMITS = new SearchLimits(60, 300, 20, 0.2, 0.5, 20_000);

    static double hundredths(long h) {
        return BigDecimal.valueOf(h, 2).doubleValue();
    }

    /**
     * One stock piece holding {@code n_i} pieces of each mark, its length 2*trim + sum(lengths) + (N-1)*kerf +
     * delta: it holds them exactly when delta >= 0. The fit of the integer instance, the offcut, the validator and
     * the saw sheet all must agree with that.
     */
    @Property(tries = 2400, seed = "20261203")
    void fitOffsetsOffcutAndValidatorAgreeWithExactDecimals(
            @ForAll @IntRange(min = 1, max = 400) int kerfHundredths,
            @ForAll @IntRange(min = 0, max = 1200) int trimHundredths,
            @ForAll @IntRange(min = -3, max = 3) int deltaHundredths,
            @ForAll @LongRange(min = 1, max = 1_000_000_000L) long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        BigDecimal kerf = BigDecimal.valueOf(kerfHundredths, 2);
        BigDecimal trim = BigDecimal.valueOf(trimHundredths, 2);
        int marks = 1 + random.nextInt(3);
        List<Demand> demands = new ArrayList<>();
        List<Cut> cuts = new ArrayList<>();
        BigDecimal sum = BigDecimal.ZERO;
        int pieces = 0;
        for (int m = 0; m < marks; m++) {
            long h = 10_000 + random.nextInt(290_000); // 100.00 to 2999.99 mm
            int quantity = 1 + random.nextInt(4);
            demands.add(new Demand("M" + (m + 1), hundredths(h), quantity));
            for (int q = 0; q < quantity; q++) {
                cuts.add(new Cut("M" + (m + 1), hundredths(h)));
            }
            sum = sum.add(BigDecimal.valueOf(h, 2).multiply(BigDecimal.valueOf(quantity)));
            pieces += quantity;
        }
        BigDecimal delta = BigDecimal.valueOf(deltaHundredths, 2);
        BigDecimal stock = trim.add(trim).add(sum).add(kerf.multiply(BigDecimal.valueOf(pieces - 1))).add(delta);
        boolean fits = deltaHundredths >= 0;
        SectionProblem problem = new SectionProblem(SECTION, demands,
                List.of(new StockOption(stock.doubleValue(), 10.0, null, Origin.MILL)), kerf.doubleValue(),
                trim.doubleValue(), 300, LIMITS);

        IntegerInstance instance = new IntegerInstance(problem);
        assertThat(instance.fits(new Pattern(0, instance.demands())))
                .as("fit of %s pieces on %s mm, kerf %s, trim %s", pieces, stock, kerf, trim).isEqualTo(fits);

        double offcut = PlanAssembler.offcut(kerf.doubleValue(), trim.doubleValue(), stock.doubleValue(), cuts);
        BigDecimal expected = delta.subtract(kerf).max(BigDecimal.ZERO); // L - 2t - sum - N*kerf
        assertThat(BigDecimal.valueOf(offcut)).as("offcut").isEqualByComparingTo(expected);

        CutPattern pattern = new CutPattern(stock.doubleValue(), Origin.MILL, 1, cuts, offcut,
                PlanAssembler.offcutKind(offcut, 300));
        SectionCutPlan plan = new SectionCutPlan(SECTION, kerf.doubleValue(), trim.doubleValue(), 300, "cost",
                Status.OPTIMAL, null, 10.0, 10.0, 0.0, 1, List.of(pattern), List.of());
        if (fits) {
            CutPlanValidator.validate(problem, plan);
            CutPlanValidator.validateCutList(new CutPlan(List.of(plan)),
                    CutListCsv.format(kit(problem), new CutPlan(List.of(plan))));
        } else {
            assertThatThrownBy(() -> CutPlanValidator.validate(problem, plan)).isInstanceOf(AssertionError.class)
                    .hasMessageContaining("does not fit");
        }
    }

    /** About 150 full solves of small fractional sections near a fill, each checked in exact decimals. */
    @Property(tries = 150, seed = "20261203")
    void everySolvedPlanPassesTheExactValidator(@ForAll @LongRange(min = 1, max = 1_000_000_000L) long seed) {
        SectionProblem problem = nearFill(seed);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.status()).isNotEqualTo(Status.INFEASIBLE); // every mark fits the stock, stock unlimited
        CutPlan whole = new CutPlan(List.of(plan));
        CutPlanValidator.validateCutList(whole, CutListCsv.format(kit(problem), whole));
        // spares cut from the offcuts keep every stock piece inside the saw model too
        List<OffcutFiller.Candidate> candidates = problem.demands().stream()
                .map(d -> new OffcutFiller.Candidate(d.mark(), d.lengthMm(), 3)).toList();
        SectionCutPlan filled = OffcutFiller.fill(plan, candidates);
        CutPlanValidator.validate(problem, filled);
        CutPlan wholeFilled = new CutPlan(List.of(filled));
        CutPlanValidator.validateCutList(wholeFilled, CutListCsv.format(kit(problem), wholeFilled));
        SectionCutPlan firstFit = new FirstFitDecreasing().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, firstFit);
    }

    /**
     * A small section (2-3 marks, 1-3 bars each, lengths to 0.01 mm, kerf 0.01-4, trim 0-12) whose stock lengths
     * sit within 0.03 mm of holding a chosen set of its pieces: some patterns just fit, some just miss.
     */
    static SectionProblem nearFill(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        BigDecimal kerf = BigDecimal.valueOf(1 + random.nextInt(400), 2);
        BigDecimal trim = BigDecimal.valueOf(random.nextInt(1201), 2);
        int marks = 2 + random.nextInt(2);
        List<Demand> demands = new ArrayList<>();
        List<BigDecimal> lengths = new ArrayList<>();
        for (int m = 0; m < marks; m++) {
            BigDecimal length = BigDecimal.valueOf(30_000 + random.nextInt(170_000), 2);
            lengths.add(length);
            demands.add(new Demand("M" + (m + 1), length.doubleValue(), 1 + random.nextInt(3)));
        }
        List<StockOption> stock = new ArrayList<>();
        int lengthsOfStock = 1 + random.nextInt(2);
        for (int s = 0; s < lengthsOfStock; s++) {
            // a fill of 2-4 pieces of the marks, then a few hundredths either side
            BigDecimal fill = BigDecimal.ZERO;
            int n = 2 + random.nextInt(3);
            for (int p = 0; p < n; p++) {
                fill = fill.add(lengths.get(random.nextInt(marks)));
            }
            fill = fill.add(kerf.multiply(BigDecimal.valueOf(n - 1))).add(trim).add(trim);
            BigDecimal length = fill.add(BigDecimal.valueOf(random.nextInt(7) - 3, 2));
            BigDecimal longest = lengths.stream().max(BigDecimal::compareTo).orElseThrow().add(trim).add(trim);
            length = length.max(longest);
            boolean priced = random.nextInt(3) != 0;
            double mm = length.doubleValue();
            if (stock.stream().anyMatch(o -> o.lengthMm() == mm)) {
                continue; // a catalog lists a stock length once
            }
            stock.add(new StockOption(length.doubleValue(), priced ? 10.0 + random.nextInt(20) : null, null,
                    Origin.MILL));
        }
        if (stock.stream().anyMatch(s -> s.price() == null)) {
            stock = stock.stream().map(s -> new StockOption(s.lengthMm(), null, null, Origin.MILL)).toList();
        }
        return new SectionProblem(SECTION, demands, stock, kerf.doubleValue(), trim.doubleValue(), 300, LIMITS);
    }

    /** A kit of the problem's bars, for the saw sheet (it reads the bars' quantities only). */
    static Kit kit(SectionProblem problem) {
        List<Bar> bars = problem.demands().stream()
                .map(d -> KitFixtures.bar(d.mark(), SECTION, d.lengthMm(), d.quantity())).toList();
        List<StockLength> stock = problem.stock().stream()
                .map(s -> new StockLength(SECTION, s.lengthMm(), s.price(), s.available(), s.origin())).toList();
        return KitFixtures.kit(List.of(KitFixtures.chs(SECTION, 48.3, 3.2)), stock, bars,
                KitSettings.defaults("exact").withKerfMm(problem.kerfMm()).withTrimMm(problem.trimMm())
                        .withMinRemnantMm(problem.minRemnantMm()));
    }
}
