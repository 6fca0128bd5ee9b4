package kitwright.cli;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.NestTolerance;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestedTube;

/**
 * Where {@code kitwright pack} gets its bundles from: the stages before crating (cutting, then nesting).
 *
 * <p>{@link #UNNESTED} ships every bar of the kit as its own bundle (nominal outside diameter, the bar's mass);
 * it is what {@code pack} uses until the cutting and nesting stages are wired in here, and it says so on stderr.
 */
@FunctionalInterface
public interface PackUpstream {

    /** The bundles of a kit. */
    NestPlan bundles(Kit kit);

    /** A note for stderr about how the bundles were made, or null. */
    default String note() {
        return null;
    }

    /** Every bar its own bundle: no cutting plan, no nesting. */
    PackUpstream UNNESTED = new PackUpstream() {
        @Override
        public NestPlan bundles(Kit kit) {
            List<Bundle> bundles = new ArrayList<>();
            for (Bar bar : kit.bars()) {
                Section s = kit.section(bar);
                double mass = kit.barMassKg(bar).orElse(0.0);
                for (int i = 0; i < bar.quantity(); i++) {
                    NestedTube tube = new NestedTube(bar.mark(), s.outerDiameterMm(), s.boreMm(), bar.lengthMm(), 0,
                            0, 0, List.of());
                    bundles.add(new Bundle("B" + (bundles.size() + 1), bar.lengthMm(), s.outerDiameterMm(), mass,
                            tube));
                }
            }
            return new NestPlan(NestTolerance.NOMINAL, 0, Status.FEASIBLE, bundles.size(), bundles);
        }

        @Override
        public String note() {
            return "pack: bundles are the kit's bars, one each, not nested (the nesting stage is not wired into"
                    + " pack on this build)";
        }
    };
}
