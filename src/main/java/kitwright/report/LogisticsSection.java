package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import kitwright.loading.LoadPlan;
import kitwright.loading.VehicleLoad;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.CratePlan;
import kitwright.packing.ItemKind;
import kitwright.packing.JointBoxLoad;

/**
 * The report block for crating and loading ("crates-and-trucks"): figures with their bounds and status, the
 * packing lists, one cross-section per distinct crate layout (crates packed alike share it, their ids listed), the
 * manifests and one deck plan per vehicle. Hand it to {@code ReportModel.Builder#section} and the cautions of
 * {@link LogisticsCautions} to {@code Builder#caution}. A pure function.
 */
public final class LogisticsSection {
    public static final String ID = "crates-and-trucks";

    record Figure(String label, String value, String note) {
    }

    record CrateRow(String id, String type, String marks, String bundles, String boxes, String gross) {
    }

    /**
     * A crate layout: the first crate drawn, its type, the other crates packed the same way (or null), and its
     * bundles by host mark with their swatches.
     */
    record CrateDrawing(String first, String type, String alike, List<HostCount> hosts, String svg) {
    }

    /** Bundles of one host mark in a crate: "A1 hosts, Ø 89.8 mm: 44". */
    record HostCount(String swatch, String mark, String diameter, String count) {
    }

    record TripRow(String id, String type, String crates, String mass, String floor, String centre, String cost,
                   String lateral, String axles, String balanceNote) {
    }

    record TripDrawing(String id, String type, String svg) {
    }

    /** The reasons are null unless that plan is INFEASIBLE. */
    record View(List<Figure> figures, String crateStatus, String crateStatusClass, String crateReason,
                String tripStatus, String tripStatusClass, String tripReason, List<CrateRow> crates,
                List<CrateDrawing> crateDrawings, List<TripRow> trips, List<TripDrawing> tripDrawings) {
    }

    private LogisticsSection() {
    }

    public static ReportSection of(CratePlan crates, LoadPlan loads, Iterable<Bundle> bundles,
                                   List<CrateType> catalog) {
        return of(crates, loads, bundles, catalog, Map.of());
    }

    /**
     * The block with the lanes of the crate cross-sections tinted by their bundles' host marks.
     *
     * @param fillByMark fill by mark (the report's {@link MarkPalette}); lanes of other marks stay white
     */
    public static ReportSection of(CratePlan crates, LoadPlan loads, Iterable<Bundle> bundles,
                                   List<CrateType> catalog, Map<String, String> fillByMark) {
        return of(crates, loads, bundles, catalog, fillByMark, "");
    }

