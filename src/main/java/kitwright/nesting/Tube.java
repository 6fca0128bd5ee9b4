package kitwright.nesting;

/**
 * One cut piece as the nesting stage sees it.
 *
 * @param id              position in the problem's tube list (0, 1, 2, ...)
 * @param outerDiameterMm outside diameter the fit rule uses
 * @param boreMm          bore the fit rule uses (0 when the tolerances leave none: the tube hosts nothing)
 * @param massKg          mass of the piece (0 when the material is unknown)
 */
public record Tube(int id, String mark, String section, double outerDiameterMm, double boreMm, double lengthMm,
                   double massKg) {
    public Tube {
        if (id < 0 || !(outerDiameterMm > 0) || !(boreMm >= 0) || boreMm >= outerDiameterMm || !(lengthMm > 0)
                || !(massKg >= 0)) {
            throw new IllegalArgumentException("bad tube " + id + " (" + mark + "): outside " + outerDiameterMm
                    + ", bore " + boreMm + ", length " + lengthMm + ", mass " + massKg);
        }
    }

    /** Envelope volume if shipped on its own, pi/4 D^2 L, in mm^3. */
    public double envelopeVolumeMm3() {
        return Math.PI / 4 * outerDiameterMm * outerDiameterMm * lengthMm;
    }
}
