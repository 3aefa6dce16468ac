package org.chillwright.physics;

/**
 * A whole harvesting system: a thermoelectric generator between a source and a sink through heat-exchanger
 * resistances, a converter, a storage and a duty-cycled device. The source and sink temperatures come
 * separately (one pair, or a schedule over a day).
 *
 * @param generator           the module, or the equivalent module of an array ({@link ModuleArray#equivalent()})
 * @param hotResistanceKPerW  source-to-hot-face resistance, K/W, ≥ 0
 * @param coldResistanceKPerW cold-face-to-sink resistance, K/W, ≥ 0
 * @param converter           the converter between the generator and the storage
 * @param storage             the capacitor or cell
 * @param device              the load
 */
public record HarvestSystem(ModuleParameters generator, double hotResistanceKPerW, double coldResistanceKPerW,
                            Converter converter, EnergyStorage storage, DutyCycledDevice device) {

    public HarvestSystem {
        required("generator", generator);
        Check.nonNegative("hotResistanceKPerW", hotResistanceKPerW);
        Check.nonNegative("coldResistanceKPerW", coldResistanceKPerW);
        required("converter", converter);
        required("storage", storage);
        required("device", device);
    }

    private static void required(String field, Object value) {
        if (value == null) {
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
    }

    /** The generator case at a source and a sink temperature (both K, source hotter). */
    public GeneratorCase caseAt(double hotSourceK, double coldSinkK) {
        return new GeneratorCase(hotSourceK, coldSinkK, hotResistanceKPerW, coldResistanceKPerW);
    }

    /** The stored energy at which the device turns on, J: one event's energy above the floor. */
    public double turnOnJ() {
        return storage.floorJ() + device.eventEnergyJ();
    }
}
