package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.PieceKind;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;

/**
 * Saw sheets: per section, a legend of its marks and one card per distinct saw pattern with the drawing
 * ({@link SawSheetDrawing}) and the cut list the saw operator works down (sequence, mark, length and tolerance,
 * start and end measured from the stock piece's left end). Identical patterns listed apart in the plan are
 * merged and their counts added. Each section starts a new page in print, on a named page (CSS Paged Media,
 * {@code page} property) whose running header names the section, so a continuation page still says which tube it
 * is for; every pattern's heading names the section too.
 */
final class SawSheetSection {
    static final String ID = "saw-sheets";

    record LegendItem(String mark, String swatch, String length, String tolerance, String quantity, String cut) {
    }

    /**
     * Consecutive equal pieces (same mark and length) as one line: "cuts 3–14, D4, 275 mm, 12 pieces, from the
     * start of the first to the end of the last", the way a saw operator sets the stop once and cuts the run.
     */
    record CutRow(String sequence, String mark, String length, String tolerance, String pieces, String start,
                  String end) {
    }

    /**
     * One distinct pattern.
     *
     * @param ticks one box per stock piece to tick off as it is cut (empty above {@link #MAX_TICKS} pieces)
     */
    record PatternCard(String id, String number, String section, String stock, String origin, String count,
                       String pieces, String svg, List<CutColumn> cutColumns, List<StopChunk> stopChunks,
                       String offcut, String offcutClass, List<Integer> ticks, boolean tallyLine) {
    }

    /** Cut rows shown side by side in columns of at most {@link #ROWS_PER_COLUMN}, so long patterns stay short. */
    record CutColumn(List<CutRow> rows) {
    }

    /**
     * A stop the operator sets, in saw order: the saw line's number, its distance from the stock piece's left end
     * ({@link SawLayout.SawLine}) and what the cut frees.
     */
    record StopRow(String number, String stop, String frees) {
    }

    /**
     * Stops laid out left to right as the saw lines lie in the drawing, at most {@link #STOPS_PER_ROW} to a table.
     */
    record StopChunk(List<StopRow> stops) {
    }

    static final int STOPS_PER_ROW = 14;

    static final int ROWS_PER_COLUMN = 6;
    static final int MAX_COLUMNS = 3;

    /** Above this many stock pieces a pattern gets a tally line instead of tick boxes. */
    static final int MAX_TICKS = 60;

    record SawSection(String id, String section, String description, String settings, String status,
                      String statusClass, String reason, List<LegendItem> legend, String key,
                      List<PatternCard> patterns, String totals, String spares, String pageName,
                      String runningHeader) {
    }

    record View(String kitName, String date, List<SawSection> sections) {
        /** The print rules of the named pages: each section on pages of its own, headed with its name. */
        String pageRules() {
            StringBuilder rules = new StringBuilder();
            for (SawSection s : sections) {
                rules.append('#').append(s.id()).append(" { page: ").append(s.pageName()).append("; }\n@page ")
                        .append(s.pageName()).append(" { @top-left { content: ").append(s.runningHeader())
                        .append("; } }\n");
            }
            return rules.toString();
        }
    }

    private SawSheetSection() {
    }

    static ReportSection of(Kit kit, List<SectionCutPlan> plans, String date) {
        List<SawSection> sections = new ArrayList<>();
        for (int i = 0; i < plans.size(); i++) {
            sections.add(section(kit, plans.get(i), i + 1, palette(kit, plans.get(i)), date));
        }
        return new ReportSection(ID, "Saw sheets", "saw-sheets",
                new View(kit.name(), date, List.copyOf(sections)));
    }

    /**
     * Colours for one section: the kit's palette ({@link MarkPalette#of(Kit)}, the colours of the bundle and crate
     * drawings too), extended by any mark the plan cuts that the kit does not list. The legend lists the marks of
     * this section only.
     */
    static MarkPalette palette(Kit kit, SectionCutPlan plan) {
        List<String> cut = new ArrayList<>();
        plan.patterns().forEach(p -> p.cuts().forEach(c -> cut.add(c.mark())));
        return MarkPalette.of(kit).with(cut);
    }

    /** Patterns with the same stock, origin, cuts and offcut, merged in first-seen order with counts added. */
    static List<CutPattern> distinct(List<CutPattern> patterns) {
        Map<List<Object>, CutPattern> merged = new LinkedHashMap<>();
        for (CutPattern p : patterns) {
            List<Object> key = List.of(p.stockLengthMm(), p.origin(), p.cuts(), p.offcutMm(), p.offcutKind());
            merged.merge(key, p, (a, b) -> new CutPattern(a.stockLengthMm(), a.origin(), a.count() + b.count(),
                    a.cuts(), a.offcutMm(), a.offcutKind()));
        }
        return List.copyOf(merged.values());
    }

