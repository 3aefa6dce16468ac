package org.chillwright.physics;

/**
 * {@code seriesCount × parallelCount} identical modules sharing isothermal cold and hot plates
 * (circuit algebra of identical modules on common plates, derived here; case S14).
 *
 * @param module        parameters of one module
 * @param seriesCount   modules in series per string, ≥ 1
 * @param parallelCount parallel strings, ≥ 1
 */
public record ModuleArray(ModuleParameters module, int seriesCount, int parallelCount) {

    public ModuleArray {
        if (module == null) {
            throw new InvalidQuantityException("module", Double.NaN, "module must be given, was null");
        }
        Check.atLeastOne("seriesCount", seriesCount);
        Check.atLeastOne("parallelCount", parallelCount);
    }

    /**
     * Every (series, parallel) split with series × parallel ≤ {@code maxModules}, fewest modules first and,
     * for one count, fewest in series first: the designs a ranking tries.
     *
     * @param maxModules most modules in one design, ≥ 1
     */
    public static int[][] splits(int maxModules) {
        Check.atLeastOne("maxModules", maxModules);
        var splits = new java.util.ArrayList<int[]>();
        for (int count = 1; count <= maxModules; count++) {
            for (int series = 1; series <= count; series++) {
                if (count % series == 0) {
                    splits.add(new int[] {series, count / series});
                }
            }
        }
        return splits.toArray(int[][]::new);
    }

    /** A single module. */
    public static ModuleArray single(ModuleParameters module) {
        return new ModuleArray(module, 1, 1);
    }

    /** Number of modules, ns·np. */
    public int moduleCount() {
        return seriesCount * parallelCount;
    }

    /** The equivalent single module seen at the array terminals ({@link ModuleParameters#inArray}). */
    public ModuleParameters equivalent() {
        // a single module is its own equivalent: skip building an equal copy on every solve
        return seriesCount == 1 && parallelCount == 1 ? module : module.inArray(seriesCount, parallelCount);
    }

    /**
     * Per-module share of array terminal values: I/np, V/ns, and heat and power divided by ns·np.
     *
     * @param currentA      array terminal current, A
     * @param voltageV      array terminal voltage, V
     * @param heatLoadW     heat pumped by the whole array, W
     * @param heatRejectedW heat released by the whole array, W
     * @param powerW        electrical power of the whole array, W
     */
    public ModuleShare share(double currentA, double voltageV, double heatLoadW, double heatRejectedW, double powerW) {
        int n = moduleCount();
        return new ModuleShare(currentA / parallelCount, voltageV / seriesCount, heatLoadW / n, heatRejectedW / n,
                powerW / n);
    }
}
