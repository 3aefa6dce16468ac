package org.chillwright.physics;

/**
 * What a two-stage stack search is asked: the case, the one supply's limits, how many modules a stage may
 * have and how many stacks to return.
 *
 * @param coolingCase        set-point, ambient, load and thermal network (the same as for one stage)
 * @param limits             limits at the stack's terminals: supply volts and amps, and optionally a rated
 *                           current and a hot-side limit that apply to every stack; each module's own rated
 *                           Imax and hot-side limit apply as well
 * @param maxModulesPerStage most modules in one stage, series × parallel, 1 to 64
 * @param limit              how many of the best stacks to return, 1 to 1000
 */
public record StackSearch(CoolingCase coolingCase, DriveLimits limits, int maxModulesPerStage, int limit) {

    /** Largest stage tried: 64 modules already give 19 series × parallel splits per module. */
    public static final int MAX_MODULES_PER_STAGE = 64;
    /** Most stacks returned at once. */
    public static final int MAX_LIMIT = 1000;

    public StackSearch {
        if (coolingCase == null || limits == null) {
            String field = coolingCase == null ? "coolingCase" : "limits";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
        Check.atLeastOne("maxModulesPerStage", maxModulesPerStage);
        if (maxModulesPerStage > MAX_MODULES_PER_STAGE) {
            throw new InvalidQuantityException("maxModulesPerStage", maxModulesPerStage,
                    "maxModulesPerStage must be <= " + MAX_MODULES_PER_STAGE + ", was " + maxModulesPerStage);
        }
        Check.atLeastOne("limit", limit);
        if (limit > MAX_LIMIT) {
            throw new InvalidQuantityException("limit", limit, "limit must be <= " + MAX_LIMIT + ", was " + limit);
        }
    }
}
