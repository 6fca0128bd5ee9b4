package kitwright.nesting;

/**
 * Where one tube travels: in the bore of another tube, or as a bundle of its own.
 *
 * @param tube      the tube's id
 * @param host      the id of the tube it lies in directly, or -1 when it is a bundle's host
 * @param centerXMm offset of its axis from the host's axis (0 for a bundle's host)
 * @param centerYMm offset of its axis from the host's axis (0 for a bundle's host)
 * @param offsetMm  start of the tube measured from the host's end (0 for a bundle's host)
 */
public record Placement(int tube, int host, double centerXMm, double centerYMm, double offsetMm) {
    public boolean isBundle() {
        return host < 0;
    }
}
