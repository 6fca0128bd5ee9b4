package kitwright.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.CutPattern;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.StockLength;
import kitwright.model.StockTerms;

/**
 * The figures of one section's cutting plan that the summary and the purchase order show: pieces and length of
 * stock by origin, cost from the catalog's prices, offcut split into remnant and scrap. Prices are looked up in the
 * tube catalog by section, stock length and origin; a mill row without a price makes the cost unknown (null), never
 * zero, while a rack row without a price costs nothing, as the cutting stage counts it.
 *
 * @param plan         the section's plan
 * @param lines        order lines, mill stock first, then rack offcuts, each in catalog order
 * @param stockMm      total length of stock used (mill and rack)
 * @param offcutMm     total offcut (remnant and scrap)
 * @param remnantMm    total length of remnants going back to the rack
 * @param remnants     number of remnants
 * @param scrapMm      total length of scrap
 * @param cost         price of all stock used, or null when a price is missing
 */
public record CuttingFigures(SectionCutPlan plan, List<OrderLine> lines, double stockMm, double offcutMm,
                             double remnantMm, int remnants, double scrapMm, Double cost) {

    /**
     * What to take for one stock length of a section.
     *
     * @param unitPrice price per piece (the catalog's price worked out on its basis), or null when it gives none
     * @param total     pieces times unit price, or null
     * @param terms     the catalog row's price as quoted, on its basis, with currency, grade, standard and supplier
     * @param massKg    mass of the line's pieces, pieces x length x mass per metre, or null without the material
     */
    public record OrderLine(String section, double stockLengthMm, Origin origin, int pieces, Double unitPrice,
                            Double total, StockTerms terms, Double massKg) {
        /** The total as an order states it, rounded half-up to the cent; null when unknown. */
        public Double totalInCents() {
            return total == null ? null
                    : java.math.BigDecimal.valueOf(total).setScale(2, java.math.RoundingMode.HALF_UP).doubleValue();
        }
    }

    public CuttingFigures {
        lines = List.copyOf(lines);
    }

    /** Figures of a section's plan, priced from the kit's catalog. */
    public static CuttingFigures of(Kit kit, SectionCutPlan plan) {
        List<StockLength> rows = kit.catalog().stockFor(plan.section());
        Map<String, Integer> pieces = new LinkedHashMap<>();
        Map<String, CutPattern> example = new LinkedHashMap<>();
        double stock = 0;
        double offcut = 0;
        double remnant = 0;
        double scrap = 0;
        int remnants = 0;
        for (CutPattern p : plan.patterns()) {
            String key = p.origin() + "/" + p.stockLengthMm();
            pieces.merge(key, p.count(), Integer::sum);
            example.putIfAbsent(key, p);
            stock += p.stockLengthMm() * p.count();
            offcut += p.offcutMm() * p.count();
            if ("remnant".equals(p.offcutKind())) {
                remnant += p.offcutMm() * p.count();
                remnants += p.count();
            } else {
                scrap += p.offcutMm() * p.count();
            }
        }
        List<OrderLine> lines = new ArrayList<>();
        for (Map.Entry<String, Integer> e : pieces.entrySet()) {
            CutPattern p = example.get(e.getKey());
            int i = catalogIndex(rows, p.stockLengthMm(), p.origin());
            Double price = price(rows, p.stockLengthMm(), p.origin());
            StockTerms terms = i < rows.size() ? rows.get(i).terms() : StockTerms.perPiece(price);
            lines.add(new OrderLine(plan.section(), p.stockLengthMm(), p.origin(), e.getValue(), price,
                    price == null ? null : price * e.getValue(), terms,
                    massKg(kit, plan.section(), p.stockLengthMm() * e.getValue())));
        }
        lines.sort(Comparator.comparing(OrderLine::origin)
                .thenComparingInt(l -> catalogIndex(rows, l.stockLengthMm(), l.origin()))
                .thenComparingDouble(OrderLine::stockLengthMm));
        Double cost = 0.0;
        for (OrderLine line : lines) {
            cost = cost == null || line.total() == null ? null : cost + line.total();
        }
        return new CuttingFigures(plan, lines, stock, offcut, remnant, remnants, scrap, cost);
    }

    /** Mass of a length of a section, when its material is known. */
    private static Double massKg(Kit kit, String section, double lengthMm) {
        return kit.catalog().section(section)
                .flatMap(s -> kit.material(s).map(m -> s.massPerMetreKg(m.densityKgM3())))
                .map(perMetre -> perMetre * lengthMm / 1000.0)
                .orElse(null);
    }

    /** Stock pieces of one origin. */
    public int pieces(Origin origin) {
        return lines.stream().filter(l -> l.origin() == origin).mapToInt(OrderLine::pieces).sum();
    }

    /** Stock length of one origin. */
    public double lengthMm(Origin origin) {
        return lines.stream().filter(l -> l.origin() == origin).mapToDouble(l -> l.stockLengthMm() * l.pieces())
                .sum();
    }

    /** Price of the stock of one origin, or null when a price is missing. */
    public Double cost(Origin origin) {
        Double sum = 0.0;
        for (OrderLine line : lines) {
            if (line.origin() == origin) {
                sum = sum == null || line.total() == null ? null : sum + line.total();
            }
        }
        return sum;
    }

    /** Offcut as a share of the stock length used, 0 when no stock is used. */
    public double offcutShare() {
        return stockMm == 0 ? 0 : offcutMm / stockMm;
    }

    /** The catalog price; rack offcuts without a price cost nothing (as the cutting stage counts them). */
    private static Double price(List<StockLength> rows, double lengthMm, Origin origin) {
        int i = catalogIndex(rows, lengthMm, origin);
        Double price = i < rows.size() ? rows.get(i).price() : null;
        return price == null && origin == Origin.RACK ? Double.valueOf(0.0) : price;
    }

    private static int catalogIndex(List<StockLength> rows, double lengthMm, Origin origin) {
        for (int i = 0; i < rows.size(); i++) {
            StockLength row = rows.get(i);
            if (row.origin() == origin && Math.abs(row.lengthMm() - lengthMm) < 1e-6) {
                return i;
            }
        }
        return rows.size();
    }
}
