package kitwright.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;

/**
 * Problem: a bar cut too long for its node-to-node length puts its end inside the joint it meets, so the kit
 * cannot be assembled. bars.csv does not say which joint each bar end meets, only the kit's joint sizes.
 *
 * <p>Method: for each bar with a node-to-node length, the space an end leaves between the node centre and the tube
 * end is its deduction (start_deduction_mm or end_deduction_mm, else kit.json's endDeductionMm), less half of what
 * the longest bar the saw may deliver (cut length plus its tolerance) is longer than node-to-node minus both
 * deductions. An end that leaves less than the radius of the smallest joint of joints.csv is inside every joint it
 * could meet: that is warned of. An end that clears the smallest joint but not a larger one is not warned of, as it
 * may meet the small one.
 *
 * <p>Guarantee: no warning without joints.csv or for a bar without a node-to-node length (nothing to measure
 * against); a warning always names a real fault of the data. Pure function.
 */
public final class JointClearance {
    /** Lengths within this of each other are equal (below the 0.01 mm the inputs are given to). */
    private static final double SLACK_MM = 1e-6;

    private JointClearance() {
    }

    /** One warning per bar end that leaves less than the smallest joint's radius, in bars.csv order. */
    public static List<String> warnings(Kit kit) {
        List<String> warnings = new ArrayList<>();
        double radius = kit.joints().stream().mapToDouble(Joint::diameterMm).min().orElse(Double.NaN) / 2;
        if (Double.isNaN(radius)) {
            return warnings;
        }
        String smallest = kit.joints().stream().filter(j -> j.diameterMm() / 2 == radius).findFirst()
                .map(Joint::mark).orElseThrow();
        for (Bar bar : kit.bars()) {
            if (bar.nodeToNodeMm() == null || bar.startDeductionMm() == null) {
                continue;
            }
            double longest = bar.lengthMm() + (bar.toleranceMm() == null ? 0 : bar.toleranceMm());
            double excess = longest - (bar.nodeToNodeMm() - bar.startDeductionMm() - bar.endDeductionMm());
            double[] leaves = {bar.startDeductionMm() - excess / 2, bar.endDeductionMm() - excess / 2};
            String[] ends = {"start", "end"};
            for (int i = 0; i < 2; i++) {
                if (leaves[i] < radius - SLACK_MM) {
                    warnings.add(String.format(Locale.ROOT, "mark %s: its %s leaves %s mm from the node centre to"
                                    + " the tube end (node to node %s mm, cut length %s mm%s), less than the %s mm"
                                    + " radius of the smallest joint %s, so the tube end would sit inside the joint"
                                    + " (expected a deduction of at least %s mm at that end)", bar.mark(), ends[i],
                            plain(leaves[i]), plain(bar.nodeToNodeMm()), plain(bar.lengthMm()),
                            bar.toleranceMm() == null || bar.toleranceMm() == 0 ? ""
                                    : " + tolerance " + plain(bar.toleranceMm()),
                            plain(radius), smallest, plain(radius + Math.max(0, excess / 2))));
                }
            }
        }
        return warnings;
    }

    private static String plain(double mm) {
        return kitwright.io.Figures.plain(Math.round(mm * 100) / 100.0);
    }
}
