package kitwright.report.cutting;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.PieceKind;
import kitwright.cutting.SawArithmetic;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;

/**
 * The saw sheet, {@code cut-list.csv}: one row per piece to cut, in saw order, and one row per stock piece for its
 * offcut. Stock pieces are numbered 1, 2, ... through the whole kit. A piece starts at
 * {@code trim + sum over earlier pieces of (length + kerf)}; the offcut starts after the last piece's kerf, or on
 * the far trim line when that kerf would pass it (no row ever starts past the stock end). Positions are summed in
 * exact decimals ({@link SawArithmetic}).
 * {@code kind} is {@code cut}, {@code allowance} (a miscut allowance piece), {@code spare} (a bar beyond the kit's
 * quantity and allowance of its mark; {@link PieceKind} decides), {@code remnant} or {@code scrap}.
 */
public final class CutListCsv {
    public static final List<String> HEADER = List.of("stock_piece", "section", "stock_length_mm", "origin",
            "sequence", "kind", "mark", "length_mm", "tolerance_mm", "start_mm");

    private CutListCsv() {
    }

    public static String format(Kit kit, CutPlan plan) {
        Map<String, Bar> bars = new HashMap<>();
        kit.bars().forEach(b -> bars.put(b.mark(), b));
        Map<String, Integer> cutSoFar = new HashMap<>();
        List<List<Object>> rows = new ArrayList<>();
        int stockPiece = 0;
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern pattern : section.patterns()) {
                for (int n = 0; n < pattern.count(); n++) {
                    stockPiece++;
                    List<Double> starts = SawArithmetic.starts(section.kerfMm(), section.trimMm(), pattern.cuts());
                    int sequence = 0;
                    for (Cut cut : pattern.cuts()) {
                        Bar bar = bars.get(cut.mark());
                        int made = cutSoFar.merge(cut.mark(), 1, Integer::sum);
                        String kind = PieceKind.of(kit, bar, made).code();
                        rows.add(List.of(stockPiece, section.section(), pattern.stockLengthMm(),
                                pattern.origin().code(), ++sequence, kind, cut.mark(), cut.lengthMm(),
                                bar == null || bar.toleranceMm() == null ? "" : bar.toleranceMm(),
                                starts.get(sequence - 1)));
                    }
                    rows.add(List.of(stockPiece, section.section(), pattern.stockLengthMm(),
                            pattern.origin().code(), ++sequence, pattern.offcutKind(), "", pattern.offcutMm(), "",
                            SawArithmetic.offcutStart(section.kerfMm(), section.trimMm(), pattern.stockLengthMm(),
                                    pattern.cuts())));
                }
            }
        }
        return CsvText.of(HEADER, rows);
    }
}
