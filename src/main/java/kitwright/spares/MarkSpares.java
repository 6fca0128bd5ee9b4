package kitwright.spares;

/**
 * Service-life spares of one mark.
 *
 * @param mark            the mark
 * @param bars            bars of the mark in service (the quantity the structures need)
 * @param lossProbability probability that one bar is lost over the kit's life, q = 1 - (1 - p)^c
 * @param expectedLosses  mean bars lost over the kit's life, n * q
 * @param spares          spares the mark needs: the smallest s with P(losses <= s) >= perMarkLevel
 * @param perMarkLevel    the share of the kit's service level this mark must reach, L^(1/m)
 * @param alreadyInKit    bars the kit already holds beyond the structures' need (its surplus), which count as spares
 */
public record MarkSpares(String mark, int bars, double lossProbability, double expectedLosses, int spares,
                         double perMarkLevel, int alreadyInKit) {
    public MarkSpares {
        if (bars < 0 || spares < 0 || alreadyInKit < 0) {
            throw new IllegalArgumentException("negative count for mark " + mark);
        }
        if (!(lossProbability >= 0 && lossProbability <= 1) || !(perMarkLevel >= 0 && perMarkLevel <= 1)) {
            throw new IllegalArgumentException("probability out of [0, 1] for mark " + mark);
        }
    }

    /** Spares still to be made: the spares needed minus the surplus the kit already holds, at least zero. */
    public int toMake() {
        return Math.max(0, spares - alreadyInKit);
    }
}
