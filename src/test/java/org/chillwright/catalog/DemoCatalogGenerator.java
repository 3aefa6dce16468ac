package org.chillwright.catalog;

import java.io.IOException;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.chillwright.physics.LegConstruction;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.physics.Units;

/**
 * Writes {@code catalog-samples/demo-catalog.csv}: an invented catalog of four invented suppliers.
 * Every module starts from a construction (couples, leg geometry, Bi₂Te₃-like properties drawn with
 * spread, contact resistance and a few per cent of parasitic conductance) and its ratings come from
 * the physics engine. The rating tests are modelled at their own mean temperatures, so the stated
 * ratings disagree by a few per cent as real ones do: ΔTmax, Imax and Vmax with the properties at
 * the colder mean temperature of the ΔTmax test, Qmax with those at the hot side (each rating test has its
 * own mean temperature: Th − ΔTmax/2 for ΔTmax, Th for Qmax). The temperature slopes of the
 * properties are invented, common practice (no source). The same seed always gives the same file.
 *
 * <p>Run: {@code ./mvnw -q test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=org.chillwright.catalog.DemoCatalogGenerator}
 */
public final class DemoCatalogGenerator {

    static final Path OUTPUT = Path.of("catalog-samples", "demo-catalog.csv");
    private static final long SEED = 20261202L;
    private static final int MODULES_PER_SUPPLIER = 12;
    private static final int[] COUPLES = {17, 31, 49, 63, 71, 97, 127, 161, 199};

    private record Supplier(String name, String prefix, String currency, int minOrder, double priceFactor,
                            int leadLowDays, int leadHighDays, double hotSideC) {
    }

    private static final List<Supplier> SUPPLIERS = List.of(
            new Supplier("Frostline Components", "FLC", "EUR", 1, 1.00, 10, 35, 25.0),
            new Supplier("Polar Ridge Thermal", "PRT", "USD", 1, 0.90, 25, 70, 27.0),
            new Supplier("Nordvik Cooling Devices", "NVD", "EUR", 10, 0.78, 40, 90, 25.0),
            new Supplier("Tundra Cell Labs", "TCL", "USD", 1, 1.25, 5, 20, 27.0));

    private DemoCatalogGenerator() {
    }

    public static void main(String[] args) throws IOException {
        Files.createDirectories(OUTPUT.getParent());
        Files.writeString(OUTPUT, csv(), StandardCharsets.UTF_8);
    }

    /** The demo catalog as CSV text. */
    static String csv() {
        var out = new StringWriter();
        ModuleCsv.write(modules(), out);
        return out.toString();
    }

    public static List<ModuleDefinition> modules() {
        var random = new Random(SEED);
        var modules = new ArrayList<ModuleDefinition>();
        for (Supplier supplier : SUPPLIERS) {
            int made = 0;
            while (made < MODULES_PER_SUPPLIER) {
                ModuleDefinition module = attempt(random, supplier, made);
                if (module != null) {
                    modules.add(module);
                    made++;
                }
            }
        }
        return modules;
    }

    /** One drawn module, or null when its ratings fall outside the span the demo should cover. */
    private static ModuleDefinition attempt(Random random, Supplier supplier, int index) {
        int couples = COUPLES[random.nextInt(COUPLES.length)];
        double legAreaMm2 = Math.exp(between(random, Math.log(0.3), Math.log(6.5))); // spreads Imax evenly
        double legLengthMm = between(random, 0.8, 2.0);
        double seebeckP = between(random, 180e-6, 215e-6);
        double seebeckN = -between(random, 180e-6, 215e-6);
        double resistivityP = between(random, 0.9e-5, 1.15e-5);
        double resistivityN = between(random, 0.9e-5, 1.15e-5);
        double conductivityP = between(random, 1.35, 1.65);
        double conductivityN = between(random, 1.35, 1.65);
        double contactOhmM2 = between(random, 1e-10, 6e-10);
        double parasiticFraction = between(random, 0.02, 0.06);
        double resistivitySlopePerK = between(random, 0.002, 0.004);
        double seebeckSlopePerK = between(random, 0.0008, 0.0016);
        double hotSideK = Units.kelvinFromCelsius(supplier.hotSideC());

        // properties at the hot side: the Qmax test (ΔT = 0)
        ModuleParameters atHotSide = parameters(couples, legAreaMm2, legLengthMm, seebeckP, seebeckN, resistivityP,
                resistivityN, conductivityP, conductivityN, contactOhmM2, parasiticFraction, 0, 0, 0);
        // properties at the mean temperature of the ΔTmax test, found by a short fixed point
        double coolerByK = 0;
        MaxRatings cold = atHotSide.ratingsAt(hotSideK);
        for (int i = 0; i < 4; i++) {
            coolerByK = cold.dtmaxK() / 2;
            cold = parameters(couples, legAreaMm2, legLengthMm, seebeckP, seebeckN, resistivityP, resistivityN,
                    conductivityP, conductivityN, contactOhmM2, parasiticFraction, coolerByK, resistivitySlopePerK,
                    seebeckSlopePerK).ratingsAt(hotSideK);
        }
        double qmaxW = atHotSide.ratingsAt(hotSideK).qmaxW();
        double imaxA = round(cold.imaxA(), 1);
        double vmaxV = round(cold.vmaxV(), 1);
        double dtmaxK = round(cold.dtmaxK(), 0);
        double statedQmaxW = round(qmaxW, qmaxW < 10 ? 2 : 1);
        boolean constructionRoute = index == MODULES_PER_SUPPLIER - 1; // one per supplier shows the other route
        if (!inSpan(imaxA, vmaxV, statedQmaxW, dtmaxK) || constructionRoute && !inSpan(atHotSide.ratingsAt(
                Units.kelvinFromCelsius(CatalogService.CONSTRUCTION_REFERENCE_HOT_SIDE_C)))) {
            return null;
        }
        String partNumber = String.format(Locale.ROOT, "%s-%03d-%04.1f%s", supplier.prefix(), couples, imaxA,
                (char) ('A' + index % 3));
        double side = footprintMm(couples, legAreaMm2);
        double heightMm = round(legLengthMm + 2 * 0.65 + 0.2, 1); // legs, two ceramic plates, solder
        double price1 = round(supplier.priceFactor() * (4.5 + 0.22 * statedQmaxW + 0.012 * couples)
                * between(random, 0.9, 1.15), 2);
        String description = String.format(Locale.ROOT, "%d-couple single-stage module, %s × %s mm", couples,
                ModuleText.number(side), ModuleText.number(side));
        RatedInputs ratings = constructionRoute ? null
                : new RatedInputs(imaxA, vmaxV, statedQmaxW, dtmaxK, supplier.hotSideC(), RatingsMethod.IMAX_VMAX_DTMAX,
                        TestAtmosphere.values()[random.nextInt(TestAtmosphere.values().length)]);
        ConstructionInputs construction = !constructionRoute ? null
                : new ConstructionInputs(couples, round(legAreaMm2, 2), null, round(legLengthMm, 2),
                        round(seebeckP, 7), round(seebeckN, 7), round(resistivityP, 8), round(resistivityN, 8),
                        round(conductivityP, 3), round(conductivityN, 3), round(contactOhmM2, 11));
        return new ModuleDefinition(supplier.name(), partNumber, description, ratings, construction, side, side,
                heightMm, new double[] {80, 100, 120, 150}[random.nextInt(4)], supplier.currency(),
                prices(supplier, price1), leadTime(random, supplier), supplier.minOrder(), lifecycle(random),
                random.nextInt(10) > 0, random.nextInt(3) > 0 ? Boolean.TRUE : null,
                "DS-" + supplier.prefix() + "-" + couples + " rev " + (char) ('A' + random.nextInt(4)),
                "Invented demo entry; not a real product.");
    }

