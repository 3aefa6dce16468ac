package org.chillwright.physics;

import java.util.List;

/**
 * Three harvesting scenarios of our own for the demo data: a wrist-worn sensor on skin, a sensor on a warm
 * pipe, and a fan on a stove. Every module, converter, storage and device is invented (no real product); the
 * heat-transfer numbers come from the sources named beside them. Temperatures are built from °C with
 * {@link Units#kelvinFromCelsius}.
 */
public final class HarvestScenarios {

    /** Seconds in an hour. */
    private static final double HOUR_S = 3600;
    /** cm² in a m². */
    private static final double SQUARE_CENTIMETRES_PER_SQUARE_METRE = 1e4;

    /**
     * Thermal resistance of the wrist (dorsal) between body and a harvester on the skin, 440 cm²·K/W on average
     * (V. Leonov, "Human Machine and Thermoelectric Energy Scavenging for Wearable Devices", ISRN Renewable
     * Energy 2011, article 785380, Table 2, measured indoors). It includes the skin contact of the measuring
     * harvester.
     */
    static final double WRIST_BODY_RESISTANCE_CM2_K_PER_W = 440;
    /**
     * Free-convection coefficient of air taken for the wrist sink, W/(m²·K): mid-range of 2 to 25 for free
     * convection of gases (Y.A. Çengel, Heat Transfer: A Practical Approach, McGraw-Hill, chapter notes
     * "Convection Heat Transfer"; the same range is in F.P. Incropera &amp; D.P. DeWitt, Fundamentals of Heat and
     * Mass Transfer, Table 1.1, from memory).
     */
    static final double WRIST_FREE_CONVECTION_W_PER_M2K = 10;
    /**
     * Linearised radiation coefficient of the sink's outer envelope, W/(m²·K): h_r = εσ(Ts + Tsur)(Ts² + Tsur²)
     * (Incropera &amp; DeWitt, eq. 1.9, from memory) with ε = 0.9 (invented finish), Ts ≈ Tsur ≈ 300 K and
     * σ = 5.670374419e-8 W/(m²·K⁴) (CODATA 2018): about 5.5.
     */
    static final double WRIST_RADIATION_W_PER_M2K = 0.9 * 5.670374419e-8 * 600 * (2 * 300.0 * 300.0);
    /**
     * Forced-convection coefficient taken for the fan-cooled stove sink, W/(m²·K): low in the 25 to 250 range
     * for forced convection of gases (Çengel, chapter notes "Convection Heat Transfer"; Incropera &amp; DeWitt,
     * Table 1.1, from memory), since the fan is small.
     */
    static final double STOVE_FORCED_CONVECTION_W_PER_M2K = 40;

    private HarvestScenarios() {
    }

    /** All three, in the order wrist, pipe, stove. */
    public static List<HarvestScenario> all() {
        return List.of(wristSensor(), warmPipeSensor(), stoveFan());
    }

