package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.metrics.KitMass;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;

/**
 * The summary at the top of the report: a row of key figures (stock to buy, cost, offcut, remnants, kit mass,
 * plan status) and one line per section with its status and gap, for a manager who reads nothing else.
 */
final class SummarySection {
    static final String ID = "summary";

    /** A key figure: a big value with its label and a short note below. */
    record Figure(String label, String value, String note) {
    }

    /** One section of the kit. */
    record Row(String section, String status, String statusClass, String millPieces, String rackPieces,
               String stockMetres, String offcutPercent, String remnants, String cost, String value,
               String lowerBound, String gap, String reason) {
    }

    record View(List<Figure> figures, boolean cutting, List<Row> rows, Row total) {
    }

    private SummarySection() {
    }

    static ReportSection of(Kit kit, List<CuttingFigures> sections) {
        List<Figure> figures = new ArrayList<>();
        List<Row> rows = new ArrayList<>();
        Row total = null;
        if (!sections.isEmpty()) {
            int mill = 0;
            int rack = 0;
            double millMm = 0;
            double stockMm = 0;
            double offcutMm = 0;
            double remnantMm = 0;
            double scrapMm = 0;
            int remnants = 0;
            Double cost = 0.0;
            for (CuttingFigures f : sections) {
                mill += f.pieces(Origin.MILL);
                rack += f.pieces(Origin.RACK);
                millMm += f.lengthMm(Origin.MILL);
                stockMm += f.stockMm();
                offcutMm += f.offcutMm();
                remnantMm += f.remnantMm();
                scrapMm += f.scrapMm();
                remnants += f.remnants();
                cost = cost == null || f.cost() == null ? null : cost + f.cost();
                rows.add(row(f));
            }
            figures.add(new Figure("Stock to buy", ShopFormat.count(mill) + " pieces",
                    ShopFormat.metres(millMm) + " m of tube" + (rack > 0 ? ", and " + ShopFormat.count(rack)
                            + " rack offcut" + (rack == 1 ? "" : "s") + " to use" : "")));
            figures.add(new Figure("Stock cost", ReportFormat.money(cost),
                    cost == null ? "a price is missing in the catalog" : "catalog prices, catalog currency"));
            double share = stockMm == 0 ? 0 : offcutMm / stockMm;
            figures.add(new Figure("Offcut", ShopFormat.percent(share) + "\u00A0%",
                    "remnant " + ShopFormat.percent(stockMm == 0 ? 0 : remnantMm / stockMm) + "\u00A0%, scrap "
                            + ShopFormat.percent(stockMm == 0 ? 0 : scrapMm / stockMm) + "\u00A0% of stock length"));
            figures.add(new Figure("Remnants", ShopFormat.count(remnants),
                    ShopFormat.metres(remnantMm) + " m back on the rack"));
            figures.add(kitMass(kit, sections));
            figures.add(plans(sections));
            total = new Row("All sections", "", "", ShopFormat.count(mill), ShopFormat.count(rack),
                    ShopFormat.metres(stockMm), ShopFormat.percent(share), ShopFormat.count(remnants),
                    ReportFormat.money(cost), "", "", "", null);
        } else {
            figures.add(kitMass(kit, sections));
        }
        return new ReportSection(ID, "Summary", "summary",
                new View(List.copyOf(figures), !sections.isEmpty(), List.copyOf(rows), total));
    }

    private static Row row(CuttingFigures f) {
        SectionCutPlan p = f.plan();
        boolean planned = p.status() != Status.INFEASIBLE;
        return new Row(p.section(), ReportFormat.status(p), ReportFormat.statusClass(p.status()),
                ShopFormat.count(f.pieces(Origin.MILL)), ShopFormat.count(f.pieces(Origin.RACK)),
                ShopFormat.metres(f.stockMm()), planned ? ShopFormat.percent(f.offcutShare()) : ShopFormat.UNKNOWN,
                ShopFormat.count(f.remnants()), planned ? ReportFormat.money(f.cost()) : ShopFormat.UNKNOWN,
                ReportFormat.objective(p.objective(), p.value()),
                ReportFormat.objective(p.objective(), p.lowerBound()), ReportFormat.gap(p.gap()),
                p.status() == Status.INFEASIBLE ? p.reason() : null);
    }

    /**
     * The kit's mass as kitwright gives it everywhere else (check, plan.json figures, compare): {@link KitMass},
     * every bar with the miscut allowance and the spares the plan cuts, and the joints, with the parts in the note.
     */
    private static Figure kitMass(Kit kit, List<CuttingFigures> sections) {
        KitMass mass = KitMass.of(kit, new CutPlan(sections.stream().map(CuttingFigures::plan).toList()));
        String barsNote = ShopFormat.count(mass.bars() + mass.allowance() + mass.spares()) + " bars in "
                + ShopFormat.count(kit.bars().size()) + " marks"
                + (mass.allowance() == 0 ? "" : " (" + ShopFormat.count(mass.allowance()) + " of them miscut allowance)")
                + (mass.spares() == 0 ? "" : " (" + ShopFormat.count(mass.spares()) + " of them spares cut)")
                + (mass.barsMassKg() == null ? " (no materials file)" : ", " + ReportFormat.kg(mass.barsMassKg()));
        String jointsNote = mass.joints() == 0 ? "no joints" : ShopFormat.count(mass.joints()) + " joints, "
                + ReportFormat.kg(mass.jointsMassKg());
        return new Figure("Kit mass", ReportFormat.kg(mass.totalKg()), barsNote + "; " + jointsNote);
    }

    private static Figure plans(List<CuttingFigures> sections) {
        long optimal = sections.stream().filter(f -> f.plan().status() == Status.OPTIMAL).count();
        long infeasible = sections.stream().filter(f -> f.plan().status() == Status.INFEASIBLE).count();
        double worstGap = sections.stream().filter(f -> f.plan().status() == Status.FEASIBLE)
                .mapToDouble(f -> f.plan().gap() == null ? 0 : f.plan().gap()).max().orElse(0);
        String value = optimal + " of " + sections.size();
        String note;
        if (infeasible > 0) {
            note = infeasible + " section" + (infeasible == 1 ? "" : "s") + " without a plan: see below";
        } else if (optimal == sections.size()) {
            note = "every section proven optimal";
        } else {
            note = "largest gap to the lower bound " + ReportFormat.gap(worstGap);
        }
        return new Figure("Proven optimal", value, note);
    }
}
