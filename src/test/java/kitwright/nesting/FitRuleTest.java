package kitwright.nesting;

import static kitwright.nesting.NestingFixtures.steel;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.NestTolerance;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class FitRuleTest {
    // The nesting chain of EN 10219-2 sizes (src/docs/sources.md, "Tube sections").
    static final Section S889 = steel(88.9, 3.2);
    static final Section S761 = steel(76.1, 3.2);
    static final Section S603 = steel(60.3, 3.2);
    static final Section S483 = steel(48.3, 3.2);
    static final Section S337 = steel(33.7, 2.6);
    static final Section S424 = steel(42.4, 2.6);

    @Test
    @DisplayName("Nominal, 2 mm clearance: 88.9x3.2 > 76.1x3.2 > 60.3x3.2 > 48.3x3.2 > 33.7 nest; 42.4 not in 48.3x3.2 (sources.md, Tube sections)")
    void nominalChain() {
        FitRule rule = NestingFixtures.nominal();
        assertThat(rule.envelope(S889).boreMm()).isCloseTo(82.5, within(1e-9));
        assertThat(rule.envelope(S761).boreMm()).isCloseTo(69.7, within(1e-9));
        assertThat(rule.envelope(S603).boreMm()).isCloseTo(53.9, within(1e-9));
        assertThat(rule.envelope(S483).boreMm()).isCloseTo(41.9, within(1e-9));
        assertThat(rule.fits(rule.envelope(S761), rule.envelope(S889))).isTrue();
        assertThat(rule.fits(rule.envelope(S603), rule.envelope(S761))).isTrue();
        assertThat(rule.fits(rule.envelope(S483), rule.envelope(S603))).isTrue();
        assertThat(rule.fits(rule.envelope(S337), rule.envelope(S483))).isTrue();
        assertThat(rule.fits(rule.envelope(S424), rule.envelope(S483))).isFalse();
    }

    @Test
    @DisplayName("Worst case EN 10219-2, 2 mm clearance, 1 mm bead: spare margins 1.11, 4.40, 0.86, 3.56 mm (sources.md, hand-computed)")
    void worstCaseMargins() {
        FitRule rule = NestingFixtures.worstCase();
        Section[] chain = {S889, S761, S603, S483, S337};
        double[] margins = {1.11, 4.40, 0.86, 3.56};
        for (int i = 0; i < margins.length; i++) {
            TubeEnvelope host = rule.envelope(chain[i]);
            TubeEnvelope guest = rule.envelope(chain[i + 1]);
            double margin = host.boreMm() - guest.outerDiameterMm() - rule.clearanceMm();
            assertThat(margin).as("margin of %s in %s", chain[i + 1].name(), chain[i].name())
                    .isCloseTo(margins[i], within(0.005));
            assertThat(rule.fits(guest, host)).isTrue();
        }
        // Without the bead and the clearance the margins are 4.11, 7.40, 3.86, 6.56 mm (sources.md, hand-computed).
        double[] gross = {4.11, 7.40, 3.86, 6.56};
        for (int i = 0; i < gross.length; i++) {
            TubeEnvelope host = rule.envelope(chain[i]);
            double margin = host.boreMm() + host.weldBeadMm() - rule.envelope(chain[i + 1]).outerDiameterMm();
            assertThat(margin).isCloseTo(gross[i], within(0.005));
        }
    }

    @Test
    @DisplayName("EN 10219-2 tolerances from memory: OD 1 % within [0.5, 10] mm; wall 10 % up to 5 mm, 0.5 mm above")
    void steelTolerances() {
        assertThat(FitRule.steelOuterDiameterToleranceMm(33.7)).isEqualTo(0.5);
        assertThat(FitRule.steelOuterDiameterToleranceMm(88.9)).isCloseTo(0.889, within(1e-12));
        assertThat(FitRule.steelOuterDiameterToleranceMm(1219)).isEqualTo(10);
        assertThat(FitRule.steelWallToleranceMm(88.9, 3.2)).isCloseTo(0.32, within(1e-12));
        assertThat(FitRule.steelWallToleranceMm(88.9, 6.3)).isEqualTo(0.5);
    }

    @Test
    @DisplayName("EN 10219-2 (from memory), D > 406.4 mm: wall +/-10 % at most 2 mm; 508x10 bore 479.92, 610x25 548.9 (hand-computed)")
    void largeDiameterWallTolerance() {
        FitRule rule = NestingFixtures.worstCase();
        // 508 x 10: OD tolerance 1 % = 5.08 mm; wall 10 % of 10 = 1.0 mm (not 0.5: D > 406.4); bead 1.0 mm:
        // bore = (508 - 5.08) - 2 (10 + 1.0) - 1.0 = 479.92 mm, outside 508 + 5.08 = 513.08 mm.
        assertThat(rule.envelope(steel(508, 10)).boreMm()).isCloseTo(479.92, within(1e-9));
        assertThat(rule.envelope(steel(508, 10)).outerDiameterMm()).isCloseTo(513.08, within(1e-9));
        // 610 x 25: 10 % of 25 = 2.5 mm, capped at 2 mm: bore = (610 - 6.1) - 2 (25 + 2) - 1.0 = 548.9 mm.
        assertThat(rule.envelope(steel(610, 25)).boreMm()).isCloseTo(548.9, within(1e-9));
        // 406.4 x 10 is not above 406.4: wall 0.5 mm; bore = (406.4 - 4.064) - 2 (10 + 0.5) - 1.0 = 380.336 mm.
        assertThat(rule.envelope(steel(406.4, 10)).boreMm()).isCloseTo(380.336, within(1e-9));
        // thin walls are 10 % of T on both sides of 406.4 mm
        assertThat(FitRule.steelWallToleranceMm(457, 4)).isCloseTo(0.4, within(1e-12));
        assertThat(FitRule.steelWallToleranceMm(323.9, 4)).isCloseTo(0.4, within(1e-12));
        // 508 x 10 (outside 513.08 + 2 clearance = 515.08) nests in 610 x 25 (bore 548.9); the validator agrees
        List<Tube> tubes = NestingFixtures.tubes(List.of(), rule, "H", steel(610, 25), 6000, 1);
        tubes = NestingFixtures.tubes(tubes, rule, "G", steel(508, 10), 5900, 1);
        NestingProblem problem = new NestingProblem(tubes, rule.clearanceMm(), 10, null);
        NestResult result = Nester.run(problem, rule, NestingFixtures.quick());
        NestPlanValidator.validate(problem, result.plan());
        assertThat(result.plan().bundles()).hasSize(1);
    }

    @Test
    @DisplayName("Other materials use the catalog's od_tolerance_mm and wall_tolerance_pct, no bead unless given")
    void catalogTolerances() {
        FitRule rule = NestingFixtures.worstCase();
        Section alu = new Section("AL 50x3", "aluminium", 50, 3, null, 0.4, 10.0);
        TubeEnvelope e = rule.envelope(alu);
        assertThat(e.outerDiameterMm()).isCloseTo(50.4, within(1e-9));
        assertThat(e.boreMm()).isCloseTo(49.6 - 2 * 3.3, within(1e-9));
        Section bare = new Section("PMMA 40x2", "acrylic", 40, 2, null, null, null);
        assertThat(rule.envelope(bare).boreMm()).isCloseTo(36, within(1e-9));
        Section seamless = new Section("CHS 48.3x3.2 SMLS", "steel", 48.3, 3.2, 0.0, null, null);
        assertThat(rule.envelope(seamless).boreMm()).isCloseTo(40.76, within(1e-9));
        assertThat(FitRule.isStructuralSteel("S355J2H")).isTrue();
        assertThat(FitRule.isStructuralSteel("stainless steel 1.4301")).isFalse();
    }

    @Test
    @DisplayName("The chain of five 6 m bars nests into one bundle, worst case and nominal")
    void chainNestsIntoOneBundle() {
        for (FitRule rule : List.of(NestingFixtures.worstCase(), NestingFixtures.nominal())) {
            List<Tube> tubes = new ArrayList<>();
            double length = 6000;
            String[] marks = {"A", "B", "C", "D", "E"};
            Section[] chain = {S889, S761, S603, S483, S337};
            for (int i = 0; i < chain.length; i++) {
                tubes = NestingFixtures.tubes(tubes, rule, marks[i], chain[i], length - 25 * i, 1);
            }
            NestingProblem problem = new NestingProblem(tubes, rule.clearanceMm(), 10, null);
            NestResult result = Nester.run(problem, rule, NestingFixtures.quick());
            NestPlanValidator.validate(problem, result.plan());
            assertThat(result.plan().bundles()).hasSize(1);
            assertThat(result.plan().status()).isEqualTo(Status.OPTIMAL);
            assertThat(result.plan().tolerance()).isEqualTo(rule.tolerance());
        }
    }

    @Test
    @DisplayName("42.4x2.6 does not nest in 48.3x3.2 even nominally: two bundles")
    void nominalMisfit() {
        FitRule rule = new FitRule(NestTolerance.NOMINAL, 2.0);
        List<Tube> tubes = NestingFixtures.tubes(List.of(), rule, "D", S483, 3000, 1);
        tubes = NestingFixtures.tubes(tubes, rule, "X", S424, 2000, 1);
        NestingProblem problem = new NestingProblem(tubes, 2.0, 10, null);
        NestResult result = Nester.run(problem, rule, NestingFixtures.quick());
        NestPlanValidator.validate(problem, result.plan());
        assertThat(result.plan().bundles()).hasSize(2);
        assertThat(result.plan().status()).isEqualTo(Status.OPTIMAL);
    }

    @Test
    @DisplayName("A thick steel wall can leave no worst-case bore (10x4: 9.5 - 2 x 4.4 - 1 < 0): it hosts nothing")
    void noBoreLeft() {
        FitRule rule = NestingFixtures.worstCase();
        Section thick = steel(10, 4);
        // EN 10219-2 from memory: OD tolerance max(0.5, 1 % of 10) = 0.5 mm, wall 10 % of 4 = 0.4 mm, bead 1.0 mm.
        assertThat(rule.envelope(thick).boreMm()).isZero();
        assertThat(rule.envelope(thick).outerDiameterMm()).isCloseTo(10.5, within(1e-9));
        Section thin = new Section("wire 1", "aluminium", 1, 0.2, null, null, null);
        List<Tube> tubes = NestingFixtures.tubes(List.of(), rule, "T", thick, 3000, 2);
        tubes = NestingFixtures.tubes(tubes, rule, "W", thin, 1000, 2);
        NestingProblem problem = new NestingProblem(tubes, 0, 10, null);
        NestResult result = Nester.run(problem, rule, NestingFixtures.quick());
        NestPlanValidator.validate(problem, result.plan());
        assertThat(result.plan().bundles()).as("no tube fits a bore of 0").hasSize(4);
    }
}
