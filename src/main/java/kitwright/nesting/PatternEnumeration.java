package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;

/**
 * Every pattern of a small kit: for each host type, every multiset of guest types that some {@link HostLoad} layout
 * carries (checked exactly by {@link SegmentPacker}). A multiset that does not fit has no superset that fits, so
 * the enumeration stops adding a type at its first failure. With all patterns at hand, the integer phase over them
 * is the exact pattern model of the channel layouts and an OPTIMAL answer from CP-SAT is a proof.
 */
final class PatternEnumeration {
    private PatternEnumeration() {
    }

    /**
     * All non-empty patterns, or null when there are more than {@code maxPatterns}, some pattern would carry more
     * than {@code maxGuests} guests, or the layout searches spend {@code work} (too many to be sure the enumeration
     * is complete and quick).
     */
    static List<Pattern> all(NestingProblem problem, List<TubeType> types, PatternPricing pricing, int maxPatterns,
                             int maxGuests, LayoutSearchWork work) {
        List<Pattern> out = new ArrayList<>();
        for (int h : pricing.hostTypes()) {
            List<Integer> guestTypes = pricing.guestsOf(h);
            int[] counts = new int[types.size()];
            if (!extend(problem, types, h, guestTypes, 0, counts, new ArrayList<>(), out, maxPatterns, maxGuests,
                    work) || work.stopped()) {
                return null;
            }
        }
        return out;
    }

    private static boolean extend(NestingProblem problem, List<TubeType> types, int host, List<Integer> guestTypes,
                                  int position, int[] counts, List<Tube> guests, List<Pattern> out,
                                  int maxPatterns, int maxGuests, LayoutSearchWork work) {
        if (position == guestTypes.size()) {
            return true;
        }
        int type = guestTypes.get(position);
        TubeType guestType = types.get(type);
        int added = 0;
        boolean ok = extend(problem, types, host, guestTypes, position + 1, counts, guests, out, maxPatterns,
                maxGuests, work);
        while (ok && added < guestType.count()) {
            guests.add(guestType.sample());
            counts[type]++;
            added++;
            List<Pattern.Segment> layout = layout(problem, types, host, counts, guests, work);
            if (work.stopped()) {
                ok = false;
                break;
            }
            if (layout == null) {
                break;
            }
            if (guests.size() > maxGuests || out.size() >= maxPatterns) {
                ok = false;
                break;
            }
            out.add(new Pattern(host, TypeCounts.of(counts), layout));
            ok = extend(problem, types, host, guestTypes, position + 1, counts, guests, out, maxPatterns, maxGuests,
                    work);
        }
        for (int i = 0; i < added; i++) {
            guests.remove(guests.size() - 1);
        }
        counts[type] -= added;
        return ok;
    }

    private static List<Pattern.Segment> layout(NestingProblem problem, List<TubeType> types, int host, int[] counts,
                                                List<Tube> guests, LayoutSearchWork work) {
        Tube h = types.get(host).sample();
        double usable = problem.usableLengthMm(h);
        double inner = problem.innerDiameterMm(h);
        HostLoad shape = new HostLoad(usable, inner);
        double rows = 0;
        for (int t = 0; t < counts.length; t++) {
            if (counts[t] > 0) {
                Tube g = types.get(t).sample();
                rows += counts[t] * g.lengthMm() / shape.mostChannels(g.outerDiameterMm());
            }
        }
        if (rows > usable + 1e-9) {
            return null; // the lanes cannot hold this much length
        }
        int[] typeOfGuest = new int[guests.size()];
        int i = 0;
        for (int t = 0; t < counts.length; t++) {
            for (int c = 0; c < counts[t]; c++) {
                typeOfGuest[i++] = t;
            }
        }
        List<Tube> ordered = new ArrayList<>();
        for (int t = 0; t < counts.length; t++) {
            for (int c = 0; c < counts[t]; c++) {
                ordered.add(types.get(t).sample());
            }
        }
        return SegmentPacker.pack(inner, usable, ordered, typeOfGuest, work);
    }
}
