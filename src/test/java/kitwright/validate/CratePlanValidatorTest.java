package kitwright.validate;

import static kitwright.packing.Fixtures.bundles;
import static kitwright.packing.Fixtures.crate;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.nesting.Bundle;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.CratePlan;
import kitwright.packing.LaneCratePacker;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The validator must reject broken plans, or the other tests prove nothing. */
class CratePlanValidatorTest {
    private final List<Bundle> bundles = bundles(30, 1000, 100, 10);
    private final List<Joint> joints = List.of(new Joint("N", 100, 1, 30));
    private final List<CrateType> crates = List.of(crate("c", 2000, 600, 600, 20, 1000, 10.0));
    private final CratePlan good = new LaneCratePacker().pack(bundles, joints, crates, JointBox.DEFAULT);

    private CratePlan withFirstItem(UnaryOperator<CrateItem> change) {
        List<Crate> cs = new ArrayList<>(good.crates());
        Crate c = cs.get(0);
        List<CrateItem> items = new ArrayList<>(c.items());
        items.set(0, change.apply(items.get(0)));
        double gross = c.tareKg() + items.stream().mapToDouble(CrateItem::massKg).sum();
        cs.set(0, new Crate(c.id(), c.type(), c.innerLengthMm(), c.innerWidthMm(), c.innerHeightMm(),
                c.outerLengthMm(), c.outerWidthMm(), c.outerHeightMm(), c.tareKg(), c.maxGrossKg(), gross, items));
        return new CratePlan(good.status(), good.lowerBound(), cs, good.boxes(), good.bounds(), null);
    }

    private void rejects(CratePlan plan, String fragment) {
        assertThatThrownBy(() -> CratePlanValidator.check(plan, bundles, joints, crates, JointBox.DEFAULT))
                .isInstanceOf(AssertionError.class).hasMessageContaining(fragment);
    }

    @Test
    @DisplayName("accepts the packer's plan")
    void accepts() {
        assertThatCode(() -> CratePlanValidator.check(good, bundles, joints, crates, JointBox.DEFAULT))
                .doesNotThrowAnyException();
    }

    @Test
    @DisplayName("rejects an item through a wall, an overlap, a missing and a doubled bundle, overweight")
    void rejectsBrokenPlans() {
        rejects(withFirstItem(i -> new CrateItem(i.kind(), i.ref(), 1500, i.yMm(), i.zMm(), i.lengthMm(),
                i.widthMm(), i.heightMm(), i.massKg())), "outside the inner walls");
        rejects(withFirstItem(i -> new CrateItem(i.kind(), i.ref(), i.xMm(), i.yMm() + 30, i.zMm(), i.lengthMm(),
                i.widthMm(), i.heightMm(), i.massKg())), "overlap");
        rejects(withFirstItem(i -> new CrateItem(i.kind(), "B2", i.xMm(), i.yMm(), i.zMm(), i.lengthMm(),
                i.widthMm(), i.heightMm(), i.massKg())), "expected exactly 1");
        rejects(withFirstItem(i -> new CrateItem(i.kind(), i.ref(), i.xMm(), i.yMm(), i.zMm(), i.lengthMm(),
                i.widthMm(), i.heightMm(), 2000)), "nesting plan");
        List<Crate> none = good.crates().subList(1, good.crates().size());
        rejects(new CratePlan(good.status(), 0, none, good.boxes(), good.bounds(), null), "expected exactly 1");
        List<Joint> moreJoints = List.of(new Joint("N", 100, 1, 31));
        assertThatThrownBy(() -> CratePlanValidator.check(good, bundles, moreJoints, crates, JointBox.DEFAULT))
                .hasMessageContaining("joint N");
    }
}