    /**
     * The block with its drawings' ids prefixed by {@code drawingPrefix} (letters, digits and '-'), so that several
     * blocks (a tour's legs, whose crate and trip ids start again from 1) can stand on one page.
     */
    public static ReportSection of(CratePlan crates, LoadPlan loads, Iterable<Bundle> bundles,
                                   List<CrateType> catalog, Map<String, String> fillByMark, String drawingPrefix) {
        Map<String, Bundle> byId = new java.util.HashMap<>();
        bundles.forEach(b -> byId.put(b.id(), b));
        Map<String, String> laneFills = new java.util.HashMap<>();
        byId.forEach((id, b) -> {
            if (fillByMark.containsKey(b.host().mark())) {
                laneFills.put(id, fillByMark.get(b.host().mark()));
            }
        });
        Map<String, JointBoxLoad> boxes = crates.boxes().stream()
                .collect(Collectors.toMap(JointBoxLoad::id, Function.identity()));
        List<Figure> figures = new ArrayList<>();
        boolean crated = crates.status() != Status.INFEASIBLE;
        boolean loaded = crated && loads.status() != Status.INFEASIBLE;
        figures.add(new Figure("Crates", ShopFormat.count(crates.crates().size()), !crated
                ? "no crate plan: see the packing lists" : "lower bound " + crates.lowerBound()
                + (crates.bounds().price() == null ? "" : ", price bound " + ShopFormat.money(crates.bounds().price()))));
        figures.add(new Figure("Joint boxes", ShopFormat.count(crates.boxes().size()), "joints in boxes"));
        figures.add(new Figure("Trips", ShopFormat.count(loads.vehicles().size()), !loaded
                ? "no load plan: see the manifests"
                : "cost " + ShopFormat.money(loads.tripCost()) + ", bound " + ShopFormat.money(loads.lowerBound())));
        List<CrateRow> rows = crates.crates().stream().map(c -> new CrateRow(c.id(), c.type(),
                CrateContents.text(CrateContents.marks(c, byId, boxes)),
                ShopFormat.count(c.items(ItemKind.BUNDLE).size()), ShopFormat.count(c.items(ItemKind.BOX).size()),
                ShopFormat.kg(c.grossKg()))).toList();
        Map<String, List<Crate>> alike = new LinkedHashMap<>();
        for (Crate c : crates.crates()) {
            alike.computeIfAbsent(layoutKey(c), k -> new ArrayList<>()).add(c);
        }
        List<CrateDrawing> crateDrawings = alike.values().stream().map(group -> new CrateDrawing(group.get(0).id(),
                group.get(0).type(), group.size() == 1 ? null
                        : CrateContents.ids(group.stream().skip(1).map(Crate::id).toList(), ", "),
                hosts(group.get(0), byId, fillByMark),
                CrateSectionDrawing.draw(drawingPrefix + "crate-" + group.get(0).id(), group.get(0),
                        laneFills))).toList();
        Map<String, Crate> crateById = crates.crates().stream()
                .collect(Collectors.toMap(Crate::id, Function.identity()));
        List<TripRow> trips = loads.vehicles().stream().map(v -> new TripRow(v.id(), v.type(),
                CrateContents.ids(v.crates().stream().map(p -> p.ref()).toList(), " "),
                ShopFormat.kg(v.massKg()) + " / " + ShopFormat.kg(v.payloadKg()),
                ShopFormat.mm(v.floorLengthMm()) + " / " + ShopFormat.mm(v.deckLengthMm()),
                ShopFormat.mm(v.centreOfGravityMm()), ShopFormat.money(v.costPerTrip()), AxleLoadText.lateral(v),
                AxleLoadText.of(v), v.balanceNote())).toList();
        List<TripDrawing> tripDrawings = new ArrayList<>();
        for (VehicleLoad v : loads.vehicles()) {
            tripDrawings.add(new TripDrawing(v.id(), v.type(), DeckPlanDrawing.draw(drawingPrefix + "deck-" + v.id(), v,
                    crateById)));
        }
        View view = new View(figures, status(crates.status(), crates.bounds().gap()), statusClass(crates.status()),
                reason(crates.status(), crates.reason()), status(loads.status(), loads.bounds().gap()),
                statusClass(loads.status()), crates.status() == Status.INFEASIBLE ? reason(loads.status(),
                "no crates to load") : reason(loads.status(), loads.reason()), rows, crateDrawings, trips,
                tripDrawings);
        return new ReportSection(ID, "Crates and trucks", "logistics", view);
    }

    /** The bundles of a crate by host mark and envelope, in crate order. */
    private static List<HostCount> hosts(Crate crate, Map<String, Bundle> bundles, Map<String, String> fillByMark) {
        Map<List<Object>, Integer> counts = new LinkedHashMap<>();
        for (CrateItem i : crate.items(ItemKind.BUNDLE)) {
            Bundle b = bundles.get(i.ref());
            if (b != null) {
                counts.merge(List.of(b.host().mark(), b.envelopeDiameterMm()), 1, Integer::sum);
            }
        }
        List<HostCount> hosts = new ArrayList<>();
        counts.forEach((key, n) -> hosts.add(new HostCount(Swatches.mark(fillByMark.getOrDefault((String) key.get(0),
                "#ffffff")), (String) key.get(0), ShopFormat.mm((Double) key.get(1)), ShopFormat.count(n))));
        return hosts;
    }

    /** Crates of one type with items in the same places look the same in cross-section. */
    private static String layoutKey(Crate c) {
        StringBuilder sb = new StringBuilder(c.type());
        for (CrateItem i : c.items()) {
            sb.append('|').append(i.kind()).append(i.yMm()).append(',').append(i.zMm()).append(',').append(i.widthMm())
                    .append(',').append(i.heightMm()).append(',').append(i.xMm());
        }
        return sb.toString();
    }

    private static String status(Status status, double gap) {
        return switch (status) {
            case OPTIMAL -> "optimal";
            case INFEASIBLE -> "infeasible";
            default -> status.name().toLowerCase(Locale.ROOT) + ", gap " + ShopFormat.percent(gap) + " %";
        };
    }

    /** Why an INFEASIBLE plan has none, else null (nothing shown). */
    private static String reason(Status status, String reason) {
        if (status != Status.INFEASIBLE) {
            return null;
        }
        return reason == null || reason.isBlank() ? "no reason given" : reason.strip();
    }

    private static String statusClass(Status status) {
        return "status-" + status.name().toLowerCase(Locale.ROOT);
    }
}
