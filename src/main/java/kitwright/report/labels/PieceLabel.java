package kitwright.report.labels;

import kitwright.io.Figures;

/**
 * The label of one cut piece, as the saw operator sticks it on: what it is, and where it travels.
 *
 * @param kind     the piece's kind in cut-list.csv: {@code cut}, {@code spare} or {@code allowance}
 * @param piece    the piece's number among the pieces of its mark, 1 to {@code ofPieces}, in cut-list order
 * @param bundle   the bundle it is nested in, empty when the plan bundled it nowhere
 * @param crate    the crate of that bundle, empty when crates were not planned
 */
public record PieceLabel(String kind, String mark, String section, double lengthMm, Double toleranceMm,
                         int piece, int ofPieces, String bundle, String crate) {
    public PieceLabel {
        if (kind == null || mark == null || section == null || bundle == null || crate == null) {
            throw new IllegalArgumentException("a piece label needs kind, mark, section, bundle and crate");
        }
        if (piece < 1 || piece > ofPieces) {
            throw new IllegalArgumentException("piece " + piece + " of " + ofPieces + " of mark " + mark);
        }
    }

    /** The QR code's text: kind;mark;section;length_mm;tolerance_mm;piece;bundle;crate. */
    public String code() {
        return CodeLine.join(kind, mark, section, Figures.plain(lengthMm),
                toleranceMm == null ? "" : Figures.plain(toleranceMm), String.valueOf(piece), bundle, crate);
    }
}
