package kitwright.loading;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;

/**
 * One vehicle (one trip) and the crates on it.
 *
 * @param massKg            gross mass of the crates on it
 * @param centreOfGravityMm the crates' centre of gravity along the deck, from the front (each crate's mass taken at
 *                          the centre of its outer box)
 * @param costPerTrip       the trip's cost from the catalog (not in the JSON contract)
 * @param floorLengthMm     deck length used, from the front to the rear face of the last crate (not in the JSON)
 */
@JsonPropertyOrder({"id", "type", "deckLengthMm", "deckWidthMm", "deckHeightMm", "payloadKg", "massKg",
    "centreOfGravityMm", "crates"})
public record VehicleLoad(String id, String type, double deckLengthMm, double deckWidthMm, double deckHeightMm,
                          double payloadKg, double massKg, double centreOfGravityMm, List<PlacedCrate> crates,
                          @JsonIgnore double costPerTrip, @JsonIgnore double floorLengthMm) {
    public VehicleLoad {
        crates = List.copyOf(crates);
    }
}
