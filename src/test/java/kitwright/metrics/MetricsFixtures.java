package kitwright.metrics;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.io.InvalidInputException;
import kitwright.io.MaterialsReader;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockLength;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;

/** Hand-made kits and cutting patterns for the metrics and compare tests (invented data). */
public final class MetricsFixtures {
    public static final String CHS_48 = "CHS 48.3x3.2";
    public static final String CHS_60 = "CHS 60.3x3.2";
    public static final double KERF = 2;
    public static final double TRIM = 5;
    public static final double MIN_REMNANT = 500;

    private MetricsFixtures() {
    }

    /** The project's materials catalog, stock-catalogs/materials.csv (factors with their sources), as read by io. */
    public static final Path MATERIALS_CSV = Path.of("stock-catalogs", "materials.csv");

    public static Map<String, Material> materials() {
        try {
            return MaterialsReader.read(MATERIALS_CSV);
        } catch (InvalidInputException e) {
            throw new IllegalStateException(e.problems().toString(), e);
        }
    }

    public static TubeCatalog catalog() {
        Map<String, Section> sections = new java.util.LinkedHashMap<>();
        sections.put(CHS_48, new Section(CHS_48, "steel", 48.3, 3.2, null, null, null));
        sections.put(CHS_60, new Section(CHS_60, "steel", 60.3, 3.2, null, null, null));
        return new TubeCatalog(Path.of("tubes.csv"), sections, List.of(
                new StockLength(CHS_48, 6000, 60.0, null, Origin.MILL),
                new StockLength(CHS_48, 12000, 110.0, null, Origin.MILL),
                new StockLength(CHS_48, 2500, 0.0, 3, Origin.RACK),
                new StockLength(CHS_60, 6000, 80.0, null, Origin.MILL)));
    }

    public static Bar bar(String mark, String section, double length, int quantity, int required) {
        return new Bar(mark, section, length, quantity, required, null, null, "");
    }

    /** Marks A, B on CHS 48.3 and C on CHS 60.3, 8 joints of 1.5 kg, no structures.csv. */
    public static Kit kit(Map<String, Material> materials) {
        return new Kit(null, KitSettings.defaults("fixture").withKerfMm(KERF).withTrimMm(TRIM)
                .withMinRemnantMm(MIN_REMNANT),
                List.of(bar("A", CHS_48, 2900, 12, 12), bar("B", CHS_48, 1800, 3, 3), bar("C", CHS_60, 2950, 4, 4)),
                List.of(), List.of(new Joint("N1", 100, 1.5, 8)), catalog(), materials, List.of(), List.of());
    }

    /**
     * A cutting pattern whose offcut follows the saw model (src/docs/sources.md): offcut = stock - 2 trim
     * - sum(lengths) - pieces x kerf, floored at 0; a remnant from MIN_REMNANT up.
     */
    public static CutPattern pattern(double stock, Origin origin, int count, Cut... cuts) {
        double used = 0;
        for (Cut c : cuts) {
            used += c.lengthMm() + KERF;
        }
        double offcut = Math.max(0, stock - 2 * TRIM - used);
        return new CutPattern(stock, origin, count, List.of(cuts), offcut, offcut >= MIN_REMNANT ? "remnant" : "scrap");
    }

    public static List<StructureCount> structures(Object... rows) {
        List<StructureCount> list = new java.util.ArrayList<>();
        for (int i = 0; i < rows.length; i += 3) {
            list.add(new StructureCount((String) rows[i], (String) rows[i + 1], (Integer) rows[i + 2]));
        }
        return list;
    }
}
