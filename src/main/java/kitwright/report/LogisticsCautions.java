package kitwright.report;

import java.util.List;

/**
 * The cautions the crating and loading stages add to the report and print with {@code kitwright pack}
 * (src/docs/sources.md, Cautions). Pass each to {@code ReportModel.Builder#caution(heading, text)}.
 */
public final class LogisticsCautions {
    /** One caution: a short heading and its text. */
    public record Caution(String heading, String text) {
    }

    private LogisticsCautions() {
    }

    public static List<Caution> all() {
        return List.of(
                new Caution("Lifting and load securing are not checked",
                        "The crate and truck plans respect inside sizes, max gross, top loads, deck sizes, door"
                                + " openings, payloads and, where the vehicle catalog gives the geometry, axle loads"
                                + " by the lever rule. They do not check lifting points, slings, forklift access,"
                                + " crate strength or load securing on the vehicle (EN 12195-1), and the catalog's"
                                + " axle figures are not the vehicle's plate. Load securing and legal limits are for"
                                + " qualified people: the carrier and local rules decide; have the loading checked by"
                                + " a competent person."),
                new Caution("Centre of gravity",
                        "Each vehicle's centre of gravity is given along the deck from the front, and across it from"
                                + " the centreline, with every crate's mass at the centre of its outer box. Rows stand"
                                + " centred across the deck and the load moves back from the headboard where the axle"
                                + " limits ask; on a semi-trailer the front load is the kingpin load. Vehicles without"
                                + " axle geometry in the catalog: axle loads not checked. Check them against the"
                                + " vehicle's plate before departure."),
                new Caution("Crate contents",
                        "Bundles lie lengthwise in lanes in the crate's cross-section (square or staggered rows);"
                                + " dunnage and bracing are not drawn. Joint boxes are planned at the kit's joint-box"
                                + " size and mass limit, the joints in a square grid."));
    }
}
