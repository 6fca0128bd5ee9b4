package kitwright.sweep;

import java.util.Objects;

/**
 * One member of a structure as the design model gives it.
 *
 * @param structure    the structure it belongs to, e.g. screen-frame
 * @param member       its id, unique within the structure
 * @param section      its tube section, a section of the tube catalog
 * @param targetTenths its target node-to-node length in tenths of a millimetre (whole, above 0)
 */
public record Member(String structure, String member, String section, long targetTenths) {
    public Member {
        Objects.requireNonNull(structure, "structure");
        Objects.requireNonNull(member, "member");
        Objects.requireNonNull(section, "section");
        if (targetTenths <= 0) {
            throw new IllegalArgumentException("target length must be above 0: " + targetTenths);
        }
    }
}
