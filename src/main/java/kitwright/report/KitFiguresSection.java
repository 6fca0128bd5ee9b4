package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import kitwright.metrics.KitMetrics;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.SparesPolicy;
import kitwright.spares.MarkSpares;
import kitwright.spares.ServiceLifeSpares;
import kitwright.spares.SparesOutcome;
import kitwright.spares.SparesSupply;

/**
 * The report block "Kit figures and service-life spares": embodied carbon of the stock bought (bought mass x the
 * material's factor, with the factor's source from materials.csv) beside the kit's own mass, the reuse ratio
 * (members in all structures / bars in the kit), and, when kit.json sets a {@code spares} policy, the spares per
 * mark (bars in service, bar-cycles, expected losses, spares needed, where they came from), the
 * policy with its per-mark level and the independence assumption, and the extra stock cost. Without a policy, one
 * line says how to set one. Add it with {@code ReportModel.builder(...).section(KitFiguresSection.of(...))}.
 *
 * <p>Pure function of the kit, its figures and its spares; numbers through {@link ShopFormat}.
 */
public final class KitFiguresSection {
    public static final String ID = "kit-figures";
    public static final String TITLE = "Kit figures and service-life spares";
    /** The policy the no-policy line suggests, as it would be written in kit.json. */
    static final String EXAMPLE_POLICY = "\"spares\": {\"lossRatePerCycle\": 0.01, \"cycles\": 10,"
            + " \"serviceLevel\": 0.95}";

    record Figure(String label, String value, String note) {
    }

    /** Embodied carbon of one material. */
    record CarbonRow(String material, String boughtMass, String factor, String co2e, String source) {
    }

    /** Spares of one mark. */
    record SparesRow(String mark, String section, String bars, String barCycles, String expectedLosses,
                     String coverage, String needed, String inKit, String fromOffcuts, String bought,
                     String missing) {
    }

    /** The policy and the figures around the spares table. */
    record Spares(String lossRate, String cycles, String serviceLevel, String marksInService,
                  String perMarkLevel, String kitLevel, List<SparesRow> rows, SparesRow total, String extraCost,
                  String replans, String missing) {
    }

    record View(List<Figure> figures, boolean carbonKnown, List<CarbonRow> carbon, CarbonRow carbonTotal,
                String members, String bars, String reuseRatio, boolean structures, boolean stockHoldsBars,
                String usedStock, String barsMass, Spares spares,
                String examplePolicy) {
    }

    private KitFiguresSection() {
    }

    /**
     * @param figures the kit's figures over the final cutting plan
     * @param spares  the service-life spares, or null when kit.json has no policy
     */
    public static ReportSection of(Kit kit, KitMetrics figures, SparesOutcome spares) {
        List<Figure> top = new ArrayList<>();
        top.add(new Figure("Embodied carbon", figures.co2eKg() == null ? ShopFormat.UNKNOWN
                : ReportFormat.kg(figures.co2eKg()) + "\u00A0CO\u2082e",
                figures.co2eKg() == null ? "no materials file" : "stock bought \u00D7 the material's factor"));
        top.add(new Figure("Stock bought", ReportFormat.kg(figures.boughtMassKg()),
                ShopFormat.count(figures.boughtPieces()) + " mill pieces, "
                        + ShopFormat.metres(figures.boughtLengthMm()) + "\u00A0m"));
        top.add(new Figure("Stock used", ReportFormat.kg(figures.usedStockMassKg()),
                ShopFormat.count(figures.stockPieces()) + " pieces: mill stock bought and rack offcuts taken"));
        top.add(new Figure("Kit mass with joints", ReportFormat.kg(figures.kitMassKg()),
                "every bar, miscut allowance and spares cut included, and the joints"));
        allowance(kit).ifPresent(top::add);
        top.add(figures.reuseRatio() == null ? new Figure("Reuse ratio", "none", "no structures.csv")
                : new Figure("Reuse ratio", reuseRatio(figures), ShopFormat.count(figures.members())
                        + " members / " + ShopFormat.count(figures.bars()) + " bars"));
        List<CarbonRow> carbon = figures.carbon().stream().map(c -> new CarbonRow(c.material(),
                ShopFormat.kg(c.boughtMassKg()), ShopFormat.decimal(c.co2eKgPerKg(), 3, false),
                ShopFormat.kg(c.co2eKg()), c.source())).toList();
        CarbonRow carbonTotal = figures.co2eKg() == null ? null : new CarbonRow("All materials",
                ShopFormat.kg(figures.boughtMassKg()), "", ShopFormat.kg(figures.co2eKg()), "");
        double jointsMass = kit.joints().stream().mapToDouble(j -> j.massKg() * j.quantity()).sum();
        Double barsMass = figures.kitMassKg() == null ? null : figures.kitMassKg() - jointsMass;
        boolean stockHoldsBars = barsMass != null && figures.usedStockMassKg() != null
                && figures.usedStockMassKg() >= barsMass;
        View view = new View(List.copyOf(top), figures.co2eKg() != null && !carbon.isEmpty(), carbon, carbonTotal,
                figures.members() == null ? "" : ShopFormat.count(figures.members()), ShopFormat.count(figures.bars()),
                reuseRatio(figures), figures.reuseRatio() != null, stockHoldsBars,
                ReportFormat.kg(figures.usedStockMassKg()), ReportFormat.kg(barsMass),
                spares == null ? null : spares(kit, spares), EXAMPLE_POLICY);
        return new ReportSection(ID, TITLE, "kit-figures", view);
    }

