package kitwright.nesting;

import java.util.List;
import java.util.Objects;
import kitwright.ids.IdScheme;

/**
 * The tubes to nest and the rules they are nested by.
 *
 * @param tubes           every cut piece, with {@code tubes.get(i).id() == i}
 * @param clearanceMm     diametral clearance kept between a host's bore and each guest
 * @param endAllowanceMm  length at each end of a host kept free of guests
 * @param maxBundleMassKg hard limit on a bundle's mass, or null for none
 * @param ids             the kit's id scheme, whose bundle ids the plan's bundles take
 */
public record NestingProblem(List<Tube> tubes, double clearanceMm, double endAllowanceMm, Double maxBundleMassKg,
                             IdScheme ids) {
    public NestingProblem {
        tubes = List.copyOf(tubes);
        Objects.requireNonNull(ids, "ids");
        for (int i = 0; i < tubes.size(); i++) {
            if (tubes.get(i).id() != i) {
                throw new IllegalArgumentException("tube " + i + " has id " + tubes.get(i).id());
            }
        }
        if (!(clearanceMm >= 0) || !(endAllowanceMm >= 0)) {
            throw new IllegalArgumentException("clearance and end allowance must not be negative");
        }
        if (maxBundleMassKg != null && !(maxBundleMassKg > 0)) {
            throw new IllegalArgumentException("bundle mass limit must be positive: " + maxBundleMassKg);
        }
    }

    /** Tubes without a kit: bundle ids avoid the tubes' marks. */
    public NestingProblem(List<Tube> tubes, double clearanceMm, double endAllowanceMm, Double maxBundleMassKg) {
        this(tubes, clearanceMm, endAllowanceMm, maxBundleMassKg,
                IdScheme.avoiding(tubes.stream().map(Tube::mark).toList()));
    }

    /** True when {@code guest} fits {@code host}'s bore with the clearance and its usable length. */
    public boolean fits(Tube guest, Tube host) {
        return FitRule.fits(guest.outerDiameterMm(), host.boreMm(), clearanceMm)
                && guest.lengthMm() <= usableLengthMm(host) + 1e-9;
    }

    /** A host's length minus the end allowance at both ends (may be zero or negative: no room). */
    public double usableLengthMm(Tube host) {
        return host.lengthMm() - 2 * endAllowanceMm;
    }

    /** Diameter of the circle guests' outsides must stay in: the bore minus the clearance. */
    public double innerDiameterMm(Tube host) {
        return host.boreMm() - clearanceMm;
    }

    /** True when the bundle mass is within the limit (always true without a limit). */
    public boolean massAllowed(double bundleMassKg) {
        return maxBundleMassKg == null || bundleMassKg <= maxBundleMassKg + 1e-9;
    }

    public double totalEnvelopeVolumeMm3() {
        return tubes.stream().mapToDouble(Tube::envelopeVolumeMm3).sum();
    }
}
