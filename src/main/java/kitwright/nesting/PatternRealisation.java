package kitwright.nesting;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns pattern counts into tubes in tubes. Each host type's tubes take the chosen patterns in column order (the
 * rest stay empty); then, widest host first, every slot of a pattern takes the next free tube of its type. Guests
 * are narrower than their hosts, so this never closes a loop, and a type's slots never outnumber its tubes because
 * the counts respect the supply. The mass limit is not looked at here ({@link MassRepair} follows).
 */
final class PatternRealisation {
    private PatternRealisation() {
    }

    static NestForest realise(NestingProblem problem, List<TubeType> types, List<Pattern> columns, long[] counts) {
        NestForest forest = new NestForest(problem);
        Map<Integer, Pattern> patternOf = new HashMap<>();
        int[] nextHost = new int[types.size()];
        for (int p = 0; p < columns.size(); p++) {
            Pattern pattern = columns.get(p);
            TubeType host = types.get(pattern.hostType());
            for (long copy = 0; copy < counts[p] && nextHost[host.index()] < host.count(); copy++) {
                patternOf.put(host.members().get(nextHost[host.index()]++), pattern);
            }
        }
        List<Deque<Integer>> free = new ArrayList<>();
        for (TubeType t : types) {
            free.add(new ArrayDeque<>(t.members()));
        }
        for (TubeType type : types) {
            for (int host : type.members()) {
                Pattern pattern = patternOf.get(host);
                if (pattern == null) {
                    continue;
                }
                for (Pattern.Segment segment : pattern.segments()) {
                    int index = forest.load(host).addSegment(segment.channels());
                    for (int lane = 0; lane < segment.channels(); lane++) {
                        for (int guestType : segment.lanes().get(lane)) {
                            Integer guest = free.get(guestType).poll();
                            if (guest != null && !forest.placeInChannel(guest, host, index, lane)) {
                                free.get(guestType).addFirst(guest);
                            }
                        }
                    }
                }
            }
        }
        return forest;
    }
}
