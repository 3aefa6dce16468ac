package org.chillwright.catalog.api;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.math.BigDecimal;
import java.time.Instant;
import java.util.List;
import org.chillwright.catalog.ConstructionInputs;
import org.chillwright.catalog.EntryRoute;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.catalog.ModuleDefinition;
import org.chillwright.catalog.ModuleSpec;
import org.chillwright.catalog.RatedInputs;

/** The module JSON of the HTTP contract: what was entered, purchasing data, and what the physics engine derives. */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record ModuleResponse(long id, long version, String supplier, String partNumber, String description,
                             EntryRoute route, RatedInputs ratings, ConstructionInputs construction,
                             Double widthMm, Double lengthMm, Double heightMm, Double maxOperatingC,
                             List<PriceJson> prices, Integer leadTimeDays, Integer minOrderQuantity,
                             Lifecycle lifecycle, Boolean rohs, Boolean reach, String datasheetRef, String notes,
                             boolean archived, Instant createdAt, String createdBy, Instant updatedAt,
                             String updatedBy, Derived derived) {

    /** Hot-side temperatures at which the ratings are re-evaluated, °C. */
    static final List<Double> RE_EVALUATED_AT_C = List.of(25.0, 50.0);
    static final double ZT_TEMPERATURE_K = 300.0;

    /**
     * @param listed           the ratings the catalog lists (stated; ideal at 25 °C for a constructed module)
     * @param ratingsConsistency stated Qmax / implied Qmax, when Qmax is stated
     * @param ratingsAt        ideal ratings of the derived parameters at 25 °C and 50 °C hot side
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record Derived(double seebeckVPerK, double resistanceOhm, double conductanceWPerK,
                          double figureOfMeritPerK, double ztAt300K, double impliedQmaxW,
                          Double ratingsConsistency, RatingsJson listed, List<RatingsJson> ratingsAt) {
    }

    static ModuleResponse of(ModuleSpec m) {
        ModuleDefinition d = m.definition();
        var p = m.parameters();
        var derived = new Derived(p.seebeckVPerK(), p.resistanceOhm(), p.conductanceWPerK(), p.figureOfMeritPerK(),
                m.ztAt(ZT_TEMPERATURE_K), m.ratings().impliedQmaxW(),
                m.ratingsConsistency().isPresent() ? m.ratingsConsistency().getAsDouble() : null,
                RatingsJson.of(m.ratings()),
                RE_EVALUATED_AT_C.stream().map(c -> RatingsJson.of(m.ratingsAtHotSideC(c))).toList());
        return new ModuleResponse(m.id(), m.version(), d.supplier(), d.partNumber(), d.description(), d.route(),
                d.ratings(), d.construction(), d.widthMm(), d.lengthMm(), d.heightMm(), d.maxOperatingC(),
                d.prices().stream().map(b -> new PriceJson(b.quantity(), plain(b.unitPrice()), d.currency())).toList(),
                d.leadTimeDays(), d.minOrderQuantity(), d.lifecycle(), d.rohs(), d.reach(), d.datasheetRef(),
                d.notes(), m.archived(), m.createdAt(), m.createdBy(), m.updatedAt(), m.updatedBy(), derived);
    }

    /** 1E+2 as 100: the stored price has no trailing zeros, JSON should not show an exponent. */
    private static BigDecimal plain(BigDecimal price) {
        return new BigDecimal(price.toPlainString());
    }
}
