package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.report.CuttingFigures.OrderLine;

/**
 * The purchase order: stock to buy per section and stock length, with unit price, line total and mass, and apart
 * from it the rack offcuts to take. Procurement forwards this page as it is.
 */
final class PurchaseOrderSection {
    static final String ID = "purchase-order";

    /** One order line, preformatted. */
    record Line(String section, String material, String stockLength, String pieces, String unitPrice, String total,
                String mass) {
    }

    /** @param allowance the line on the miscut allowance the stock covers, or null without one */
    record View(List<Line> mill, Line millTotal, List<Line> rack, Line rackTotal, boolean hasRack, String allowance) {
    }

    private PurchaseOrderSection() {
    }

    static ReportSection of(Kit kit, List<CuttingFigures> sections) {
        List<OrderLine> mill = new ArrayList<>();
        List<OrderLine> rack = new ArrayList<>();
        for (CuttingFigures f : sections) {
            for (OrderLine line : f.lines()) {
                (line.origin() == Origin.MILL ? mill : rack).add(line);
            }
        }
        String allowance = KitFiguresSection.allowancePieces(kit).map(pieces -> "Of the pieces cut from this stock, "
                + pieces + " are miscut allowance for saw errors, beyond the kit's bars: "
                + KitFiguresSection.allowanceByMark(kit) + ".").orElse(null);
        View view = new View(lines(kit, mill), total(kit, mill), lines(kit, rack), total(kit, rack), !rack.isEmpty(),
                allowance);
        return new ReportSection(ID, "Purchase order", "purchase-order", view);
    }

    private static List<Line> lines(Kit kit, List<OrderLine> lines) {
        return lines.stream().map(l -> new Line(l.section(), material(kit, l.section()),
                ShopFormat.mm(l.stockLengthMm()), ShopFormat.count(l.pieces()), ReportFormat.money(l.unitPrice()),
                ReportFormat.money(l.total()), ReportFormat.kg(massKg(kit, l)))).toList();
    }

    private static Line total(Kit kit, List<OrderLine> lines) {
        int pieces = 0;
        double lengthMm = 0;
        Double cost = 0.0;
        Double mass = 0.0;
        for (OrderLine l : lines) {
            pieces += l.pieces();
            lengthMm += l.stockLengthMm() * l.pieces();
            cost = cost == null || l.total() == null ? null : cost + l.total();
            Double m = massKg(kit, l);
            mass = mass == null || m == null ? null : mass + m;
        }
        return new Line("Total", "", ShopFormat.metres(lengthMm) + "\u00A0m", ShopFormat.count(pieces), "",
                ReportFormat.money(cost), ReportFormat.kg(mass));
    }

    private static String material(Kit kit, String section) {
        return kit.catalog().section(section).map(s -> s.material()).orElse("");
    }

    /** Mass of the stock on a line, when the section's material is known. */
    static Double massKg(Kit kit, OrderLine line) {
        return kit.catalog().section(line.section())
                .flatMap(s -> kit.material(s).map(m -> s.massPerMetreKg(m.densityKgM3())))
                .map(perMetre -> perMetre * line.stockLengthMm() / 1000.0 * line.pieces())
                .orElse(null);
    }
}
