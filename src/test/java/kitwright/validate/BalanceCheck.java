package kitwright.validate;

import java.util.List;
import kitwright.loading.VehicleLoad;
import kitwright.model.AxleGeometry;
import kitwright.model.VehicleType;

/**
 * The balance part of {@link LoadPlanValidator}, derived from the crates' boxes alone: the lateral centre of gravity
 * (gross mass at each footprint's centre, offset from the centreline, positive towards growing y) and the support
 * loads by moments (statics: for a beam on two supports at a and b, a load m at x puts m (x - a) / (b - a) on the
 * support at b and the rest on the one at a), each crate taken one at a time.
 */
final class BalanceCheck {
    private static final double EPS = 1e-3;

    private BalanceCheck() {
    }

    /** @param boxes per crate {x0, y0, x1, y1, gross kg} */
    static void check(VehicleLoad load, VehicleType type, List<double[]> boxes, List<String> errors) {
        double mass = 0;
        double across = 0;
        double onRear = 0;
        AxleGeometry a = type.axles();
        for (double[] b : boxes) {
            mass += b[4];
            across += b[4] * (b[1] + b[3]) / 2;
            if (a != null) {
                double x = (b[0] + b[2]) / 2;
                onRear += b[4] * (x - a.frontSupportMm()) / (a.rearSupportMm() - a.frontSupportMm());
            }
        }
        if (mass <= 0) {
            return;
        }
        double lateral = across / mass - type.deckWidthMm() / 2;
        if (Math.abs(lateral - load.lateralCentreOfGravityMm()) > EPS) {
            errors.add(load.id() + ": lateral centre of gravity " + load.lateralCentreOfGravityMm() + " should be "
                    + lateral);
        }
        if (Math.abs(lateral) > 0.10 * type.deckWidthMm() + EPS && load.balanceNote() == null) {
            errors.add(load.id() + ": lateral centre " + lateral + " mm is beyond 10 % of the deck width and the"
                    + " load does not say why");
        }
        if (a == null) {
            if (load.axleLoadsKg() != null) {
                errors.add(load.id() + ": axle loads given for a vehicle without axle geometry");
            }
            return;
        }
        double rear = a.unladenRearKg() + onRear;
        double front = a.unladenFrontKg() + mass - onRear;
        if (load.axleLoadsKg() == null) {
            errors.add(load.id() + ": no axle loads although the catalog gives the geometry");
            return;
        }
        if (Math.abs(front - load.axleLoadsKg().front()) > EPS || Math.abs(rear - load.axleLoadsKg().rear()) > EPS) {
            errors.add(load.id() + ": axle loads " + load.axleLoadsKg() + " should be front " + front + ", rear "
                    + rear);
        }
        if (front > a.maxFrontKg() + EPS || rear > a.maxRearKg() + EPS
                || (a.minFrontKg() != null && front < a.minFrontKg() - EPS)) {
            errors.add(load.id() + ": axle loads front " + front + ", rear " + rear + " outside the limits "
                    + a.maxFrontKg() + " / " + a.maxRearKg() + (a.minFrontKg() == null ? "" : ", least front "
                    + a.minFrontKg()));
        }
    }
}
