package kitwright.validate;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.SectionCutPlan;
import kitwright.loading.LoadPlan;
import kitwright.loading.PlacedCrate;
import kitwright.loading.VehicleLoad;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.CratePlan;
import kitwright.packing.ItemKind;
import kitwright.packing.JointBoxLoad;
import kitwright.plan.PlanResult;
import kitwright.report.LogisticsCsv;
import org.apache.commons.csv.CSVRecord;

/**
 * Re-checks a whole plan from first principles: each stage by its own validator ({@link CutPlanValidator},
 * {@link NestPlanValidator}, {@link CratePlanValidator}, {@link LoadPlanValidator}) against the outputs of the stage
 * before it, then the seams between the stages, counted here again without the planning or report code:
 * <ul>
 *   <li>every piece the cutting plan cuts (kit bars and spares, mark and length) is a tube of exactly one bundle,
 *   and the bundles hold nothing else;</li>
 *   <li>every bundle of the nesting plan lies in exactly one crate, every joint of the kit in a joint box and every
 *   joint box in exactly one crate;</li>
 *   <li>every crate is on exactly one vehicle;</li>
 *   <li>the packing lists ({@code packing-lists.csv}) name each crate once with its type, the marks and counts of
 *   its tubes and joints, its bundles and boxes and its gross mass, and over all crates the marks add up to the
 *   pieces cut plus the kit's joints; the manifests ({@code manifests.csv}) list each vehicle's crates and mass;
 *   every list of ids in them is in number order (the same text before the last number, the numbers rising);</li>
 *   <li>the ids of bundles, joint boxes, crates and trips are all different and none reads like a mark of the kit's
 *   bars or joints: no two have the same letters before their first digit, counted in upper case without the
 *   characters that are neither letters nor digits (so no id equals a mark, whatever the case).</li>
 * </ul>
 * A stage that has no feasible plan must say why, and the stages after it must not pretend otherwise. Throws an
 * AssertionError naming what is wrong.
 */
public final class PlanValidator {
    private static final double KG = 0.051; // the CSVs round masses to 0.1 kg
    private static final Pattern LAST_NUMBER = Pattern.compile("(.*?)(\\d+)");
    private static final Pattern LEADING_LETTERS = Pattern.compile("^\\p{L}*");

    private PlanValidator() {
    }

    /** The records of a plan, with the packing lists and manifests their writer makes of them. */
    public static void validate(PlanResult result) {
        Map<String, String> files = new HashMap<>();
        if (result.logisticsPlanned() && result.crates().status() != Status.INFEASIBLE) {
            files.put(LogisticsCsv.PACKING_LISTS,
                    LogisticsCsv.packingLists(result.crates(), result.nesting().plan().bundles()));
            files.put(LogisticsCsv.MANIFESTS, LogisticsCsv.manifests(result.loads()));
            files.put(LogisticsCsv.LOAD_LISTS, LogisticsCsv.loadLists(result.loads(), result.crates()));
        }
        validate(result, files);
    }

