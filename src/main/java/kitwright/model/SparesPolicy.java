package kitwright.model;

/**
 * Service-life spares (kit.json {@code spares}): each bar is lost with probability {@code lossRatePerCycle} per
 * assembly cycle, over {@code cycles} cycles; {@code serviceLevel} is the chance that every mark is covered.
 */
public record SparesPolicy(double lossRatePerCycle, int cycles, double serviceLevel) {
}
