package kitwright.model;

/**
 * One row of the tube catalog: a stock length of a section that can be bought (mill) or taken from the rack.
 *
 * @param price     price per piece in the catalog's currency, or null when the catalog gives none
 * @param available how many pieces can be had, or null for unlimited
 */
public record StockLength(String section, double lengthMm, Double price, Integer available, Origin origin) {
    public StockLength {
        if (lengthMm <= 0) {
            throw new IllegalArgumentException("stock length must be positive: " + lengthMm);
        }
        if (available != null && available < 0) {
            throw new IllegalArgumentException("available must not be negative: " + available);
        }
    }

    public boolean unlimited() {
        return available == null;
    }
}
