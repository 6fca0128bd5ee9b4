package kitwright.cutting;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;

/**
 * The saw model of {@link SectionProblem} in exact decimal arithmetic, for every figure a plan states along a stock
 * piece: where each piece starts, the offcut and where it starts. Each double is read as the decimal it was written
 * as, its shortest decimal form ({@link BigDecimal#valueOf(double)}), so 599.1 + 1.04 is 600.14 and no sum drifts.
 * <pre>
 *   start_i  = trim + sum over earlier pieces j of (l_j + kerf)
 *   offcut   = max(0, L - 2*trim - sum_i l_i - n*kerf)              (to the micrometre, rounded down)
 *   offcut starts at min(trim + sum_i (l_i + kerf), L - trim)       (no kerf past the far trim line)
 * </pre>
 */
public final class SawArithmetic {
    private SawArithmetic() {
    }

    /** Decimals of a length as written: 6000 has 0, 599.1 has 1, 1.04 has 2. */
    public static int decimals(double mm) {
        return Math.max(0, exact(mm).stripTrailingZeros().scale());
    }

    /** The decimal a length was written as. */
    public static BigDecimal exact(double mm) {
        return BigDecimal.valueOf(mm);
    }

    /** Where each piece starts, in saw order. */
    public static List<Double> starts(double kerfMm, double trimMm, List<Cut> cuts) {
        List<Double> starts = new ArrayList<>(cuts.size());
        BigDecimal kerf = exact(kerfMm);
        BigDecimal position = exact(trimMm);
        for (Cut c : cuts) {
            starts.add(position.doubleValue());
            position = position.add(exact(c.lengthMm())).add(kerf);
        }
        return starts;
    }

    /** Where the offcut starts: one kerf after the last piece, never past the far trim line. */
    public static double offcutStart(double kerfMm, double trimMm, double stockLengthMm, List<Cut> cuts) {
        BigDecimal position = exact(trimMm).add(consumed(kerfMm, cuts));
        return position.min(exact(stockLengthMm).subtract(exact(trimMm))).doubleValue();
    }

    /** L - 2*trim - sum(lengths) - n*kerf, floored at 0, rounded down to a micrometre. */
    public static double offcut(double kerfMm, double trimMm, double stockLengthMm, List<Cut> cuts) {
        BigDecimal trim = exact(trimMm);
        BigDecimal offcut = exact(stockLengthMm).subtract(trim).subtract(trim).subtract(consumed(kerfMm, cuts));
        return offcut.max(BigDecimal.ZERO).setScale(3, RoundingMode.FLOOR).doubleValue();
    }

    /** Whether the pieces fit: sum(l_i + kerf) &lt;= L - 2*trim + kerf. */
    public static boolean fits(double kerfMm, double trimMm, double stockLengthMm, List<Cut> cuts) {
        return consumed(kerfMm, cuts).compareTo(capacity(kerfMm, trimMm, stockLengthMm)) <= 0;
    }

    /** L - 2*trim + kerf: what the pieces and their kerfs may take. */
    static BigDecimal capacity(double kerfMm, double trimMm, double stockLengthMm) {
        BigDecimal trim = exact(trimMm);
        return exact(stockLengthMm).subtract(trim).subtract(trim).add(exact(kerfMm));
    }

    /** sum(l_i + kerf). */
    static BigDecimal consumed(double kerfMm, List<Cut> cuts) {
        BigDecimal kerf = exact(kerfMm);
        BigDecimal sum = BigDecimal.ZERO;
        for (Cut c : cuts) {
            sum = sum.add(exact(c.lengthMm())).add(kerf);
        }
        return sum;
    }
}
