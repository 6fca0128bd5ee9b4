package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Status;
import net.jqwik.api.ForAll;
import net.jqwik.api.Label;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;

class ComparisonProperties {

    @Property(tries = 100, seed = "11")
    @Label("The best of a row is the lowest (reuse: highest) ranked value; every other ranked value is worse")
    void bestIsExtreme(@ForAll @Size(min = 1, max = 6) List<@IntRange(min = 0, max = 50) Integer> costs) {
        List<OptionSummary> options = new ArrayList<>();
        for (int i = 0; i < costs.size(); i++) {
            options.add(CompareFixtures.option("o" + i, 3 + i, costs.get(i) / 10.0, costs.get(i) * 100.0, 5.0, 2,
                    Status.OPTIMAL));
        }
        Comparison c = Comparison.of(options);
        for (Comparison.Row row : c.rows()) {
            if (row.metric().direction() == CompareMetric.Direction.NONE) {
                assertThat(row.best()).isNull();
                continue;
            }
            if (row.cells().stream().allMatch(cell -> cell.value() == null)) {
                // a figure no option knows (these options give no crate prices): nothing to rank
                assertThat(row.cells()).allSatisfy(cell -> assertThat(cell.isBest()).isFalse());
                continue;
            }
            assertThat(row.cells()).anySatisfy(cell -> assertThat(cell.isBest()).isTrue());
            for (Comparison.Cell cell : row.cells()) {
                assertThat(cell.difference()).isNotNull();
                if (row.metric().direction() == CompareMetric.Direction.LOWER) {
                    assertThat(cell.difference()).isGreaterThanOrEqualTo(0.0);
                } else {
                    assertThat(cell.difference()).isLessThanOrEqualTo(0.0);
                }
                assertThat(cell.isBest()).isEqualTo(cell.difference() == 0.0);
            }
        }
    }
}
