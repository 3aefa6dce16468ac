package org.chillwright.selection;

/** What a ranking puts first. */
public enum Objective {
    /** Highest coefficient of performance: least heat added to the hot side per watt removed. */
    COP,
    /** Least electrical input power. */
    POWER,
    /** Most margin in kelvin: how much colder the object could be held at the same load. */
    MARGIN,
    /** Lowest array cost at the chosen build quantity. */
    COST
}
