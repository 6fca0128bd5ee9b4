package kitwright.model;

import java.util.List;

/**
 * Settings of a kit from {@code kit.json}, with the documented defaults. Catalog paths are resolved by the reader
 * and live on {@link Kit}; this record holds the planning parameters only.
 *
 * @param kerfMm                  saw kerf, the slot one cut turns into chips [2.0]
 * @param trimMm                  end trim per end, including its own squaring cut [5.0]
 * @param minRemnantMm            shortest offcut that goes back on the rack as a remnant [500]
 * @param timeLimitSeconds        safety-net time limit per optimisation problem [10]
 * @param structuresStandTogether kit quantity is the sum over structures rather than the largest [false]
 * @param endDeductionMm          per end, node-to-node length minus cut length over two [0]
 * @param nestTolerance           fit rule for nesting [worst-case]
 * @param nestClearanceMm         diametral handling clearance between a guest and its host's bore [2.0]
 * @param nestEndAllowanceMm      per end, length of a host kept free of guests [10]
 * @param maxBundleMassKg         hard limit on a bundle's mass, or null for none
 * @param jointBox                the box joints travel in
 * @param spares                  service-life spares policy, or null for none
 * @param miscutAllowance         extra pieces per mark for saw errors [none]
 * @param tour                    the structures in the order they are built, one leg each; a structure may come
 *                                back (rebuilt at a later venue) [empty: no tour]
 */
public record KitSettings(String name, String description, double kerfMm, double trimMm, double minRemnantMm,
                          double timeLimitSeconds, boolean structuresStandTogether, double endDeductionMm,
                          NestTolerance nestTolerance, double nestClearanceMm, double nestEndAllowanceMm,
                          Double maxBundleMassKg, JointBox jointBox, SparesPolicy spares,
                          MiscutAllowance miscutAllowance, List<String> tour) {

    public static final double DEFAULT_KERF_MM = 2.0;
    public static final double DEFAULT_TRIM_MM = 5.0;
    public static final double DEFAULT_MIN_REMNANT_MM = 500;
    public static final double DEFAULT_TIME_LIMIT_SECONDS = 10;
    public static final double DEFAULT_NEST_CLEARANCE_MM = 2.0;
    public static final double DEFAULT_NEST_END_ALLOWANCE_MM = 10;

    public KitSettings {
        description = description == null ? "" : description;
        nestTolerance = nestTolerance == null ? NestTolerance.WORST_CASE : nestTolerance;
        jointBox = jointBox == null ? JointBox.DEFAULT : jointBox;
        miscutAllowance = miscutAllowance == null ? MiscutAllowance.NONE : miscutAllowance;
        tour = tour == null ? List.of() : List.copyOf(tour);
    }

    /** Settings without a tour. */
    public KitSettings(String name, String description, double kerfMm, double trimMm, double minRemnantMm,
                       double timeLimitSeconds, boolean structuresStandTogether, double endDeductionMm,
                       NestTolerance nestTolerance, double nestClearanceMm, double nestEndAllowanceMm,
                       Double maxBundleMassKg, JointBox jointBox, SparesPolicy spares,
                       MiscutAllowance miscutAllowance) {
        this(name, description, kerfMm, trimMm, minRemnantMm, timeLimitSeconds, structuresStandTogether,
                endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm, maxBundleMassKg, jointBox, spares,
                miscutAllowance, List.of());
    }

    /** Settings without a miscut allowance. */
    public KitSettings(String name, String description, double kerfMm, double trimMm, double minRemnantMm,
                       double timeLimitSeconds, boolean structuresStandTogether, double endDeductionMm,
                       NestTolerance nestTolerance, double nestClearanceMm, double nestEndAllowanceMm,
                       Double maxBundleMassKg, JointBox jointBox, SparesPolicy spares) {
        this(name, description, kerfMm, trimMm, minRemnantMm, timeLimitSeconds, structuresStandTogether,
                endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm, maxBundleMassKg, jointBox, spares,
                MiscutAllowance.NONE);
    }

    /** All defaults, for a kit of the given name. */
    public static KitSettings defaults(String name) {
        return new KitSettings(name, "", DEFAULT_KERF_MM, DEFAULT_TRIM_MM, DEFAULT_MIN_REMNANT_MM,
                DEFAULT_TIME_LIMIT_SECONDS, false, 0, NestTolerance.WORST_CASE, DEFAULT_NEST_CLEARANCE_MM,
                DEFAULT_NEST_END_ALLOWANCE_MM, null, JointBox.DEFAULT, null, MiscutAllowance.NONE);
    }

    public KitSettings withKerfMm(double value) {
        return new KitSettings(name, description, value, trimMm, minRemnantMm, timeLimitSeconds,
                structuresStandTogether, endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, miscutAllowance, tour);
    }

    public KitSettings withTrimMm(double value) {
        return new KitSettings(name, description, kerfMm, value, minRemnantMm, timeLimitSeconds,
                structuresStandTogether, endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, miscutAllowance, tour);
    }

    public KitSettings withMinRemnantMm(double value) {
        return new KitSettings(name, description, kerfMm, trimMm, value, timeLimitSeconds,
                structuresStandTogether, endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, miscutAllowance, tour);
    }

    public KitSettings withTimeLimitSeconds(double value) {
        return new KitSettings(name, description, kerfMm, trimMm, minRemnantMm, value,
                structuresStandTogether, endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, miscutAllowance, tour);
    }

    public KitSettings withNestTolerance(NestTolerance value) {
        return new KitSettings(name, description, kerfMm, trimMm, minRemnantMm, timeLimitSeconds,
                structuresStandTogether, endDeductionMm, value, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, miscutAllowance, tour);
    }

    public KitSettings withMiscutAllowance(MiscutAllowance value) {
        return new KitSettings(name, description, kerfMm, trimMm, minRemnantMm, timeLimitSeconds,
                structuresStandTogether, endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, value, tour);
    }

    public KitSettings withTour(List<String> value) {
        return new KitSettings(name, description, kerfMm, trimMm, minRemnantMm, timeLimitSeconds,
                structuresStandTogether, endDeductionMm, nestTolerance, nestClearanceMm, nestEndAllowanceMm,
                maxBundleMassKg, jointBox, spares, miscutAllowance, value);
    }
}
