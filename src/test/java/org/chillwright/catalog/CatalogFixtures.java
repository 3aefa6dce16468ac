package org.chillwright.catalog;

import java.math.BigDecimal;
import java.util.List;
import org.chillwright.physics.RatingsMethod;

/** Invented modules for tests: no value here describes a real product. */
public final class CatalogFixtures {

    private CatalogFixtures() {
    }

    /** A mid-size rated module: 6 A, 15.4 V, 56 W, 68 K at 25 °C (consistency 0.99), two price breaks in EUR. */
    public static ModuleDefinition rated(String supplier, String partNumber) {
        return new ModuleDefinition(supplier, partNumber, "Invented 127-couple test module",
                new RatedInputs(6.0, 15.4, 56.0, 68.0, 25.0, RatingsMethod.IMAX_VMAX_DTMAX, TestAtmosphere.DRY_NITROGEN),
                null, 40.0, 40.0, 3.9, 80.0, "EUR",
                List.of(new PriceBreak(1, new BigDecimal("12.40")), new PriceBreak(100, new BigDecimal("9.85"))),
                21, 1, Lifecycle.ACTIVE, true, true, "rev C", null);
    }

    /** A constructed module: 71 couples of 1 mm² × 1.3 mm legs, Bi2Te3-like properties. */
    public static ModuleDefinition constructed(String supplier, String partNumber) {
        return new ModuleDefinition(supplier, partNumber, "Invented constructed test module", null,
                new ConstructionInputs(71, 1.0, null, 1.3, 200e-6, -195e-6, 1.0e-5, 1.05e-5, 1.5, 1.45, 2e-10),
                30.0, 30.0, 3.6, 85.0, "USD", List.of(new PriceBreak(10, new BigDecimal("8.10"))), 35, 10,
                Lifecycle.NOT_FOR_NEW_DESIGNS, null, null, null, null);
    }

    public static ModuleDefinition withImax(ModuleDefinition d, double imaxA) {
        RatedInputs r = d.ratings();
        return new ModuleDefinition(d.supplier(), d.partNumber(), d.description(),
                new RatedInputs(imaxA, r.vmaxV(), r.qmaxW(), r.dtmaxK(), r.hotSideC(), r.method(), r.testAtmosphere()),
                null, d.widthMm(), d.lengthMm(), d.heightMm(), d.maxOperatingC(), d.currency(), d.prices(),
                d.leadTimeDays(), d.minOrderQuantity(), d.lifecycle(), d.rohs(), d.reach(), d.datasheetRef(), d.notes());
    }
}
