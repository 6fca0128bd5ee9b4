package kitwright.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import kitwright.model.Origin;
import kitwright.report.CuttingFigures.OrderLine;
import kitwright.report.SummarySection.Figure;

/**
 * The summary's stock cost: the plan's cost (mill stock and rack offcuts at their catalog prices, what the cutting
 * minimises) with, beneath it, what is payable to suppliers (the mill stock alone, as order.csv adds up) and what
 * the rack offcuts count for. Stock priced in several currencies is not added up: each currency's payable amount is
 * shown apart, as on the purchase order.
 */
final class StockCostFigure {
    private StockCostFigure() {
    }

    static Figure of(List<CuttingFigures> sections) {
        Map<String, Double> payable = new LinkedHashMap<>();
        Map<String, Double> rack = new LinkedHashMap<>();
        for (CuttingFigures f : sections) {
            for (OrderLine line : f.lines()) {
                if (line.origin() == Origin.MILL && line.total() == null) {
                    return new Figure("Stock cost", ShopFormat.UNKNOWN, "a price is missing in the catalog");
                }
                Map<String, Double> into = line.origin() == Origin.MILL ? payable : rack;
                into.merge(line.terms().currency(), line.total() == null ? 0.0 : line.totalInCents(), Double::sum);
                payable.putIfAbsent(line.terms().currency(), 0.0);
            }
        }
        if (payable.size() > 1) {
            return new Figure("Stock cost", "several currencies", "payable to suppliers " + payable.entrySet()
                    .stream().map(e -> ShopFormat.money(e.getValue()) + "\u00A0" + e.getKey())
                    .collect(Collectors.joining(", ")) + ": see the purchase order");
        }
        String currency = payable.keySet().stream().findFirst().orElse("");
        double mill = payable.getOrDefault(currency, 0.0);
        double offcuts = rack.getOrDefault(currency, 0.0);
        String unit = currency.isEmpty() ? "" : "\u00A0" + currency;
        return new Figure("Stock cost", ShopFormat.money(mill + offcuts) + unit, "payable to suppliers "
                + ShopFormat.money(mill) + unit + (rack.isEmpty() ? "" : "; rack offcuts " + ShopFormat.money(offcuts)
                + " at their rack price") + (currency.isEmpty() ? "; catalog currency" : ""));
    }
}
