package kitwright.bench;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;

/**
 * A stand-in for the nesting stage, for the packing benchmark only: each tube, largest first, takes as guest the
 * longest unused tube of the largest diameter that is at least 4 mm under its bore and not longer than it less
 * 20 mm, and so on down (one channel per host). The real nesting stage packs more tubes per bundle.
 */
final class ChainNesting {
    private ChainNesting() {
    }

    /** A cut piece: mark, outside diameter, wall, length, mass. */
    record Piece(String mark, double diameterMm, double wallMm, double lengthMm, double massKg) {
        double bore() {
            return diameterMm - 2 * wallMm;
        }
    }

    static List<Bundle> bundles(List<Piece> pieces) {
        List<Piece> sorted = new ArrayList<>(pieces);
        sorted.sort(Comparator.comparingDouble(Piece::diameterMm).reversed()
                .thenComparing(Comparator.comparingDouble(Piece::lengthMm).reversed()));
        boolean[] used = new boolean[sorted.size()];
        List<Bundle> bundles = new ArrayList<>();
        for (int h = 0; h < sorted.size(); h++) {
            if (used[h]) {
                continue;
            }
            used[h] = true;
            List<Piece> chain = new ArrayList<>();
            chain.add(sorted.get(h));
            Piece host = sorted.get(h);
            while (true) {
                int guest = -1;
                for (int g = h + 1; g < sorted.size(); g++) {
                    Piece p = sorted.get(g);
                    if (!used[g] && p.diameterMm() <= host.bore() - 4 && p.lengthMm() <= host.lengthMm() - 20) {
                        guest = g;
                        break;
                    }
                }
                if (guest < 0) {
                    break;
                }
                used[guest] = true;
                host = sorted.get(guest);
                chain.add(host);
            }
            NestedTube tube = null;
            for (int k = chain.size() - 1; k >= 0; k--) {
                Piece p = chain.get(k);
                tube = new NestedTube(p.mark(), p.diameterMm(), p.bore(), p.lengthMm(), 0, 0, k == 0 ? 0 : 10,
                        tube == null ? List.of() : List.of(tube));
            }
            double mass = chain.stream().mapToDouble(Piece::massKg).sum();
            bundles.add(new Bundle("B" + (bundles.size() + 1), chain.get(0).lengthMm(), chain.get(0).diameterMm(),
                    mass, tube));
        }
        return bundles;
    }
}
