package kitwright.cli;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.loading.LoadPlan;
import kitwright.loading.VehicleLoad;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.packing.StructureShare;
import kitwright.report.CrateContents;
import kitwright.report.ShopFormat;

/** The text {@code kitwright pack} prints: crates and trips, each beside its lower bound and status. */
final class PackSummary {
    private PackSummary() {
    }

    /**
     * @param kit the kit's name for the heading line, or null for none (when the text follows the kit's cutting and
     *            nesting summary, as in {@code plan})
     */
    static String text(String kit, StructureShare share, CratePlan crates, LoadPlan loads, List<CrateType> catalog) {
        StringBuilder sb = new StringBuilder();
        if (kit != null) {
            sb.append("Kit ").append(kit);
        }
        if (kit != null && share != null) {
            sb.append(", packed for structure '").append(share.structure()).append("': the bundles holding its tubes");
            if (!share.extraTubes().isEmpty()) {
                sb.append(" (riding along beyond its counts: ").append(CrateContents.plainText(share.extraTubes()))
                        .append(')');
            }
            sb.append(share.allJoints() ? "; all the kit's joints (structures.csv counts bars only)" : "");
        }
        if (kit != null) {
            sb.append(".\n");
        }
        if (crates.status() == Status.INFEASIBLE) {
            sb.append("Crates: none planned; INFEASIBLE: ").append(reason(crates.reason())).append('\n');
            sb.append("Trips: none planned (no crates to load).\n");
            return sb.toString();
        }
        Map<String, Integer> byType = new TreeMap<>();
        crates.crates().forEach(c -> byType.merge(c.type(), 1, Integer::sum));
        sb.append("Crates: ").append(crates.crates().size()).append(byType.isEmpty() ? "" : " (" + counts(byType) + ")");
        Double price = crates.price(catalog);
        if (price != null) {
            sb.append(", price ").append(money(price));
        }
        sb.append("; lower bound ").append(crates.lowerBound()).append(crates.lowerBound() == 1 ? " crate" : " crates");
        if (crates.bounds().price() != null) {
            sb.append(", price ").append(money(crates.bounds().price()));
        }
        sb.append("; ").append(crates.status()).append(limited(crates.status(), crates.reason())).append(", gap ").append(percent(crates.bounds().gap()))
                .append(" %.\n");
        sb.append("Joint boxes: ").append(crates.boxes().size()).append(".\n");
        if (loads.status() == Status.INFEASIBLE) {
            sb.append("Trips: none planned; INFEASIBLE: ").append(reason(loads.reason())).append('\n');
            return sb.toString();
        }
        Map<String, Integer> byVehicle = new TreeMap<>();
        loads.vehicles().forEach(v -> byVehicle.merge(v.type(), 1, Integer::sum));
        sb.append("Trips: ").append(loads.vehicles().size())
                .append(byVehicle.isEmpty() ? "" : " (" + counts(byVehicle) + ")")
                .append(", cost ").append(money(loads.tripCost()))
                .append("; lower bound ").append(money(loads.lowerBound()))
                .append(" (fleet LP ").append(money(loads.bounds().fleetRelaxation())).append("); ")
                .append(loads.status()).append(limited(loads.status(), loads.reason())).append(", gap ").append(percent(loads.bounds().gap()))
                .append(" %.\n");
        for (VehicleLoad v : loads.vehicles()) {
            sb.append("  ").append(v.id()).append(' ').append(v.type()).append(": ").append(v.crates().size())
                    .append(v.crates().size() == 1 ? " crate, " : " crates, ").append(kg(v.massKg()))
                    .append(" kg of ")
                    .append(kg(v.payloadKg())).append(" kg, floor ").append(mm(v.floorLengthMm()))
                    .append(" of ").append(mm(v.deckLengthMm())).append(" mm, centre of gravity ")
                    .append(mm(v.centreOfGravityMm())).append(" mm from the front, ")
                    .append(mm(Math.abs(v.lateralCentreOfGravityMm()))).append(" mm off the centreline; ")
                    .append(axles(v)).append(".\n");
            if (v.balanceNote() != null) {
                sb.append("    ").append(v.balanceNote()).append(".\n");
            }
        }
        if (loads.totalCost() != null) {
            sb.append("Crates and trips: ").append(money(loads.totalCost())).append("; lower bound ")
                    .append(money(loads.totalLowerBound())).append(", gap ").append(percent(loads.totalGap()))
                    .append(" %.\n");
        }
        return sb.toString();
    }

    // Plain ASCII numbers for the console, as the cutting summary prints them ("3476.2 kg"): the report's digit
    // groups (a narrow no-break space) show as '?' or worse in many terminals and trip up scripts.
    private static String money(double value) {
        return ShopFormat.money(value).replace(ShopFormat.GROUP, "");
    }

    /** "kingpin 9120 of 12000 kg, rear axles 17400 of 24000 kg" or "axle loads not checked". */
    private static String axles(VehicleLoad v) {
        if (v.axleLoadsKg() == null || v.axles() == null) {
            return kitwright.report.LogisticsCsv.NOT_CHECKED;
        }
        return kitwright.report.LogisticsCsv.frontSupport(v) + " " + kg(v.axleLoadsKg().front()) + " of "
                + kg(v.axles().maxFrontKg()) + " kg, rear axles " + kg(v.axleLoadsKg().rear()) + " of "
                + kg(v.axles().maxRearKg()) + " kg";
    }

    private static String kg(double value) {
        return ShopFormat.kg(value).replace(ShopFormat.GROUP, "");
    }

    private static String mm(double value) {
        return ShopFormat.mm(value).replace(ShopFormat.GROUP, "");
    }

    private static String percent(double value) {
        return ShopFormat.percent(value).replace(ShopFormat.GROUP, "");
    }

    /** The reason of an INFEASIBLE plan as a sentence. */
    /** ", stopped by the time limit" after a FEASIBLE status whose search the clock cut short, else "". */
    private static String limited(Status status, String reason) {
        return status == Status.FEASIBLE && reason != null ? ", " + reason : "";
    }

    private static String reason(String reason) {
        String text = reason == null || reason.isBlank() ? "no reason given" : reason.strip();
        return text.endsWith(".") ? text : text + ".";
    }

    private static String counts(Map<String, Integer> counts) {
        StringBuilder sb = new StringBuilder();
        counts.forEach((k, n) -> sb.append(sb.length() == 0 ? "" : ", ").append(k).append(" x ").append(n));
        return sb.toString();
    }
}