    private static SawSection section(Kit kit, SectionCutPlan plan, int index, MarkPalette palette,
                                      String date) {
        List<CutPattern> patterns = distinct(plan.patterns());
        double scale = patterns.stream().mapToDouble(CutPattern::stockLengthMm).max().orElse(1);
        List<PatternCard> cards = new ArrayList<>();
        for (int j = 0; j < patterns.size(); j++) {
            cards.add(card(kit, plan, patterns.get(j), "s" + index + "-p" + (j + 1), j + 1, scale, palette));
        }
        String settings = "kerf " + ShopFormat.sawMmUnit(plan.kerfMm()) + " \u00B7 end trim "
                + ShopFormat.sawMmUnit(plan.trimMm()) + " each end \u00B7 remnant from "
                + ShopFormat.mmUnit(plan.minRemnantMm());
        int pieces = patterns.stream().mapToInt(CutPattern::count).sum();
        String totals = ShopFormat.count(pieces) + " stock piece" + (pieces == 1 ? "" : "s") + " in "
                + patterns.size() + " pattern" + (patterns.size() == 1 ? "" : "s");
        Map<String, Integer> allowance = PieceKind.counts(kit, plan, PieceKind.ALLOWANCE);
        String allowanceText = allowance.isEmpty() ? null : "Miscut allowance cut beyond the kit: "
                + allowance.entrySet().stream().map(a -> a.getKey() + " \u00D7\u2009" + a.getValue())
                .collect(Collectors.joining(", "));
        String sparesText = plan.spares().isEmpty() ? null : "Spares cut beyond the kit: " + plan.spares().stream()
                .map(s -> s.mark() + " \u00D7\u2009" + s.count()).collect(Collectors.joining(", "));
        String spares = Stream.of(allowanceText, sparesText).filter(Objects::nonNull)
                .reduce((x, y) -> x + ". " + y).orElse(null);
        return new SawSection("saw-" + index, plan.section(), description(kit, plan.section()), settings,
                ReportFormat.status(plan), ReportFormat.statusClass(plan.status()),
                plan.status() == Status.INFEASIBLE ? plan.reason() : null, legend(kit, plan, palette),
                Swatches.key(), List.copyOf(cards), totals, spares, "saw-sheet-" + index,
                HtmlReport.cssString(kit.name() + " \u00B7 saw sheet \u00B7 " + plan.section() + " \u00B7 " + date));
    }

    private static String description(Kit kit, String section) {
        return kit.catalog().section(section).map(s -> "tube \u00D8\u2009" + ShopFormat.mm(s.outerDiameterMm())
                + " \u00D7 " + ShopFormat.mm(s.wallMm()) + " mm, " + s.material()).orElse("");
    }

    private static PatternCard card(Kit kit, SectionCutPlan plan, CutPattern p, String id, int number,
                                    double scale, MarkPalette palette) {
        String stock = ShopFormat.sawMmUnit(p.stockLengthMm());
        String origin = p.origin() == Origin.RACK ? "rack offcut" : "mill stock";
        String offcut = p.offcutMm() <= 0 ? "no offcut"
                : p.offcutKind() + " " + ShopFormat.sawMmUnit(p.offcutMm())
                + ("remnant".equals(p.offcutKind()) ? ": back to the rack" : ": to the scrap bin");
        String title = "Pattern " + number + " of " + plan.section() + ": " + stock + " " + origin + ", "
                + p.count() + " times; cuts " + p.cuts().stream()
                .map(c -> c.mark() + " " + ShopFormat.sawMmUnit(c.lengthMm())).collect(Collectors.joining(", "))
                + "; " + offcut;
        SawSheetDrawing.Tube tube = kit.catalog().section(plan.section())
                .filter(s -> s.wallMm() > 0 && 2 * s.wallMm() <= s.outerDiameterMm())
                .map(s -> new SawSheetDrawing.Tube(s.outerDiameterMm(), s.wallMm())).orElse(null);
        String svg = SawSheetDrawing.draw(id, title, p, plan.kerfMm(), plan.trimMm(), scale, palette, tube);
        SawLayout layout = SawLayout.of(p, plan.kerfMm(), plan.trimMm());
        List<CutColumn> columns = columns(cutRows(kit, layout.pieces())).stream().map(CutColumn::new).toList();
        List<StopRow> stopRows = layout.sawLines().stream().map(l -> new StopRow(String.valueOf(l.number()),
                ShopFormat.sawMm(l.stopMm()), l.frees())).toList();
        int chunks = Math.max(1, (stopRows.size() + STOPS_PER_ROW - 1) / STOPS_PER_ROW);
        int perChunk = Math.max(1, (stopRows.size() + chunks - 1) / chunks);
        List<StopChunk> stops = new ArrayList<>();
        for (int from = 0; from < stopRows.size(); from += perChunk) {
            stops.add(new StopChunk(List.copyOf(stopRows.subList(from, Math.min(stopRows.size(), from + perChunk)))));
        }
        List<Integer> ticks = p.count() > MAX_TICKS ? List.of()
                : java.util.stream.IntStream.rangeClosed(1, p.count()).boxed().toList();
        return new PatternCard(id, String.valueOf(number), plan.section(), stock, origin, countText(p.count()),
                ShopFormat.count(p.count()), svg, columns, stops, offcut,
                p.offcutMm() <= 0 ? "none" : p.offcutKind(), ticks, ticks.isEmpty());
    }

