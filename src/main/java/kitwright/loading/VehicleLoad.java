package kitwright.loading;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import kitwright.model.AxleGeometry;

/**
 * One vehicle (one trip) and the crates on it, in loading order (the first crate goes in first; unloading runs the
 * other way, from the doors).
 *
 * @param massKg                   gross mass of the crates on it
 * @param centreOfGravityMm        the crates' centre of gravity along the deck, from the front (each crate's mass
 *                                 taken at the centre of its outer box)
 * @param lateralCentreOfGravityMm signed offset of the crates' centre of gravity from the deck's centreline,
 *                                 positive towards growing {@code yMm} (each crate's gross mass at the centre of its
 *                                 footprint)
 * @param balanceNote              why the lateral centre lies more than 10 % of the deck width off the centreline;
 *                                 null when it does not
 * @param axleLoadsKg              front (kingpin on a semi-trailer) and rear support loads by the lever rule, unladen
 *                                 loads included; null when the catalog gives no axle geometry (not checked)
 * @param costPerTrip              the trip's cost from the catalog (not in the JSON contract)
 * @param floorLengthMm            deck length used, from the front to the rear face of the last crate (not in the
 *                                 JSON)
 * @param axles                    the vehicle type's axle geometry and limits, or null (not in the JSON)
 */
@JsonPropertyOrder({"id", "type", "deckLengthMm", "deckWidthMm", "deckHeightMm", "payloadKg", "massKg",
    "centreOfGravityMm", "lateralCentreOfGravityMm", "balanceNote", "axleLoadsKg", "crates"})
public record VehicleLoad(String id, String type, double deckLengthMm, double deckWidthMm, double deckHeightMm,
                          double payloadKg, double massKg, double centreOfGravityMm, double lateralCentreOfGravityMm,
                          @JsonInclude(JsonInclude.Include.NON_NULL) String balanceNote,
                          @JsonInclude(JsonInclude.Include.NON_NULL) AxleLoads axleLoadsKg,
                          List<PlacedCrate> crates, @JsonIgnore double costPerTrip, @JsonIgnore double floorLengthMm,
                          @JsonIgnore AxleGeometry axles) {
    public VehicleLoad {
        crates = List.copyOf(crates);
    }

    /** A vehicle without lateral centre, axle loads or geometry (drawings and tests of the older contract). */
    public VehicleLoad(String id, String type, double deckLengthMm, double deckWidthMm, double deckHeightMm,
                       double payloadKg, double massKg, double centreOfGravityMm, List<PlacedCrate> crates,
                       double costPerTrip, double floorLengthMm) {
        this(id, type, deckLengthMm, deckWidthMm, deckHeightMm, payloadKg, massKg, centreOfGravityMm, 0, null, null,
                crates, costPerTrip, floorLengthMm, null);
    }

    /** The loads on the front support (front axle, or kingpin) and the rear axle group, kg. */
    public record AxleLoads(double front, double rear) {
    }
}
