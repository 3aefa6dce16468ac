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

    /** The case in words and the person's units, for reports. */
    public java.util.Map<String, String> lines() {
        var c = form.toSpec().rankingCase();
        var lines = new java.util.LinkedHashMap<String, String>();
        lines.put("Object set-point", temperature(c.coolingCase().setPointK()));
        lines.put("Hottest ambient", temperature(c.coolingCase().ambientK()));
        if (form.coldestDay() != null) {
            lines.put("Coldest ambient (heating check)", temperature(form.coldestDay().ambientK()));
        }
        lines.put("Heat load", power(form.heatLoadW()) + " (" + power(form.activeLoadW()) + " active, "
                + power(form.parasiticW()) + " parasitic)");
        lines.put("Heat sink", form.sizesSink() ? "sized for a " + number(c.sinkRiseK(), 1) + " K rise"
                : number(c.coolingCase().sinkResistanceKPerW(), 3) + " K/W");
        lines.put("Interfaces (cold, hot)", number(c.coolingCase().coldInterfaceKPerW(), 3) + " K/W, "
                + number(c.coolingCase().hotInterfaceKPerW(), 3) + " K/W");
        lines.put("Supply limits", (known(c.supplyMaxV()) ? number(c.supplyMaxV(), 1) + " V" : "no voltage limit")
                + ", " + (known(c.supplyMaxA()) ? number(c.supplyMaxA(), 1) + " A" : "no current limit"));
        if (c.coolingCase().hasRelativeHumidity()) {
            lines.put("Relative humidity", percent(c.coolingCase().relativeHumidity()));
        }
        lines.put("Designs", "1 to " + c.maxModules() + " modules, ranked by " + c.objective());
        return lines;
    }

    public boolean known(double value) {
        return Double.isFinite(value);
    }

    public String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%.0f %%", 100 * fraction) : "–";
    }
}
