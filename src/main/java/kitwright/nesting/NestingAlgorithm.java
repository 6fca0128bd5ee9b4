package kitwright.nesting;

/** A way to group tubes into bundles. Implementations are stateless and deterministic. */
public interface NestingAlgorithm {
    NestingSolution solve(NestingProblem problem);
}
