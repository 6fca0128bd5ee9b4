package kitwright.cli;

import java.util.Locale;
import java.util.stream.Collectors;
import kitwright.plan.KitSummary;
import kitwright.plan.KitSummary.MarkLine;
import kitwright.plan.KitSummary.SectionTotal;
import kitwright.plan.KitSummary.StructureMembers;

/** The kit summary as the console shows it after {@code check}. */
final class SummaryText {
    private SummaryText() {
    }

    static String format(KitSummary s) {
        StringBuilder sb = new StringBuilder();
        sb.append("Kit ").append(s.kit());
        if (!s.description().isEmpty()) {
            sb.append(": ").append(s.description());
        }
        sb.append("\n\n").append(count(s.marks(), "mark")).append(", ").append(count(s.bars(), "bar"))
                .append(" in the kit\n");
        if (s.members() != null) {
            sb.append(count(s.structures().size(), "structure")).append(" with ")
                    .append(count(s.members(), "member")).append(" in all; reuse ratio ")
                    .append(fixed(s.reuseRatio(), 2)).append(" (members in all structures / bars in the kit)\n");
        } else {
            sb.append("No structures.csv: quantities as given; reuse ratio: none\n");
        }
        TextTable sections = new TextTable("Section", "Material", ">Marks", ">Bars", ">Cut length (m)",
                ">Mass (kg)");
        double totalLength = 0;
        Double totalMass = 0.0;
        for (SectionTotal t : s.sections()) {
            sections.row(t.section(), t.material(), t.marks(), t.bars(), fixed(t.cutLengthMm() / 1000, 3),
                    fixed(t.massKg(), 1));
            totalLength += t.cutLengthMm();
            totalMass = totalMass == null || t.massKg() == null ? null : totalMass + t.massKg();
        }
        sections.row("All sections", "", s.marks(), s.bars(), fixed(totalLength / 1000, 3), fixed(totalMass, 1));
        sb.append('\n').append(sections.render(""));
        TextTable marks = new TextTable("Mark", "Section", ">Cut length (mm)", ">Quantity", ">Needed", ">Surplus",
                ">Mass (kg)");
        for (MarkLine m : s.markList()) {
            marks.row(m.mark(), m.section(), fixed(m.lengthMm(), 1), m.quantity(), m.required(), m.surplus(),
                    fixed(m.massKg(), 1));
        }
        sb.append('\n').append(marks.render(""));
        if (!s.structures().isEmpty()) {
            TextTable structures = new TextTable("Structure", ">Members");
            for (StructureMembers m : s.structures()) {
                structures.row(m.structure(), m.members());
            }
            sb.append('\n').append(structures.render(""));
        }
        sb.append('\n');
        if (s.joints().types() == 0) {
            sb.append("Joints: none (no joints.csv)\n");
        } else {
            sb.append("Joints: ").append(count(s.joints().types(), "type")).append(", ")
                    .append(count(s.joints().count(), "piece")).append(", ")
                    .append(fixed(s.joints().massKg(), 1)).append(" kg\n");
        }
        if (s.kitMassKg() == null) {
            sb.append("Kit mass: unknown (no materials file found, so no densities)\n");
        } else {
            sb.append("Kit mass: ").append(fixed(s.kitMassKg(), 1)).append(" kg (bars ")
                    .append(fixed(s.barsMassKg(), 1)).append(" kg")
                    .append(s.allowance() == 0 ? "" : " with the " + count(s.allowance(), "miscut allowance piece"))
                    .append(s.sparesToMake() == 0 ? "" : (s.allowance() == 0 ? " with the " : " and the ")
                            + count(s.sparesToMake(), "spare bar") + " to make")
                    .append(", joints ").append(fixed(s.jointsMassKg(), 1)).append(" kg)\n");
        }
        // surplus bars of bars.csv, not the service-life spares of the line after it
        sb.append("Surplus bars (beyond what the structures need): ").append(s.spares().isEmpty() ? "none"
                : s.spares().stream().map(c -> c.mark() + " " + c.count()).collect(Collectors.joining(", ")))
                .append('\n');
        if (s.allowance() > 0) {
            sb.append("Miscut allowance (extra pieces for saw errors, cut beyond the quantity): ")
                    .append(count(s.allowance(), "piece")).append(" (").append(s.markList().stream()
                            .filter(m -> m.allowance() > 0).map(m -> m.mark() + " " + m.allowance())
                            .collect(Collectors.joining(", "))).append(")\n");
        }
        return sb.toString();
    }

    private static String count(int n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }

    private static String fixed(Double value, int decimals) {
        return value == null ? "-" : String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
