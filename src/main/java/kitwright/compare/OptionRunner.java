package kitwright.compare;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import kitwright.io.InvalidInputException;
import kitwright.io.Problem;

/**
 * Plans several kit options in parallel on a bounded pool of threads and returns their summaries in the order the
 * folders were given, whatever order they finish in. Each option is planned deterministically by the
 * {@link OptionPlanner}, so the result does not depend on the number of threads.
 */
public final class OptionRunner {
    private final OptionPlanner planner;
    private final int threads;
    private final Consumer<String> progress;

    /**
     * @param threads  at most this many options are planned at once (at least 1)
     * @param progress receives one line per started and finished option (e.g. stderr)
     */
    public OptionRunner(OptionPlanner planner, int threads, Consumer<String> progress) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1: " + threads);
        }
        this.planner = planner;
        this.threads = threads;
        this.progress = progress;
    }

    /**
     * Plans every option. Invalid input in any option is collected over all options and thrown once, so the user
     * sees every problem; nothing is returned then.
     *
     * @throws InvalidInputException with the problems of every invalid option
     * @throws IllegalStateException when a planner fails otherwise (its cause attached)
     */
    public List<OptionSummary> run(List<Path> kitDirs) throws InvalidInputException {
        int n = kitDirs.size();
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, Math.max(1, n)), runnable -> {
            Thread t = new Thread(runnable, "kitwright-compare");
            t.setDaemon(true);
            return t;
        });
        AtomicInteger finished = new AtomicInteger();
        try {
            List<Future<OptionSummary>> futures = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                Path dir = kitDirs.get(i);
                int number = i + 1;
                futures.add(pool.submit(() -> {
                    progress.accept("compare: planning option " + number + "/" + n + ": " + dir);
                    long start = System.nanoTime();
                    OptionSummary summary = planner.plan(dir);
                    progress.accept(String.format(java.util.Locale.ROOT,
                            "compare: option %d/%d %s: %s in %.1f s (%d of %d done)", number, n, summary.kit(),
                            summary.status(), (System.nanoTime() - start) / 1e9, finished.incrementAndGet(), n));
                    return summary;
                }));
            }
            List<OptionSummary> summaries = new ArrayList<>(n);
            List<Problem> problems = new ArrayList<>();
            RuntimeException failure = null;
            for (Future<OptionSummary> f : futures) {
                try {
                    summaries.add(f.get());
                } catch (ExecutionException e) {
                    if (e.getCause() instanceof InvalidInputException invalid) {
                        problems.addAll(invalid.problems());
                    } else if (failure == null) {
                        failure = new IllegalStateException("planning an option failed: " + e.getCause(),
                                e.getCause());
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IllegalStateException("interrupted while planning options", e);
                }
            }
            if (failure != null) {
                throw failure;
            }
            if (!problems.isEmpty()) {
                throw new InvalidInputException(problems);
            }
            return summaries;
        } finally {
            pool.shutdownNow();
        }
    }
}