    /**
     * The records of a plan and the files written for it (by file name; CSVs not given are not checked): the saw
     * sheet ({@code cut-list.csv}) with its kinds, the packing lists and the manifests.
     */
    public static void validate(PlanResult result, Map<String, String> files) {
        Kit kit = result.kit();
        CutPlanValidator.validate(kit, result.cutting());
        if (files.containsKey("cut-list.csv")) {
            CutPlanValidator.validateCutList(result.cutting(), files.get("cut-list.csv"));
            CutPlanValidator.validateKinds(kit, result.cutting(), files.get("cut-list.csv"));
        }
        check(result.nesting() != null, "the nesting stage ran");
        NestPlanValidator.validate(kit, result.cutting(), result.nesting().plan());
        check((result.nesting().plan().status() == Status.INFEASIBLE) == (result.nesting().reason() != null),
                "a nesting reason exactly when the nesting is INFEASIBLE");
        cutPiecesAreTubes(result);
        idsReadLikeNoMark(result);
        if (result.tour() != null) {
            TourValidator.validate(kit, result.tour());
        }
        if (!result.logisticsPlanned()) {
            check(result.crates() == null && result.loads() == null, "crates and loads planned together or not");
            check(kit.crates().isEmpty() || kit.vehicles().isEmpty(), "logistics skipped only without a catalog");
            return;
        }
        List<Bundle> bundles = result.nesting().plan().bundles();
        CratePlan crates = result.crates();
        LoadPlan loads = result.loads();
        if (crates.status() == Status.INFEASIBLE) {
            check(crates.reason() != null && !crates.reason().isBlank(), "INFEASIBLE crating needs a reason");
            check(crates.crates().isEmpty(), "INFEASIBLE crating has no crates");
            check(loads.status() == Status.INFEASIBLE, "no loading without crates");
            return;
        }
        CratePlanValidator.check(crates, bundles, kit.joints(), kit.crates(), kit.settings().jointBox());
        everyBundleOnceInACrate(bundles, crates);
        everyJointInABox(kit.joints(), crates);
        if (loads.status() == Status.INFEASIBLE) {
            check(loads.reason() != null && !loads.reason().isBlank(), "INFEASIBLE loading needs a reason");
            check(loads.vehicles().isEmpty(), "INFEASIBLE loading has no vehicles");
        } else {
            LoadPlanValidator.check(loads, crates, kit.crates(), kit.vehicles());
            everyCrateOnceOnAVehicle(crates, loads);
        }
        if (files.containsKey(LogisticsCsv.PACKING_LISTS)) {
            packingLists(result, files.get(LogisticsCsv.PACKING_LISTS));
        }
        if (files.containsKey(LogisticsCsv.MANIFESTS)) {
            manifests(crates, loads, files.get(LogisticsCsv.MANIFESTS));
        }
        if (files.containsKey(LogisticsCsv.LOAD_LISTS)) {
            loadLists(crates, loads, files.get(LogisticsCsv.LOAD_LISTS));
        }
    }

    /**
     * One row per crate per vehicle, in the vehicle's loading order (which {@link LoadPlanValidator} checks can be
     * loaded): steps 1..n, unloading n..1, outer size and gross mass as in the crate plan.
     */
    private static void loadLists(CratePlan crates, LoadPlan loads, String csv) {
        Map<String, Crate> byId = new HashMap<>();
        crates.crates().forEach(c -> byId.put(c.id(), c));
        List<CSVRecord> rows = read(csv, List.of("vehicle", "loading_step", "unloading_step", "crate",
                "outer_length_mm", "outer_width_mm", "outer_height_mm", "gross_kg"));
        int k = 0;
        for (VehicleLoad v : loads.vehicles()) {
            int n = v.crates().size();
            for (int i = 0; i < n; i++, k++) {
                check(k < rows.size(), "load list row for " + v.crates().get(i).ref() + " on " + v.id());
                CSVRecord row = rows.get(k);
                Crate c = byId.get(v.crates().get(i).ref());
                String at = "load list of " + v.id() + ", row " + (i + 1) + ": ";
                check(row.get("vehicle").equals(v.id()) && row.get("crate").equals(c.id()), at + "vehicle and crate");
                check(Integer.parseInt(row.get("loading_step")) == i + 1
                        && Integer.parseInt(row.get("unloading_step")) == n - i, at + "steps");
                check(Math.abs(Double.parseDouble(row.get("outer_length_mm")) - c.outerLengthMm()) <= 0.5
                        && Math.abs(Double.parseDouble(row.get("outer_width_mm")) - c.outerWidthMm()) <= 0.5
                        && Math.abs(Double.parseDouble(row.get("outer_height_mm")) - c.outerHeightMm()) <= 0.5,
                        at + "outer size");
                check(Math.abs(Double.parseDouble(row.get("gross_kg")) - c.grossKg()) <= KG, at + "gross mass");
            }
        }
        check(rows.size() == k, "one load list row per crate per vehicle");
    }

    /** Cut pieces (mark and length, times the pattern count) against the tubes of all bundles, as multisets. */
    private static void cutPiecesAreTubes(PlanResult result) {
        Map<String, Integer> cut = new TreeMap<>();
        for (SectionCutPlan section : result.cutting().sections()) {
            for (CutPattern p : section.patterns()) {
                for (Cut c : p.cuts()) {
                    cut.merge(piece(c.mark(), c.lengthMm()), p.count(), Integer::sum);
                }
            }
        }
        Map<String, Integer> nested = new TreeMap<>();
        for (Bundle b : result.nesting().plan().bundles()) {
            walk(b.host(), t -> nested.merge(piece(t.mark(), t.lengthMm()), 1, Integer::sum));
        }
        check(cut.equals(nested), "the bundles hold exactly the cut pieces:\n  cut    " + cut + "\n  nested " + nested);
    }

