package kitwright.report;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Numbers as the workshop and the purchasing office read them: millimetres without spurious decimals, digits
 * grouped in threes with a narrow no-break space ("12 000", SI brochure 9th ed. 5.4.4 recommends a thin space
 * and never a comma or point for grouping), a point as the decimal sign, money with two decimals.
 *
 * <p>All methods are pure and independent of the JVM's default locale, so the report's bytes never depend on
 * the machine that wrote them.
 */
public final class ShopFormat {
    /** U+202F NARROW NO-BREAK SPACE: groups digits and keeps a number on one line. */
    public static final String GROUP = "\u202F";
    /** Shown where a value is unknown (no price, no material). */
    public static final String UNKNOWN = "\u2014";

    private ShopFormat() {
    }

    /** A length in millimetres to 0.1 mm, with no trailing ".0": 1234.0 gives "1 234", 1234.25 gives "1 234.3". */
    public static String mm(double millimetres) {
        return decimal(millimetres, 1, false);
    }

    /**
     * A length on the saw sheet, to 0.01 mm as the plan holds it: 599.06 gives "599.06", 1234.0 gives "1 234" (a
     * hundredth of kerf decides a fit, so the sheet shows it).
     */
    public static String sawMm(double millimetres) {
        return decimal(millimetres, 2, false);
    }

    /** A saw-sheet length with its unit: "599.06 mm". */
    public static String sawMmUnit(double millimetres) {
        return sawMm(millimetres) + "\u00A0mm";
    }

    /** A length with its unit: "1 234 mm". */
    public static String mmUnit(double millimetres) {
        return mm(millimetres) + "\u00A0mm";
    }

    /** Metres to two decimals at most, for totals of stock length: 73 250 mm gives "73.25". */
    public static String metres(double millimetres) {
        return decimal(millimetres / 1000.0, 2, false);
    }

    /** Money in the catalog's currency, always two decimals: "1 234.50". */
    public static String money(double amount) {
        return decimal(amount, 2, true);
    }

    /** Mass in kilograms to one decimal at most: "1 234.5". */
    public static String kg(double kilograms) {
        return decimal(kilograms, 1, false);
    }

    /** A share in percent to one decimal: 0.08312 gives "8.3". */
    public static String percent(double fraction) {
        return decimal(fraction * 100.0, 1, true);
    }

    /** A number with exactly {@code places} decimals and grouped digits: (5667.654, 2) gives "5 667.65". */
    public static String fixed(double value, int places) {
        return decimal(value, places, true);
    }

    /** A plain count with grouped digits: 12000 gives "12 000". */
    public static String count(long n) {
        return decimal(n, 0, true);
    }

    /** Seconds without trailing zeros: 10.0 gives "10", 2.5 gives "2.5". */
    public static String seconds(double seconds) {
        return decimal(seconds, 3, false);
    }

    /**
     * Rounds half away from zero to {@code places} decimals and groups the integer digits.
     *
     * @param fixed keep every decimal place (money, percent) rather than dropping trailing zeros
     */
    static String decimal(double value, int places, boolean fixed) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            return UNKNOWN;
        }
        BigDecimal rounded = BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_UP);
        if (rounded.signum() == 0) {
            rounded = rounded.abs();
        }
        if (!fixed) {
            rounded = rounded.stripTrailingZeros();
            if (rounded.scale() < 0) {
                rounded = rounded.setScale(0);
            }
        }
        String plain = rounded.toPlainString();
        boolean negative = plain.startsWith("-");
        if (negative) {
            plain = plain.substring(1);
        }
        int point = plain.indexOf('.');
        String whole = point < 0 ? plain : plain.substring(0, point);
        String fraction = point < 0 ? "" : plain.substring(point);
        StringBuilder grouped = new StringBuilder();
        for (int i = 0; i < whole.length(); i++) {
            if (i > 0 && (whole.length() - i) % 3 == 0) {
                grouped.append(GROUP);
            }
            grouped.append(whole.charAt(i));
        }
        return (negative ? "-" : "") + grouped + fraction;
    }
}
