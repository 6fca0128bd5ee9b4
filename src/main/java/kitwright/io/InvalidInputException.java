package kitwright.io;

import java.util.List;

/** Thrown when the input has problems; carries every problem found, not just the first. */
public final class InvalidInputException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public InvalidInputException(List<Problem> problems) {
        super(problems.size() + " problem(s) in the input: " + problems.get(0));
        this.problems = List.copyOf(problems);
    }

    public InvalidInputException(Problem problem) {
        this(List.of(problem));
    }

    public List<Problem> problems() {
        return problems;
    }
}
