package org.chillwright.catalog;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Everything a person enters about a module: what create, edit and import carry. Exactly one of
 * {@code ratings} and {@code construction} is set on a valid definition. Text is trimmed (blank
 * becomes null), the currency upper-cased and price breaks sorted by quantity, so that two
 * definitions that mean the same are equal.
 *
 * @param widthMm         footprint, mm, optional
 * @param maxOperatingC   highest hot-side temperature the module may see, °C, optional
 * @param currency        ISO 4217 code of the prices, required when there are prices
 * @param leadTimeDays    optional
 * @param rohs            RoHS compliance declared: true, false, or null when unknown
 * @param reach           REACH (no SVHC above threshold) declared: true, false, or null when unknown
 * @param datasheetRef    datasheet revision or reference, free text
 */
public record ModuleDefinition(String supplier, String partNumber, String description,
                               RatedInputs ratings, ConstructionInputs construction,
                               Double widthMm, Double lengthMm, Double heightMm, Double maxOperatingC,
                               String currency, List<PriceBreak> prices, Integer leadTimeDays,
                               Integer minOrderQuantity, Lifecycle lifecycle, Boolean rohs, Boolean reach,
                               String datasheetRef, String notes) {

    private static final Comparator<PriceBreak> BY_QUANTITY =
            Comparator.comparing(PriceBreak::quantity, Comparator.nullsFirst(Comparator.naturalOrder()));

    public ModuleDefinition {
        supplier = clean(supplier);
        partNumber = clean(partNumber);
        description = clean(description);
        currency = clean(currency) == null ? null : clean(currency).toUpperCase(java.util.Locale.ROOT);
        var sorted = new ArrayList<PriceBreak>();
        if (prices != null) {
            prices.stream().filter(java.util.Objects::nonNull).forEach(sorted::add);
        }
        sorted.sort(BY_QUANTITY);
        prices = List.copyOf(sorted);
        lifecycle = lifecycle == null ? Lifecycle.ACTIVE : lifecycle;
        datasheetRef = clean(datasheetRef);
        notes = clean(notes);
    }

    public EntryRoute route() {
        return ratings != null ? EntryRoute.RATINGS : EntryRoute.CONSTRUCTION;
    }

    /**
     * Unit price when buying {@code quantity} pieces: the price of the largest break at or below it.
     * Empty when the smallest break is above {@code quantity} or no price is known.
     */
    /**
     * What one needed piece really costs when {@code needed} pieces must be bought: at least the minimum
     * order, then the cheapest of buying that many at their break or rounding up to a larger break. Empty
     * without prices.
     */
    public Optional<BigDecimal> effectiveUnitPriceAt(int needed) {
        int bought = minOrderQuantity == null ? needed : Math.max(needed, minOrderQuantity);
        BigDecimal best = unitPriceAt(bought).map(p -> p.multiply(BigDecimal.valueOf(bought))).orElse(null);
        for (PriceBreak b : prices) {
            if (b.quantity() != null && b.quantity() > bought) {
                BigDecimal roundedUp = b.unitPrice().multiply(BigDecimal.valueOf(b.quantity()));
                best = best == null || roundedUp.compareTo(best) < 0 ? roundedUp : best;
            }
        }
        return Optional.ofNullable(best)
                .map(total -> total.divide(BigDecimal.valueOf(needed), 4, java.math.RoundingMode.HALF_UP));
    }

    public Optional<BigDecimal> unitPriceAt(int quantity) {
        BigDecimal price = null;
        for (PriceBreak b : prices) {
            if (b.quantity() != null && b.quantity() <= quantity) {
                price = b.unitPrice();
            }
        }
        return Optional.ofNullable(price);
    }

    private static String clean(String text) {
        return text == null || text.isBlank() ? null : text.strip();
    }
}
