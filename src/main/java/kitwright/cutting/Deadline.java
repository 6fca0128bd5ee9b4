package kitwright.cutting;

/** The wall-clock safety net of one section's solve. */
final class Deadline {
    private final long endNanos;

    private Deadline(long endNanos) {
        this.endNanos = endNanos;
    }

    static Deadline in(double seconds) {
        long nanos = (long) Math.min(Long.MAX_VALUE / 4.0, seconds * 1e9);
        return new Deadline(System.nanoTime() + nanos);
    }

    boolean passed() {
        return System.nanoTime() >= endNanos;
    }

    /** Seconds left, at least a millisecond so that a solver given it still returns at once. */
    double remainingSeconds() {
        return Math.max(0.001, (endNanos - System.nanoTime()) / 1e9);
    }
}
