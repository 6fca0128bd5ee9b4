package kitwright.report;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;

/**
 * Everything {@link HtmlReport} draws, assembled from the stage results: the kit's name, the report's date and
 * the sections in reading order. A stage that did not run is simply absent: its sections are left out and the
 * rest of the report stands.
 *
 * <p>Order: summary, purchase order, saw sheets (when the cutting plan is given), then the blocks later stages add
 * ({@link Builder#section}), then cautions and the inputs used, which every report carries.
 *
 * @param kitName     the kit's name, shown in the title and the running header of every printed page
 * @param description the kit's description, or empty
 * @param date        the report's date (a parameter, never the clock, so the output is reproducible)
 * @param sections    the blocks in reading order
 */
public record ReportModel(String kitName, String description, LocalDate date, List<ReportSection> sections) {

    public ReportModel {
        Objects.requireNonNull(kitName, "kitName");
        Objects.requireNonNull(date, "date");
        description = description == null ? "" : description;
        sections = List.copyOf(sections);
        if (sections.stream().map(ReportSection::id).distinct().count() != sections.size()) {
            throw new IllegalArgumentException("section ids must be unique");
        }
    }

    /** The report of a kit and its cutting plan, dated {@code date}. */
    public static ReportModel of(Kit kit, CutPlan cutting, LocalDate date) {
        return builder(kit, date).cutting(cutting).build();
    }

    /** A builder to which each stage that ran hands its result. */
    public static Builder builder(Kit kit, LocalDate date) {
        return new Builder(kit, date);
    }

    /** Collects stage results; {@link #build()} turns them into sections. Not thread-safe; use once. */
    public static final class Builder {
        private final Kit kit;
        private final LocalDate date;
        private CutPlan cutting;
        private final List<ReportSection> extra = new ArrayList<>();
        private final List<CautionsSection.Caution> cautions = new ArrayList<>(CautionsSection.general());

        private Builder(Kit kit, LocalDate date) {
            this.kit = Objects.requireNonNull(kit, "kit");
            this.date = Objects.requireNonNull(date, "date");
        }

        /** The cutting stage's plan: adds the summary figures, the purchase order and the saw sheets. */
        public Builder cutting(CutPlan plan) {
            this.cutting = Objects.requireNonNull(plan, "plan");
            return this;
        }

        /** A block of a later stage, placed after the saw sheets in the order added. */
        public Builder section(ReportSection section) {
            extra.add(Objects.requireNonNull(section, "section"));
            return this;
        }

        /** A caution a stage needs its readers to see, after the general ones. */
        public Builder caution(String heading, String text) {
            cautions.add(new CautionsSection.Caution(heading, text));
            return this;
        }

        public ReportModel build() {
            List<ReportSection> sections = new ArrayList<>();
            List<SectionCutPlan> plans = cutting == null ? List.of() : cutting.sections();
            List<CuttingFigures> figures = plans.stream().map(p -> CuttingFigures.of(kit, p)).toList();
            sections.add(SummarySection.of(kit, figures));
            if (cutting != null) {
                sections.add(PurchaseOrderSection.of(kit, figures, date.toString()));
                sections.add(SawSheetSection.of(kit, plans, date.toString()));
            }
            sections.addAll(extra);
            sections.add(CautionsSection.of(cautions));
            sections.add(InputsSection.of(kit, plans));
            return new ReportModel(kit.name(), kit.settings().description(), date, sections);
        }
    }
}