    /**
     * A wrist-worn sensor on skin. The body core (37 °C) heats a 30 × 30 mm plate on the back of the wrist
     * through the tissue's measured resistance; a finned sink gives the heat to room air by free convection and
     * radiation. The day: at night the wrist is under the covers (air near 28 °C), commutes are cold, the office
     * is at 22 °C.
     */
    public static HarvestScenario wristSensor() {
        double footprintM2 = 9e-4;                                             // 30 × 30 mm plate (invented)
        double finsM2 = 30e-4;                                                 // 30 cm² of pins (invented)
        double hotKPerW = WRIST_BODY_RESISTANCE_CM2_K_PER_W / (footprintM2 * SQUARE_CENTIMETRES_PER_SQUARE_METRE);
        double coldKPerW = 1 / (WRIST_FREE_CONVECTION_W_PER_M2K * finsM2 + WRIST_RADIATION_W_PER_M2K * footprintM2);
        // invented wearable module: long thin legs (40 K/W), Z = 1.2e-3 1/K (parasitic paths), R = 40 ohm
        double conductanceWPerK = 1 / 40.0;
        double resistanceOhm = 40;
        var module = new ModuleParameters(Math.sqrt(1.2e-3 * conductanceWPerK * resistanceOhm), resistanceOhm,
                conductanceWPerK);
        var storage = new CapacitorStorage(0.1, 2.0, 3.3, Double.POSITIVE_INFINITY, 1e-6); // invented
        var device = new DutyCycledDevice(1.5e-6, 0, 2e-3, 30); // invented: optical pulse reading + radio every 30 s
        double coreC = 37;
        double nightCoreC = 36.5;
        var day = schedule(
                new double[] {0, 6.5, 7, 7.5, 8, 12, 12.25, 13, 13.25, 17.5, 17.75, 18, 18.25, 23, 23.5, 24},
                new double[] {nightCoreC, nightCoreC, coreC, coreC, coreC, coreC, coreC, coreC, coreC, coreC, coreC,
                        coreC, coreC, coreC, nightCoreC, nightCoreC},
                new double[] {28, 28, 18, 8, 22, 22, 15, 15, 22, 22, 10, 10, 21, 21, 28, 28});
        return new HarvestScenario("wrist-sensor", "Wrist-worn sensor on skin",
                "Invented demo scenario: a sensor on the back of the wrist reads a pulse and sends it every 30 s, "
                        + "powered by body heat through a 30 x 30 mm generator, a boost converter and a 0.1 F "
                        + "supercapacitor. Under the covers at night the difference to the air is small.",
                "Body side: " + WRIST_BODY_RESISTANCE_CM2_K_PER_W + " cm2*K/W measured at the wrist (Leonov, ISRN "
                        + "Renewable Energy 2011, article 785380, Table 2) over the 9 cm2 plate, from a 37 C core "
                        + "(36.5 C at night, from memory). Air side: free convection h = 10 W/(m2*K), mid-range "
                        + "of 2-25 for gases (Cengel, Heat Transfer, chapter notes; Incropera & DeWitt, Table 1.1, "
                        + "from memory) on 30 cm2 of pins, plus linearised radiation (Incropera & DeWitt eq. 1.9, "
                        + "from memory) on the 9 cm2 envelope. Module, converter, storage, device and the day: "
                        + "invented.",
                new HarvestSystem(module, hotKPerW, coldKPerW, Converter.demo(), storage, device), footprintM2,
                Units.kelvinFromCelsius(coreC), Units.kelvinFromCelsius(22), day);
    }

    /**
     * A sensor on a warm pipe: a clamped 40 × 40 mm module between a hot-water pipe and a natural-convection
     * sink, charging a small rechargeable cell, in a plant room at 25 °C. The water runs from 06:00 to 22:00;
     * at night the pipe cools towards the room.
     */
    public static HarvestScenario warmPipeSensor() {
        // invented standard-size module: 127 couples, S = 53 mV/K, R = 2 ohm, Z = 2.5e-3 1/K
        double s = 0.053;
        double r = 2.0;
        var module = new ModuleParameters(s, r, s * s / (r * 2.5e-3));
        double hotKPerW = 0.8;  // clamped saddle and pipe wall, invented
        double coldKPerW = 2.5; // natural-convection finned sink: 1 to 3 K/W is usual (common practice, no source)
        var storage = CellStorage.ofMilliampHours(100, 3.7, 0.02, 0.9, 0.2, 2e-6); // invented
        var device = new DutyCycledDevice(5e-6, 0, 0.25, 60); // invented: vibration reading and radio every minute
        double roomC = 25;
        var day = schedule(
                new double[] {0, 5.5, 6, 22, 22.5, 23, 24},
                new double[] {31, 30, 60, 60, 45, 38, 33},
                new double[] {roomC, roomC, roomC, roomC, roomC, roomC, roomC});
        return new HarvestScenario("warm-pipe-sensor", "Sensor on a warm pipe",
                "Invented demo scenario: a condition sensor clamped to a hot-water pipe sends a reading every "
                        + "minute, powered by the pipe through a 40 x 40 mm generator into a 100 mAh cell. The "
                        + "water runs 06:00-22:00; at night the cell carries the sensor.",
                "Sink: 2.5 K/W, within the 1-3 K/W usual for natural-convection finned sinks (common practice, "
                        + "no source). Saddle 0.8 K/W, module, converter, cell, device and the day: invented.",
                new HarvestSystem(module, hotKPerW, coldKPerW, Converter.demo(), storage, device), 16e-4,
                Units.kelvinFromCelsius(60), Units.kelvinFromCelsius(roomC), day);
    }

