package kitwright.cli;

import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.PieceKind;
import kitwright.cutting.SectionCutPlan;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.Status;

/** The cutting plan as the console shows it after {@code cut}: one line per section, then the totals. */
final class CutSummaryText {
    private CutSummaryText() {
    }

    static String format(Kit kit, CutPlan plan) {
        StringBuilder sb = new StringBuilder();
        int bars = kit.bars().stream().mapToInt(b -> b.quantity()).sum();
        sb.append("Kit ").append(kit.name()).append(": ").append(kit.bars().size()).append(" marks, ").append(bars)
                .append(" bars in ").append(plan.sections().size()).append(" sections (kerf ")
                .append(saw(kit.settings().kerfMm())).append(" mm, trim ").append(saw(kit.settings().trimMm()))
                .append(" mm per end, remnants from ").append(fixed(kit.settings().minRemnantMm(), 0)).append(" mm)\n\n");
        boolean masses = !kit.materials().isEmpty();
        TextTable table = masses
                ? new TextTable("Section", "Status", "Stock to buy", "Rack offcuts used", ">Cost", ">Offcut %",
                        ">Gap %", ">Bought (kg)")
                : new TextTable("Section", "Status", "Stock to buy", "Rack offcuts used", ">Cost", ">Offcut %",
                        ">Gap %");
        double cost = 0;
        boolean allPriced = true;
        double stockLength = 0;
        double offcut = 0;
        double bought = 0;
        for (SectionCutPlan s : plan.sections()) {
            double length = 0;
            double waste = 0;
            for (CutPattern p : s.patterns()) {
                length += p.stockLengthMm() * p.count();
                waste += p.offcutMm() * p.count();
            }
            stockLength += length;
            offcut += waste;
            String value;
            if (s.status() == Status.INFEASIBLE) {
                value = "-";
            } else if (s.objective().equals("cost")) {
                value = fixed(s.value(), 2);
                cost += s.value();
            } else {
                value = "(" + fixed(s.value() / 1000, 1) + " m)";
                allPriced = false;
            }
            Object[] cells = {s.section(), s.status(), pieces(s, Origin.MILL), pieces(s, Origin.RACK), value,
                    length > 0 ? fixed(100 * waste / length, 1) : "-",
                    s.gap() == null ? "-" : fixed(100 * s.gap(), 2)};
            if (masses) {
                Section section = kit.catalog().section(s.section()).orElseThrow();
                Double kg = kit.material(section).map(m -> section.massPerMetreKg(m.densityKgM3())).orElse(null);
                double mill = s.patterns().stream().filter(p -> p.origin() == Origin.MILL)
                        .mapToDouble(p -> p.stockLengthMm() * p.count()).sum();
                Object[] more = java.util.Arrays.copyOf(cells, cells.length + 1);
                more[cells.length] = kg == null ? "-" : fixed(kg * mill / 1000, 1);
                cells = more;
                bought += kg == null ? 0 : kg * mill / 1000;
            }
            table.row(cells);
        }
        sb.append(table.render(""));
        Double payable = allPriced ? KitMetricsCalculator.payableCost(kit, plan) : null;
        sb.append('\n').append("Total: cost ").append(fixed(cost, 2))
                .append(allPriced ? "" : " (sections without prices left out)")
                .append(payable == null ? "" : ", payable to suppliers " + fixed(payable, 2) + " (order.csv)")
                .append("; ").append(fixed(stockLength / 1000, 1)).append(" m of stock, ")
                .append(stockLength > 0 ? fixed(100 * offcut / stockLength, 1) : "0").append(" % offcut");
        if (masses) {
            sb.append("; ").append(fixed(bought, 1)).append(" kg bought from the mill");
        }
        sb.append('\n');
        for (SectionCutPlan s : plan.sections()) {
            if (s.status() == Status.INFEASIBLE) {
                sb.append(s.section()).append(": INFEASIBLE: ").append(s.reason()).append('\n');
            } else if (s.reason() != null) {
                sb.append(s.section()).append(": ").append(s.status()).append(", ").append(s.reason())
                        .append(" (this plan may differ on a faster or slower machine)\n");
            }
            Map<String, Integer> allowance = PieceKind.counts(kit, s, PieceKind.ALLOWANCE);
            if (!allowance.isEmpty()) {
                sb.append(s.section()).append(": miscut allowance cut: ").append(allowance.entrySet().stream()
                        .map(x -> x.getKey() + " " + x.getValue()).collect(Collectors.joining(", "))).append('\n');
            }
            if (!s.spares().isEmpty()) {
                sb.append(s.section()).append(": spares cut: ").append(s.spares().stream()
                        .map(x -> x.mark() + " " + x.count()).collect(Collectors.joining(", "))).append('\n');
            }
        }
        sb.append("OPTIMAL: proven least cost. FEASIBLE: a valid plan within the gap of the lower bound.\n");
        return sb.toString();
    }

    /** e.g. "12 x 6000, 3 x 12000" (mm), or "-". */
    private static String pieces(SectionCutPlan s, Origin origin) {
        Map<Double, Integer> count = new TreeMap<>();
        for (CutPattern p : s.patterns()) {
            if (p.origin() == origin) {
                count.merge(p.stockLengthMm(), p.count(), Integer::sum);
            }
        }
        if (count.isEmpty()) {
            return "-";
        }
        return count.entrySet().stream().map(e -> e.getValue() + " x " + fixed(e.getKey(), 0))
                .collect(Collectors.joining(", ")) + " mm";
    }

    /** A kerf or trim as written, at least one decimal: 3.0, 1.04 (a hundredth of kerf decides a fit). */
    private static String saw(double mm) {
        return fixed(mm, Math.max(1, kitwright.cutting.SawArithmetic.decimals(mm)));
    }

    private static String fixed(double value, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
