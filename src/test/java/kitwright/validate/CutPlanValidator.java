package kitwright.validate;

import java.math.BigDecimal;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.Demand;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.SectionProblem;
import kitwright.cutting.Spare;
import kitwright.cutting.StockOption;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;

/**
 * Re-checks a cutting plan from first principles, independent of the optimiser's code: every pattern fits the saw
 * model, offcuts and their kind are right, every mark is cut as often as demanded (its quantity plus its miscut
 * allowance, then the spares reported), rack
 * and limited stock are not overdrawn, the value is the sum of prices (or lengths), the bound is below the value and
 * the status agrees with the numbers. Throws AssertionError naming the first thing wrong.
 *
 * <p>Saw model (the issue's): a pattern fits when sum(length + kerf) &lt;= L - 2*trim + kerf; piece i starts at
 * trim + sum over earlier pieces of (length + kerf) and must end by the far trim line L - trim; offcut =
 * L - 2*trim - sum(lengths) - n*kerf floored at 0; remnant when positive and at least the minimum remnant length.
 * Fits, starts and offcuts are re-computed in exact decimal arithmetic: every double is read as its shortest
 * decimal form ({@link BigDecimal#valueOf(double)}), so 599.1 is 599.1 and a hundredth over is over.
 */
public final class CutPlanValidator {
    /** Offcuts are reported to a micrometre (the plan's rounding). */
    private static final BigDecimal OFFCUT_ROUNDING = new BigDecimal("0.001");

    private CutPlanValidator() {
    }

    /**
     * Every section of a kit's plan, against the kit's bars and catalog (settings as given in the kit): each mark's
     * demand is its quantity plus the miscut allowance of kit.json, max(piecesPerMark, ceil(percent / 100 x
     * quantity)), worked out here again.
     */
    public static void validate(Kit kit, CutPlan plan) {
        List<String> sections = kit.usedSections();
        check(plan.sections().size() == sections.size(), "one plan per used section: " + sections);
        for (int s = 0; s < sections.size(); s++) {
            String name = sections.get(s);
            SectionCutPlan section = plan.sections().get(s);
            check(section.section().equals(name), "sections in catalog order: expected " + name);
            List<Demand> demands = kit.bars().stream().filter(b -> b.section().equals(name))
                    .map(b -> new Demand(b.mark(), b.lengthMm(), b.quantity() + allowance(kit, b))).toList();
            List<StockOption> stock = kit.catalog().stockFor(name).stream().map(StockOption::of).toList();
            validate(demands, stock, kit.settings().kerfMm(), kit.settings().trimMm(),
                    kit.settings().minRemnantMm(), section);
        }
        Set<String> marks = new HashSet<>();
        for (Bar b : kit.bars()) {
            marks.add(b.mark());
        }
        check(marks.size() == kit.bars().size(), "marks unique in the kit");
    }

    public static void validate(SectionProblem problem, SectionCutPlan plan) {
        validate(problem.demands(), problem.stock(), problem.kerfMm(), problem.trimMm(), problem.minRemnantMm(), plan);
    }

