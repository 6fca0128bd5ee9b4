package kitwright.compare;

import java.nio.file.Path;
import kitwright.io.InvalidInputException;

/**
 * Plans one kit option from its folder and sums it up: the hook between {@code compare} and the whole-chain
 * pipeline. Implementations must be deterministic (same folder, same summary) and safe to call from several
 * threads at once on different folders.
 */
@FunctionalInterface
public interface OptionPlanner {
    /**
     * @throws InvalidInputException when the kit folder or its catalogs have problems (every problem listed)
     */
    OptionSummary plan(Path kitDir) throws InvalidInputException;
}
