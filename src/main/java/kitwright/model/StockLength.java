package kitwright.model;

import java.util.Objects;

/**
 * One row of the tube catalog: a stock length of a section that can be bought (mill) or taken from the rack.
 *
 * @param price     price of one piece in the catalog's currency, worked out from the quoted price on its basis
 *                  (what the optimiser and every cost adds), or null when the catalog gives none
 * @param available how many pieces can be had, or null for unlimited
 * @param terms     the price as quoted, with its basis, currency, grade, standard and supplier
 */
public record StockLength(String section, double lengthMm, Double price, Integer available, Origin origin,
                          StockTerms terms) {
    public StockLength {
        if (lengthMm <= 0) {
            throw new IllegalArgumentException("stock length must be positive: " + lengthMm);
        }
        if (available != null && available < 0) {
            throw new IllegalArgumentException("available must not be negative: " + available);
        }
        Objects.requireNonNull(terms, "terms");
    }

    /** A row priced per piece, with no currency, grade, standard or supplier. */
    public StockLength(String section, double lengthMm, Double price, Integer available, Origin origin) {
        this(section, lengthMm, price, available, origin, StockTerms.perPiece(price));
    }

    public boolean unlimited() {
        return available == null;
    }
}
