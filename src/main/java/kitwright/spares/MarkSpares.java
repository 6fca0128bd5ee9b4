package kitwright.spares;

/**
 * Service-life spares of one mark.
 *
 * @param mark             the mark
 * @param bars             bars of the mark in service at once, n (the quantity the structures need)
 * @param barCycles        bar-cycles over the kit's life, n * c: each is one chance to lose a bar, since a lost bar
 *                         is replaced from the spares and its replacement serves the cycles that are left
 * @param lossRatePerCycle probability p that a bar in service is lost in one cycle
 * @param spares           spares the mark needs: the smallest s with P(losses <= s) >= perMarkLevel,
 *                         losses ~ Binomial(n * c, p)
 * @param perMarkLevel     the share of the kit's service level this mark must reach, L^(1/m)
 * @param alreadyInKit     bars the kit already holds beyond the structures' need (its surplus), which count as spares
 * @param coverage         P(losses <= spares held), the spares held being {@link #held()}: the chance that the mark
 *                         never runs short over the kit's life
 */
public record MarkSpares(String mark, int bars, int barCycles, double lossRatePerCycle, int spares,
                         double perMarkLevel, int alreadyInKit, double coverage) {
    public MarkSpares {
        if (bars < 0 || barCycles < 0 || spares < 0 || alreadyInKit < 0) {
            throw new IllegalArgumentException("negative count for mark " + mark);
        }
        if (!(lossRatePerCycle >= 0 && lossRatePerCycle <= 1) || !(perMarkLevel >= 0 && perMarkLevel <= 1)
                || !(coverage >= 0 && coverage <= 1)) {
            throw new IllegalArgumentException("probability out of [0, 1] for mark " + mark);
        }
    }

    /** Mean bars lost over the kit's life, n * c * p. */
    public double expectedLosses() {
        return barCycles * lossRatePerCycle;
    }

    /** Spares still to be made: the spares needed minus the surplus the kit already holds, at least zero. */
    public int toMake() {
        return Math.max(0, spares - alreadyInKit);
    }

    /** Spares the kit holds once those to make are made: the surplus plus {@link #toMake()}. */
    public int held() {
        return alreadyInKit + toMake();
    }
}
