package kitwright.report;

import java.util.ArrayList;
import java.util.List;

/**
 * What the plan does not cover and what to check before relying on it. The general cautions always appear;
 * stages add their own through {@link ReportModel.Builder#caution(String, String)}.
 */
final class CautionsSection {
    static final String ID = "cautions";

    /** One caution: a short heading and its text. */
    record Caution(String heading, String text) {
    }

    record View(List<Caution> cautions) {
    }

    private CautionsSection() {
    }

    /** The cautions every report carries. */
    static List<Caution> general() {
        List<Caution> list = new ArrayList<>();
        list.add(new Caution("Material and logistics planning only",
                "This report plans stock, saw cuts and shipping. It does not check structural capacity, joints "
                        + "or connections, lifting, or load securing on vehicles (e.g. EN 12195-1). Those checks "
                        + "belong to a qualified engineer: follow local codes and regulations and the advice of "
                        + "licensed professionals."));
        list.add(new Caution("Cut length, not node-to-node length",
                "Every length on the saw sheets is a cut length. Check the first piece of each mark against the "
                        + "drawings and the joints before cutting the batch; mixing cut and node-to-node lengths is "
                        + "the costliest error in a kit."));
        list.add(new Caution("Saw model",
                "The plan assumes the kerf and end trim stated on each saw sheet. A wider blade or a longer trim "
                        + "can make a pattern too long for its stock piece: re-plan with the shop's real figures."));
        list.add(new Caution("Nesting tolerances",
                "Where tubes are planned to slide inside one another, the fit uses the tolerance rule named in "
                        + "that section (worst-case or nominal sizes). Out-of-roundness, straightness, internal "
                        + "weld beads beyond the catalog's figure, burrs and paint are not counted: try one nest "
                        + "of each kind before packing the batch."));
        list.add(new Caution("Handling",
                "Long tubes and nested bundles are heavy and awkward; manual handling guidance often puts about "
                        + "25 kg as the limit for one person (common practice). Use lifting aids where needed."));
        list.add(new Caution("Prices and stock",
                "Costs come from the catalog's prices in its currency. Confirm prices, stock lengths and rack "
                        + "contents with the supplier and the shop before ordering."));
        return List.copyOf(list);
    }

    static ReportSection of(List<Caution> cautions) {
        return new ReportSection(ID, "Cautions", "cautions", new View(List.copyOf(cautions)));
    }
}
