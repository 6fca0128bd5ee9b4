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
                        "The crate and truck plans respect inside sizes, max gross, top loads, deck sizes and payloads."
                                + " They do not check lifting points, slings, forklift access, crate strength, axle"
                                + " loads or load securing on the vehicle (EN 12195-1). Local rules and the carrier"
                                + " decide: have the loading checked by a competent person."),
                new Caution("Centre of gravity",
                        "Each vehicle's centre of gravity is given along the deck from the front, with every crate's"
                                + " mass taken at the centre of its outer box. Loads start at the front of the deck;"
                                + " check axle loads against the vehicle's plate before departure."),
                new Caution("Crate contents",
                        "Bundles lie lengthwise in lanes in the crate's cross-section (square or staggered rows);"
                                + " dunnage and bracing are not drawn. Joint boxes are planned at the kit's joint-box"
                                + " size and mass limit, the joints in a square grid."));
    }
}
