package kitwright.report.labels;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.PieceKind;
import kitwright.cutting.SectionCutPlan;
import kitwright.ids.IdOrder;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import kitwright.packing.CratePlan;
import kitwright.packing.CrateItem;
import kitwright.packing.ItemKind;

/**
 * Every label of a plan: one per cut piece (miscut allowance and spares included, their kind by {@link PieceKind}) and one tag per remnant, in the order of
 * cut-list.csv, so the operator peels them off as the saw works down the list.
 *
 * <p>Pieces of one mark are interchangeable, so the n-th piece of a mark goes into the n-th place for that mark
 * found in the bundles taken in number order (host first, then its guests, depth first); its crate is the one that
 * holds that bundle. The pieces a mark's bundles hold are exactly the pieces cut of it (nesting packs every cut
 * piece), so every label names a bundle; a piece without one prints it blank rather than invent one.
 */
public record LabelSet(List<PieceLabel> pieces, List<RemnantTag> remnants) {
    public LabelSet {
        pieces = List.copyOf(pieces);
        remnants = List.copyOf(remnants);
    }

    /**
     * @param crates the crate plan, or null when crates were not planned (crate fields stay blank)
     */
    public static LabelSet of(Kit kit, CutPlan plan, List<Bundle> bundles, CratePlan crates, String date) {
        Map<String, Deque<String>> places = places(bundles);
        Map<String, String> crateOf = crateOf(crates);
        Map<String, Integer> total = new HashMap<>();
        plan.sections().forEach(s -> s.patterns().forEach(p -> p.cuts()
                .forEach(c -> total.merge(c.mark(), p.count(), Integer::sum))));
        List<PieceLabel> pieces = new ArrayList<>();
        List<RemnantTag> remnants = new ArrayList<>();
        Map<String, Integer> cutSoFar = new HashMap<>();
        int stockPiece = 0;
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern pattern : section.patterns()) {
                for (int n = 0; n < pattern.count(); n++) {
                    stockPiece++;
                    for (Cut cut : pattern.cuts()) {
                        Bar bar = kit.bar(cut.mark()).orElse(null);
                        int made = cutSoFar.merge(cut.mark(), 1, Integer::sum);
                        String kind = PieceKind.of(kit, bar, made).code();
                        Deque<String> free = places.get(cut.mark());
                        String bundle = free == null || free.isEmpty() ? "" : free.removeFirst();
                        pieces.add(new PieceLabel(kind, cut.mark(), section.section(), cut.lengthMm(),
                                bar == null ? null : bar.toleranceMm(), made, total.get(cut.mark()), bundle,
                                crateOf.getOrDefault(bundle, "")));
                    }
                    if ("remnant".equals(pattern.offcutKind()) && pattern.offcutMm() > 0) {
                        remnants.add(new RemnantTag(section.section(), pattern.offcutMm(), stockPiece, date,
                                kit.name()));
                    }
                }
            }
        }
        return new LabelSet(pieces, remnants);
    }

    /** Per mark, one bundle id per tube of that mark, bundles in number order. */
    private static Map<String, Deque<String>> places(List<Bundle> bundles) {
        Map<String, Deque<String>> places = new HashMap<>();
        bundles.stream().sorted(Comparator.comparing(Bundle::id, IdOrder.NUMBER_ORDER))
                .forEach(b -> addTubes(b.id(), b.host(), places));
        return places;
    }

    private static void addTubes(String bundle, NestedTube tube, Map<String, Deque<String>> places) {
        places.computeIfAbsent(tube.mark(), m -> new ArrayDeque<>()).addLast(bundle);
        tube.guests().forEach(g -> addTubes(bundle, g, places));
    }

    private static Map<String, String> crateOf(CratePlan crates) {
        Map<String, String> crateOf = new HashMap<>();
        if (crates != null) {
            crates.crates().forEach(c -> c.items(ItemKind.BUNDLE).stream().map(CrateItem::ref)
                    .forEach(ref -> crateOf.put(ref, c.id())));
        }
        return crateOf;
    }
}
