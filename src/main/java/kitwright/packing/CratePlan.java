package kitwright.packing;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import kitwright.model.CrateType;
import kitwright.model.Status;

/**
 * The crating of a kit: {@code plan.json -> "crates"} = {@code {status, lowerBound, crates}}. The joint boxes'
 * contents, the bound details and the reason of an INFEASIBLE plan travel with the record for the packing lists
 * and the report but stay out of the JSON contract.
 *
 * @param lowerBound proven lower bound on the number of crates ({@link CrateBounds#crates()})
 * @param boxes      every joint box, in id order (each one is a box item of exactly one crate)
 * @param reason     why no plan exists (INFEASIBLE); "stopped by the time limit" for a FEASIBLE plan whose search
 *                   the wall-clock limit cut short; else null
 */
@JsonPropertyOrder({"status", "lowerBound", "crates"})
public record CratePlan(Status status, int lowerBound, List<Crate> crates,
                        @JsonIgnore List<JointBoxLoad> boxes, @JsonIgnore CrateBounds bounds,
                        @JsonIgnore String reason) {
    public CratePlan {
        crates = List.copyOf(crates);
        boxes = List.copyOf(boxes);
        bounds = bounds == null ? CrateBounds.NONE : bounds;
    }

    /** The price of the crates at the catalog's prices, or null when a crate's type has no price. */
    public Double price(List<CrateType> catalog) {
        double sum = 0;
        for (Crate c : crates) {
            CrateType t = catalog.stream().filter(x -> x.name().equals(c.type())).findFirst().orElse(null);
            if (t == null || t.price() == null) {
                return null;
            }
            sum += t.price();
        }
        return sum;
    }

    /** A plan that cannot be made, with the reason. */
    public static CratePlan infeasible(String reason) {
        return new CratePlan(Status.INFEASIBLE, 0, List.of(), List.of(), CrateBounds.NONE, reason);
    }
}
