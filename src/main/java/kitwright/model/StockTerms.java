package kitwright.model;

import java.util.Objects;

/**
 * The buying terms of a catalog row as the catalog quotes them, for the order a supplier receives: the price on its
 * basis, the currency, and the grade, standard and supplier. Text fields are empty when the catalog leaves them out.
 *
 * @param quotedPrice the catalog's price on {@code basis}, or null when it gives none
 */
public record StockTerms(PriceBasis basis, Double quotedPrice, String currency, String grade, String standard,
                         String supplier) {
    public StockTerms {
        Objects.requireNonNull(basis, "basis");
        currency = Objects.requireNonNullElse(currency, "");
        grade = Objects.requireNonNullElse(grade, "");
        standard = Objects.requireNonNullElse(standard, "");
        supplier = Objects.requireNonNullElse(supplier, "");
    }

    /** A price per piece with nothing else said. */
    public static StockTerms perPiece(Double price) {
        return new StockTerms(PriceBasis.PIECE, price, "", "", "", "");
    }
}
