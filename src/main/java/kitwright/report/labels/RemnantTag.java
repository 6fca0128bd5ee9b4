package kitwright.report.labels;

import kitwright.io.Figures;

/**
 * The tag of a remnant going back to the rack: enough to find it again for the next job.
 *
 * @param stockPiece the stock piece it is left of, as numbered in cut-list.csv
 * @param date       the plan's date (ISO 8601)
 */
public record RemnantTag(String section, double lengthMm, int stockPiece, String date, String kit) {
    public RemnantTag {
        if (section == null || date == null || kit == null || !(lengthMm > 0)) {
            throw new IllegalArgumentException("a remnant tag needs section, a positive length, date and kit");
        }
    }

    /** The QR code's text: remnant;section;length_mm;date;kit. */
    public String code() {
        return CodeLine.join("remnant", section, Figures.plain(lengthMm), date, kit);
    }
}
