package kitwright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

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

    public int count() {
        return found.size();
    }

    public boolean isEmpty() {
        return found.isEmpty();
    }

    /** The problems in the order they were found. */
    public List<Problem> list() {
        return List.copyOf(found);
    }

    /** Throws one exception carrying every problem, when there is any. */
    public void throwIfAny() throws InvalidInputException {
        if (!found.isEmpty()) {
            throw new InvalidInputException(found);
        }
    }
}
