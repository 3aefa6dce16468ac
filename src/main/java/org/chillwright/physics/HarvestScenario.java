package org.chillwright.physics;

/**
 * A worked harvesting example of our own, with invented numbers: a system, a design point and a day.
 *
 * @param key                  a stable identifier for the demo data ({@code wrist-sensor}, …)
 * @param title                a short title
 * @param summary              one or two sentences on what it shows; says that the scenario is invented
 * @param basis                where each number comes from: named sources, "common practice (no source)",
 *                             "from memory", or "invented"
 * @param system               generator, exchangers, converter, storage and device
 * @param generatorFootprintM2 area the generator covers on the heat source, m² (for power per area)
 * @param hotSourceK           source temperature at the design point, K
 * @param coldSinkK            sink temperature at the design point, K
 * @param day                  source and sink temperatures over a day, from 0 to 86,400 s
 */
public record HarvestScenario(String key, String title, String summary, String basis, HarvestSystem system,
                              double generatorFootprintM2, double hotSourceK, double coldSinkK,
                              TemperatureSchedule day) {

    public HarvestScenario {
        for (String[] text : new String[][] {{"key", key}, {"title", title}, {"summary", summary}, {"basis", basis}}) {
            if (text[1] == null || text[1].isBlank()) {
                throw new InvalidQuantityException(text[0], Double.NaN, text[0] + " must be given, was blank");
            }
        }
        if (system == null) {
            throw new InvalidQuantityException("system", Double.NaN, "system must be given, was null");
        }
        Check.positive("generatorFootprintM2", generatorFootprintM2);
        Check.positive("coldSinkK", coldSinkK);
        Check.above("hotSourceK", hotSourceK, coldSinkK, "coldSinkK");
        if (day == null) {
            throw new InvalidQuantityException("day", Double.NaN, "day must be given, was null");
        }
    }

    /** The generator case at the design point. */
    public GeneratorCase designCase() {
        return system.caseAt(hotSourceK, coldSinkK);
    }
}