    public static void validate(List<Demand> demands, List<StockOption> stock, double kerf, double trim,
                                double minRemnant, SectionCutPlan plan) {
        String where = "section " + plan.section() + ": ";
        check(plan.kerfMm() == kerf && plan.trimMm() == trim && plan.minRemnantMm() == minRemnant,
                where + "saw settings copied into the plan");
        boolean millPriced = stock.stream().filter(s -> s.origin() == Origin.MILL).allMatch(s -> s.price() != null);
        boolean somePrice = stock.stream().anyMatch(s -> s.price() != null && s.price() > 0);
        String objective = millPriced && somePrice ? "cost" : "length";
        check(objective.equals(plan.objective()), where + "objective " + objective + ", got " + plan.objective());
        check(plan.status() != null, where + "status present");
        if (plan.status() == Status.INFEASIBLE) {
            check(plan.reason() != null && !plan.reason().isBlank(), where + "INFEASIBLE needs a reason");
            check(plan.patterns().isEmpty(), where + "INFEASIBLE has no patterns");
            check(plan.value() == null && plan.lowerBound() == null && plan.gap() == null,
                    where + "INFEASIBLE has no value, bound or gap");
            check(plan.stockPieces() == 0, where + "INFEASIBLE uses no stock");
            return;
        }
        check(plan.reason() == null || (plan.status() == Status.FEASIBLE
                && plan.reason().equals(SectionCutPlan.STOPPED_BY_TIME_LIMIT)), where
                + "reason only when INFEASIBLE, or '" + SectionCutPlan.STOPPED_BY_TIME_LIMIT + "' when FEASIBLE");
        Map<String, Demand> byMark = new HashMap<>();
        for (Demand d : demands) {
            byMark.put(d.mark(), d);
        }
        Map<String, Integer> cut = new HashMap<>();
        Map<String, Integer> used = new HashMap<>();
        double value = 0;
        int pieces = 0;
        for (CutPattern p : plan.patterns()) {
            String at = where + p + ": ";
            check(p.count() >= 1, at + "count at least 1");
            check(!p.cuts().isEmpty(), at + "a pattern cuts something");
            StockOption row = stock.stream()
                    .filter(s -> s.lengthMm() == p.stockLengthMm() && s.origin() == p.origin())
                    .findFirst().orElseThrow(() -> new AssertionError(at + "no such stock row"));
            BigDecimal k = exact(kerf);
            BigDecimal t = exact(trim);
            BigDecimal stockLength = exact(p.stockLengthMm());
            BigDecimal farTrimLine = stockLength.subtract(t);
            BigDecimal start = t;
            BigDecimal lengths = BigDecimal.ZERO;
            int sequence = 0;
            for (Cut c : p.cuts()) {
                sequence++;
                Demand d = byMark.get(c.mark());
                check(d != null, at + "unknown mark " + c.mark());
                check(exact(d.lengthMm()).compareTo(exact(c.lengthMm())) == 0, at + "cut length of " + c.mark()
                        + " is " + c.lengthMm() + ", the mark is " + d.lengthMm());
                BigDecimal end = start.add(exact(c.lengthMm()));
                check(end.compareTo(farTrimLine) <= 0, at + "does not fit: cut " + sequence + " ends at "
                        + end.toPlainString()
                        + ", past the far trim line " + farTrimLine.toPlainString());
                start = end.add(k);
                lengths = lengths.add(exact(c.lengthMm()));
                cut.merge(c.mark(), p.count(), Integer::sum);
            }
            BigDecimal n = BigDecimal.valueOf(p.cuts().size());
            BigDecimal offcut = stockLength.subtract(t.add(t)).subtract(lengths).subtract(n.multiply(k))
                    .max(BigDecimal.ZERO);
            check(offcut.subtract(exact(p.offcutMm())).abs().compareTo(OFFCUT_ROUNDING) < 0
                            && exact(p.offcutMm()).compareTo(offcut) <= 0,
                    at + "offcut should be " + offcut.toPlainString() + " (never more)");
            String kind = p.offcutMm() > 0 && p.offcutMm() >= minRemnant ? "remnant" : "scrap";
            check(kind.equals(p.offcutKind()), at + "offcut kind should be " + kind);
            used.merge(p.stockLengthMm() + "/" + p.origin(), p.count(), Integer::sum);
            double unit = objective.equals("cost") ? (row.price() == null ? 0 : row.price()) : p.stockLengthMm();
            value += unit * p.count();
            pieces += p.count();
        }
        Map<String, Integer> spares = new HashMap<>();
        for (Spare s : plan.spares()) {
            check(byMark.containsKey(s.mark()), where + "spare of unknown mark " + s.mark());
            check(s.count() > 0, where + "spare count positive");
            check(spares.put(s.mark(), s.count()) == null, where + "spares listed once per mark");
        }
        for (Demand d : demands) {
            int expected = d.quantity() + spares.getOrDefault(d.mark(), 0);
            check(cut.getOrDefault(d.mark(), 0) == expected,
                    where + "mark " + d.mark() + " cut " + cut.getOrDefault(d.mark(), 0) + " times, expected "
                            + expected);
        }
        for (Map.Entry<String, Integer> e : used.entrySet()) {
            long limit = 0;
            boolean unlimited = false;
            for (StockOption s : stock) {
                if ((s.lengthMm() + "/" + s.origin()).equals(e.getKey())) {
                    if (s.available() == null) {
                        unlimited = true;
                    } else {
                        limit += s.available();
                    }
                }
            }
            check(unlimited || e.getValue() <= limit, where + "stock " + e.getKey() + " used " + e.getValue()
                    + " times, only " + limit + " available");
        }
        check(plan.stockPieces() == pieces, where + "stockPieces " + plan.stockPieces() + " vs " + pieces);
        check(plan.value() != null && Math.abs(plan.value() - value) <= 1e-9 * Math.max(1, value),
                where + "value " + plan.value() + " should be " + value);
        check(plan.lowerBound() != null && plan.lowerBound() >= 0, where + "lower bound present");
        check(plan.lowerBound() <= plan.value() + 1e-9 * Math.max(1, value), where + "bound above value");
        double gap = plan.value() > 0 ? (plan.value() - plan.lowerBound()) / plan.value() : 0;
        check(plan.gap() != null && Math.abs(plan.gap() - gap) <= 1e-9, where + "gap should be " + gap);
        if (plan.status() == Status.OPTIMAL) {
            check(plan.gap() <= 1e-9, where + "OPTIMAL with a gap");
        } else {
            check(plan.gap() > 0, where + "FEASIBLE with no gap should be OPTIMAL");
        }
    }

