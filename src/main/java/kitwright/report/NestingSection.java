package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.nesting.Bundle;
import kitwright.nesting.Handling;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;
import kitwright.nesting.NestedTube;

/**
 * The report block of the nesting stage: bundles against the lower bound and the status, envelope volume nested
 * and loose, bundles above the one-person lift, the fit rule used (which says that out-of-roundness and
 * straightness are not counted), a table of the distinct bundle layouts and one figure of each: the drawing
 * ({@link BundleDrawing}) and a table of its tubes. With the kit, tubes are coloured by mark (the same colour as on
 * the saw sheets and in the crate lanes, see {@link MarkPalette}) and the tables name the section. Add it with
 * {@code ReportModel.builder(...).section(NestingSection.of(result, kit))}.
 */
public final class NestingSection {
    public static final String ID = "nesting";
    /** One tube of a layout, for the table under its drawing. */
    record Tube(String mark, String swatch, String section, String count, String outside, String bore,
                String length, String in) {
    }

    /** One distinct bundle layout: preformatted strings for the template. */
    record Layout(String anchor, String first, String ids, String alike, String hostMark, String tubes,
                  String tubesText, String diameter, String length, String mass, String handling, String svg,
                  List<Tube> parts) {
    }

    record View(String bundles, String pieces, String lowerBound, String status,
                String statusClass, String bundledVolume, String looseVolume, String liftLimit, String heavyFlag,
                String heavyBundles, String reason, String rule, String method, List<Layout> layouts) {
    }

    private NestingSection() {
    }

    /** The block without the kit: tubes grey by nesting level, no section names. */
    public static ReportSection of(NestResult result) {
        return of(result, Map.of(), Map.of());
    }

    /** The block of a kit's plan: tubes coloured by mark (the saw sheets' colours) and named by section. */
    public static ReportSection of(NestResult result, Kit kit) {
        Map<String, String> sectionOf = new LinkedHashMap<>();
        for (Bar b : kit.bars()) {
            sectionOf.put(b.mark(), b.section());
        }
        Map<String, String> fills = MarkPalette.of(kit).fills();
        return of(result, sectionOf, fills);
    }

    private static ReportSection of(NestResult result, Map<String, String> sectionOf, Map<String, String> fills) {
        NestPlan plan = result.plan();
        List<Layout> layouts = new ArrayList<>();
        for (BundleDrawing.Distinct d : BundleDrawing.distinct(plan)) {
            Bundle b = d.bundle();
            String ids = d.ids().size() == 1 ? d.ids().get(0)
                    : d.ids().get(0) + " to " + d.ids().get(d.ids().size() - 1);
            layouts.add(new Layout("bundle-" + b.id(), b.id(), ids, String.valueOf(d.ids().size()), b.host().mark(),
                    String.valueOf(count(b.host())), tubes(count(b.host())), format(b.envelopeDiameterMm(), 1), format(b.lengthMm(), 0),
                    format(b.massKg(), 1), Handling.flag(b.massKg()), BundleDrawing.svg(b, d.ids(), fills),
                    parts(b, sectionOf, fills)));
        }
        long heavy = plan.bundles().stream().filter(b -> !Handling.flag(b.massKg()).isEmpty()).count();
        View view = new View(String.valueOf(plan.bundles().size()), String.valueOf(result.pieces()),
                ShopFormat.decimal(plan.lowerBound(), 2, false), plan.status().name(),
                "status-" + plan.status().name().toLowerCase(Locale.ROOT),
                format(result.bundledVolumeM3(), 3), format(result.looseVolumeM3(), 3),
                format(Handling.ONE_PERSON_LIFT_KG, 0), Handling.TWO_PEOPLE_OR_HOIST, String.valueOf(heavy),
                result.reason(), result.rule(), method(), layouts);
        return new ReportSection(ID, "Nested bundles", "nesting", view);
    }

    /** Tubes of one mark in a bundle: the first met, how many, and the marks of the tubes they lie in. */
    private static final class Entry {
        private final NestedTube tube;
        private final java.util.Set<String> hosts = new java.util.LinkedHashSet<>();
        private int count;

        Entry(NestedTube tube) {
            this.tube = tube;
        }
    }

    /** The tubes of a bundle by mark, host first then in nesting order, with what they lie in. */
    private static List<Tube> parts(Bundle bundle, Map<String, String> sectionOf, Map<String, String> fills) {
        Map<String, Entry> byMark = new LinkedHashMap<>();
        collect(bundle.host(), null, byMark);
        List<Tube> parts = new ArrayList<>();
        byMark.forEach((mark, e) -> parts.add(new Tube(mark, Swatches.mark(fills.getOrDefault(mark, "#ffffff")),
                sectionOf.getOrDefault(mark, ""), String.valueOf(e.count), format(e.tube.outerDiameterMm(), 1),
                format(e.tube.boreMm(), 1), ShopFormat.mm(e.tube.lengthMm()),
                e.hosts.isEmpty() ? "\u2014" : String.join(", ", e.hosts))));
        return parts;
    }

    private static void collect(NestedTube tube, String host, Map<String, Entry> byMark) {
        Entry entry = byMark.computeIfAbsent(tube.mark(), k -> new Entry(tube));
        entry.count++;
        if (host != null) {
            entry.hosts.add(host);
        }
        for (NestedTube g : tube.guests()) {
            collect(g, tube.mark(), byMark);
        }
    }

    static String method() {
        return "Guests lie in channels of the host's bore (1 to 8 or 19 equal channels, laid out as the densest known"
                + " packings of equal circles in a circle) and end to end along the host less the end allowances."
                + " The lower bound counts what each host can carry in these layouts (linear-programming relaxation"
                + " of the pattern model); OPTIMAL means no plan of such layouts has fewer bundles.";
    }

    private static String tubes(int n) {
        return n + (n == 1 ? " tube" : " tubes");
    }

    private static int count(NestedTube t) {
        int n = 1;
        for (NestedTube g : t.guests()) {
            n += count(g);
        }
        return n;
    }

    private static String format(double value, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
