package org.chillwright.web;

/** Heat-flow units a person may type in a form; the engine always sees watts. */
public enum PowerUnit {
    W("W", 1.0),
    /** International Table Btu per hour: 1 Btu_IT/h = 0.2930711 W (NIST SP 811, 2008, Appendix B.9). */
    BTU_PER_HOUR("BTU/h", 0.2930711);

    private final String symbol;
    private final double watts;

    PowerUnit(String symbol, double watts) {
        this.symbol = symbol;
        this.watts = watts;
    }

    public String symbol() {
        return symbol;
    }

    public double toWatts(double value) {
        return value * watts;
    }

    public double fromWatts(double valueW) {
        return valueW / watts;
    }
}
