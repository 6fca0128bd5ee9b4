package kitwright.tour;

import java.util.Objects;

/**
 * One leg of a tour: from the depot or a venue to the next venue or back to the depot, shipping what
 * {@code structure} needs (on the last leg, what the last structure brings home).
 *
 * @param number   1 for the leg from the depot, then in tour order
 * @param from     {@link TourPlan#DEPOT} or the structure built at the venue the leg leaves
 * @param to       the structure built at the venue the leg reaches, or {@link TourPlan#DEPOT}
 * @param sameAs   the number of the first leg with the same shipment (this leg's own number when it is the first)
 * @param shipment what the leg carries, crated and loaded
 */
public record Leg(int number, String from, String to, String structure, int sameAs, LegShipment shipment) {
    public Leg {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(structure, "structure");
        Objects.requireNonNull(shipment, "shipment");
        if (number < 1 || sameAs < 1 || sameAs > number) {
            throw new IllegalArgumentException("leg " + number + " the same as leg " + sameAs);
        }
    }

    /** "depot → screen-frame". */
    public String route() {
        return from + " \u2192 " + to;
    }
}
