package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Collects every problem found while reading input, so that a clerk sees all of them in one run rather than one
 * per attempt. Readers add to it and go on reading; the caller throws once at the end.
 */
public final class Problems {
    private final List<Problem> found = new ArrayList<>();

    public void add(Problem problem) {
        found.add(problem);
    }

    public void add(Path file, int line, String column, String message) {
        found.add(new Problem(file, line, column, message));
    }

    /** A problem on a row of a sheet of a workbook ({@code sheet} null for a text file). */
    public void add(Path file, String sheet, int line, String column, String message) {
        found.add(new Problem(file, sheet, line, column, message));
    }

    public int count() {
        return found.size();
    }

    public boolean isEmpty() {
        return found.isEmpty();
    }

    /**
     * The problems grouped by file (files in the order they were first reported) and by line within a file, so
     * that a clerk can work down each file once.
     */
    public List<Problem> list() {
        Map<List<Object>, Integer> fileOrder = new HashMap<>();
        for (Problem problem : found) {
            fileOrder.putIfAbsent(place(problem), fileOrder.size());
        }
        List<Problem> sorted = new ArrayList<>(found);
        sorted.sort(Comparator.comparing((Problem p) -> fileOrder.get(place(p))).thenComparingInt(Problem::line));
        return List.copyOf(sorted);
    }

    /** The file and sheet of a problem: the sheets of one workbook are grouped like files. */
    private static List<Object> place(Problem problem) {
        return java.util.Arrays.asList(problem.file(), problem.sheet());
    }

    /** Throws one exception carrying every problem, when there is any. */
    public void throwIfAny() throws InvalidInputException {
        if (!found.isEmpty()) {
            throw new InvalidInputException(list());
        }
    }
}
