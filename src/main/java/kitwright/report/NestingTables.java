package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.nesting.Bundle;
import kitwright.nesting.Handling;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestedTube;

/**
 * The rows of {@code nests.csv} and {@code assembly-order.csv}, as lists of strings (pure; {@link NestingCsv}
 * writes them). Every tube of a bundle gets a place name: the bundle id for its host, then ".n" for the n-th guest
 * of each host down the nest (BDL-4.1.2 is the second guest of the first guest of bundle BDL-4). A guest's channel is
 * numbered within its host by distinct centre, in the order guests appear (by offset).
 */
public final class NestingTables {
    public static final List<String> NESTS_HEADER = List.of("bundle", "tube", "mark", "level", "in_tube", "in_mark",
            "channel", "center_x_mm", "center_y_mm", "offset_mm", "length_mm", "outer_diameter_mm", "bore_mm",
            "bundle_diameter_mm", "bundle_length_mm", "bundle_mass_kg", "handling");
    public static final List<String> ASSEMBLY_HEADER = List.of("bundle", "step", "slide_tube", "mark", "into_tube",
            "into_mark", "channel", "offset_mm", "center_x_mm", "center_y_mm");

    private NestingTables() {
    }

    /** One row per tube: bundle hosts first in each bundle, then their guests depth first. */
    public static List<List<String>> nests(NestPlan plan) {
        List<List<String>> rows = new ArrayList<>();
        for (Bundle b : plan.bundles()) {
            List<String> bundleColumns = List.of(number(b.envelopeDiameterMm(), 3), number(b.lengthMm(), 1),
                    number(b.massKg(), 2), Handling.flag(b.massKg()));
            visit(b.host(), b.id(), null, null, "", 0, (tube, place, host, hostPlace, channel, level) -> {
                List<String> row = new ArrayList<>(List.of(b.id(), place, tube.mark(), String.valueOf(level),
                        hostPlace == null ? "" : hostPlace, host == null ? "" : host.mark(), channel,
                        number(tube.centerXMm(), 2), number(tube.centerYMm(), 2), number(tube.offsetMm(), 1),
                        number(tube.lengthMm(), 1), number(tube.outerDiameterMm(), 3), number(tube.boreMm(), 3)));
                row.addAll(bundleColumns);
                rows.add(row);
            });
        }
        return rows;
    }

    /**
     * The assembly order, innermost first: a guest is slid into its host only after its own guests are in it
     * (a post-order walk of each bundle), so every step handles a finished sub-nest.
     */
    public static List<List<String>> assemblyOrder(NestPlan plan) {
        List<List<String>> rows = new ArrayList<>();
        for (Bundle b : plan.bundles()) {
            List<List<String>> steps = new ArrayList<>();
            postOrder(b.host(), b.id(), steps);
            for (int i = 0; i < steps.size(); i++) {
                List<String> row = new ArrayList<>(List.of(b.id(), String.valueOf(i + 1)));
                row.addAll(steps.get(i));
                rows.add(row);
            }
        }
        return rows;
    }

    private static void postOrder(NestedTube host, String hostPlace, List<List<String>> steps) {
        Map<NestedTube, String> channels = channels(host);
        int n = 0;
        for (NestedTube guest : host.guests()) {
            String place = hostPlace + "." + (++n);
            postOrder(guest, place, steps);
            steps.add(List.of(place, guest.mark(), hostPlace, host.mark(), channels.get(guest),
                    number(guest.offsetMm(), 1), number(guest.centerXMm(), 2), number(guest.centerYMm(), 2)));
        }
    }

    interface Visitor {
        void visit(NestedTube tube, String place, NestedTube host, String hostPlace, String channel, int level);
    }

    private static void visit(NestedTube tube, String place, NestedTube host, String hostPlace, String channel,
                              int level, Visitor visitor) {
        visitor.visit(tube, place, host, hostPlace, channel, level);
        Map<NestedTube, String> channels = channels(tube);
        int n = 0;
        for (NestedTube guest : tube.guests()) {
            visit(guest, place + "." + (++n), tube, place, channels.get(guest), level + 1, visitor);
        }
    }

    /** Channel numbers of a host's guests: 1, 2, ... by distinct centre, in guest order. */
    static Map<NestedTube, String> channels(NestedTube host) {
        Map<String, Integer> byCentre = new LinkedHashMap<>();
        Map<NestedTube, String> out = new java.util.IdentityHashMap<>();
        for (NestedTube g : host.guests()) {
            String key = number(g.centerXMm(), 2) + "," + number(g.centerYMm(), 2);
            int channel = byCentre.computeIfAbsent(key, k -> byCentre.size() + 1);
            out.put(g, String.valueOf(channel));
        }
        return out;
    }

    /** Fixed decimals, a dot, no grouping, and no "-0". */
    static String number(double value, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", value);
        return s.matches("-0(\\.0*)?") ? s.substring(1) : s;
    }
}
