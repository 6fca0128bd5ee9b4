package kitwright.model;

/**
 * A circular hollow section (CHS) named by the catalog, e.g. "CHS 48.3x3.2".
 *
 * @param weldBeadMm       internal weld bead height eating into the bore, or null for the material's default
 * @param odToleranceMm    outside-diameter tolerance (plus or minus) for non-steel materials, or null
 * @param wallTolerancePct wall-thickness tolerance in percent for non-steel materials, or null
 */
public record Section(String name, String material, double outerDiameterMm, double wallMm,
                      Double weldBeadMm, Double odToleranceMm, Double wallTolerancePct) {

    public Section {
        if (outerDiameterMm <= 0 || wallMm <= 0 || 2 * wallMm >= outerDiameterMm) {
            throw new IllegalArgumentException("bad section " + name + ": " + outerDiameterMm + "x" + wallMm);
        }
    }

    /** Nominal bore (inside diameter), D - 2T. */
    public double boreMm() {
        return outerDiameterMm - 2 * wallMm;
    }

    /**
     * Mass per metre of a CHS, M = pi * (D - T) * T * rho * 1e-6 kg/m with D, T in mm and rho in kg/m3
     * (the formula behind the EN 10219-2 and EN 10210-2 tables).
     */
    public double massPerMetreKg(double densityKgM3) {
        return Math.PI * (outerDiameterMm - wallMm) * wallMm * densityKgM3 * 1e-6;
    }
}
