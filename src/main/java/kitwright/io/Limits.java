package kitwright.io;

/**
 * Upper limits on the numbers kitwright reads, far beyond any real kit. They exist so that a typing slip (an extra
 * run of zeros, a value in micrometres) is reported as bad input instead of overflowing the stages' integer
 * arithmetic (lengths become whole units of the finest decimal a section uses, down to a micrometre, in
 * {@code int}; prices are scaled into {@code long}) or
 * running for days. A value above its limit is reported with the limit in the message.
 */
public final class Limits {
    /** Longest length of any kind, in millimetres: 1 km (stock, bars, crates, decks, kerf, trim, allowances). */
    public static final double MAX_LENGTH_MM = 1_000_000;
    /** Most items in one row: bars of a mark, joints of a mark, bars of a mark one structure uses. */
    public static final int MAX_COUNT = 100_000;
    /**
     * Most assembly cycles of a spares policy: 10,000, a kit put up and taken down every day for 27 years. It keeps
     * a mark's bar-cycles (bars x cycles, at most {@link #MAX_COUNT} x this) within an {@code int}.
     */
    public static final int MAX_CYCLES = 10_000;
    /**
     * Most structures in a kit.json {@code tour}: 1,000 builds, one leg each and a report section per leg. Plan
     * time grows with the distinct structures, not the legs, but the report and files grow with every leg.
     */
    public static final int MAX_TOUR_LEGS = 1_000;
    /** Largest other number: prices, masses, densities, costs, seconds. */
    public static final double MAX_NUMBER = 1e9;
    /** Largest input file, in bytes (64 MiB); also stops a device such as /dev/zero from being read forever. */
    public static final int MAX_FILE_BYTES = 64 << 20;

    private Limits() {
    }
}
