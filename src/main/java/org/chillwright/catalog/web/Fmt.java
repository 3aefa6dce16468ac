package org.chillwright.catalog.web;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import org.chillwright.physics.Units;
import org.springframework.stereotype.Component;

/** Number formatting for the catalog pages, used in templates as {@code @catalogFormat}. */
@Component("catalogFormat")
public class Fmt {

    private static final String SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    private static final java.time.format.DateTimeFormatter TIME =
            java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'").withZone(java.time.ZoneOffset.UTC);

    /** {@code digits} significant figures; very small or large values as "2.62 × 10⁻³". */
    public String sig(Double value, int digits) {
        if (value == null || value.isNaN()) {
            return "—";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        int exponent = rounded.precision() - rounded.scale() - 1;
        if (exponent >= -2 && exponent < 6) {
            return rounded.setScale(Math.max(0, digits - 1 - exponent), RoundingMode.HALF_EVEN).toPlainString();
        }
        BigDecimal mantissa = rounded.movePointLeft(exponent).setScale(digits - 1, RoundingMode.HALF_EVEN);
        return mantissa.toPlainString() + " × 10" + superscript(exponent);
    }

    public String fixed(Double value, int decimals) {
        return value == null || value.isNaN() ? "—"
                : new BigDecimal(value).setScale(decimals, RoundingMode.HALF_EVEN).toPlainString();
    }

    public String celsius(double kelvin) {
        return fixed(Units.celsiusFromKelvin(kelvin), 1);
    }

    public String price(BigDecimal price, String currency) {
        if (price == null) {
            return "—";
        }
        return price.setScale(Math.max(2, price.scale()), RoundingMode.UNNECESSARY).toPlainString()
                + (currency == null ? "" : " " + currency);
    }

    public String time(java.time.Instant instant) {
        return TIME.format(instant);
    }

    public String percent(double fraction) {
        return fixed(fraction * 100, 1) + " %";
    }

    private static String superscript(int exponent) {
        var out = new StringBuilder(exponent < 0 ? "⁻" : "");
        for (char c : Integer.toString(Math.abs(exponent)).toCharArray()) {
            out.append(SUPERSCRIPT.charAt(c - '0'));
        }
        return out.toString();
    }
}