    private static void everyBundleOnceInACrate(List<Bundle> bundles, CratePlan crates) {
        Map<String, Integer> crated = new TreeMap<>();
        crates.crates().forEach(c -> c.items(ItemKind.BUNDLE).forEach(i -> crated.merge(i.ref(), 1, Integer::sum)));
        Map<String, Integer> expected = new TreeMap<>();
        bundles.forEach(b -> expected.put(b.id(), 1));
        check(crated.equals(expected), "every bundle in exactly one crate, nothing else crated as a bundle");
    }

    private static void everyJointInABox(List<Joint> joints, CratePlan crates) {
        Map<String, Integer> boxed = new TreeMap<>();
        crates.boxes().forEach(x -> x.joints().forEach(j -> boxed.merge(j.mark(), j.count(), Integer::sum)));
        Map<String, Integer> expected = new TreeMap<>();
        joints.stream().filter(j -> j.quantity() > 0).forEach(j -> expected.merge(j.mark(), j.quantity(), Integer::sum));
        check(boxed.equals(expected), "every joint in a box: boxed " + boxed + ", kit " + expected);
        Map<String, Integer> crated = new TreeMap<>();
        crates.crates().forEach(c -> c.items(ItemKind.BOX).forEach(i -> crated.merge(i.ref(), 1, Integer::sum)));
        Map<String, Integer> boxes = new TreeMap<>();
        crates.boxes().forEach(x -> boxes.put(x.id(), 1));
        check(crated.equals(boxes), "every joint box in exactly one crate");
    }

    private static void everyCrateOnceOnAVehicle(CratePlan crates, LoadPlan loads) {
        Map<String, Integer> loaded = new TreeMap<>();
        loads.vehicles().forEach(v -> v.crates().forEach(p -> loaded.merge(p.ref(), 1, Integer::sum)));
        Map<String, Integer> expected = new TreeMap<>();
        crates.crates().forEach(c -> expected.put(c.id(), 1));
        check(loaded.equals(expected), "every crate on exactly one vehicle: loaded " + loaded.keySet());
    }

