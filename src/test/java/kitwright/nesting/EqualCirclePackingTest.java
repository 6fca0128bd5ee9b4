package kitwright.nesting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class EqualCirclePackingTest {

    @ParameterizedTest(name = "n = {0}: container ratio {1} (Graham, Lubachevsky et al. 1998; Specht's tables)")
    @CsvSource({"1, 1", "2, 2", "3, 2.154700538", "4, 2.414213562", "5, 2.701301617", "6, 3", "7, 3",
        "8, 3.304764871", "19, 4.863703305"})
    void ratioMatchesPublishedValue(int n, double published) {
        assertThat(EqualCirclePacking.ratio(n)).isCloseTo(published, within(1e-8));
    }

    @ParameterizedTest(name = "n = {0}: the centres realise the ratio (inside the container, no two overlapping)")
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8, 19})
    void centresAreAValidPacking(int n) {
        double[][] c = EqualCirclePacking.centres(n);
        assertThat(c).hasNumberOfRows(n);
        double ratio = EqualCirclePacking.ratio(n);
        double outermost = 0;
        for (int i = 0; i < n; i++) {
            double r = Math.hypot(c[i][0], c[i][1]);
            outermost = Math.max(outermost, r);
            assertThat(r + 1).isLessThanOrEqualTo(ratio + 1e-12);
            for (int j = i + 1; j < n; j++) {
                assertThat(Math.hypot(c[i][0] - c[j][0], c[i][1] - c[j][1])).isGreaterThanOrEqualTo(2 - 1e-12);
            }
        }
        assertThat(outermost + 1).isCloseTo(ratio, within(1e-12)); // the ring touches the container
    }

    @ParameterizedTest(name = "n = {0} guests of 26.9 mm fit a bore of ratio(n) x 26.9 + 2 mm, not one 1 % smaller")
    @ValueSource(ints = {2, 3, 4, 5, 6, 7})
    void guestsSideBySide(int n) {
        double d = 26.9;
        double clearance = 2.0;
        double exact = EqualCirclePacking.ratio(n) * d + clearance; // Graham, Lubachevsky et al. 1998
        assertThat(bundles(n, d, exact, clearance)).isEqualTo(1);
        assertThat(bundles(n, d, 0.99 * EqualCirclePacking.ratio(n) * d + clearance, clearance)).isGreaterThan(1);
    }

    /** One host of the given bore, 1020 mm long, and n guests 1000 mm long (no room end to end). */
    private static int bundles(int n, double d, double bore, double clearance) {
        List<Tube> tubes = new ArrayList<>();
        tubes.add(new Tube(0, "HOST", "H", bore + 8, bore, 1020, 10));
        for (int i = 1; i <= n; i++) {
            tubes.add(new Tube(i, "G", "G", d, d - 4, 1000, 1));
        }
        NestingProblem problem = new NestingProblem(tubes, clearance, 10, null);
        NestResult result = Nester.run(problem, NestingFixtures.nominal(), NestingFixtures.quick());
        NestPlanValidator.validate(problem, result.plan());
        return result.plan().bundles().size();
    }
}
