package kitwright.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import kitwright.nesting.Bundle;
import kitwright.nesting.Handling;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;
import kitwright.nesting.NestedTube;

/**
 * The report block of the nesting stage: bundles against the lower bound and the status, envelope volume nested
 * and loose, bundles above the one-person lift, the fit rule used (which says that out-of-roundness and
 * straightness are not counted), a table of the distinct bundle layouts and one drawing of each
 * ({@link BundleDrawing}). Add it with {@code ReportModel.builder(...).section(NestingSection.of(result))}.
 */
public final class NestingSection {
    public static final String ID = "nesting";

    /** One distinct bundle layout: preformatted strings for the template. */
    record Layout(String anchor, String first, String ids, String alike, String hostMark, String tubes,
                  String diameter, String length, String mass, String handling, String svg) {
    }

    record View(String bundles, String pieces, String lowerBound, String status, String statusClass,
                String bundledVolume, String looseVolume, String liftLimit, String heavyFlag, String heavyBundles,
                String reason, String rule, String method, List<Layout> layouts) {
    }

    private NestingSection() {
    }

    public static ReportSection of(NestResult result) {
        NestPlan plan = result.plan();
        List<Layout> layouts = new ArrayList<>();
        for (BundleDrawing.Distinct d : BundleDrawing.distinct(plan)) {
            Bundle b = d.bundle();
            String ids = d.ids().size() == 1 ? d.ids().get(0)
                    : d.ids().get(0) + " to " + d.ids().get(d.ids().size() - 1);
            layouts.add(new Layout("bundle-" + b.id(), b.id(), ids, String.valueOf(d.ids().size()), b.host().mark(),
                    String.valueOf(count(b.host())), format(b.envelopeDiameterMm(), 1), format(b.lengthMm(), 0),
                    format(b.massKg(), 1), Handling.flag(b.massKg()), BundleDrawing.svg(b, d.ids())));
        }
        long heavy = plan.bundles().stream().filter(b -> !Handling.flag(b.massKg()).isEmpty()).count();
        View view = new View(String.valueOf(plan.bundles().size()), String.valueOf(result.pieces()),
                format(plan.lowerBound(), 2), plan.status().name(),
                "status-" + plan.status().name().toLowerCase(Locale.ROOT),
                format(result.bundledVolumeM3(), 3), format(result.looseVolumeM3(), 3),
                format(Handling.ONE_PERSON_LIFT_KG, 0), Handling.TWO_PEOPLE_OR_HOIST, String.valueOf(heavy),
                result.reason(), result.rule(), method(), layouts);
        return new ReportSection(ID, "Nested bundles", "nesting", view);
    }

    static String method() {
        return "Guests lie in channels of the host's bore (1 to 8 or 19 equal channels, laid out as the densest known"
                + " packings of equal circles in a circle) and end to end along the host less the end allowances."
                + " The lower bound counts what each host can carry in these layouts (linear-programming relaxation"
                + " of the pattern model); OPTIMAL means no plan of such layouts has fewer bundles.";
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
