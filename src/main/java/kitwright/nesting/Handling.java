package kitwright.nesting;

/**
 * Manual handling flag for bundles: above about 25 kg a bundle is for two people or a hoist (a common practice
 * figure for one person's lift; manual handling guidance differs by country and task, see src/docs/sources.md).
 */
public final class Handling {
    /** Mass one person may lift, kg (common practice). */
    public static final double ONE_PERSON_LIFT_KG = 25.0;
    /** The flag text for heavier bundles. */
    public static final String TWO_PEOPLE_OR_HOIST = "two people or a hoist";

    private Handling() {
    }

    /** The flag for a bundle of this mass, or an empty string. */
    public static String flag(double massKg) {
        return massKg > ONE_PERSON_LIFT_KG ? TWO_PEOPLE_OR_HOIST : "";
    }
}
