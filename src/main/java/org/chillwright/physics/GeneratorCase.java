package org.chillwright.physics;

/**
 * A thermoelectric generator between a heat source and a sink through heat-exchanger resistances
 * (node balances, see {@link GeneratorSolver}): Th = Tsrc − Rhx,h·Qh,in and Tc = Tsnk + Rhx,c·Qc,out.
 *
 * @param hotSourceK          source temperature, K, &gt; coldSinkK
 * @param coldSinkK           sink temperature, K, &gt; 0
 * @param hotResistanceKPerW  source-to-hot-face resistance, K/W, ≥ 0
 * @param coldResistanceKPerW cold-face-to-sink resistance, K/W, ≥ 0
 */
public record GeneratorCase(double hotSourceK, double coldSinkK, double hotResistanceKPerW,
                            double coldResistanceKPerW) {

    public GeneratorCase {
        Check.positive("coldSinkK", coldSinkK);
        Check.above("hotSourceK", hotSourceK, coldSinkK, "coldSinkK");
        Check.nonNegative("hotResistanceKPerW", hotResistanceKPerW);
        Check.nonNegative("coldResistanceKPerW", coldResistanceKPerW);
    }

    /** Junction temperatures held directly (ideal heat exchangers). */
    public static GeneratorCase atJunctions(double hotJunctionK, double coldJunctionK) {
        return new GeneratorCase(hotJunctionK, coldJunctionK, 0, 0);
    }
}
