package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.PriceBasis;
import kitwright.model.StockTerms;
import kitwright.report.CuttingFigures.OrderLine;

/**
 * The purchase order: one printed A4 sheet per supplier the tube catalog names (one sheet when it names none), each
 * with the stock to buy from that supplier, blank fields for the order number, delivery date and delivery address,
 * and totals per currency; then, on a sheet of its own, the rack offcuts to take, which nobody is paid for.
 * Procurement forwards a supplier's sheet as it is. Unit prices are shown on their catalog basis (per piece, per
 * metre or per kg); a line total is the pieces' price worked out on that basis, as in order.csv.
 */
final class PurchaseOrderSection {
    static final String ID = "purchase-order";

    /** One order line, preformatted. */
    record Line(String section, String material, String gradeAndStandard, String stockLength, String pieces,
                String mass, String unitPrice, String currency, String total) {
    }

    /** The sum of a sheet's lines priced in one currency. */
    record CurrencyTotal(String currency, String pieces, String mass, String total) {
    }

    /** One supplier's sheet. */
    record Sheet(String supplier, boolean supplierGiven, String kit, String date, List<Line> lines,
                 List<CurrencyTotal> totals, boolean hasGrade) {
    }

    /** @param allowance the line on the miscut allowance the stock covers, or null without one */
    record View(String kit, List<Sheet> sheets, List<Line> rack, Line rackTotal, boolean hasRack, String allowance) {
    }

    private PurchaseOrderSection() {
    }

    static ReportSection of(Kit kit, List<CuttingFigures> sections, String date) {
        Map<String, List<OrderLine>> bySupplier = new LinkedHashMap<>();
        List<OrderLine> rack = new ArrayList<>();
        for (CuttingFigures f : sections) {
            for (OrderLine line : f.lines()) {
                if (line.origin() == Origin.MILL) {
                    bySupplier.computeIfAbsent(line.terms().supplier(), s -> new ArrayList<>()).add(line);
                } else {
                    rack.add(line);
                }
            }
        }
        if (bySupplier.isEmpty()) {
            bySupplier.put("", List.of());
        }
        List<Sheet> sheets = new ArrayList<>();
        bySupplier.forEach((supplier, lines) -> sheets.add(new Sheet(supplier, !supplier.isEmpty(), kit.name(), date,
                lines(kit, lines, true), totals(lines),
                lines.stream().anyMatch(l -> !gradeAndStandard(l.terms()).isEmpty()))));
        String allowance = KitFiguresSection.allowancePieces(kit).map(pieces -> "Of the pieces cut from this stock, "
                + pieces + " are miscut allowance for saw errors, beyond the kit's bars: "
                + KitFiguresSection.allowanceByMark(kit) + ".").orElse(null);
        View view = new View(kit.name(), sheets, lines(kit, rack, false), rackTotal(rack), !rack.isEmpty(),
                allowance);
        return new ReportSection(ID, "Purchase order", "purchase-order", view);
    }

    private static List<Line> lines(Kit kit, List<OrderLine> lines, boolean quoted) {
        return lines.stream().map(l -> new Line(l.section(), material(kit, l.section()), gradeAndStandard(l.terms()),
                ShopFormat.mm(l.stockLengthMm()), ShopFormat.count(l.pieces()), ReportFormat.kg(l.massKg()),
                quoted ? unitPrice(l) : ReportFormat.money(l.unitPrice()) + " per piece", l.terms().currency(),
                ReportFormat.money(l.total()))).toList();
    }

    /** The catalog's price on its basis: "5.10 per m", "1.05 per kg", "56.38 per piece". */
    static String unitPrice(OrderLine line) {
        if (line.unitPrice() == null) {
            return ShopFormat.UNKNOWN;
        }
        StockTerms terms = line.terms();
        return ShopFormat.money(terms.quotedPrice()) + " " + per(terms.basis());
    }

    static String per(PriceBasis basis) {
        return switch (basis) {
            case PIECE -> "per piece";
            case METRE -> "per m";
            case KILOGRAM -> "per kg";
        };
    }

    /** Totals per currency, in the order the currencies first appear; a missing price makes its total unknown. */
    private static List<CurrencyTotal> totals(List<OrderLine> lines) {
        Map<String, List<OrderLine>> byCurrency = new LinkedHashMap<>();
        lines.forEach(l -> byCurrency.computeIfAbsent(l.terms().currency(), c -> new ArrayList<>()).add(l));
        List<CurrencyTotal> totals = new ArrayList<>();
        byCurrency.forEach((currency, group) -> {
            Sum sum = Sum.of(group);
            totals.add(new CurrencyTotal(currency.isEmpty() ? "Total" : "Total " + currency,
                    ShopFormat.count(sum.pieces), ReportFormat.kg(sum.mass), ReportFormat.money(sum.cost)));
        });
        return totals;
    }

    private static Line rackTotal(List<OrderLine> lines) {
        Sum sum = Sum.of(lines);
        return new Line("Total", "", "", ShopFormat.metres(sum.lengthMm) + "\u00A0m", ShopFormat.count(sum.pieces),
                ReportFormat.kg(sum.mass), "", "", ReportFormat.money(sum.cost));
    }

    private static String gradeAndStandard(StockTerms terms) {
        return String.join(" · ", java.util.stream.Stream.of(terms.grade(), terms.standard())
                .filter(s -> !s.isEmpty()).toList());
    }

    private static String material(Kit kit, String section) {
        return kit.catalog().section(section).map(s -> s.material()).orElse("");
    }

    /**
     * Pieces, length, mass and cost of some lines, the cost as the sum of the line totals in cents (as an order adds
     * up); mass and cost null when one line's is unknown.
     */
    private record Sum(int pieces, double lengthMm, Double mass, Double cost) {
        static Sum of(List<OrderLine> lines) {
            int pieces = 0;
            double lengthMm = 0;
            Double mass = 0.0;
            Double cost = 0.0;
            for (OrderLine l : lines) {
                pieces += l.pieces();
                lengthMm += l.stockLengthMm() * l.pieces();
                mass = mass == null || l.massKg() == null ? null : mass + l.massKg();
                cost = cost == null || l.total() == null ? null : cost + l.totalInCents();
            }
            return new Sum(pieces, lengthMm, mass, cost);
        }
    }
}
