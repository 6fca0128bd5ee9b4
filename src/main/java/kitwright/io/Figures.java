package kitwright.io;

import java.math.BigDecimal;

/** Numbers as people write them in messages: {@code 5990}, not {@code 5990.0}; {@code 0.1}, not {@code 0.1000001}. */
public final class Figures {
    private Figures() {
    }

    /** A plain figure, rounded to 0.001 and without trailing zeros. */
    public static String plain(double value) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            return String.valueOf(value);
        }
        BigDecimal rounded = BigDecimal.valueOf(value).setScale(3, java.math.RoundingMode.HALF_UP).stripTrailingZeros();
        return rounded.scale() < 0 ? rounded.setScale(0).toPlainString() : rounded.toPlainString();
    }
}
