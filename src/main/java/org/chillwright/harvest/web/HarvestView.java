package org.chillwright.harvest.web;

import java.util.Locale;
import org.chillwright.physics.Units;
import org.chillwright.web.TemperatureUnit;

/** Formats engine values (SI, kelvin) for the harvest pages, temperatures in the unit the person chose. */
public record HarvestView(TemperatureUnit unit) {

    public String temperature(double temperatureK) {
        if (!Double.isFinite(temperatureK)) {
            return "–";
        }
        return String.format(Locale.ROOT, "%.1f %s", unit.fromCelsius(Units.celsiusFromKelvin(temperatureK)),
                unit.symbol());
    }

    /** Power in W, or mW below one watt, to three significant figures. */
    public String power(double powerW) {
        if (!Double.isFinite(powerW)) {
            return "–";
        }
        return Math.abs(powerW) < 1 ? sig(powerW * 1e3) + " mW" : sig(powerW) + " W";
    }

    public String number(double value, int decimals) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%." + decimals + "f", value) : "–";
    }

    public String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%.2f %%", 100 * fraction) : "–";
    }

    public boolean known(double value) {
        return Double.isFinite(value);
    }

    /** Three significant figures, plain notation. */
    public String sig(double value) {
        return Double.isFinite(value) ? new java.math.BigDecimal(value)
                .round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString() : "–";
    }
}
