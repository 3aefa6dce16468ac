package org.chillwright.harvest;

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
import org.chillwright.selection.TestCatalog;

/**
 * Invented generator test modules under a supplier name only the harvest tests use. HRV-A carries the
 * ideal ratings of the check cases' synthetic TM-A at 300 K (S02), so it derives back to S 0.04 V/K,
 * R 2.4 Ω, K 0.25 W/K (S03); HRV-HALF has half its leg area (R 4.8 Ω, K 0.125 W/K) and states no
 * temperature limit; HRV-COOL is HRV-A limited to 80 °C; HRV-OLD is obsolete.
 */
public final class HarvestTestCatalog {

    public static final String SUPPLIER = "Heatrun Test Modules";

    /**
     * A property only the harvest test classes set, so that Spring caches a context of their own with its own
     * in-memory database: these modules copy TM-A and would otherwise tie with the selection tests' modules
     * and change those rankings.
     */
    public static final String OWN_DATABASE = "chillwright.test.catalog=harvest";

    private HarvestTestCatalog() {
    }

    /** Adds the modules once per database (a Spring test context shares one). */
    public static synchronized void ensure(CatalogService catalog) {
        if (catalog.search(ModuleQuery.text("HRV-A")).total() > 0) {
            return;
        }
        add(catalog, "HRV-A", 1, 200.0, Lifecycle.ACTIVE, "18.00");
        add(catalog, "HRV-HALF", 0.5, null, Lifecycle.ACTIVE, "7.50");
        add(catalog, "HRV-COOL", 1, 80.0, Lifecycle.ACTIVE, "12.00");
        add(catalog, "HRV-OLD", 1, 200.0, Lifecycle.OBSOLETE, "9.00");
    }

    /** TM-A with its legs' area scaled: Imax, Qmax scale with area, Vmax and ΔTmax do not (Goldsmid 2016, from memory). */
    private static void add(CatalogService catalog, String partNumber, double areaScale, Double maxOperatingC,
                            Lifecycle lifecycle, String price) {
        var ratings = new RatedInputs(TestCatalog.TM_A_IMAX_A * areaScale, TestCatalog.TM_A_VMAX_V,
                TestCatalog.TM_A_QMAX_W * areaScale, TestCatalog.TM_A_DTMAX_K, TestCatalog.TM_A_HOT_SIDE_C,
                RatingsMethod.IMAX_VMAX_DTMAX, TestAtmosphere.DRY_NITROGEN);
        var definition = new ModuleDefinition(SUPPLIER, partNumber, "invented generator test module", ratings, null,
                40.0, 40.0, 3.8, maxOperatingC, "EUR", List.of(new PriceBreak(1, new BigDecimal(price))), 28, 1,
                lifecycle, true, true, "rev A", null);
        catalog.create(definition, "test");
    }
}
