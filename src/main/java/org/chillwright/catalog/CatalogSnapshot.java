package org.chillwright.catalog;

import java.util.Arrays;
import java.util.List;
import org.chillwright.physics.ModuleParameters;

/**
 * Solver inputs of every active (not archived) module, in primitive arrays indexed alike, so a
 * ranking can sweep the whole catalog without loading entities. Immutable; a new one is built
 * after each committed catalog change. Index {@code i} means the same module in every accessor.
 * Unknown values are NaN ({@link #maxHotSideK}) or absent price breaks.
 */
public final class CatalogSnapshot {

    private final long revision;
    private final long[] ids;
    private final String[] suppliers;
    private final String[] partNumbers;
    private final Lifecycle[] lifecycles;
    private final double[] seebeckVPerK;
    private final double[] resistanceOhm;
    private final double[] conductanceWPerK;
    private final double[] imaxA;
    private final double[] vmaxV;
    private final double[] qmaxW;
    private final double[] dtmaxK;
    private final double[] maxHotSideK;
    private final String[] currencies;
    private final int[][] breakQuantities;
    private final double[][] breakUnitPrices;
    private final int[] minOrderQuantities;

    CatalogSnapshot(long revision, List<Row> rows) {
        this.revision = revision;
        int n = rows.size();
        ids = new long[n];
        suppliers = new String[n];
        partNumbers = new String[n];
        lifecycles = new Lifecycle[n];
        seebeckVPerK = new double[n];
        resistanceOhm = new double[n];
        conductanceWPerK = new double[n];
        imaxA = new double[n];
        vmaxV = new double[n];
        qmaxW = new double[n];
        dtmaxK = new double[n];
        maxHotSideK = new double[n];
        currencies = new String[n];
        breakQuantities = new int[n][];
        breakUnitPrices = new double[n][];
        minOrderQuantities = new int[n];
        for (int i = 0; i < n; i++) {
            Row row = rows.get(i);
            ids[i] = row.id();
            suppliers[i] = row.supplier();
            partNumbers[i] = row.partNumber();
            lifecycles[i] = row.lifecycle();
            seebeckVPerK[i] = row.seebeckVPerK();
            resistanceOhm[i] = row.resistanceOhm();
            conductanceWPerK[i] = row.conductanceWPerK();
            imaxA[i] = row.imaxA();
            vmaxV[i] = row.vmaxV();
            qmaxW[i] = row.qmaxW();
            dtmaxK[i] = row.dtmaxK();
            maxHotSideK[i] = row.maxHotSideK();
            currencies[i] = row.currency();
            breakQuantities[i] = row.breakQuantities().clone();
            breakUnitPrices[i] = row.breakUnitPrices().clone();
            minOrderQuantities[i] = row.minOrderQuantity();
        }
    }

    /** One module's solver inputs, as read from the database. */
    record Row(long id, String supplier, String partNumber, Lifecycle lifecycle, double seebeckVPerK,
               double resistanceOhm, double conductanceWPerK, double imaxA, double vmaxV, double qmaxW,
               double dtmaxK, double maxHotSideK, String currency, int[] breakQuantities,
               double[] breakUnitPrices, int minOrderQuantity) {
    }

    static CatalogSnapshot empty() {
        return new CatalogSnapshot(-1, List.of());
    }

    /** The catalog revision this snapshot shows; grows with every committed change. */
    public long revision() {
        return revision;
    }

    public int size() {
        return ids.length;
    }

    public long id(int i) {
        return ids[i];
    }

    public String supplier(int i) {
        return suppliers[i];
    }

    public String partNumber(int i) {
        return partNumbers[i];
    }

    public Lifecycle lifecycle(int i) {
        return lifecycles[i];
    }

    /** Derived lumped parameters of module {@code i}. Allocates; hot loops may read the three arrays' values instead. */
    public ModuleParameters parameters(int i) {
        return new ModuleParameters(seebeckVPerK[i], resistanceOhm[i], conductanceWPerK[i]);
    }

    public double seebeckVPerK(int i) {
        return seebeckVPerK[i];
    }

    public double resistanceOhm(int i) {
        return resistanceOhm[i];
    }

    public double conductanceWPerK(int i) {
        return conductanceWPerK[i];
    }

    /** Rated Imax (ideal at the reference hot side for a constructed module), A. */
    public double imaxA(int i) {
        return imaxA[i];
    }

    public double vmaxV(int i) {
        return vmaxV[i];
    }

    /** Stated or implied Qmax, W. */
    public double qmaxW(int i) {
        return qmaxW[i];
    }

    public double dtmaxK(int i) {
        return dtmaxK[i];
    }

    /** Highest allowed hot-side temperature, K, or NaN when the supplier states none. */
    public double maxHotSideK(int i) {
        return maxHotSideK[i];
    }

    /** Currency of module {@code i}'s prices, or null when it has none. */
    public String currency(int i) {
        return currencies[i];
    }

    /** Unit price when buying {@code quantity} pieces (largest break at or below it), or NaN. */
    /**
     * What one needed piece really costs when {@code needed} pieces must be bought: at least the minimum
     * order is bought, then the cheapest of buying that many at their break or rounding up to a larger
     * break (which is often cheaper, and is the only way to buy fewer pieces than the first break). Total
     * cost over {@code needed}; NaN without prices.
     */
    public double effectiveUnitPriceAt(int i, int needed) {
        int[] quantities = breakQuantities[i];
        int bought = Math.max(needed, minOrderQuantities[i]);
        double best = bought * unitPriceAt(i, bought); // NaN when below the first break
        for (int b = 0; b < quantities.length; b++) {
            if (quantities[b] > bought) {
                double roundedUp = quantities[b] * breakUnitPrices[i][b];
                best = Double.isNaN(best) ? roundedUp : Math.min(best, roundedUp);
            }
        }
        return best / needed;
    }

    public double unitPriceAt(int i, int quantity) {
        double price = Double.NaN;
        int[] quantities = breakQuantities[i];
        for (int b = 0; b < quantities.length && quantities[b] <= quantity; b++) {
            price = breakUnitPrices[i][b];
        }
        return price;
    }

    /** Index of a module id, or -1 when it is not in the snapshot (unknown or archived). */
    public int indexOf(long id) {
        int i = Arrays.binarySearch(ids, id); // rows are read in id order
        return i >= 0 ? i : -1;
    }
}
