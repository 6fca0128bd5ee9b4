package kitwright.model;

/**
 * A vehicle or container from the vehicle catalog: load space, payload and cost per trip.
 *
 * @param axles        where the deck rests on its supports and what they may carry, or null when the catalog does
 *                     not say (axle loads are then not checked)
 * @param doorHeightMm the door opening's height (containers), or null when the load space is open to its full
 *                     height; stacks stay below it
 */
public record VehicleType(String name, double deckLengthMm, double deckWidthMm, double deckHeightMm,
                          double payloadKg, double costPerTrip, String source, AxleGeometry axles,
                          Double doorHeightMm) {

    /** A vehicle without axle geometry or door opening. */
    public VehicleType(String name, double deckLengthMm, double deckWidthMm, double deckHeightMm, double payloadKg,
                       double costPerTrip, String source) {
        this(name, deckLengthMm, deckWidthMm, deckHeightMm, payloadKg, costPerTrip, source, null, null);
    }

    /** The height a stack may reach: the deck height, or the door opening when lower. */
    public double loadHeightMm() {
        return doorHeightMm == null ? deckHeightMm : Math.min(deckHeightMm, doorHeightMm);
    }
}
