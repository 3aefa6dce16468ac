package org.chillwright.physics;

/**
 * The legs of a detailed module (or of an array of identical ones on common plates) between fixed
 * face temperatures: N couples of one p and one n {@link LegGrid}, thermally in parallel and
 * electrically in series. Working storage for one solve at a time: not thread-safe.
 */
final class CoupleModel {

    private final LegGrid p;
    private final LegGrid n;
    private final int couples;
    private final int seriesCount;
    private final int parallelCount;
    private final double lowestValidK;
    private final double highestValidK;

    /** Heat drawn from the cold face, W, terminal quantities of the whole array. */
    double coldHeatW;
    /** Heat released at the hot face, W. */
    double hotHeatW;
    /** Terminal voltage, V. */
    double voltageV;
    /** Coldest and hottest temperature in any leg, K. */
    double lowestK;
    double highestK;
    /** Couple solves done (for tests of the iteration counts). */
    int solves;

    CoupleModel(DetailedModule module, int seriesCount, int parallelCount, int cells) {
        double l = module.legLengthM();
        MaterialSet m = module.material();
        p = new LegGrid(m.p(), module.legAreaPM2(), l, +1, module.contactResistivityOhmM2() / module.legAreaPM2(),
                module.thermalContactM2KPerW() / module.legAreaPM2(), cells);
        n = new LegGrid(m.n(), module.legAreaNM2(), l, -1, module.contactResistivityOhmM2() / module.legAreaNM2(),
                module.thermalContactM2KPerW() / module.legAreaNM2(), cells);
        couples = module.couples();
        this.seriesCount = seriesCount;
        this.parallelCount = parallelCount;
        lowestValidK = m.lowestK();
        highestValidK = m.highestK();
    }

    void reset() {
        p.reset();
        n.reset();
    }

    /**
     * Solves both legs at a terminal current between fixed faces; false when no steady profile exists.
     *
     * @param currentA terminal current of the array, A (each module carries currentA / parallelCount)
     */
    boolean solve(double currentA, double coldFaceK, double hotFaceK) {
        solves++;
        if (!(coldFaceK > 0 && hotFaceK > 0 && Double.isFinite(currentA))) {
            return false;
        }
        double moduleA = currentA / parallelCount;
        if (!p.solve(moduleA, coldFaceK, hotFaceK)) {
            p.reset();
            if (!p.solve(moduleA, coldFaceK, hotFaceK)) {
                return false;
            }
        }
        if (!n.solve(moduleA, coldFaceK, hotFaceK)) {
            n.reset();
            if (!n.solve(moduleA, coldFaceK, hotFaceK)) {
                return false;
            }
        }
        int modules = seriesCount * parallelCount;
        coldHeatW = modules * couples * (p.coldHeatW + n.coldHeatW);
        hotHeatW = modules * couples * (p.hotHeatW + n.hotHeatW);
        voltageV = seriesCount * couples * (p.voltageV + n.voltageV);
        lowestK = Math.min(p.lowestK, n.lowestK);
        highestK = Math.max(p.highestK, n.highestK);
        return true;
    }

    /** Whether every leg temperature of the last solve lay within the material's range. */
    boolean withinMaterialRange() {
        return lowestK >= lowestValidK && highestK <= highestValidK;
    }

    double[] profileP() {
        return p.temperatureK.clone();
    }

    double[] profileN() {
        return n.temperatureK.clone();
    }
}
