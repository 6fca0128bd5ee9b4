package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import javax.xml.parsers.DocumentBuilderFactory;
import kitwright.loading.LoadPlan;
import kitwright.loading.RowLoadPlanner;
import kitwright.loading.VehicleLoad;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.VehicleType;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.packing.Fixtures;
import kitwright.packing.ItemKind;
import kitwright.packing.LaneCratePacker;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class LogisticsDrawingsTest {
    private static final String HOSTILE = "<b>&\"crate";
    private final CrateType type = Fixtures.crate(HOSTILE, 2000, 1000, 1000, 50, 100_000, 100.0);
    private final List<Joint> joints = List.of(new Joint("N1", 100, 1, 30));
    private final CratePlan crates = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 5, 2))
            .pack(Fixtures.bundles(130, 1000, 100, 10), joints, List.of(type), JointBox.DEFAULT);
    private final List<VehicleType> vehicles = List.of(new VehicleType("truck <1>", 6200, 2450, 2400, 20_000, 400,
            "invented"));
    private final LoadPlan loads = new RowLoadPlanner().load(crates, List.of(type), vehicles);

    private static Document parse(String svg) throws Exception {
        return DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    @DisplayName("crate cross-section: well-formed SVG, one circle per lane, escaped names, same bytes twice")
    void crateSection() throws Exception {
        CratePlanValidator.check(crates, Fixtures.bundles(130, 1000, 100, 10), joints, List.of(type),
                JointBox.DEFAULT);
        Crate first = crates.crates().get(0);
        String svg = CrateSectionDrawing.draw("crate-" + first.id(), first);
        Document doc = parse(svg);
        long lanes = first.items(ItemKind.BUNDLE).stream().map(i -> List.of(i.yMm(), i.zMm())).distinct().count();
        assertThat(doc.getElementsByTagName("circle").getLength()).isEqualTo((int) lanes);
        assertThat(svg).doesNotContain("<b>").contains("&lt;b&gt;&amp;&quot;crate").doesNotContain("<script");
        assertThat(CrateSectionDrawing.draw("crate-" + first.id(), first)).isEqualTo(svg);
        // two bundles of 1000 mm end to end in each lane of a 2000 mm crate: the lane says so
        assertThat(svg).contains("data-bundles=\"2\"");
        String firstBundle = first.items(ItemKind.BUNDLE).get(0).ref();
        String tinted = CrateSectionDrawing.draw("crate-" + first.id(), first, Map.of(firstBundle, "#123456"));
        assertThat(tinted.split("fill=\"#123456\"", -1)).as("the lane of the tinted bundle").hasSize(2);
    }

    @Test
    @DisplayName("deck plan: one footprint per stack, centre of gravity marked at its distance, escaped names")
    void deckPlan() throws Exception {
        LoadPlanValidator.check(loads, crates, List.of(type), vehicles);
        Map<String, Crate> byId = crates.crates().stream().collect(Collectors.toMap(Crate::id, Function.identity()));
        VehicleLoad v = loads.vehicles().get(0);
        String svg = DeckPlanDrawing.draw("deck-" + v.id(), v, byId);
        Document doc = parse(svg);
        long stacks = v.crates().stream().map(p -> List.of(p.xMm(), p.yMm())).distinct().count();
        assertThat(doc.getElementsByTagName("g").getLength()).isEqualTo((int) stacks + 1);
        assertThat(svg).contains("data-cog-mm=\"" + Svg.number(v.centreOfGravityMm()) + "\"")
                .contains("truck &lt;1&gt;").doesNotContain("<script");
        assertThat(DeckPlanDrawing.draw("deck-" + v.id(), v, byId)).isEqualTo(svg);
    }
}
