package kitwright.model;

import java.util.Locale;
import java.util.Optional;

/**
 * What a catalog price is per: one piece of the stock length, one metre of it, or one kilogram of it. Steel
 * stockholders quote tube per piece, per metre or per tonne (per kilogram here), so the catalog says which.
 */
public enum PriceBasis {
    PIECE("piece"), METRE("m"), KILOGRAM("kg");

    private final String code;

    PriceBasis(String code) {
        this.code = code;
    }

    /** The word used in catalogs and CSV: {@code piece}, {@code m} or {@code kg}. */
    @com.fasterxml.jackson.annotation.JsonValue
    public String code() {
        return code;
    }

    /** The price of one piece: the quoted price times the piece's metres or kilograms on those bases. */
    public double perPiece(double quoted, double lengthMm, double massPerMetreKg) {
        return switch (this) {
            case PIECE -> quoted;
            case METRE -> quoted * lengthMm / 1000.0;
            case KILOGRAM -> quoted * massPerMetreKg * lengthMm / 1000.0;
        };
    }

    public static Optional<PriceBasis> parse(String text) {
        String wanted = text.trim().toLowerCase(Locale.ROOT);
        for (PriceBasis basis : values()) {
            if (basis.code.equals(wanted)) {
                return Optional.of(basis);
            }
        }
        return Optional.empty();
    }
}