    /**
     * Re-checks a saw sheet ({@code cut-list.csv} text) against its plan in exact decimals: one row per cut in the
     * plan's saw order, each starting at trim + sum over earlier pieces of (length + kerf) and ending by the far trim
     * line; the offcut row starts one kerf after the last piece, or at the far trim line when that kerf would pass it,
     * and ends by the far trim line. No row places a cut past the stock end.
     */
    public static void validateCutList(CutPlan plan, String csv) {
        List<org.apache.commons.csv.CSVRecord> rows = rows(csv);
        int row = 0;
        int stockPiece = 0;
        for (SectionCutPlan section : plan.sections()) {
            BigDecimal k = exact(section.kerfMm());
            BigDecimal t = exact(section.trimMm());
            for (CutPattern p : section.patterns()) {
                BigDecimal farTrimLine = exact(p.stockLengthMm()).subtract(t);
                for (int n = 0; n < p.count(); n++) {
                    stockPiece++;
                    BigDecimal start = t;
                    for (int i = 0; i <= p.cuts().size(); i++) {
                        check(row < rows.size(), "cut-list.csv ends before stock piece " + stockPiece);
                        org.apache.commons.csv.CSVRecord r = rows.get(row++);
                        String at = "cut-list.csv row " + (row + 1) + ": ";
                        check(Integer.parseInt(r.get("stock_piece")) == stockPiece, at + "stock piece " + stockPiece);
                        check(new BigDecimal(r.get("stock_length_mm")).compareTo(exact(p.stockLengthMm())) == 0,
                                at + "stock length " + p.stockLengthMm());
                        BigDecimal length = new BigDecimal(r.get("length_mm"));
                        BigDecimal at0 = new BigDecimal(r.get("start_mm"));
                        boolean offcut = i == p.cuts().size();
                        BigDecimal expected = offcut ? start.min(farTrimLine) : start;
                        check(at0.compareTo(expected) == 0, at + "starts at " + at0.toPlainString() + ", expected "
                                + expected.toPlainString());
                        check(at0.add(length).compareTo(farTrimLine) <= 0, at + "ends at "
                                + at0.add(length).toPlainString() + ", past the far trim line "
                                + farTrimLine.toPlainString() + " of the stock piece");
                        if (!offcut) {
                            check(length.compareTo(exact(p.cuts().get(i).lengthMm())) == 0, at + "length of cut");
                            start = at0.add(length).add(k);
                        }
                    }
                }
            }
        }
        check(row == rows.size(), "cut-list.csv has " + (rows.size() - row) + " rows more than the plan");
    }

    /**
     * The miscut allowance of a mark from kit.json's setting: the larger of the pieces per mark and the least whole
     * number of pieces k with 100 k at least percent x quantity, compared in exact decimals.
     */
    static int allowance(Kit kit, Bar bar) {
        kitwright.model.MiscutAllowance setting = kit.settings().miscutAllowance();
        BigDecimal share = exact(setting.percent()).multiply(BigDecimal.valueOf(bar.quantity()));
        int k = 0;
        while (BigDecimal.valueOf(100L * k).compareTo(share) < 0) {
            k++;
        }
        return Math.max(setting.piecesPerMark(), k);
    }

    /**
     * Re-checks the {@code kind} column of a saw sheet ({@code cut-list.csv} text) against the kit: taking each
     * mark's pieces in the sheet's order, the first {@code quantity} are {@code cut}, the next {@code allowance}
     * (the miscut allowance) are {@code allowance}, and the rest {@code spare}; offcut rows are {@code remnant} or
     * {@code scrap}. Each mark's rows add up to what the plan cuts of it.
     */
    public static void validateKinds(Kit kit, CutPlan plan, String csv) {
        List<org.apache.commons.csv.CSVRecord> rows = rows(csv);
        Map<String, Integer> seen = new HashMap<>();
        for (org.apache.commons.csv.CSVRecord r : rows) {
            String kind = r.get("kind");
            String mark = r.get("mark");
            String at = "cut-list.csv line " + (r.getRecordNumber() + 1) + ": ";
            if (mark.isEmpty()) {
                check(kind.equals("remnant") || kind.equals("scrap"), at + "an offcut row is remnant or scrap, not "
                        + kind);
                continue;
            }
            Bar bar = kit.bar(mark).orElseThrow(() -> new AssertionError(at + "unknown mark " + mark));
            int n = seen.merge(mark, 1, Integer::sum);
            String expected = n <= bar.quantity() ? "cut" : n <= bar.quantity() + allowance(kit, bar) ? "allowance"
                    : "spare";
            check(kind.equals(expected), at + "piece " + n + " of mark " + mark + " is " + kind + ", expected "
                    + expected + " (quantity " + bar.quantity() + ", allowance " + allowance(kit, bar) + ")");
        }
        Map<String, Integer> cut = new HashMap<>();
        plan.sections().forEach(s -> s.patterns().forEach(p -> p.cuts()
                .forEach(c -> cut.merge(c.mark(), p.count(), Integer::sum))));
        check(cut.equals(seen), "cut-list.csv pieces per mark " + seen + ", the plan cuts " + cut);
    }

    /** The rows of a saw sheet, by header name (the file's byte-order mark and CRLF checked). */
    private static List<org.apache.commons.csv.CSVRecord> rows(String csv) {
        return CsvOutput.records(csv);
    }

    /** The decimal a double was written as: its shortest decimal form. */
    static BigDecimal exact(double value) {
        return BigDecimal.valueOf(value);
    }

    private static void check(boolean condition, String message) {
        if (!condition) {
            throw new AssertionError(message);
        }
    }
}
