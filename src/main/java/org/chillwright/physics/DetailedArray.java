package org.chillwright.physics;

/**
 * {@code seriesCount × parallelCount} identical detailed modules on common isothermal plates (the
 * detailed counterpart of {@link ModuleArray}; physics.md g): each module carries the terminal
 * current / parallelCount, the voltage adds over the series count, heats add over all modules.
 *
 * @param module        one module, not null
 * @param seriesCount   modules in series per string, ≥ 1
 * @param parallelCount parallel strings, ≥ 1
 */
public record DetailedArray(DetailedModule module, int seriesCount, int parallelCount) {

    public DetailedArray {
        if (module == null) {
            throw new InvalidQuantityException("module", Double.NaN, "module must be given, was null");
        }
        Check.atLeastOne("seriesCount", seriesCount);
        Check.atLeastOne("parallelCount", parallelCount);
    }

    /** A single module. */
    public static DetailedArray single(DetailedModule module) {
        return new DetailedArray(module, 1, 1);
    }

    /** The lumped equivalent of the array with properties at one temperature ({@link DetailedModule#lumpedAt}). */
    public ModuleArray lumpedAt(double temperatureK) {
        return new ModuleArray(module.lumpedAt(temperatureK), seriesCount, parallelCount);
    }
}
