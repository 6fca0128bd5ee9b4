package kitwright.plan;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import kitwright.metrics.KitMass;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.Section;
import kitwright.model.StructureCount;
import kitwright.spares.SparesPlan;
import kitwright.spares.SparesStage;

/**
 * What a kit holds, before anything is planned: marks, bars, cut length and mass per section, joints, the members
 * of each structure and the reuse ratio (members in all structures / bars in the kit), and the spares (bars beyond
 * what the structures need). Lengths are rounded to 0.1 mm, masses to 0.001 kg, the ratio to 0.001.
 *
 * @param members      members in all structures, or null without structures.csv
 * @param reuseRatio   members / bars, or null without structures.csv
 * @param barsMassKg   mass of all bars, the miscut allowance and the spares to make included, or null when
 *                     materials are unknown
 * @param jointsMassKg mass of all joints (0 without joints.csv)
 * @param kitMassKg    bars plus joints ({@link KitMass}), or null when materials are unknown
 * @param spares       marks with more bars than the structures need, and how many more
 * @param sparesToMake spare bars made beyond bars.csv (the service-life spares of kit.json's policy before a plan,
 *                     those the plan cut after), counted in {@code barsMassKg}
 * @param allowance    miscut allowance pieces of all marks (kit.json {@code miscutAllowance}), cut beyond bars.csv
 *                     and counted in {@code barsMassKg}; each mark's in {@link MarkLine#allowance()}
 */
public record KitSummary(String kit, String description, int marks, int bars, Integer members, Double reuseRatio,
                         List<SectionTotal> sections, List<MarkLine> markList, List<StructureMembers> structures,
                         JointTotal joints, Double barsMassKg, double jointsMassKg, Double kitMassKg,
                         List<SpareCount> spares, int sparesToMake, int allowance) {

    public KitSummary {
        sections = List.copyOf(sections);
        markList = List.copyOf(markList);
        structures = List.copyOf(structures);
        spares = List.copyOf(spares);
    }

    /** Totals of one section: marks, bars, total cut length and mass (null when the material is unknown). */
    public record SectionTotal(String section, String material, int marks, int bars, double cutLengthMm,
                               Double massKg) {
    }

    /**
     * One mark: cut length, kit quantity, what the structures need, the surplus, the mark's total mass (of its
     * quantity) and its miscut allowance pieces, cut beyond the quantity.
     */
    public record MarkLine(String mark, String section, double lengthMm, int quantity, int required, int surplus,
                           Double massKg, int allowance) {
    }

    /** Members (bars in place) of one structure. */
    public record StructureMembers(String structure, int members) {
    }

    /** Joint types, pieces and their total mass. */
    public record JointTotal(int types, int count, double massKg) {
    }

    /** Spare bars of one mark: the kit's quantity minus what the structures need. */
    public record SpareCount(String mark, int count) {
    }

    /**
     * Summarises a validated kit before it is planned: the spares to make are those kit.json's spares policy sizes
     * ({@link SparesStage#sizing}, as {@code plan} makes them), none without a policy.
     */
    public static KitSummary of(Kit kit) {
        Map<String, Integer> toMake = new LinkedHashMap<>();
        SparesPlan sizing = SparesStage.sizing(kit);
        if (sizing != null) {
            sizing.marks().forEach(m -> toMake.put(m.mark(), m.toMake()));
        }
        return of(kit, toMake);
    }

    /**
     * Summarises a validated kit that holds {@code sparesToMake} bars per mark beyond bars.csv (a plan's spares
     * cut, {@link KitMass#sparesCut}).
     */
    public static KitSummary of(Kit kit, Map<String, Integer> sparesToMake) {
        KitMass kitMass = KitMass.of(kit, sparesToMake);
        List<MarkLine> markList = new ArrayList<>();
        List<SpareCount> spares = new ArrayList<>();
        boolean massKnown = kitMass.barsMassKg() != null;
        for (Bar bar : kit.bars()) {
            Optional<Double> each = kit.barMassKg(bar);
            Double total = each.map(m -> m * bar.quantity()).orElse(null);
            markList.add(new MarkLine(bar.mark(), bar.section(), round(bar.lengthMm(), 1), bar.quantity(),
                    bar.requiredQuantity(), bar.surplus(), total == null ? null : round(total, 3),
                    kit.allowance(bar)));
            if (bar.surplus() > 0) {
                spares.add(new SpareCount(bar.mark(), bar.surplus()));
            }
        }
        int bars = kit.bars().stream().mapToInt(Bar::quantity).sum();
        Integer members = null;
        Double reuseRatio = null;
        if (!kit.structures().isEmpty()) {
            members = kit.barCounts().stream().mapToInt(StructureCount::count).sum();
            reuseRatio = round((double) members / bars, 3);
        }
        double jointsMass = kitMass.jointsMassKg();
        JointTotal joints = new JointTotal(kit.joints().size(), kitMass.joints(), round(jointsMass, 3));
        Double barsMassKg = massKnown ? round(kitMass.barsMassKg(), 3) : null;
        Double kitMassKg = massKnown ? round(kitMass.totalKg(), 3) : null;
        return new KitSummary(kit.name(), kit.settings().description(), kit.bars().size(), bars, members,
                reuseRatio, sections(kit), markList, structures(kit), joints, barsMassKg, round(jointsMass, 3),
                kitMassKg, spares, kitMass.spares(), kitMass.allowance());
    }

    private static List<SectionTotal> sections(Kit kit) {
        List<SectionTotal> totals = new ArrayList<>();
        for (String name : kit.usedSections()) {
            Section section = kit.catalog().section(name).orElseThrow();
            List<Bar> bars = kit.bars().stream().filter(b -> b.section().equals(name)).toList();
            double length = bars.stream().mapToDouble(b -> b.lengthMm() * b.quantity()).sum();
            Double mass = kit.material(section)
                    .map(m -> round(section.massPerMetreKg(m.densityKgM3()) * length / 1000.0, 3)).orElse(null);
            totals.add(new SectionTotal(name, section.material(), bars.size(),
                    bars.stream().mapToInt(Bar::quantity).sum(), round(length, 1), mass));
        }
        return totals;
    }

    private static List<StructureMembers> structures(Kit kit) {
        Map<String, Integer> members = new LinkedHashMap<>();
        for (StructureCount count : kit.barCounts()) {
            members.merge(count.structure(), count.count(), Integer::sum);
        }
        return members.entrySet().stream().map(e -> new StructureMembers(e.getKey(), e.getValue())).toList();
    }

    /** Rounds half up to the given decimals, so that summaries read the same on every machine. */
    static double round(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).doubleValue();
    }
}
