package kitwright.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.SectionCutPlan;
import kitwright.io.KitwrightVersion;
import kitwright.model.JointBox;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.SparesPolicy;

/**
 * The inputs the plan was made from, so a reader can repeat it: the kitwright version, every catalog with its
 * path, every setting that shaped the plan (saw, end deduction, structures, nesting, bundle mass, joint box,
 * spares, time limit), the materials with their sources, the saw settings each section was planned with, and
 * the marks of the kit.
 */
final class InputsSection {
    static final String ID = "inputs";

    record Setting(String name, String value) {
    }

    record SectionSetting(String section, String kerf, String trim, String minRemnant, String objective) {
    }

    record MaterialRow(String name, String density, String source) {
    }

    record MarkRow(String mark, String section, String length, String nodeToNode, String tolerance,
                   String quantity, String needed, String note) {
    }

    record View(List<Setting> settings, List<SectionSetting> sections, boolean hasSections,
                List<MaterialRow> materials, boolean hasMaterials, List<MarkRow> marks) {
    }

    private InputsSection() {
    }

    static ReportSection of(Kit kit, List<SectionCutPlan> plans) {
        KitSettings s = kit.settings();
        List<Setting> settings = new ArrayList<>();
        settings.add(new Setting("Kit", kit.name()));
        if (kit.dir() != null) {
            settings.add(new Setting("Kit folder", folderName(kit.dir())));
        }
        if (kit.files().workbook() != null) {
            settings.add(new Setting("Kit tables", file(kit.dir(), kit.files().workbook()) + ", sheets "
                    + String.join(", ", kit.files().sheets())));
        }
        settings.add(new Setting("kitwright", KitwrightVersion.current()));
        settings.add(new Setting("Tube catalog", file(kit.dir(), kit.catalog().file())));
        settings.add(new Setting("Materials catalog", catalog(kit.dir(), kit.files().materials(),
                "none (masses and carbon unknown)")));
        settings.add(new Setting("Crate catalog", catalog(kit.dir(), kit.files().crates(), "none")));
        settings.add(new Setting("Vehicle catalog", catalog(kit.dir(), kit.files().vehicles(), "none")));
        settings.add(new Setting("Kerf", ShopFormat.sawMmUnit(s.kerfMm())));
        settings.add(new Setting("End trim", ShopFormat.sawMmUnit(s.trimMm()) + " each end, including its own cut"));
        settings.add(new Setting("Minimum remnant", ShopFormat.mmUnit(s.minRemnantMm())
                + " (shorter offcuts are scrap)"));
        settings.add(new Setting("End deduction", ShopFormat.sawMmUnit(s.endDeductionMm())
                + " per end (node to node minus cut length, over two), unless bars.csv gives an end its own"));
        settings.add(new Setting("Structures", kit.structures().isEmpty()
                ? "none given (no structures.csv): quantities as bars.csv states them"
                : s.structuresStandTogether()
                ? "stand together: a mark's quantity is the sum over the structures"
                : "one at a time: a mark's quantity is the largest any structure needs"));
        settings.add(new Setting("Time limit", ShopFormat.seconds(s.timeLimitSeconds())
                + "\u00A0s per section and stage (a safety net)"));
        settings.add(new Setting("Nesting fit", s.nestTolerance().name().toLowerCase(java.util.Locale.ROOT)
                .replace('_', '-') + " tolerances, clearance " + ShopFormat.sawMmUnit(s.nestClearanceMm())
                + " on the diameter, " + ShopFormat.sawMmUnit(s.nestEndAllowanceMm()) + " kept free at each end"));
        settings.add(new Setting("Bundle mass limit", s.maxBundleMassKg() == null ? "none"
                : ShopFormat.kg(s.maxBundleMassKg()) + "\u00A0kg"));
        JointBox box = s.jointBox();
        settings.add(new Setting("Joint box", ShopFormat.mm(box.lengthMm()) + " \u00D7 " + ShopFormat.mm(box.widthMm())
                + " \u00D7 " + ShopFormat.mm(box.heightMm()) + "\u00A0mm, at most " + ShopFormat.kg(box.maxMassKg())
                + "\u00A0kg"));
        SparesPolicy spares = s.spares();
        settings.add(new Setting("Service-life spares", spares == null ? "none"
                : "loss rate " + ShopFormat.percent(spares.lossRatePerCycle()) + "\u00A0% per bar and cycle, "
                + spares.cycles() + " cycles, kit service level " + ShopFormat.percent(spares.serviceLevel())
                + "\u00A0%"));
        List<SectionSetting> sections = plans.stream().map(p -> new SectionSetting(p.section(),
                ShopFormat.sawMmUnit(p.kerfMm()), ShopFormat.sawMmUnit(p.trimMm()), ShopFormat.mmUnit(p.minRemnantMm()),
                "length".equals(p.objective()) ? "least stock length (no prices)" : "least cost")).toList();
        List<MaterialRow> materials = kit.materials().values().stream()
                .sorted(java.util.Comparator.comparing(Material::name))
                .map(m -> new MaterialRow(m.name(), ShopFormat.count(Math.round(m.densityKgM3())) + "\u00A0kg/m\u00B3",
                        m.source())).toList();
        List<MarkRow> marks = kit.bars().stream().map(b -> new MarkRow(b.mark(), b.section(),
                ShopFormat.mm(b.lengthMm()), b.nodeToNodeMm() == null ? "" : ShopFormat.mm(b.nodeToNodeMm()),
                b.toleranceMm() == null ? "" : "\u00B1\u2009" + ShopFormat.mm(b.toleranceMm()),
                ShopFormat.count(b.quantity()), ShopFormat.count(b.requiredQuantity()), b.note())).toList();
        return new ReportSection(ID, "Inputs used", "inputs", new View(List.copyOf(settings), sections,
                !sections.isEmpty(), materials, !materials.isEmpty(), marks));
    }

    /**
     * A file as the reader should see it: its path relative to the kit folder (../../stock-catalogs/steel.csv),
     * else its name. Both paths are made absolute first, so that the kit folder typed relative or absolute names
     * the file the same.
     */
    static String file(Path kitDir, Path file) {
        if (file == null) {
            return ShopFormat.UNKNOWN;
        }
        Path absolute = file.toAbsolutePath().normalize();
        Path shown = absolute.getFileName();
        if (kitDir != null) {
            Path folder = kitDir.toAbsolutePath().normalize();
            if (!absolute.equals(folder) && java.util.Objects.equals(folder.getRoot(), absolute.getRoot())) {
                shown = folder.relativize(absolute);
            }
        }
        return shown.toString().replace('\\', '/');
    }

    /** A catalog file as {@link #file}, or what it means that there is none. */
    private static String catalog(Path kitDir, Path file, String none) {
        return file == null ? none : file(kitDir, file);
    }


    /** The kit folder's own name, also when it was typed as "." or with a trailing "..". */
    private static String folderName(Path kitDir) {
        Path name = kitDir.toAbsolutePath().normalize().getFileName();
        return name == null ? kitDir.toString() : name.toString();
    }
}
