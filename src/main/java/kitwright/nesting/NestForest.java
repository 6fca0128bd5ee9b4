package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;

/**
 * Working state of one nesting run: which tube lies in which, what each host carries, and the mass of every
 * subtree. Guests are always narrower than their hosts' bores, so the "lies in" relation has no cycles.
 */
final class NestForest {
    private final NestingProblem problem;
    private final int[] host;
    private final HostLoad[] loads;
    private final double[] subtreeMassKg;

    NestForest(NestingProblem problem) {
        this.problem = problem;
        int n = problem.tubes().size();
        host = new int[n];
        loads = new HostLoad[n];
        subtreeMassKg = new double[n];
        for (int i = 0; i < n; i++) {
            host[i] = -1;
            subtreeMassKg[i] = problem.tubes().get(i).massKg();
        }
    }

    NestingProblem problem() {
        return problem;
    }

    int size() {
        return host.length;
    }

    int host(int tube) {
        return host[tube];
    }

    boolean isBundle(int tube) {
        return host[tube] < 0;
    }

    int root(int tube) {
        int t = tube;
        while (host[t] >= 0) {
            t = host[t];
        }
        return t;
    }

    double subtreeMassKg(int tube) {
        return subtreeMassKg[tube];
    }

    HostLoad load(int tube) {
        if (loads[tube] == null) {
            Tube t = problem.tubes().get(tube);
            loads[tube] = new HostLoad(problem.usableLengthMm(t), problem.innerDiameterMm(t));
        }
        return loads[tube];
    }

    /** Puts a bundle's host into another tube where it fits, keeping the mass limit. */
    boolean tryInsert(int guest, int into) {
        if (host[guest] >= 0 || !problem.fits(problem.tubes().get(guest), problem.tubes().get(into))) {
            return false;
        }
        if (!massAllows(guest, into)) {
            return false;
        }
        Tube g = problem.tubes().get(guest);
        if (!load(into).tryAdd(guest, g.outerDiameterMm(), g.lengthMm())) {
            return false;
        }
        link(guest, into);
        return true;
    }

    /** True when putting the guest's subtree into the host keeps the host's bundle within the mass limit. */
    boolean massAllows(int guest, int into) {
        return problem.massAllowed(subtreeMassKg[root(into)] + subtreeMassKg[guest]);
    }

    /** Places a bundle's host in a given channel of another tube, ignoring the mass limit (repaired later). */
    boolean placeInChannel(int guest, int into, int segment, int channel) {
        Tube g = problem.tubes().get(guest);
        if (host[guest] >= 0 || !FitRule.fits(g.outerDiameterMm(), problem.tubes().get(into).boreMm(),
                problem.clearanceMm())) {
            return false;
        }
        if (!load(into).appendIfFits(segment, channel, guest, g.outerDiameterMm(), g.lengthMm())) {
            return false;
        }
        link(guest, into);
        return true;
    }

    /** Takes a guest (with its own guests) out of its host; it becomes a bundle of its own. */
    void detach(int guest) {
        int into = host[guest];
        if (into < 0) {
            return;
        }
        loads[into].remove(guest);
        host[guest] = -1;
        for (int t = into; t >= 0; t = host[t]) {
            subtreeMassKg[t] -= subtreeMassKg[guest];
        }
    }

    private void link(int guest, int into) {
        host[guest] = into;
        for (int t = into; t >= 0; t = host[t]) {
            subtreeMassKg[t] += subtreeMassKg[guest];
        }
    }

    /** Every tube of the subtree below a tube (not the tube itself), depth first. */
    List<Integer> descendants(int tube) {
        List<Integer> out = new ArrayList<>();
        if (loads[tube] == null) {
            return out;
        }
        for (HostLoad.Segment seg : loads[tube].segments()) {
            for (List<Integer> lane : seg.lanes) {
                for (int guest : lane) {
                    out.add(guest);
                    out.addAll(descendants(guest));
                }
            }
        }
        return out;
    }

    int bundles() {
        int count = 0;
        for (int h : host) {
            if (h < 0) {
                count++;
            }
        }
        return count;
    }

    /** Total envelope volume of the bundles, pi/4 D^2 L of each bundle's host, in mm^3. */
    double envelopeVolumeMm3() {
        double sum = 0;
        for (int i = 0; i < host.length; i++) {
            if (host[i] < 0) {
                sum += problem.tubes().get(i).envelopeVolumeMm3();
            }
        }
        return sum;
    }

    /** True when some bundle is above the mass limit. */
    boolean overMassLimit() {
        for (int i = 0; i < host.length; i++) {
            if (host[i] < 0 && !problem.massAllowed(subtreeMassKg[i])) {
                return true;
            }
        }
        return false;
    }

    /** One placement per tube, with the final centres and offsets. */
    List<Placement> placements() {
        Placement[] out = new Placement[host.length];
        for (int i = 0; i < host.length; i++) {
            if (host[i] < 0) {
                out[i] = new Placement(i, -1, 0, 0, 0);
            }
            if (loads[i] != null) {
                for (double[] p : loads[i].positions(problem.endAllowanceMm())) {
                    int guest = (int) p[0];
                    out[guest] = new Placement(guest, i, p[1], p[2], p[3]);
                }
            }
        }
        return List.of(out);
    }
}
