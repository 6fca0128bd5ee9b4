package kitwright.compare;

import java.util.function.Function;

/**
 * The compared figures, one row of the comparison each, in the order of {@code compare.json}. Each knows its
 * label, unit, the decimals it is shown with and which direction is better: lower for everything except the
 * reuse ratio; members (the structures served, a given), the offcut and the remnant (remnants go back to the rack:
 * stock with value, not waste; scrap is ranked) and the status are shown but not ranked.
 */
public enum CompareMetric {
    MARKS("marks", "Marks (bar types)", "", 0, Direction.LOWER, s -> s.marks()),
    BARS("bars", "Bars in the kit", "", 0, Direction.LOWER, s -> s.bars()),
    MEMBERS("members", "Members in all structures", "", 0, Direction.NONE, s -> s.members()),
    REUSE_RATIO("reuseRatio", "Reuse ratio (members per bar)", "", 2, Direction.HIGHER, s -> s.reuseRatio()),
    STOCK_PIECES("stockPieces", "Stock pieces cut", "", 0, Direction.LOWER, s -> s.stockPieces()),
    STOCK_LENGTH("stockLengthMm", "Stock length cut", "m", 1, Direction.LOWER, s -> s.stockLengthMm() / 1000.0),
    COST("cost", "Stock cost", "", 2, Direction.LOWER, OptionSummary::cost),
    OFFCUT("offcutPct", "Offcut (remnant + scrap)", "%", 2, Direction.NONE, s -> s.offcutPct()),
    SCRAP("scrapPct", "Scrap", "%", 2, Direction.LOWER, s -> s.scrapPct()),
    REMNANT("remnantPct", "Remnant back to the rack", "%", 2, Direction.NONE, s -> s.remnantPct()),
    KIT_MASS("kitMassKg", "Kit mass (bars with spares, and joints)", "kg", 1, Direction.LOWER,
            OptionSummary::kitMassKg),
    BOUGHT_MASS("boughtMassKg", "Stock mass bought", "kg", 1, Direction.LOWER, OptionSummary::boughtMassKg),
    USED_STOCK_MASS("usedStockMassKg", "Stock mass used (bought and rack)", "kg", 1, Direction.LOWER,
            OptionSummary::usedStockMassKg),
    CO2E("co2eKg", "Embodied carbon of stock bought", "kg CO\u2082e", 1, Direction.LOWER, OptionSummary::co2eKg),
    BUNDLES("bundles", "Nested bundles", "", 0, Direction.LOWER, OptionSummary::bundles),
    CRATES("crates", "Crates", "", 0, Direction.LOWER, OptionSummary::crates),
    VEHICLES("vehicles", "Vehicles", "", 0, Direction.LOWER, OptionSummary::vehicles),
    TRIP_COST("tripCost", "Trip cost", "", 2, Direction.LOWER, OptionSummary::tripCost),
    CRATE_COST("crateCost", "Crate cost", "", 2, Direction.LOWER, OptionSummary::crateCost),
    TOTAL_COST("totalCost", "Total cost (stock, crates, trips)", "", 2, Direction.LOWER, OptionSummary::totalCost);

    /** Which way a figure is better. */
    public enum Direction { LOWER, HIGHER, NONE }

    private final String key;
    private final String label;
    private final String unit;
    private final int decimals;
    private final Direction direction;
    private final Function<OptionSummary, Number> value;

    CompareMetric(String key, String label, String unit, int decimals, Direction direction,
                  Function<OptionSummary, Number> value) {
        this.key = key;
        this.label = label;
        this.unit = unit;
        this.decimals = decimals;
        this.direction = direction;
        this.value = value;
    }

    /** The compare.json key. */
    public String key() {
        return key;
    }

    public String label() {
        return label;
    }

    /** Unit as shown on the page (stock length in metres there, millimetres in the files). */
    public String unit() {
        return unit;
    }

    public int decimals() {
        return decimals;
    }

    public Direction direction() {
        return direction;
    }

    /** The figure of an option in the page's unit, or null when it is not known. */
    public Double valueOf(OptionSummary option) {
        Number n = value.apply(option);
        return n == null ? null : n.doubleValue();
    }
}