    /**
     * A fan on a stove: a high-temperature module between a stove top and a fan-cooled sink drives the fan
     * (1.2 W) and sends the flue temperature every five minutes. The stove is lit in the morning and the evening.
     * The hot face runs near 150 °C: only a module built for that temperature will do, and the fan must never
     * be the only protection of the module (see the README's cautions on hot sides).
     */
    public static HarvestScenario stoveFan() {
        // invented high-temperature module: S = 50 mV/K, R = 1.6 ohm, Z = 2.0e-3 1/K
        double s = 0.05;
        double r = 1.6;
        var module = new ModuleParameters(s, r, s * s / (r * 2.0e-3));
        double hotKPerW = 1.5; // base plate and its contact with the stove top, invented
        double finsM2 = 0.04;  // 400 cm² of fins, invented
        double coldKPerW = 1 / (STOVE_FORCED_CONVECTION_W_PER_M2K * finsM2);
        var storage = new CapacitorStorage(1.0, 3.0, 5.0, Double.POSITIVE_INFINITY, 10e-6); // invented
        var device = new DutyCycledDevice(0, 1.2, 0.5, 300); // invented: 1.2 W fan, a radio report every 5 min
        double roomC = 22;
        double litC = 250;
        var day = schedule(
                new double[] {0, 0.5, 6.5, 7.25, 9.5, 11.5, 17, 17.75, 22.5, 24},
                new double[] {35, roomC, roomC, litC, litC, roomC, roomC, litC, litC, 60},
                new double[] {roomC, roomC, roomC, roomC, roomC, roomC, roomC, roomC, roomC, roomC});
        return new HarvestScenario("stove-fan", "Fan on a stove",
                "Invented demo scenario: a stove-top fan driven by a 40 x 40 mm high-temperature generator "
                        + "through a converter and a 1 F buffer, also reporting the flue temperature every 5 "
                        + "minutes. The stove is lit 06:30-09:30 and 17:00-22:30; the fan stops as it cools.",
                "Sink: 400 cm2 of fins at h = 40 W/(m2*K), low in the 25-250 range for forced convection of "
                        + "gases (Cengel, Heat Transfer, chapter notes; Incropera & DeWitt, Table 1.1, from "
                        + "memory). Stove-top temperature, base plate, module, converter, buffer, fan and the day: "
                        + "invented. The hot face runs near 150 C: a module rated for it is assumed.",
                new HarvestSystem(module, hotKPerW, coldKPerW, Converter.demo(), storage, device), 16e-4,
                Units.kelvinFromCelsius(litC), Units.kelvinFromCelsius(roomC), day);
    }

    /** A linear schedule from hours and °C. */
    private static TemperatureSchedule schedule(double[] hours, double[] hotC, double[] coldC) {
        double[] timesS = new double[hours.length];
        double[] hotK = new double[hours.length];
        double[] coldK = new double[hours.length];
        for (int i = 0; i < hours.length; i++) {
            timesS[i] = hours[i] * HOUR_S;
            hotK[i] = Units.kelvinFromCelsius(hotC[i]);
            coldK[i] = Units.kelvinFromCelsius(coldC[i]);
        }
        return new TemperatureSchedule(timesS, hotK, coldK, TemperatureSchedule.Interpolation.LINEAR);
    }
}