    private static Spares spares(Kit kit, SparesOutcome outcome) {
        SparesPolicy policy = outcome.sizing().policy();
        List<SparesRow> rows = new ArrayList<>();
        int bars = 0;
        long barCycles = 0;
        int needed = 0;
        int inKit = 0;
        int marksInService = 0;
        for (MarkSpares m : outcome.sizing().marks()) {
            SparesSupply s = outcome.supply(m.mark());
            rows.add(new SparesRow(m.mark(), section(kit, m.mark()), ShopFormat.count(m.bars()),
                    ShopFormat.count(m.barCycles()), ShopFormat.decimal(m.expectedLosses(), 2, true),
                    percent(m.coverage()),
                    ShopFormat.count(m.spares()), ShopFormat.count(m.alreadyInKit()),
                    ShopFormat.count(s.fromOffcuts()), ShopFormat.count(s.bought()), ShopFormat.count(s.missing())));
            bars += m.bars();
            barCycles += m.barCycles();
            needed += m.spares();
            inKit += m.alreadyInKit();
            marksInService += m.bars() > 0 ? 1 : 0;
        }
        SparesRow total = new SparesRow("All marks", "", ShopFormat.count(bars), ShopFormat.count(barCycles),
                ShopFormat.decimal(outcome.sizing().totalExpectedLosses(), 2, true), percent(outcome.sizing()
                .kitLevel()), ShopFormat.count(needed), ShopFormat.count(inKit),
                ShopFormat.count(outcome.fromOffcuts()), ShopFormat.count(outcome.bought()),
                ShopFormat.count(outcome.missing()));
        double perMarkLevel = ServiceLifeSpares.perMarkLevel(policy.serviceLevel(), marksInService);
        return new Spares(percent(policy.lossRatePerCycle()), ShopFormat.count(policy.cycles()),
                percent(policy.serviceLevel()), ShopFormat.count(marksInService), percent(perMarkLevel),
                percent(outcome.sizing().kitLevel()), rows, total, ReportFormat.money(outcome.extraCost()),
                outcome.rounds() == 1 ? "once" : ShopFormat.count(outcome.rounds()) + " times",
                outcome.missing() == 0 ? null
                : ShopFormat.count(outcome.missing()));
    }

    /**
     * The miscut allowance of kit.json, when it adds pieces: how many of the pieces the order buys stock for are
     * extra pieces for saw errors rather than the kit's bars, by mark.
     */
    private static Optional<Figure> allowance(Kit kit) {
        return allowancePieces(kit).map(pieces -> new Figure("Miscut allowance", pieces, "cut beyond the kit's"
                + " bars for saw errors, the order buys stock for them and they ship with the kit (labels and"
                + " cut-list kind \u201Callowance\u201D): " + allowanceByMark(kit)));
    }

    /** "5 pieces": the kit's miscut allowance pieces, or empty when it has none. */
    static Optional<String> allowancePieces(Kit kit) {
        int total = kit.bars().stream().mapToInt(kit::allowance).sum();
        return total == 0 ? Optional.empty()
                : Optional.of(ShopFormat.count(total) + " piece" + (total == 1 ? "" : "s"));
    }

    /** "K1 × 1, K2 × 2": the miscut allowance pieces of each mark that has some, in the kit's order. */
    static String allowanceByMark(Kit kit) {
        return kit.bars().stream().filter(b -> kit.allowance(b) > 0)
                .map(b -> b.mark() + " \u00D7\u2009" + kit.allowance(b)).collect(Collectors.joining(", "));
    }

    /** The reuse ratio to two decimals, or "none" without structures.csv. */
    private static String reuseRatio(KitMetrics figures) {
        return figures.reuseRatio() == null ? "none" : ShopFormat.decimal(figures.reuseRatio(), 2, true);
    }

    /** A probability in percent to three decimals at most: 0.0956179 gives "9.562 %". */
    static String percent(double probability) {
        return ShopFormat.decimal(probability * 100.0, 3, false) + "\u00A0%";
    }

    private static String section(Kit kit, String mark) {
        return kit.bars().stream().filter(b -> b.mark().equals(mark)).map(Bar::section).findFirst().orElse("");
    }
}