    /** How many stock pieces to cut to a pattern, in words: "cut 12 stock pieces like this". */
    static String countText(int count) {
        return "cut " + ShopFormat.count(count) + " stock piece" + (count == 1 ? "" : "s") + " like this";
    }

    /** Rows in up to {@link #MAX_COLUMNS} columns of about {@link #ROWS_PER_COLUMN}, the first the longest. */
    private static <T> List<List<T>> columns(List<T> rows) {
        int columnCount = rows.size() <= ROWS_PER_COLUMN + 2 ? 1
                : Math.min(MAX_COLUMNS, (rows.size() + ROWS_PER_COLUMN - 1) / ROWS_PER_COLUMN);
        int perColumn = Math.max(1, (rows.size() + columnCount - 1) / columnCount);
        List<List<T>> columns = new ArrayList<>();
        for (int from = 0; from < rows.size(); from += perColumn) {
            columns.add(List.copyOf(rows.subList(from, Math.min(rows.size(), from + perColumn))));
        }
        return List.copyOf(columns);
    }

    /** The cut list with runs of equal pieces on one line each. */
    static List<CutRow> cutRows(Kit kit, List<SawLayout.Segment> pieces) {
        List<CutRow> rows = new ArrayList<>();
        int i = 0;
        while (i < pieces.size()) {
            SawLayout.Segment first = pieces.get(i);
            int j = i;
            while (j + 1 < pieces.size() && pieces.get(j + 1).mark().equals(first.mark())
                    && pieces.get(j + 1).lengthMm() == first.lengthMm()) {
                j++;
            }
            SawLayout.Segment last = pieces.get(j);
            String sequence = i == j ? String.valueOf(first.sequence())
                    : first.sequence() + "\u2013" + last.sequence();
            rows.add(new CutRow(sequence, first.mark(), ShopFormat.sawMm(first.lengthMm()),
                    tolerance(kit, first.mark()),
                    ShopFormat.count(j - i + 1), ShopFormat.sawMm(first.startMm()),
                    ShopFormat.sawMm(last.endMm())));
            i = j + 1;
        }
        return List.copyOf(rows);
    }

    private static String tolerance(Kit kit, String mark) {
        return kit.bar(mark).map(Bar::toleranceMm).map(t -> "\u00B1\u2009" + ShopFormat.mm(t))
                .orElse(ShopFormat.UNKNOWN);
    }

    /** Every mark of the section (the kit's and any the plan cuts), in palette order, with pieces cut. */
    private static List<LegendItem> legend(Kit kit, SectionCutPlan plan, MarkPalette palette) {
        Map<String, Integer> cut = new LinkedHashMap<>();
        Map<String, Double> lengths = new LinkedHashMap<>();
        for (CutPattern p : plan.patterns()) {
            for (Cut c : p.cuts()) {
                cut.merge(c.mark(), p.count(), Integer::sum);
                lengths.putIfAbsent(c.mark(), c.lengthMm());
            }
        }
        List<LegendItem> items = new ArrayList<>();
        for (String mark : palette.marks()) {
            Bar bar = kit.bar(mark).orElse(null);
            if (bar != null ? !bar.section().equals(plan.section()) : !cut.containsKey(mark)) {
                continue; // the palette is the kit's; the legend is this section's
            }
            double length = bar != null ? bar.lengthMm() : lengths.getOrDefault(mark, 0.0);
            items.add(new LegendItem(mark, Swatches.mark(palette.fill(mark)), ShopFormat.sawMm(length),
                    tolerance(kit, mark), bar == null ? ShopFormat.UNKNOWN : ShopFormat.count(bar.quantity()),
                    ShopFormat.count(cut.getOrDefault(mark, 0))));
        }
        return List.copyOf(items);
    }
}
