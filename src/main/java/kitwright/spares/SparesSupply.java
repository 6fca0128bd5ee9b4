package kitwright.spares;

/**
 * Where the service-life spares of one mark come from.
 *
 * @param mark           the mark
 * @param needed         spares to make (beyond the kit's own surplus), from {@link MarkSpares#toMake()}
 * @param fromOffcuts    spares cut from offcuts of stock bought for the kit anyway (free of stock cost)
 * @param bought         spares added to the demand because the offcuts could not hold them
 * @param missing        spares that could not be cut at all (limited stock), normally 0
 * @param expectedLosses mean bars of this mark lost over the kit's life
 */
public record SparesSupply(String mark, int needed, int fromOffcuts, int bought, int missing,
                           double expectedLosses) {
    public SparesSupply {
        if (needed < 0 || fromOffcuts < 0 || bought < 0 || missing < 0) {
            throw new IllegalArgumentException("negative spares count for mark " + mark);
        }
    }

    /** Spares cut for this mark: from offcuts plus bought (may exceed {@code needed} when patterns over-produce). */
    public int cut() {
        return fromOffcuts + bought;
    }
}