    private static boolean inSpan(MaxRatings r) {
        return inSpan(r.imaxA(), r.vmaxV(), r.qmaxW(), r.dtmaxK());
    }

    private static boolean inSpan(double imaxA, double vmaxV, double qmaxW, double dtmaxK) {
        return imaxA >= 1 && imaxA <= 15 && vmaxV >= 2 && vmaxV <= 25 && dtmaxK >= 64 && dtmaxK <= 74
                && qmaxW >= 2 && qmaxW <= 120;
    }

    private static ModuleParameters parameters(int couples, double legAreaMm2, double legLengthMm,
                                               double seebeckP, double seebeckN, double resistivityP,
                                               double resistivityN, double conductivityP, double conductivityN,
                                               double contactOhmM2, double parasiticFraction, double coolerByK,
                                               double resistivitySlopePerK, double seebeckSlopePerK) {
        double seebeckScale = 1 - seebeckSlopePerK * coolerByK;
        double resistivityScale = 1 - resistivitySlopePerK * coolerByK;
        double areaM2 = Units.squareMetresFromSquareMillimetres(legAreaMm2);
        ModuleParameters legs = new LegConstruction(couples, areaM2, areaM2, Units.metresFromMillimetres(legLengthMm),
                seebeckP * seebeckScale, seebeckN * seebeckScale, resistivityP * resistivityScale,
                resistivityN * resistivityScale, conductivityP, conductivityN, contactOhmM2).toParameters();
        // filler and air between the legs carry heat beside them: a few per cent more conductance
        return new ModuleParameters(legs.seebeckVPerK(), legs.resistanceOhm(),
                legs.conductanceWPerK() * (1 + parasiticFraction));
    }

    private static double footprintMm(int couples, double legAreaMm2) {
        double legsAreaMm2 = 2 * couples * legAreaMm2 / 0.35; // legs fill about a third of the plate
        double[] sizes = {6, 8, 10, 12, 15, 20, 25, 30, 40, 50, 62};
        for (double size : sizes) {
            if (size * size >= legsAreaMm2) {
                return size;
            }
        }
        return sizes[sizes.length - 1];
    }

    private static List<PriceBreak> prices(Supplier supplier, double price1) {
        var breaks = new ArrayList<PriceBreak>();
        int[] quantities = supplier.minOrder() > 1 ? new int[] {10, 100, 1000} : new int[] {1, 10, 100, 1000};
        double[] factors = supplier.minOrder() > 1 ? new double[] {0.85, 0.7, 0.58} : new double[] {1, 0.88, 0.74, 0.6};
        for (int i = 0; i < quantities.length; i++) {
            breaks.add(new PriceBreak(quantities[i], BigDecimal.valueOf(price1 * factors[i]).setScale(2,
                    RoundingMode.HALF_EVEN)));
        }
        return breaks;
    }

    private static int leadTime(Random random, Supplier supplier) {
        return supplier.leadLowDays() + random.nextInt(supplier.leadHighDays() - supplier.leadLowDays() + 1);
    }

    private static Lifecycle lifecycle(Random random) {
        int draw = random.nextInt(20);
        return draw < 14 ? Lifecycle.ACTIVE : draw < 17 ? Lifecycle.NOT_FOR_NEW_DESIGNS
                : draw < 19 ? Lifecycle.LAST_TIME_BUY : Lifecycle.OBSOLETE;
    }

    private static double between(Random random, double low, double high) {
        return low + (high - low) * random.nextDouble();
    }

    private static double round(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).doubleValue();
    }
}
