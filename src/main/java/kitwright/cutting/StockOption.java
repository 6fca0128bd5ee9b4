package kitwright.cutting;

import kitwright.model.Origin;
import kitwright.model.StockLength;

/**
 * One stock length a section can be cut from.
 *
 * @param lengthMm  length of one stock piece in millimetres
 * @param price     price of one piece, or null when the catalog gives none (a rack row without a price costs
 *                  nothing: it is already paid for)
 * @param available pieces that can be had, or null for unlimited
 * @param origin    bought from the mill, or an offcut already on the rack
 */
public record StockOption(double lengthMm, Double price, Integer available, Origin origin) {
    public StockOption {
        if (!(lengthMm > 0) || Double.isInfinite(lengthMm)) {
            throw new IllegalArgumentException("stock length must be positive: " + lengthMm);
        }
        if (price != null && (price < 0 || price.isNaN() || price.isInfinite())) {
            throw new IllegalArgumentException("price must not be negative: " + price);
        }
        if (available != null && available < 0) {
            throw new IllegalArgumentException("available must not be negative: " + available);
        }
        if (origin == null) {
            throw new IllegalArgumentException("a stock option needs an origin");
        }
    }

    /** The option of a catalog row. */
    public static StockOption of(StockLength row) {
        return new StockOption(row.lengthMm(), row.price(), row.available(), row.origin());
    }

    public boolean unlimited() {
        return available == null;
    }
}
