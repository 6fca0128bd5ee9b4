package kitwright.cli;

/** The exit codes of every kitwright command, declared in one place (and listed in the README). */
public enum ExitCode {
    /** The command did what was asked. */
    OK(0),
    /** A bug or an environment failure (disk full, native library missing); the message says which. */
    INTERNAL_ERROR(1),
    /** Bad arguments or bad data; every problem is printed with file, line and column. */
    INVALID_INPUT(2),
    /** The data is valid but no feasible plan exists for at least one part (e.g. rack stock too short). */
    NO_FEASIBLE_PLAN(3);

    private final int code;

    ExitCode(int code) {
        this.code = code;
    }

    public int code() {
        return code;
    }
}
