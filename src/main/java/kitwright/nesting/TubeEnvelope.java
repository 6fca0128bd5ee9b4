package kitwright.nesting;

/**
 * The sizes of one section as the nesting fit rule sees them: the largest outside diameter and the smallest bore it
 * allows for, with the allowances that produced them (all zero under the nominal rule).
 *
 * @param outerDiameterMm   largest outside diameter the rule allows for (nominal under the nominal rule)
 * @param boreMm            smallest bore the rule allows for, weld bead deducted (nominal D - 2T under the nominal rule)
 * @param outerToleranceMm  outside-diameter tolerance applied (plus on the outside, minus on the bore)
 * @param wallToleranceMm   wall-thickness tolerance applied (plus, on each side of the bore)
 * @param weldBeadMm        internal weld bead height deducted from the bore
 */
public record TubeEnvelope(double outerDiameterMm, double boreMm, double outerToleranceMm, double wallToleranceMm,
                           double weldBeadMm) {
    public TubeEnvelope {
        if (!(outerDiameterMm > 0) || !(boreMm < outerDiameterMm)) {
            throw new IllegalArgumentException("bad tube envelope: outside " + outerDiameterMm + ", bore " + boreMm);
        }
    }
}
