package kitwright.cutting;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;

/**
 * The integer unit of a section's lengths: 10^-decimals mm, with {@code decimals} the finest decimal its data
 * actually uses (lengths, kerf, trim, stock lengths, each read as its shortest decimal form), so that every length
 * is a whole number of units and the solvers decide every fit exactly. Whole-millimetre data gets 1 mm units,
 * data with hundredths 0.01 mm units.
 *
 * <p>Exactness has a price: the knapsack tables and the arc-flow graph grow with the capacity in units. Past
 * {@link #MAX_DECIMALS} decimals, or when the longest capacity would exceed {@link IntegerInstance#MAX_UNITS}
 * units, fewer decimals are kept and lengths are rounded: {@link #up} for what a piece consumes, {@link #down} for
 * what a stock piece offers in a plan, the other way round for a bound. {@link #exact} says whether that happened.
 *
 * @param decimals units are 10^-decimals mm
 * @param exact    every length of the section is a whole number of units
 */
record LengthScale(int decimals, boolean exact) {
    /** Micrometres: the finest saw arithmetic worth planning exactly. */
    static final int MAX_DECIMALS = 3;

    /** The exact scale of a section's saw data, at most {@link #MAX_DECIMALS} decimals. */
    static LengthScale of(SectionProblem problem) {
        int finest = 0;
        for (double mm : lengths(problem)) {
            finest = Math.max(finest, decimalsOf(mm));
        }
        return new LengthScale(Math.min(finest, MAX_DECIMALS), finest <= MAX_DECIMALS);
    }

    /** One decimal fewer, no longer exact. */
    LengthScale coarser() {
        return new LengthScale(decimals - 1, false);
    }

    /** Units, rounded up (exact when the length is a whole number of units). */
    long up(BigDecimal mm) {
        return mm.movePointRight(decimals).setScale(0, RoundingMode.CEILING).longValueExact();
    }

    /** Units, rounded down (exact when the length is a whole number of units). */
    long down(BigDecimal mm) {
        return mm.movePointRight(decimals).setScale(0, RoundingMode.FLOOR).longValueExact();
    }

    /** Decimals of a length as written: 6000 has 0, 599.1 has 1, 1.04 has 2. */
    static int decimalsOf(double mm) {
        return SawArithmetic.decimals(mm);
    }

    private static List<Double> lengths(SectionProblem problem) {
        List<Double> all = new ArrayList<>();
        all.add(problem.kerfMm());
        all.add(problem.trimMm());
        problem.demands().forEach(d -> all.add(d.lengthMm()));
        problem.stock().forEach(s -> all.add(s.lengthMm()));
        return all;
    }
}
