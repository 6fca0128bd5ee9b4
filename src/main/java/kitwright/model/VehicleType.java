package kitwright.model;

/** A vehicle or container from the vehicle catalog: load space, payload and cost per trip. */
public record VehicleType(String name, double deckLengthMm, double deckWidthMm, double deckHeightMm,
                          double payloadKg, double costPerTrip, String source) {
}
