package org.chillwright.harvest;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.IntStream;
import org.chillwright.physics.GeneratorCase;
import org.chillwright.physics.GeneratorSolver;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.Units;

/**
 * Solves every module in every series × parallel split as a generator between one hot source and one cold
 * sink, each design on the load that gives it the most power (the solver's numerical optimum: with finite
 * heat-exchanger resistances it is not RL = R), and ranks the designs. Pure: no Spring, no
 * catalog; stateless and thread-safe.
 */
public final class HarvestEngine {

    private final GeneratorSolver solver = new GeneratorSolver();

    /**
     * One design in full: open circuit, best-power point, best-efficiency point.
     *
     * @param module      parameters of one module
     * @param maxHotSideK the module's hot-side limit, K, or NaN when unknown
     * @param unitPrice   price of one module at the build quantity, or NaN
     */
    public HarvestDesign design(long moduleId, ModuleParameters module, int seriesCount, int parallelCount,
                                GeneratorCase c, double maxHotSideK, double unitPrice) {
        var array = module.inArray(seriesCount, parallelCount);
        return new HarvestDesign(moduleId, seriesCount, parallelCount, solver.openCircuitV(array, c),
                solver.maxPower(array, c), solver.maxEfficiency(array, c), GeneratorSolver.openCircuitHotJunctionK(array, c),
                maxHotSideK, unitPrice);
    }

    /** What rules a design out, if anything: the hot-side limit first, then the converter's voltage. */
    public Optional<HarvestRanking.Rejection> problem(HarvestDesign d, double minLoadVoltageV) {
        if (d.exceedsHotSideLimit()) {
            return Optional.of(new HarvestRanking.Rejection(d.moduleId(), HarvestRanking.HOT_SIDE_ABOVE_LIMIT,
                    "the hot face would reach " + celsius(d.openCircuitHotJunctionK())
                            + " with the load disconnected, above the module's maximum operating temperature of "
                            + celsius(d.maxHotSideK())));
        }
        if (d.atMaxPower().voltageV() < minLoadVoltageV) {
            return Optional.of(new HarvestRanking.Rejection(d.moduleId(), HarvestRanking.BELOW_MIN_VOLTAGE,
                    String.format(Locale.ROOT, "%.3f V at the best-power load, below the required %.3f V",
                            d.atMaxPower().voltageV(), minLoadVoltageV)));
        }
        return Optional.empty();
    }

    public HarvestRanking rank(GeneratorTable table, HarvestCase harvestCase) {
        long start = System.nanoTime();
        GeneratorCase c = harvestCase.generatorCase();
        int[][] splits = ModuleArray.splits(harvestCase.maxModules());
        int n = table.size();
        var designs = new HarvestDesign[n * splits.length];
        IntStream.range(0, n).parallel().forEach(i -> {
            var module = new ModuleParameters(table.seebeckVPerK()[i], table.resistanceOhm()[i],
                    table.conductanceWPerK()[i]);
            for (int k = 0; k < splits.length; k++) {
                int modules = splits[k][0] * splits[k][1];
                double price = table.prices().unitPrice(i, modules * harvestCase.costQuantity());
                designs[i * splits.length + k] = design(table.moduleIds()[i], module, splits[k][0], splits[k][1], c,
                        table.maxHotSideK()[i], price);
            }
        });

        var feasible = new ArrayList<HarvestDesign>();
        var rejections = new ArrayList<HarvestRanking.Rejection>();
        for (int i = 0; i < n; i++) {
            var ofModule = Arrays.asList(designs).subList(i * splits.length, (i + 1) * splits.length);
            int before = feasible.size();
            ofModule.stream().filter(d -> problem(d, harvestCase.minLoadVoltageV()).isEmpty()).forEach(feasible::add);
            if (feasible.size() == before) {
                rejections.add(reasonFor(ofModule, harvestCase.minLoadVoltageV()));
            }
        }
        feasible.sort(order(harvestCase.objective()));
        var candidates = new ArrayList<HarvestRanking.Candidate>();
        for (var d : feasible.subList(0, Math.min(harvestCase.limit(), feasible.size()))) {
            candidates.add(new HarvestRanking.Candidate(candidates.size() + 1, d));
        }
        return new HarvestRanking(candidates, rejections, feasible.size(), designs.length, System.nanoTime() - start);
    }

    /**
     * Why none of a module's designs works. If every design runs too hot, name the coolest one (more
     * modules share the heat, so the largest array runs coolest); otherwise the voltage is short, and the
     * design with the highest voltage says by how much.
     */
    private HarvestRanking.Rejection reasonFor(java.util.List<HarvestDesign> ofModule, double minLoadVoltageV) {
        var withinLimit = ofModule.stream().filter(d -> !d.exceedsHotSideLimit()).toList();
        var telling = withinLimit.isEmpty()
                ? ofModule.stream().min(Comparator.comparingDouble(HarvestDesign::openCircuitHotJunctionK))
                : withinLimit.stream().max(Comparator.comparingDouble(d -> d.atMaxPower().voltageV()));
        var d = telling.orElseThrow();
        var reason = problem(d, minLoadVoltageV).orElseThrow();
        String prefix = ofModule.size() == 1 ? "" : (withinLimit.isEmpty() ? "even " : "at best ")
                + d.seriesCount() + " in series × " + d.parallelCount() + " in parallel: ";
        return new HarvestRanking.Rejection(d.moduleId(), reason.code(), prefix + reason.message());
    }

    /** Best first; ties keep fewer modules first (the splits are generated in that order). */
    private static Comparator<HarvestDesign> order(HarvestObjective objective) {
        return switch (objective) {
            case POWER -> Comparator.comparingDouble((HarvestDesign d) -> d.atMaxPower().powerW()).reversed();
            case EFFICIENCY -> Comparator.comparingDouble((HarvestDesign d) -> d.atMaxPower().efficiency()).reversed();
            case COST_PER_WATT -> Comparator.comparingDouble(
                    (HarvestDesign d) -> Double.isNaN(d.costPerW()) ? Double.POSITIVE_INFINITY : d.costPerW());
        };
    }

    private static String celsius(double temperatureK) {
        return String.format(Locale.ROOT, "%.1f °C", Units.celsiusFromKelvin(temperatureK));
    }
}