    /** Each crate's line, recounted from the bundles' tubes and the boxes' joints; totals against cut + joints. */
    private static void packingLists(PlanResult result, String csv) {
        Map<String, Bundle> bundles = new HashMap<>();
        result.nesting().plan().bundles().forEach(b -> bundles.put(b.id(), b));
        Map<String, JointBoxLoad> boxes = new HashMap<>();
        result.crates().boxes().forEach(x -> boxes.put(x.id(), x));
        List<CSVRecord> rows = read(csv, List.of("crate", "type", "marks", "bundles", "bundle_ids", "boxes", "box_ids",
                "gross_kg", "max_gross_kg"));
        List<Crate> crates = result.crates().crates();
        check(rows.size() == crates.size(), "one packing-list line per crate");
        Map<String, Integer> total = new TreeMap<>();
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord row = rows.get(i);
            Crate c = crates.get(i);
            String at = "packing list of " + c.id() + ": ";
            check(row.get("crate").equals(c.id()) && row.get("type").equals(c.type()), at + "id and type");
            Map<String, Integer> marks = new TreeMap<>();
            List<String> bundleIds = new ArrayList<>();
            List<String> boxIds = new ArrayList<>();
            for (CrateItem item : c.items()) {
                if (item.kind() == ItemKind.BUNDLE) {
                    bundleIds.add(item.ref());
                    walk(bundles.get(item.ref()).host(), t -> marks.merge(t.mark(), 1, Integer::sum));
                } else {
                    boxIds.add(item.ref());
                    boxes.get(item.ref()).joints().forEach(j -> marks.merge(j.mark(), j.count(), Integer::sum));
                }
            }
            check(parseMarks(row.get("marks")).equals(marks), at + "marks " + row.get("marks") + ", holds " + marks);
            check(Integer.parseInt(row.get("bundles")) == bundleIds.size()
                    && sameIds(words(row.get("bundle_ids")), bundleIds), at + "bundles");
            check(Integer.parseInt(row.get("boxes")) == boxIds.size() && sameIds(words(row.get("box_ids")), boxIds),
                    at + "joint boxes");
            check(inNumberOrder(words(row.get("bundle_ids"))) && inNumberOrder(words(row.get("box_ids"))),
                    at + "ids in number order: " + row.get("bundle_ids") + " / " + row.get("box_ids"));
            double contents = c.items().stream().mapToDouble(CrateItem::massKg).sum();
            check(Math.abs(Double.parseDouble(row.get("gross_kg")) - (c.tareKg() + contents)) <= KG,
                    at + "gross " + row.get("gross_kg") + " kg, tare + contents " + (c.tareKg() + contents));
            check(Math.abs(Double.parseDouble(row.get("max_gross_kg")) - c.maxGrossKg()) <= KG, at + "max gross");
            marks.forEach((m, n) -> total.merge(m, n, Integer::sum));
        }
        Map<String, Integer> expected = new TreeMap<>();
        for (SectionCutPlan section : result.cutting().sections()) {
            for (CutPattern p : section.patterns()) {
                p.cuts().forEach(c -> expected.merge(c.mark(), p.count(), Integer::sum));
            }
        }
        result.kit().joints().stream().filter(j -> j.quantity() > 0)
                .forEach(j -> expected.merge(j.mark(), j.quantity(), Integer::sum));
        check(total.equals(expected), "packing lists hold every piece cut and every joint once:\n  lists "
                + total + "\n  plan  " + expected);
    }

    private static void manifests(CratePlan crates, LoadPlan loads, String csv) {
        Map<String, Crate> byId = new HashMap<>();
        crates.crates().forEach(c -> byId.put(c.id(), c));
        List<CSVRecord> rows = read(csv, List.of("vehicle", "type", "crates", "crate_ids", "mass_kg", "payload_kg",
                "floor_length_mm", "deck_length_mm", "centre_of_gravity_mm", "cost_per_trip",
                "lateral_centre_of_gravity_mm", "front_load_kg", "max_front_kg", "rear_load_kg", "max_rear_kg",
                "front_support"));
        check(rows.size() == loads.vehicles().size(), "one manifest line per vehicle");
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord row = rows.get(i);
            VehicleLoad v = loads.vehicles().get(i);
            String at = "manifest of " + v.id() + ": ";
            check(row.get("vehicle").equals(v.id()) && row.get("type").equals(v.type()), at + "id and type");
            List<String> refs = v.crates().stream().map(PlacedCrate::ref).toList();
            check(Integer.parseInt(row.get("crates")) == refs.size() && sameIds(words(row.get("crate_ids")), refs),
                    at + "crates");
            check(inNumberOrder(words(row.get("crate_ids"))), at + "ids in number order: " + row.get("crate_ids"));
            double mass = refs.stream().mapToDouble(r -> byId.get(r).grossKg()).sum();
            check(Math.abs(Double.parseDouble(row.get("mass_kg")) - mass) <= KG, at + "mass " + row.get("mass_kg")
                    + " kg, its crates weigh " + mass);
            check(mass <= Double.parseDouble(row.get("payload_kg")) + KG, at + "within the payload");
            check(Math.abs(Double.parseDouble(row.get("lateral_centre_of_gravity_mm"))
                    - v.lateralCentreOfGravityMm()) <= 0.5, at + "lateral centre");
            if (v.axleLoadsKg() == null) {
                check(row.get("front_support").equals(LogisticsCsv.NOT_CHECKED) && row.get("front_load_kg").isEmpty(),
                        at + "axle loads not checked");
            } else {
                double front = Double.parseDouble(row.get("front_load_kg"));
                double rear = Double.parseDouble(row.get("rear_load_kg"));
                check(Math.abs(front - v.axleLoadsKg().front()) <= 0.5 && Math.abs(rear - v.axleLoadsKg().rear())
                        <= 0.5, at + "axle loads");
                check(front <= Double.parseDouble(row.get("max_front_kg")) + 0.5
                        && rear <= Double.parseDouble(row.get("max_rear_kg")) + 0.5, at + "axle loads within limits");
            }
        }
    }

    /** Every id of the plan against every mark of the kit, and against each other. */
    private static void idsReadLikeNoMark(PlanResult result) {
        Map<String, List<String>> byKind = new TreeMap<>();
        byKind.put("bundle", result.nesting().plan().bundles().stream().map(Bundle::id).toList());
        if (result.crates() != null) {
            byKind.put("joint box", result.crates().boxes().stream().map(JointBoxLoad::id).toList());
            byKind.put("crate", result.crates().crates().stream().map(Crate::id).toList());
        }
        if (result.loads() != null) {
            byKind.put("trip", result.loads().vehicles().stream().map(VehicleLoad::id).toList());
        }
        Map<String, String> markOf = new HashMap<>();
        result.kit().bars().forEach(b -> markOf.put(letters(b.mark()), b.mark()));
        result.kit().joints().forEach(j -> markOf.put(letters(j.mark()), j.mark()));
        Map<String, String> kindOf = new HashMap<>();
        Set<String> seen = new HashSet<>();
        byKind.forEach((kind, ids) -> {
            for (String id : ids) {
                check(seen.add(id), "id " + id + " given twice");
                String mark = markOf.get(letters(id));
                check(mark == null, kind + " " + id + " reads like mark " + mark);
                String other = kindOf.putIfAbsent(letters(id), kind);
                check(other == null || other.equals(kind), kind + " " + id + " reads like the ids of a " + other);
            }
        });
    }

    /**
     * The letters a text starts with, in upper case, once everything but letters and digits is dropped: two texts
     * with the same such letters read alike (C1, c-01; BDL-1, bdl12).
     */
    public static String letters(String text) {
        String plain = text.toUpperCase(Locale.ROOT).replaceAll("[^\\p{L}\\p{Nd}]", "");
        Matcher m = LEADING_LETTERS.matcher(plain);
        return m.find() ? m.group() : "";
    }

    private static boolean sameIds(List<String> printed, List<String> held) {
        return printed.stream().sorted().toList().equals(held.stream().sorted().toList());
    }

    /** Each id has the text of the one before it before its last number, and a larger last number. */
    public static boolean inNumberOrder(List<String> ids) {
        for (int i = 1; i < ids.size(); i++) {
            Matcher a = LAST_NUMBER.matcher(ids.get(i - 1));
            Matcher b = LAST_NUMBER.matcher(ids.get(i));
            if (!a.matches() || !b.matches() || !a.group(1).equals(b.group(1))
                    || new BigInteger(a.group(2)).compareTo(new BigInteger(b.group(2))) >= 0) {
                return false;
            }
        }
        return true;
    }

    private static List<CSVRecord> read(String csv, List<String> header) {
        List<CSVRecord> rows = CsvOutput.records(csv);
        check(rows.isEmpty() || rows.get(0).getParser().getHeaderNames().equals(header), "CSV header " + header);
        return rows;
    }

    /** "A1 x 12; N90 x 40" (packing-lists.csv) as a map. */
    private static Map<String, Integer> parseMarks(String text) {
        Map<String, Integer> marks = new TreeMap<>();
        if (text.isBlank()) {
            return marks;
        }
        for (String part : text.split("; ")) {
            int at = part.lastIndexOf(" x ");
            check(at > 0, "marks written as 'MARK x COUNT': " + part);
            marks.merge(part.substring(0, at), Integer.parseInt(part.substring(at + 3)), Integer::sum);
        }
        return marks;
    }

    private static List<String> words(String text) {
        return text.isBlank() ? List.of() : List.of(text.split(" "));
    }

    private static String piece(String mark, double lengthMm) {
        return mark + " @ " + Math.round(lengthMm * 1000) / 1000.0;
    }

    private static void walk(NestedTube tube, java.util.function.Consumer<NestedTube> visit) {
        visit.accept(tube);
        tube.guests().forEach(g -> walk(g, visit));
    }

    private static void check(boolean condition, String message) {
        if (!condition) {
            throw new AssertionError("plan invalid: " + message);
        }
    }
}
