package org.chillwright.catalog;

import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import java.math.BigDecimal;

@Embeddable
class StoredPriceBreak {

    @Column(nullable = false)
    private int quantity;

    @Column(name = "unit_price", nullable = false, precision = 14, scale = 4)
    private BigDecimal unitPrice;

    protected StoredPriceBreak() {
    }

    StoredPriceBreak(PriceBreak priceBreak) {
        this.quantity = priceBreak.quantity();
        this.unitPrice = priceBreak.unitPrice();
    }

    PriceBreak toPriceBreak() {
        return new PriceBreak(quantity, unitPrice);
    }
}
