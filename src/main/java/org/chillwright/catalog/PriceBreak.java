package org.chillwright.catalog;

import java.math.BigDecimal;

/**
 * Unit price from {@code quantity} pieces up, in the module's currency. The price is kept without
 * trailing zeros so that 12.40 and 12.4 are the same price.
 */
public record PriceBreak(Integer quantity, BigDecimal unitPrice) {

    public PriceBreak {
        unitPrice = unitPrice == null ? null : unitPrice.stripTrailingZeros();
    }
}
