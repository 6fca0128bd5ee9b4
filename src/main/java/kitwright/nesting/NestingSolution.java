package kitwright.nesting;

import java.util.List;
import kitwright.model.Status;

/**
 * The outcome of a nesting algorithm: one placement per tube, the status, a lower bound on the number of bundles and,
 * when INFEASIBLE, the reason (the placements are then still complete, but break the bundle mass limit); a FEASIBLE
 * solution whose search the wall-clock limit cut short gives the reason "stopped by the time limit".
 */
public record NestingSolution(List<Placement> placements, Status status, double lowerBound, String reason) {
    public NestingSolution {
        placements = List.copyOf(placements);
        for (int i = 0; i < placements.size(); i++) {
            if (placements.get(i).tube() != i) {
                throw new IllegalArgumentException("placement " + i + " is for tube " + placements.get(i).tube());
            }
        }
    }

    public int bundles() {
        return (int) placements.stream().filter(Placement::isBundle).count();
    }
}
