package org.chillwright.harvest;

import java.util.Objects;

/**
 * The generator inputs of every module a harvest ranking may consider, as parallel primitive arrays.
 * Index {@code i} describes one module; NaN marks an unknown limit.
 *
 * @param moduleIds        catalog ids
 * @param seebeckVPerK     S of one module, V/K
 * @param resistanceOhm    R of one module, Ω
 * @param conductanceWPerK K of one module, W/K
 * @param maxHotSideK      highest allowed hot-side temperature, K, or NaN
 * @param prices           unit price at a quantity, for the cost objective
 */
public record GeneratorTable(long[] moduleIds, double[] seebeckVPerK, double[] resistanceOhm,
                             double[] conductanceWPerK, double[] maxHotSideK, UnitPrices prices) {

    /** Unit price of module {@code index} when buying {@code quantity} pieces; NaN when it has none. */
    public interface UnitPrices {
        double unitPrice(int index, int quantity);

        UnitPrices NONE = (index, quantity) -> Double.NaN;
    }

    public GeneratorTable {
        int n = moduleIds.length;
        for (double[] column : new double[][] {seebeckVPerK, resistanceOhm, conductanceWPerK, maxHotSideK}) {
            if (column.length != n) {
                throw new IllegalArgumentException("every column needs " + n + " rows, one has " + column.length);
            }
        }
        Objects.requireNonNull(prices, "prices");
    }

    public int size() {
        return moduleIds.length;
    }
}
