package org.chillwright.physics;

/**
 * One catalog module as a stack search sees it: its lumped parameters and the ratings that limit it.
 *
 * @param moduleId    catalog id (any number for a module that is not in a catalog)
 * @param parameters  lumped S, R, K of one module (the Ioffe 1957 / Goldsmid 2016 ideal equations)
 * @param ratedImaxA  rated Imax of one module, A, &gt; 0, or NaN when not stated
 * @param maxHotSideK highest allowed hot-face temperature of the module (solder or assembly limit), K, &gt; 0,
 *                    or NaN when not stated
 */
public record CandidateModule(long moduleId, ModuleParameters parameters, double ratedImaxA, double maxHotSideK) {

    public CandidateModule {
        if (parameters == null) {
            throw new InvalidQuantityException("parameters", Double.NaN, "parameters must be given, was null");
        }
        Check.positiveOrAbsent("ratedImaxA", ratedImaxA);
        Check.positiveOrAbsent("maxHotSideK", maxHotSideK);
    }

    /** A module with no stated ratings. */
    public static CandidateModule of(long moduleId, ModuleParameters parameters) {
        return new CandidateModule(moduleId, parameters, Double.NaN, Double.NaN);
    }
}
