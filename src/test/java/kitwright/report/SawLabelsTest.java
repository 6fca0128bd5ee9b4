package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.model.Origin;
import org.junit.jupiter.api.Test;

/**
 * Every piece and offcut of a drawing is named in text (so greyscale print loses nothing), and no two callouts in
 * a row overlap, over many random patterns (fixed seed) with short and long pieces mixed.
 */
class SawLabelsTest {
    private static final double SPAN = SawSheetDrawing.WIDTH - SawSheetDrawing.LEFT - SawSheetDrawing.RIGHT;

    private static CutPattern randomPattern(Random random) {
        double stock = random.nextBoolean() ? 6000 : 12000;
        List<Cut> cuts = new ArrayList<>();
        double used = 0;
        String[] marks = {"A", "B12", "C-3", "LONGMARK7", "E"};
        while (true) {
            double length = random.nextInt(4) == 0 ? 60 + random.nextInt(300) : 300 + random.nextInt(2500);
            String mark = marks[random.nextInt(marks.length)];
            int repeat = 1 + random.nextInt(6);
            boolean added = false;
            for (int r = 0; r < repeat && used + length + 2 <= stock - 10 + 2; r++) {
                cuts.add(new Cut(mark, length));
                used += length + 2;
                added = true;
            }
            if (!added) {
                break;
            }
        }
        double offcut = Math.max(0, stock - 10 - used);
        return new CutPattern(stock, Origin.MILL, 1, cuts, offcut, offcut >= 500 ? "remnant" : "scrap");
    }

    @Test
    void everyPieceIsNamedAndNoCalloutsOverlap() {
        Random random = new Random(20250314L);
        for (int n = 0; n < 300; n++) {
            CutPattern pattern = randomPattern(random);
            SawLayout layout = SawLayout.of(pattern, 2, 5);
            double scale = SPAN / 12000;
            SawLabels labels = SawLabels.of(layout, pattern, scale, SawSheetDrawing.LEFT, SawSheetDrawing.WIDTH);
            List<String> texts = new ArrayList<>();
            labels.inside().forEach(l -> texts.add(l.first() + " " + l.second()));
            labels.callouts().forEach(c -> texts.add(c.text()));
            String all = String.join(" | ", texts);
            // each piece is covered by exactly one label: inside, a run label, or a callout
            int named = 0;
            for (SawLabels.Inside l : labels.inside()) {
                named += l.second() != null ? 1 : Integer.parseInt(l.first().split(" ")[0]);
            }
            for (SawLabels.Callout c : labels.callouts()) {
                if (!c.text().startsWith("remnant") && !c.text().startsWith("scrap") && !c.text().startsWith("trim")) {
                    named += c.toX() > c.fromX() ? Integer.parseInt(c.text().split(" ")[0]) : 1;
                }
            }
            assertThat(named).as("pieces named in pattern %d: %s", n, all).isEqualTo(pattern.cuts().size());
            for (Cut cut : pattern.cuts()) {
                assertThat(all).contains(cut.mark()).contains(ShopFormat.mm(cut.lengthMm()));
            }
            // both end trims are named in words, at the two ends
            assertThat(labels.callouts()).filteredOn(c -> c.text().equals("trim 5"))
                    .extracting(SawLabels.Callout::fromX).as("trim callouts in pattern %d", n)
                    .containsExactly(SawSheetDrawing.LEFT, SawSheetDrawing.LEFT + pattern.stockLengthMm() * scale);
            String offcutText = SawLabels.offcutText(pattern);
            boolean offcutInside = pattern.offcutMm() * scale >= SawLabels.textWidth(offcutText, SawLabels.FONT) + 10;
            if (pattern.offcutMm() > 0 && !offcutInside) {
                assertThat(texts).contains(offcutText);
            }
            for (int row = 0; row < labels.rows(); row++) {
                int r = row;
                List<SawLabels.Callout> inRow = labels.callouts().stream().filter(c -> c.row() == r)
                        .sorted(Comparator.comparingDouble(SawLabels.Callout::centreX)).toList();
                for (int i = 1; i < inRow.size(); i++) {
                    SawLabels.Callout a = inRow.get(i - 1);
                    SawLabels.Callout b = inRow.get(i);
                    double gap = (b.centreX() - SawLabels.textWidth(b.text(), SawLabels.CALLOUT_FONT) / 2)
                            - (a.centreX() + SawLabels.textWidth(a.text(), SawLabels.CALLOUT_FONT) / 2);
                    assertThat(gap).as("gap between callouts in pattern %d", n).isGreaterThanOrEqualTo(0);
                }
                for (SawLabels.Callout c : inRow) {
                    double half = SawLabels.textWidth(c.text(), SawLabels.CALLOUT_FONT) / 2;
                    assertThat(c.centreX() - half).isGreaterThanOrEqualTo(0);
                    assertThat(c.centreX() + half).isLessThanOrEqualTo(SawSheetDrawing.WIDTH);
                }
            }
        }
    }

    @Test
    void aRunOfEqualNarrowPiecesGetsOneLabel() {
        List<Cut> cuts = new ArrayList<>();
        for (int i = 0; i < 30; i++) {
            cuts.add(new Cut("D4", 275));
        }
        CutPattern p = new CutPattern(12000, Origin.MILL, 1, cuts, 12000 - 10 - 30 * 277, "remnant");
        SawLayout layout = SawLayout.of(p, 2, 5);
        SawLabels labels = SawLabels.of(layout, p, SPAN / 12000, SawSheetDrawing.LEFT, SawSheetDrawing.WIDTH);
        assertThat(labels.inside()).extracting(SawLabels.Inside::first).containsExactly("30 \u00D7 D4 \u00B7 275");
        // nothing but the two end trims is called out
        assertThat(labels.callouts()).extracting(SawLabels.Callout::text).containsExactly("trim 5", "trim 5");
    }
}
