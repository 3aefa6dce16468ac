package org.chillwright.selection;

import java.math.BigDecimal;
import java.util.List;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.catalog.ModuleDefinition;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.catalog.PriceBreak;
import org.chillwright.catalog.RatedInputs;
import org.chillwright.catalog.TestAtmosphere;
import org.chillwright.physics.RatingsMethod;

/**
 * A small invented catalog whose best answer can be checked by hand. TMA-1 carries the ideal ratings of
 * the check cases' synthetic module TM-A at 300 K (S02), so it derives back to S 0.04 V/K, R 2.4 Ω,
 * K 0.25 W/K (S03); TMA-HALF has half its leg area (half the Imax and Qmax), TMA-TINY a tenth.
 */
public final class TestCatalog {

    public static final String SUPPLIER_A = "Testbench Thermal";
    public static final String SUPPLIER_B = "Quayside Peltier Works";
    public static final double TM_A_IMAX_A = 3.82782218758095;
    public static final double TM_A_VMAX_V = 12.00000000529863;
    public static final double TM_A_QMAX_W = 28.35119901;
    public static final double TM_A_DTMAX_K = 70.33066887760879;
    public static final double TM_A_HOT_SIDE_C = 26.85;

    private TestCatalog() {
    }

    /** Adds the modules once per database (a Spring test context shares one). */
    public static synchronized void ensure(CatalogService catalog) {
        if (catalog.search(ModuleQuery.text("TMA-1")).total() > 0) {
            return;
        }
        add(catalog, SUPPLIER_A, "TMA-1", 1, Lifecycle.ACTIVE, "18.00");
        add(catalog, SUPPLIER_B, "TMA-HALF", 0.5, Lifecycle.ACTIVE, "7.50");
        add(catalog, SUPPLIER_B, "TMA-TINY", 0.1, Lifecycle.ACTIVE, "2.10");
        add(catalog, SUPPLIER_A, "TMA-OLD", 1, Lifecycle.OBSOLETE, "9.00");
    }

    /** TM-A with its legs' area scaled: Imax, Qmax scale with area, Vmax and ΔTmax do not (Goldsmid 2016, from memory). */
    private static void add(CatalogService catalog, String supplier, String partNumber, double areaScale,
                            Lifecycle lifecycle, String price) {
        var ratings = new RatedInputs(TM_A_IMAX_A * areaScale, TM_A_VMAX_V, TM_A_QMAX_W * areaScale, TM_A_DTMAX_K,
                TM_A_HOT_SIDE_C, RatingsMethod.IMAX_VMAX_DTMAX, TestAtmosphere.DRY_NITROGEN);
        var definition = new ModuleDefinition(supplier, partNumber, "invented test module", ratings, null, 30.0, 30.0,
                3.6, 80.0, "EUR", List.of(new PriceBreak(1, new BigDecimal(price)),
                        new PriceBreak(100, new BigDecimal(price).multiply(new BigDecimal("0.8")))),
                21, 10, lifecycle, true, true, "rev A", null);
        catalog.create(definition, "test");
    }
}
