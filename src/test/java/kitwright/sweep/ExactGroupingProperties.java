package kitwright.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * The exact grouping against brute force on small cases: every set of whole-tenth marks inside each section's
 * range is listed, each member sent to its nearest mark, and the best (largest change, then sum of squares) over
 * all shares of at most K marks taken. Independent of the greedy cover and the dynamic programmes: it neither
 * assumes contiguous groups nor a clamped mean. Edge inputs: equal lengths, ties midway between marks, odd spans
 * whose continuous optimum is half a tenth (so the whole-tenth optimum rounds up), K from the number of sections to
 * the number of distinct lengths.
 */
class ExactGroupingProperties {

    @Property(tries = 300, seed = "20261203")
    void matchesBruteForce(@ForAll("cases") Case c) {
        List<String> order = new ArrayList<>();
        List<Member> members = new ArrayList<>();
        for (int s = 0; s < c.sections().size(); s++) {
            order.add("S" + s);
            int id = 0;
            for (long x : c.sections().get(s)) {
                members.add(new Member("st", "m" + s + "-" + id++, "S" + s, x));
            }
        }
        int distinct = SweepOptions.lengths(members, order).stream().mapToInt(l -> l.lengths().size()).sum();
        for (int k = order.size(); k <= distinct; k++) {
            Grouping grouping = ExactGrouping.of(SweepOptions.lengths(members, order), k);
            SweepOption option = SweepOptions.of(members, order, new MarkNames(List.of()), k);
            long[] brute = BruteForce.best(c.sections(), k);

            assertThat(grouping.marks()).as("marks used").isEqualTo(k);
            assertThat(grouping.largestChangeTenths()).as("largest change, K=" + k).isEqualTo(brute[0]);
            assertThat(grouping.squaredChange()).as("sum of squares, K=" + k).isEqualTo(brute[1]);
            assertThat(option.largestChangeTenths()).as("achieved largest change").isEqualTo(brute[0]);
            assertThat(option.squaredChange()).as("achieved sum of squares").isEqualTo(brute[1]);
            assertNearestMarks(option);
        }
    }

    /** Each member takes a nearest mark of its section, and equal targets of a section share one. */
    private static void assertNearestMarks(SweepOption option) {
        for (SweepOption.MemberMark m : option.members()) {
            long nearest = option.kitMarks().stream().filter(k -> k.section().equals(m.member().section()))
                    .mapToLong(k -> Math.abs(k.nodeToNodeTenths() - m.member().targetTenths())).min().orElseThrow();
            assertThat(Math.abs(m.changeTenths())).as("member " + m.member().member()).isEqualTo(nearest);
            for (SweepOption.MemberMark other : option.members()) {
                if (other.member().section().equals(m.member().section())
                        && other.member().targetTenths() == m.member().targetTenths()) {
                    assertThat(other.mark()).isEqualTo(m.mark());
                }
            }
        }
    }

    record Case(List<List<Long>> sections) {
    }

    @Provide
    Arbitrary<Case> cases() {
        Arbitrary<Long> length = Arbitraries.longs().between(20_000, 20_011)
                .edgeCases(e -> e.add(20_000L));
        Arbitrary<List<Long>> section = length.list().ofMinSize(1).ofMaxSize(6);
        return Combinators.combine(section.list().ofMinSize(1).ofMaxSize(3), Arbitraries.just(0))
                .as((sections, unused) -> new Case(sections));
    }
}
