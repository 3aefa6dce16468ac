package org.chillwright.harvest.api;

import jakarta.annotation.Nullable;
import java.util.List;

/** The ranked generator designs, the modules that cannot do the job with their reasons, and what it took. */
public record HarvestRankingResponse(List<Candidate> candidates, List<Refused> infeasible, int feasible,
                                     int evaluated, double elapsedMs, long catalogRevision) {

    /**
     * One design on its best-power load; whole-array values at its terminals. {@code maxHotSideC} and the
     * prices are null when unknown; {@code warnings} flag a module without a stated maximum temperature
     * (HOT_SIDE_LIMIT_UNCHECKED) and an open-circuit voltage above 60 V DC (SHOCK_HAZARD_VOLTAGE).
     */
    public record Candidate(int rank, long moduleId, String partNumber, String supplier, String lifecycle,
                            int seriesCount, int parallelCount, double openCircuitV, double loadOhm,
                            double currentA, double voltageV, double powerW, double efficiency,
                            double hotJunctionC, double coldJunctionC, double heatInW, double maxEfficiency,
                            double maxEfficiencyLoadOhm, double openCircuitHotJunctionC,
                            @Nullable Double maxHotSideC, @Nullable Double unitPrice, @Nullable Double arrayCost,
                            @Nullable Double costPerW, @Nullable String currency,
                            List<GeneratorResponse.WarningJson> warnings) {
    }

    /** A module that has no design that works. */
    public record Refused(long moduleId, String partNumber, String supplier, Reason reason) {
    }

    /** A stable code and a sentence with the numbers. */
    public record Reason(String code, String message) {
    }
}
