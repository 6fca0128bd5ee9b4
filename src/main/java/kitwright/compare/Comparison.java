package kitwright.compare;

import java.util.ArrayList;
import java.util.List;
import kitwright.compare.CompareMetric.Direction;

/**
 * The comparison of several options: for each figure, each option's value, the best value and each option's
 * difference to it. Pure function of the summaries; options keep their given order. INFEASIBLE options are shown
 * but not ranked.
 *
 * @param options the options compared
 * @param rows    one row per {@link CompareMetric}, in its order
 */
public record Comparison(List<OptionSummary> options, List<Row> rows) {
    public Comparison {
        options = List.copyOf(options);
        rows = List.copyOf(rows);
    }

    /**
     * One figure across the options.
     *
     * @param best  the best known value, or null when the figure is not ranked or no option knows it
     * @param cells one per option, in the options' order
     */
    public record Row(CompareMetric metric, Double best, List<Cell> cells) {
        public Row {
            cells = List.copyOf(cells);
        }
    }

    /**
     * One option's value of a figure.
     *
     * @param value        the value in the page's unit, or null when not known
     * @param isBest       true when the value equals the best (ties are all best)
     * @param difference   value - best (0 for the best), or null when not ranked or not known
     * @param relativePct  difference / |best| * 100, or null when best is 0 or the difference is null
     */
    public record Cell(Double value, boolean isBest, Double difference, Double relativePct) {
    }

    /** Compares options figure by figure. */
    public static Comparison of(List<OptionSummary> options) {
        List<Row> rows = new ArrayList<>();
        for (CompareMetric metric : CompareMetric.values()) {
            List<Double> values = options.stream().map(metric::valueOf).toList();
            List<Double> ranked = new ArrayList<>();
            for (int i = 0; i < options.size(); i++) {
                ranked.add(ranked(options.get(i)) ? values.get(i) : null);
            }
            Double best = best(metric.direction(), ranked);
            List<Cell> cells = new ArrayList<>(values.size());
            for (int i = 0; i < values.size(); i++) {
                Double v = values.get(i);
                if (ranked.get(i) == null || best == null) {
                    cells.add(new Cell(v, false, null, null));
                    continue;
                }
                // Values are already rounded (OptionSummary); the tolerance only absorbs the unit conversion.
                double difference = v - best;
                if (Math.abs(difference) < 1e-9 * Math.max(1, Math.abs(best))) {
                    difference = 0;
                }
                Double relative = best == 0 ? null : 100.0 * difference / Math.abs(best);
                cells.add(new Cell(v, difference == 0, difference, relative));
            }
            rows.add(new Row(metric, best, cells));
        }
        return new Comparison(options, rows);
    }

    /**
     * Whether an option takes part in the ranking: an INFEASIBLE option has sections without a plan, so its figures
     * are incomplete and would look best.
     */
    public static boolean ranked(OptionSummary option) {
        return option.status() != kitwright.model.Status.INFEASIBLE;
    }

    private static Double best(Direction direction, List<Double> values) {
        if (direction == Direction.NONE) {
            return null;
        }
        Double best = null;
        for (Double v : values) {
            if (v != null && (best == null
                    || (direction == Direction.LOWER ? v < best : v > best))) {
                best = v;
            }
        }
        return best;
    }
}
