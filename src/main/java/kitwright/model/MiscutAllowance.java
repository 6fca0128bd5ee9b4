package kitwright.model;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Miscut allowance (kit.json {@code miscutAllowance}): extra pieces of every mark cut for saw errors, so that a
 * piece sawn short or out of square on the floor does not leave the kit a bar short. A mark of kit quantity q gets
 * {@code max(piecesPerMark, ceil(percent / 100 x q))} extra pieces; they are cut, bundled, crated and weighed with
 * the kit, and the cut-list and the labels tell them from the kit's own bars (kind {@code allowance}).
 * Service-life spares come on top of them. The share of the quantity is worked out in exact decimals, so 10 % of
 * 30 is 3, not 4.
 *
 * @param piecesPerMark at least this many extra pieces per mark, 0 or more
 * @param percent       at least this share of the mark's quantity, in percent from 0 to 100, rounded up to whole
 *                      pieces
 */
public record MiscutAllowance(int piecesPerMark, double percent) {
    /** No allowance: the default when kit.json does not set one. */
    public static final MiscutAllowance NONE = new MiscutAllowance(0, 0);

    public MiscutAllowance {
        if (piecesPerMark < 0) {
            throw new IllegalArgumentException("piecesPerMark must not be negative: " + piecesPerMark);
        }
        if (!(percent >= 0 && percent <= 100)) {
            throw new IllegalArgumentException("percent must be from 0 to 100: " + percent);
        }
    }

    /** Extra pieces for a mark of {@code quantity} bars: max(piecesPerMark, ceil(percent / 100 x quantity)). */
    public int piecesFor(int quantity) {
        if (quantity < 0) {
            throw new IllegalArgumentException("quantity must not be negative: " + quantity);
        }
        int share = BigDecimal.valueOf(percent).multiply(BigDecimal.valueOf(quantity))
                .divide(BigDecimal.valueOf(100)).setScale(0, RoundingMode.CEILING).intValueExact();
        return Math.max(piecesPerMark, share);
    }

    /** True when the allowance adds no piece to any mark. */
    public boolean isNone() {
        return piecesPerMark == 0 && percent == 0;
    }
}
