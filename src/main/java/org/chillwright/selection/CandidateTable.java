package org.chillwright.selection;

import java.util.Objects;

/**
 * The solver inputs of every module a ranking may consider, as parallel primitive arrays so that tens of
 * thousands of candidates are solved without touching entities or boxing. Index {@code i} describes one
 * module; NaN marks an unknown rating or limit.
 *
 * @param moduleIds        catalog ids
 * @param seebeckVPerK     S of one module, V/K
 * @param resistanceOhm    R of one module, Ω
 * @param conductanceWPerK K of one module, W/K
 * @param ratedImaxA       stated Imax of one module, A, or NaN
 * @param ratedDtmaxK      stated ΔTmax, K, or NaN
 * @param maxHotSideK      maximum hot-side temperature, K, or NaN
 * @param prices           unit price at a quantity, for the cost objective
 */
public record CandidateTable(long[] moduleIds, double[] seebeckVPerK, double[] resistanceOhm,
                             double[] conductanceWPerK, double[] ratedImaxA, double[] ratedDtmaxK,
                             double[] maxHotSideK, PriceBook prices) {

    /** Unit price of module {@code index} when buying {@code quantity} pieces; NaN when it has no price. */
    public interface PriceBook {
        double unitPrice(int index, int quantity);

        PriceBook NONE = (index, quantity) -> Double.NaN;
    }

    public CandidateTable {
        int n = moduleIds.length;
        for (double[] column : new double[][] {seebeckVPerK, resistanceOhm, conductanceWPerK, ratedImaxA, ratedDtmaxK,
                maxHotSideK}) {
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
