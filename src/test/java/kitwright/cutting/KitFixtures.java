package kitwright.cutting;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;

/** Kits built in code for stage tests (invented data). */
public final class KitFixtures {
    private KitFixtures() {
    }

    public static Kit kit(List<Section> sections, List<StockLength> stock, List<Bar> bars, KitSettings settings) {
        Map<String, Section> byName = new LinkedHashMap<>();
        sections.forEach(s -> byName.put(s.name(), s));
        TubeCatalog catalog = new TubeCatalog(Path.of("test-catalog.csv"), byName, stock);
        return new Kit(null, settings, bars, List.of(), List.of(), catalog, Map.of(), List.of(), List.of());
    }

    public static Section chs(String name, double diameter, double wall) {
        return new Section(name, "steel", diameter, wall, null, null, null);
    }

    public static Bar bar(String mark, String section, double length, int quantity) {
        return new Bar(mark, section, length, quantity, quantity, null, 0.5, "");
    }

    /**
     * A random kit: 1-3 sections of 1-5 marks (200-2900 mm, 1-12 bars), 6 m mill stock (and sometimes 12 m), a
     * rack row now and then, kerf 0-3 mm, trim 0-8 mm, minimum remnant 300-800 mm.
     */
    public static Kit random(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        String[] names = {"CHS 33.7x2.6", "CHS 48.3x3.2", "CHS 60.3x3.2"};
        double[] diameters = {33.7, 48.3, 60.3};
        int count = 1 + random.nextInt(3);
        List<Section> sections = new ArrayList<>();
        List<StockLength> stock = new ArrayList<>();
        List<Bar> bars = new ArrayList<>();
        int mark = 1;
        for (int s = 0; s < count; s++) {
            sections.add(chs(names[s], diameters[s], 2.6));
            boolean priced = random.nextInt(5) != 0;
            stock.add(new StockLength(names[s], 6000, priced ? 30.0 + s : null, null, Origin.MILL));
            if (random.nextBoolean()) {
                stock.add(new StockLength(names[s], 12000, priced ? 55.0 + s : null, null, Origin.MILL));
            }
            if (random.nextInt(3) == 0) {
                stock.add(new StockLength(names[s], 1500 + 100 * random.nextInt(30), priced ? 1.0 : null,
                        1 + random.nextInt(3), Origin.RACK));
            }
            int marks = 1 + random.nextInt(5);
            for (int m = 0; m < marks; m++) {
                bars.add(bar("B" + mark++, names[s], 200 + random.nextInt(2700), 1 + random.nextInt(12)));
            }
        }
        KitSettings settings = KitSettings.defaults("random-" + seed)
                .withKerfMm(random.nextInt(4))
                .withTrimMm(random.nextInt(9))
                .withMinRemnantMm(300 + 100 * random.nextInt(6));
        return kit(sections, stock, bars, settings);
    }
}
