package kitwright.report.cutting;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockLength;

/**
 * The rack for the next job, {@code rack-after.csv}, in the tube catalog's format: the rack rows of the catalog
 * with the offcuts this plan takes off them (rows used up are left out), then the new remnants of each section,
 * longest first, as rack rows without a price (already paid for). A remnant is listed at its offcut length, which
 * already leaves the far trim on it, so the next job trims it again: a safe choice. Prices are per piece (the
 * catalog's price worked out on its basis), so no {@code price_basis} column is needed; when the catalog states
 * currencies, a {@code currency} column gives each row its section's, so that the rows go back into that catalog
 * without mixing a blank currency into a priced section.
 */
public final class RackAfterCsv {
    public static final List<String> HEADER = List.of("section", "material", "outer_diameter_mm", "wall_mm",
            "length_mm", "price", "available", "origin", "weld_bead_mm", "od_tolerance_mm", "wall_tolerance_pct");

    private RackAfterCsv() {
    }

    public static String format(Kit kit, CutPlan plan) {
        boolean currencies = kit.catalog().stock().stream().anyMatch(s -> !s.terms().currency().isEmpty());
        List<String> header = new ArrayList<>(HEADER);
        if (currencies) {
            header.add("currency");
        }
        Map<String, SectionCutPlan> plans = new HashMap<>();
        plan.sections().forEach(s -> plans.put(s.section(), s));
        List<List<Object>> rows = new ArrayList<>();
        for (Section section : kit.catalog().sections().values()) {
            SectionCutPlan cut = plans.get(section.name());
            int first = rows.size();
            Map<Double, Integer> used = new HashMap<>();
            Map<Double, Integer> remnants = new TreeMap<>(java.util.Comparator.reverseOrder());
            if (cut != null) {
                for (CutPattern p : cut.patterns()) {
                    if (p.origin() == Origin.RACK) {
                        used.merge(p.stockLengthMm(), p.count(), Integer::sum);
                    }
                    if (p.offcutKind().equals("remnant")) {
                        remnants.merge(p.offcutMm(), p.count(), Integer::sum);
                    }
                }
            }
            for (StockLength row : kit.catalog().stockFor(section.name())) {
                if (row.origin() != Origin.RACK) {
                    continue;
                }
                if (row.unlimited()) {
                    rows.add(row(section, row.lengthMm(), row.price(), null));
                    continue;
                }
                int taken = Math.min(row.available(), used.getOrDefault(row.lengthMm(), 0));
                used.merge(row.lengthMm(), -taken, Integer::sum);
                int left = row.available() - taken;
                if (left > 0) {
                    rows.add(row(section, row.lengthMm(), row.price(), left));
                }
            }
            remnants.forEach((length, count) -> rows.add(row(section, length, null, count)));
            if (currencies) {
                String currency = kit.catalog().stockFor(section.name()).stream().findFirst()
                        .map(s -> s.terms().currency()).orElse("");
                rows.subList(first, rows.size()).forEach(r -> r.add(currency));
            }
        }
        return CsvText.of(header, rows);
    }

    private static List<Object> row(Section section, double length, Double price, Integer available) {
        List<Object> row = new ArrayList<>();
        row.add(section.name());
        row.add(section.material());
        row.add(section.outerDiameterMm());
        row.add(section.wallMm());
        row.add(length);
        row.add(price);
        row.add(available);
        row.add(Origin.RACK.code());
        row.add(section.weldBeadMm());
        row.add(section.odToleranceMm());
        row.add(section.wallTolerancePct());
        return row;
    }
}
