package kitwright.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;

/**
 * The inputs the plan was made from, so a reader can repeat it: kit settings (kerf, trim, minimum remnant, time
 * limit), the files read, the materials with their sources, the saw settings each section was planned with, and
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
        settings.add(new Setting("Tube catalog", file(kit.dir(), kit.catalog().file())));
        settings.add(new Setting("Kerf", ShopFormat.sawMmUnit(s.kerfMm())));
        settings.add(new Setting("End trim", ShopFormat.sawMmUnit(s.trimMm()) + " each end, including its own cut"));
        settings.add(new Setting("Minimum remnant", ShopFormat.mmUnit(s.minRemnantMm())
                + " (shorter offcuts are scrap)"));
        settings.add(new Setting("Time limit", ShopFormat.seconds(s.timeLimitSeconds())
                + "\u00A0s per section and stage (a safety net)"));
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
     * A file as the reader should see it: relative to the kit folder when it lies below it, else its name. Both
     * paths are made absolute first, so that the kit folder typed relative or absolute names the file the same.
     */
    static String file(Path kitDir, Path file) {
        if (file == null) {
            return ShopFormat.UNKNOWN;
        }
        Path absolute = file.toAbsolutePath().normalize();
        Path shown = absolute.getFileName();
        if (kitDir != null) {
            Path folder = kitDir.toAbsolutePath().normalize();
            if (absolute.startsWith(folder) && !absolute.equals(folder)) {
                shown = folder.relativize(absolute);
            }
        }
        return shown.toString().replace('\\', '/');
    }

    /** The kit folder's own name, also when it was typed as "." or with a trailing "..". */
    private static String folderName(Path kitDir) {
        Path name = kitDir.toAbsolutePath().normalize().getFileName();
        return name == null ? kitDir.toString() : name.toString();
    }
}
