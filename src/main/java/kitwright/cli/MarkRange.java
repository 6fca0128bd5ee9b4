package kitwright.cli;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.io.InvalidInputException;
import kitwright.io.Problem;

/**
 * The {@code --marks} value of {@code sweep}: {@code A..B} (or one count A), whole numbers with A ≤ B. A bad value
 * is a problem printed as {@code command line: --marks: ...}.
 */
final class MarkRange {
    private static final Pattern RANGE = Pattern.compile("\\s*(\\d{1,6})\\s*(?:\\.\\.\\s*(\\d{1,6})\\s*)?");
    private static final String OPTION = "--marks";

    private MarkRange() {
    }

    /** {A, B} from the text. */
    static int[] parse(String text) throws InvalidInputException {
        Matcher m = RANGE.matcher(text);
        if (!m.matches()) {
            throw problem("'" + text + "' is not a range of mark counts (expected A..B with whole numbers, e.g."
                    + " 5..24, or one count such as 8)");
        }
        int first = Integer.parseInt(m.group(1));
        int last = m.group(2) == null ? first : Integer.parseInt(m.group(2));
        if (first > last) {
            throw problem("the range " + text + " runs backwards (expected A..B with A at most B, e.g. " + last + ".."
                    + first + ")");
        }
        return new int[] {first, last};
    }

    /** Checks {A, B} against the members: at least one mark per section, at most one per distinct length. */
    static void check(int[] range, int sections, int distinctLengths) throws InvalidInputException {
        if (range[0] < sections) {
            throw problem(range[0] + " marks are fewer than the " + sections + " sections of members.csv (expected"
                    + " at least " + sections + ": each section needs a mark of its own)");
        }
        if (range[1] > distinctLengths) {
            throw problem(range[1] + " marks are more than the " + distinctLengths + " distinct lengths of"
                    + " members.csv (expected at most " + distinctLengths + ": a mark per distinct length and"
                    + " section is already exact)");
        }
    }

    private static InvalidInputException problem(String message) {
        return new InvalidInputException(new Problem(null, 0, OPTION, message));
    }
}
