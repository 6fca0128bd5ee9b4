package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicInteger;
import kitwright.io.InvalidInputException;
import kitwright.io.Problem;
import kitwright.model.Status;
import org.junit.jupiter.api.Test;

class OptionRunnerTest {

    /** A fake planner: the folder name is the kit, later folders finish first, and it records concurrency. */
    private static final class FakePlanner implements OptionPlanner {
        final AtomicInteger running = new AtomicInteger();
        final AtomicInteger maxRunning = new AtomicInteger();

        @Override
        public OptionSummary plan(Path kitDir) throws InvalidInputException {
            int now = running.incrementAndGet();
            maxRunning.accumulateAndGet(now, Math::max);
            try {
                String name = kitDir.getFileName().toString();
                if (name.startsWith("bad")) {
                    throw new InvalidInputException(new Problem(kitDir.resolve("bars.csv"), 3, "quantity",
                            "is negative (expected a whole number of at least 1)"));
                }
                int marks = Integer.parseInt(name.replaceAll("\\D", ""));
                Thread.sleep(Math.max(0, 60 - 2L * marks));
                return CompareFixtures.option(name, marks, 2.0, 1000.0 * marks, 5.0, 1, Status.OPTIMAL);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException(e);
            } finally {
                running.decrementAndGet();
            }
        }
    }

    @Test
    void keepsTheGivenOrderAndBoundsTheThreads() throws Exception {
        FakePlanner planner = new FakePlanner();
        List<String> lines = new CopyOnWriteArrayList<>();
        List<Path> dirs = List.of(Path.of("kits/k6"), Path.of("kits/k12"), Path.of("kits/k20"), Path.of("kits/k3"));
        List<OptionSummary> result = new OptionRunner(planner, 2, lines::add).run(dirs);
        assertThat(result).extracting(OptionSummary::kit).containsExactly("k6", "k12", "k20", "k3");
        assertThat(planner.maxRunning.get()).isBetween(1, 2);
        assertThat(lines).hasSize(8).anySatisfy(l -> assertThat(l).contains("k20: OPTIMAL"));
        assertThat(new OptionRunner(new FakePlanner(), 1, l -> { }).run(dirs)).isEqualTo(result);
    }

    @Test
    void collectsTheProblemsOfEveryInvalidOption() {
        List<Path> dirs = List.of(Path.of("bad1"), Path.of("k6"), Path.of("bad2"));
        assertThatThrownBy(() -> new OptionRunner(new FakePlanner(), 2, l -> { }).run(dirs))
                .isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.problems())
                        .extracting(p -> p.file().getParent().toString()).containsExactly("bad1", "bad2"));
    }

    @Test
    void reportsOtherFailuresAsInternal() {
        OptionPlanner broken = dir -> {
            throw new ArithmeticException("boom");
        };
        assertThatThrownBy(() -> new OptionRunner(broken, 2, l -> { }).run(List.of(Path.of("a"), Path.of("b"))))
                .isInstanceOf(IllegalStateException.class).hasRootCauseInstanceOf(ArithmeticException.class);
    }
}
