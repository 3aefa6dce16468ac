package org.chillwright.selection.web;

import java.util.Locale;
import org.chillwright.physics.Units;

/** Formats engine values (SI, kelvin) in the units the person chose for the case. */
public record CaseView(CaseForm form) {

    public String temperature(double temperatureK) {
        if (!Double.isFinite(temperatureK)) {
            return "–";
        }
        var unit = form.temperatureUnit();
        return String.format(Locale.ROOT, "%.1f %s", unit.fromCelsius(Units.celsiusFromKelvin(temperatureK)),
                unit.symbol());
    }

    public String difference(double differenceK) {
        if (!Double.isFinite(differenceK)) {
            return "–";
        }
        var unit = form.temperatureUnit();
        return String.format(Locale.ROOT, "%.1f %s", unit.differenceFromKelvin(differenceK),
                unit == org.chillwright.web.TemperatureUnit.F ? "°F" : "K");
    }

    public String power(double powerW) {
        if (!Double.isFinite(powerW)) {
            return "–";
        }
        var unit = form.powerUnit();
        return String.format(Locale.ROOT, "%.2f %s", unit.fromWatts(powerW), unit.symbol());
    }

    public String number(double value, int decimals) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%." + decimals + "f", value) : "–";
    }

    public boolean known(double value) {
        return Double.isFinite(value);
    }

    public String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%.0f %%", 100 * fraction) : "–";
    }
}
