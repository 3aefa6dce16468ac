package org.chillwright.physics;

/**
 * One stage of a stack: {@code seriesCount × parallelCount} identical catalog modules on common plates
 * (arrays of identical modules, derived here), seen at its terminals as one equivalent module.
 *
 * @param module        the catalog module
 * @param seriesCount   modules in series per string, ≥ 1
 * @param parallelCount parallel strings, ≥ 1
 */
public record StageDesign(CandidateModule module, int seriesCount, int parallelCount) {

    public StageDesign {
        if (module == null) {
            throw new InvalidQuantityException("module", Double.NaN, "module must be given, was null");
        }
        Check.atLeastOne("seriesCount", seriesCount);
        Check.atLeastOne("parallelCount", parallelCount);
    }

    /** Number of modules, series × parallel. */
    public int moduleCount() {
        return seriesCount * parallelCount;
    }

    /** The equivalent module at the stage's terminals: S·ns, R·ns/np, K·ns·np (arrays of identical modules, derived here, case S14). */
    public ModuleParameters equivalent() {
        return new ModuleArray(module.parameters(), seriesCount, parallelCount).equivalent();
    }

    /** Rated Imax at the stage's terminals, module Imax × parallel strings, A; NaN when the module has none. */
    public double ratedImaxA() {
        return module.ratedImaxA() * parallelCount;
    }
}
