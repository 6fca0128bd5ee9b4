package kitwright.validate;

import static kitwright.packing.Fixtures.bundles;
import static kitwright.packing.Fixtures.crate;
import static org.assertj.core.api.Assertions.assertThat;
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
import kitwright.packing.ItemKind;
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
        int first = 0;
        while (items.get(first).kind() != ItemKind.BUNDLE) {
            first++;
        }
        items.set(first, change.apply(items.get(first)));
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
        rejects(withFirstItem(i -> new CrateItem(i.kind(), i.ref(), 2050 - i.lengthMm(), i.yMm(), i.zMm(), i.lengthMm(),
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

    @Test
    @DisplayName("rejects a bundle lifted 5 mm off what it rests on")
    void rejectsALiftedBundle() {
        List<Crate> cs = new ArrayList<>(good.crates());
        Crate c = cs.get(0);
        List<CrateItem> items = new ArrayList<>(c.items());
        int top = 0;
        for (int k = 1; k < items.size(); k++) {
            if (items.get(k).zMm() > items.get(top).zMm()) {
                top = k;
            }
        }
        CrateItem i = items.get(top);
        items.set(top, new CrateItem(i.kind(), i.ref(), i.xMm(), i.yMm(), i.zMm() + 5, i.lengthMm(), i.widthMm(),
                i.heightMm(), i.massKg()));
        cs.set(0, new Crate(c.id(), c.type(), c.innerLengthMm(), c.innerWidthMm(), c.innerHeightMm(),
                c.outerLengthMm(), c.outerWidthMm(), c.outerHeightMm(), c.tareKg(), c.maxGrossKg(), c.grossKg(),
                items));
        rejects(new CratePlan(good.status(), good.lowerBound(), cs, good.boxes(), good.bounds(), null),
                i.ref() + " is not supported");
    }

    private static CrateItem bundle(String ref, double x, double axisY, double axisZ, double length, double d) {
        return new CrateItem(ItemKind.BUNDLE, ref, x, axisY - d / 2, axisZ - d / 2, length, d, d, 10);
    }

    private static CrateItem box(String ref, double x, double y, double z) {
        return new CrateItem(ItemKind.BOX, ref, x, y, z, 600, 400, 300, 20);
    }

    private static boolean stands(CrateItem item, CrateItem... below) {
        List<CrateItem> all = new ArrayList<>(List.of(below));
        all.add(item);
        return SupportRule.supported(item, all, 1000, CratePlanValidator.TOUCH, CratePlanValidator.BOX_SHARE);
    }

    @Test
    @DisplayName("support rule: boxes need their centre and half their footprint on items whose top is their bottom")
    void boxSupport() {
        CrateItem upper = box("U", 0, 0, 300);
        assertThat(stands(upper)).as("nothing below").isFalse();
        assertThat(stands(upper, box("L", 0, 0, 0))).as("box on an equal box").isTrue();
        assertThat(stands(upper, box("L", 200, 0, 0))).as("2/3 of the footprint, centre over it").isTrue();
        assertThat(stands(upper, box("L", 400, 0, 0))).as("1/3 of the footprint, centre off it").isFalse();
        assertThat(stands(upper, box("L", 0, 0, -5))).as("a 5 mm gap").isFalse();
        // a box on a square row of four 100 mm bundles (tops at z = 100, bounding rectangles cover 400 mm)
        CrateItem onRow = box("R", 0, 0, 100);
        assertThat(stands(onRow, bundle("a", 0, 50, 50, 600, 100), bundle("b", 0, 150, 50, 600, 100),
                bundle("c", 0, 250, 50, 600, 100), bundle("d", 0, 350, 50, 600, 100))).isTrue();
    }

    @Test
    @DisplayName("support rule: a bundle needs support along its whole length, flat below its axis or in a cradle")
    void bundleSupport() {
        // square rows: right on top of an equal bundle
        CrateItem upper = bundle("U", 0, 50, 150, 1000, 100);
        assertThat(stands(upper, bundle("L", 0, 50, 50, 1000, 100))).as("square row on row").isTrue();
        assertThat(stands(upper, bundle("L", 0, 50, 50, 600, 100))).as("400 mm overhang").isFalse();
        assertThat(stands(upper, bundle("L1", 0, 50, 50, 600, 100), bundle("L2", 600, 50, 50, 400, 100)))
                .as("two bundles end to end below").isTrue();
        assertThat(stands(upper)).as("nothing below").isFalse();
        // staggered rows, pitch d*sqrt(3)/2: resting in the dip between two bundles
        double pitch = 100 * Math.sqrt(3) / 2;
        CrateItem dip = bundle("S", 0, 100, 50 + pitch, 1000, 100);
        assertThat(stands(dip, bundle("A", 0, 50, 50, 1000, 100), bundle("B", 0, 150, 50, 1000, 100)))
                .as("staggered row on row").isTrue();
        assertThat(stands(dip, bundle("A", 0, 50, 50, 1000, 100))).as("one side only: it would roll").isFalse();
        // against the left wall (y = 0) on one bundle of the row below: the wall holds the other side
        CrateItem atWall = bundle("W", 0, 50, 50 + 2 * pitch, 1000, 100);
        assertThat(stands(atWall, bundle("A", 0, 100, 50 + pitch, 1000, 100))).as("wall and one bundle").isTrue();
        CrateItem offWall = bundle("W", 0, 110, 50 + 2 * pitch, 1000, 100);
        assertThat(stands(offWall, bundle("A", 0, 160, 50 + pitch, 1000, 100))).as("60 mm from the wall: rolls off")
                .isFalse();
        // the side of a box (y 0-400, 300 high, spanning the bundle's axis height) catches it like a wall
        CrateItem byBox = bundle("F", 0, 450, 50 + 2 * pitch, 600, 100);
        CrateItem below = bundle("A", 0, 500, 50 + pitch, 600, 100);
        assertThat(stands(byBox, below, box("L", 0, 0, 0))).as("box side and one bundle").isTrue();
        assertThat(stands(byBox, below)).as("same without the box").isFalse();
        // on the top of a box (300 mm high), the axis band (y 200 +- 25) over the box or not
        assertThat(stands(bundle("T", 0, 200, 350, 600, 100), box("L", 0, 0, 0))).isTrue();
        assertThat(stands(bundle("T", 0, 450, 350, 600, 100), box("L", 0, 0, 0))).as("beside the box").isFalse();
    }
}
