package kitwright.nesting;

import java.util.Locale;
import kitwright.model.NestTolerance;
import kitwright.model.Section;

/**
 * Whether one tube slides into another: a guest fits when its largest outside diameter plus the diametral handling
 * clearance is at most the host's smallest bore.
 *
 * <p><b>Worst case</b> (the default). Structural steel follows EN 10219-2 for cold-formed welded hollow sections
 * (from memory, see src/docs/sources.md, "Tube sections"): outside diameter within plus or minus 1 % of D, at least
 * 0.5 mm and at most 10 mm; wall thickness, for D up to 406.4 mm, within plus or minus 10 % of T for T up to 5 mm,
 * 0.5 mm above, and for D above 406.4 mm within plus or minus 10 % of T, at most 2 mm. The largest outside
 * diameter is D + tolerance; the smallest bore is (D - tolerance) - 2 (T + wall tolerance) - weld bead, with the
 * catalog's {@code weld_bead_mm} or 1.0 mm for steel (welded tube carries an internal bead unless it is removed).
 * Other materials use the catalog's {@code od_tolerance_mm} and {@code wall_tolerance_pct} (0 when absent) and
 * their {@code weld_bead_mm} (0 when absent). Out-of-roundness and straightness are not counted.
 *
 * <p><b>Nominal</b>: outside diameter D and bore D - 2T, no tolerances and no weld bead; for comparison only.
 *
 * <p>Sizes are rounded to the nearest micrometre so that the JSON shows the values the rule compared.
 */
public final class FitRule {
    /** Default weld bead height for welded steel tube, in mm (kitwright's own default, see src/docs/sources.md). */
    public static final double DEFAULT_STEEL_WELD_BEAD_MM = 1.0;
    /** The outside diameter above which EN 10219-2 gives the large-diameter wall tolerance (from memory). */
    static final double LARGE_DIAMETER_MM = 406.4;

    private final NestTolerance tolerance;
    private final double clearanceMm;

    public FitRule(NestTolerance tolerance, double clearanceMm) {
        if (tolerance == null) {
            throw new IllegalArgumentException("tolerance rule missing");
        }
        if (!(clearanceMm >= 0)) {
            throw new IllegalArgumentException("clearance must not be negative: " + clearanceMm);
        }
        this.tolerance = tolerance;
        this.clearanceMm = clearanceMm;
    }

    public NestTolerance tolerance() {
        return tolerance;
    }

    public double clearanceMm() {
        return clearanceMm;
    }

    /** The outside diameter and bore this rule compares for a section. */
    public TubeEnvelope envelope(Section section) {
        double d = section.outerDiameterMm();
        double t = section.wallMm();
        if (tolerance == NestTolerance.NOMINAL) {
            return new TubeEnvelope(micrometres(d), micrometres(d - 2 * t), 0, 0, 0);
        }
        double outerTolerance;
        double wallTolerance;
        double bead;
        if (isStructuralSteel(section.material())) {
            outerTolerance = steelOuterDiameterToleranceMm(d);
            wallTolerance = steelWallToleranceMm(d, t);
            bead = section.weldBeadMm() != null ? section.weldBeadMm() : DEFAULT_STEEL_WELD_BEAD_MM;
        } else {
            outerTolerance = section.odToleranceMm() != null ? section.odToleranceMm() : 0;
            wallTolerance = section.wallTolerancePct() != null ? t * section.wallTolerancePct() / 100.0 : 0;
            bead = section.weldBeadMm() != null ? section.weldBeadMm() : 0;
        }
        double largestOuter = d + outerTolerance;
        // A thick wall with its tolerances (e.g. steel 10 x 4: 9.5 - 2 x 4.4 - 1 < 0) can leave no bore at all:
        // such a tube is valid stock, it just hosts nothing (bore 0 fits no guest).
        double smallestBore = Math.max(0, (d - outerTolerance) - 2 * (t + wallTolerance) - bead);
        return new TubeEnvelope(micrometres(largestOuter), micrometres(smallestBore), outerTolerance, wallTolerance,
                bead);
    }

    /** True when a guest of this envelope fits a host's bore with the clearance. */
    public boolean fits(TubeEnvelope guest, TubeEnvelope host) {
        return fits(guest.outerDiameterMm(), host.boreMm(), clearanceMm);
    }

    /** The fit test on the sizes themselves: outside + clearance at most the bore (1 nm slack for rounding). */
    public static boolean fits(double guestOuterMm, double hostBoreMm, double clearanceMm) {
        return guestOuterMm + clearanceMm <= hostBoreMm + 1e-6;
    }

    /** EN 10219-2 outside-diameter tolerance (from memory): 1 % of D, at least 0.5 mm, at most 10 mm. */
    public static double steelOuterDiameterToleranceMm(double outerDiameterMm) {
        return Math.min(10.0, Math.max(0.5, 0.01 * outerDiameterMm));
    }

    /**
     * EN 10219-2 wall tolerance (from memory): for D up to 406.4 mm, 10 % of T for T up to 5 mm, 0.5 mm above; for
     * D above 406.4 mm, 10 % of T, at most 2 mm.
     */
    public static double steelWallToleranceMm(double outerDiameterMm, double wallMm) {
        if (outerDiameterMm > LARGE_DIAMETER_MM) {
            return Math.min(2.0, 0.1 * wallMm);
        }
        return wallMm <= 5.0 ? 0.1 * wallMm : 0.5;
    }

    /**
     * Whether a catalog material name means structural steel hollow section (EN 10219): names containing "steel"
     * (but not "stainless", which follows other standards) or a steel grade such as S235, S275, S355.
     */
    public static boolean isStructuralSteel(String material) {
        String m = material == null ? "" : material.toLowerCase(Locale.ROOT).trim();
        if (m.contains("stainless")) {
            return false;
        }
        return m.contains("steel") || m.matches("s\\d{3}.*");
    }

    /** One sentence for reports: which rule was used and what it leaves out. */
    public String description() {
        String counted = tolerance == NestTolerance.NOMINAL
                ? "Nominal sizes: outside diameter D and bore D - 2T, no tolerances, no weld bead"
                : "Worst case: largest outside diameter against smallest bore; steel by EN 10219-2 (outside"
                + " diameter +/-1 %, at least 0.5 mm, at most 10 mm; wall +/-10 % up to 5 mm, +/-0.5 mm above,"
                + " above 406.4 mm diameter +/-10 % at most 2 mm) minus"
                + " the weld bead (1.0 mm for welded steel unless the catalog says otherwise); other materials by the"
                + " catalog's od_tolerance_mm and wall_tolerance_pct";
        return counted + "; diametral clearance " + format(clearanceMm) + " mm. Out-of-roundness and straightness"
                + " are not counted.";
    }

    private static String format(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }

    private static double micrometres(double mm) {
        return Math.round(mm * 1000.0) / 1000.0;
    }
}
