package kitwright.nesting;

import java.util.List;

/**
 * One cut tube in a bundle, with the guests it carries in its bore. Diameter and bore are the ones the fit rule
 * used (worst-case or nominal), so a direct guest's outerDiameterMm + clearance <= this boreMm.
 *
 * @param centerXMm offset of this tube's axis from its immediate host's axis (0 for a bundle's host)
 * @param centerYMm offset of this tube's axis from its immediate host's axis (0 for a bundle's host)
 * @param offsetMm  start of this tube measured from its immediate host's end (0 for a bundle's host)
 */
public record NestedTube(String mark, double outerDiameterMm, double boreMm, double lengthMm,
                         double centerXMm, double centerYMm, double offsetMm, List<NestedTube> guests) {
    public NestedTube {
        guests = List.copyOf(guests);
    }
}
