package org.chillwright.catalog.api;

import java.math.BigDecimal;

/** One price break in the module JSON: unit price from {@code quantity} pieces up. */
public record PriceJson(Integer quantity, BigDecimal unitPrice, String currency) {
}
