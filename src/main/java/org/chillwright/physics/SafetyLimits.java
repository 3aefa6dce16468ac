package org.chillwright.physics;

import java.util.Locale;

/**
 * Limits beyond which a design can hurt someone or itself, shared by the cooler and generator checks. Both
 * are common practice with no single published source: the applicable product-safety standard, the
 * module's own data and local codes govern.
 */
public final class SafetyLimits {

    /**
     * Above this DC voltage an array is a shock hazard, V: 60 V DC is the usual extra-low-voltage limit for
     * dry locations (common practice, no source; the applicable standard and local codes govern).
     */
    public static final double SHOCK_HAZARD_ABOVE_V = 60.0;

    /**
     * Hottest hot face accepted for a module that states no maximum temperature, K (250 °C): the solder and
     * the ceramics of bismuth-telluride modules give out well before this (common practice, no source).
     * Beyond it a point is of no physical use, whatever the equations say.
     */
    public static final double HOT_FACE_WITHOUT_STATED_LIMIT_K = 523.15;

    private SafetyLimits() {
    }

    /** Whether a voltage, V (either sign), is above {@link #SHOCK_HAZARD_ABOVE_V}. */
    public static boolean isShockHazard(double voltageV) {
        return Math.abs(voltageV) > SHOCK_HAZARD_ABOVE_V;
    }

    /**
     * The shock-hazard warning for an array's voltage, V.
     *
     * @param what which voltage it is, e.g. "the terminal voltage" or "the open-circuit voltage"
     */
    public static Warning shockHazard(String what, double voltageV) {
        return new Warning(Warning.Code.SHOCK_HAZARD_VOLTAGE, String.format(Locale.ROOT,
                "%s of %.1f V is above %.0f V DC, the usual extra-low-voltage limit for dry locations (common"
                        + " practice): guard live parts against touch, insulate and fuse the wiring, and follow the"
                        + " applicable standard and local codes", what, Math.abs(voltageV), SHOCK_HAZARD_ABOVE_V));
    }
}
