package kitwright.cutting;

import com.google.ortools.sat.CpSolver;
import kitwright.natives.SolverLibraries;

/** CP-SAT settings shared by the integer models: one worker, fixed seed, deterministic work limit first. */
final class CpSatRun {
    private CpSatRun() {
    }

    /** A solver that runs one worker for at most {@code deterministicTime} units or until the deadline. */
    static CpSolver solver(double deterministicTime, Deadline deadline) {
        SolverLibraries.load();
        CpSolver solver = new CpSolver();
        solver.getParameters()
                .setNumWorkers(1)
                .setRandomSeed(20_240_601)
                .setMaxDeterministicTime(deterministicTime)
                .setMaxTimeInSeconds(deadline.remainingSeconds())
                .setLogSearchProgress(false);
        return solver;
    }

    /** Greatest common divisor of the stock costs (1 when all are zero). */
    static long costDivisor(IntegerInstance instance) {
        long g = 0;
        for (long c : instance.cost) {
            g = IntegerInstance.gcd(g, c);
        }
        return Math.max(1, g);
    }
}
