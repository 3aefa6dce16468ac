package org.chillwright.catalog.api;

import java.util.List;
import java.util.Objects;
import org.chillwright.catalog.ConstructionInputs;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.catalog.ModuleDefinition;
import org.chillwright.catalog.PriceBreak;
import org.chillwright.catalog.RatedInputs;
import org.chillwright.web.InvalidRequestException;

/**
 * {@code POST /api/v1/modules} and {@code PUT /api/v1/modules/{id}}: a module given by
 * {@code ratings} or by {@code construction}. {@code version} is required on PUT. All prices share
 * one currency.
 */
public record ModuleRequest(Long version, String supplier, String partNumber, String description,
                            RatedInputs ratings, ConstructionInputs construction,
                            Double widthMm, Double lengthMm, Double heightMm, Double maxOperatingC,
                            List<PriceJson> prices, Integer leadTimeDays, Integer minOrderQuantity,
                            Lifecycle lifecycle, Boolean rohs, Boolean reach, String datasheetRef, String notes) {

    ModuleDefinition toDefinition() {
        List<PriceJson> given = prices == null ? List.of() : prices.stream().filter(Objects::nonNull).toList();
        List<String> currencies = given.stream().map(PriceJson::currency).filter(Objects::nonNull)
                .map(c -> c.strip().toUpperCase(java.util.Locale.ROOT)).distinct().toList();
        if (currencies.size() > 1) {
            throw new InvalidRequestException("prices", "all prices of a module must be in one currency, got "
                    + String.join(", ", currencies));
        }
        return new ModuleDefinition(supplier, partNumber, description, ratings, construction, widthMm, lengthMm,
                heightMm, maxOperatingC, currencies.isEmpty() ? null : currencies.get(0),
                given.stream().map(p -> new PriceBreak(p.quantity(), p.unitPrice())).toList(), leadTimeDays,
                minOrderQuantity, lifecycle, rohs, reach, datasheetRef, notes);
    }
}
