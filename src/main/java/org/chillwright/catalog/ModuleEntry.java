package org.chillwright.catalog;

import jakarta.persistence.CollectionTable;
import jakarta.persistence.Column;
import jakarta.persistence.ElementCollection;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.OrderBy;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.physics.Units;
import org.hibernate.annotations.Fetch;
import org.hibernate.annotations.FetchMode;

/** One catalog row: the inputs as entered, the values derived from them, and who changed it when. */
@Entity
@Table(name = "catalog_module")
class ModuleEntry {

    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "catalog_module_seq")
    @SequenceGenerator(name = "catalog_module_seq", sequenceName = "catalog_module_seq", allocationSize = 50)
    private Long id;

    @Column(nullable = false, length = 120)
    private String supplier;
    @Column(name = "part_number", nullable = false, length = 80)
    private String partNumber;
    @Column(length = 500)
    private String description;
    @Enumerated(EnumType.STRING)
    @Column(name = "entry_route", nullable = false, length = 16)
    private EntryRoute route;

    @Column(name = "imax_a")
    private Double imaxA;
    @Column(name = "vmax_v")
    private Double vmaxV;
    @Column(name = "qmax_w")
    private Double qmaxW;
    @Column(name = "dtmax_k")
    private Double dtmaxK;
    @Column(name = "hot_side_c")
    private Double hotSideC;
    @Enumerated(EnumType.STRING)
    @Column(name = "ratings_method", length = 20)
    private RatingsMethod ratingsMethod;
    @Enumerated(EnumType.STRING)
    @Column(name = "test_atmosphere", length = 16)
    private TestAtmosphere testAtmosphere;

    private Integer couples;
    @Column(name = "leg_area_mm2")
    private Double legAreaMm2;
    @Column(name = "leg_area_n_mm2")
    private Double legAreaNMm2;
    @Column(name = "leg_length_mm")
    private Double legLengthMm;
    @Column(name = "seebeck_p_v_per_k")
    private Double seebeckPVPerK;
    @Column(name = "seebeck_n_v_per_k")
    private Double seebeckNVPerK;
    @Column(name = "resistivity_p_ohm_m")
    private Double resistivityPOhmM;
    @Column(name = "resistivity_n_ohm_m")
    private Double resistivityNOhmM;
    @Column(name = "conductivity_p_w_per_mk")
    private Double conductivityPWPerMK;
    @Column(name = "conductivity_n_w_per_mk")
    private Double conductivityNWPerMK;
    @Column(name = "contact_resistivity_ohm_m2")
    private Double contactResistivityOhmM2;

    @Column(name = "seebeck_v_per_k", nullable = false)
    private double seebeckVPerK;
    @Column(name = "resistance_ohm", nullable = false)
    private double resistanceOhm;
    @Column(name = "conductance_w_per_k", nullable = false)
    private double conductanceWPerK;
    @Column(name = "figure_of_merit_per_k", nullable = false)
    private double figureOfMeritPerK;
    @Column(name = "list_imax_a", nullable = false)
    private double listImaxA;
    @Column(name = "list_vmax_v", nullable = false)
    private double listVmaxV;
    @Column(name = "list_qmax_w", nullable = false)
    private double listQmaxW;
    @Column(name = "list_dtmax_k", nullable = false)
    private double listDtmaxK;
    @Column(name = "list_hot_side_c", nullable = false)
    private double listHotSideC;

    @Column(name = "width_mm")
    private Double widthMm;
    @Column(name = "length_mm")
    private Double lengthMm;
    @Column(name = "height_mm")
    private Double heightMm;
    @Column(name = "max_operating_c")
    private Double maxOperatingC;
    @Column(length = 3)
    private String currency;
    @ElementCollection
    @CollectionTable(name = "catalog_price_break", joinColumns = @JoinColumn(name = "module_id"))
    @OrderBy("quantity")
    @Fetch(FetchMode.SUBSELECT) // one query for the prices of a whole page or import batch
    private List<StoredPriceBreak> prices = new ArrayList<>();
    @Column(name = "lead_time_days")
    private Integer leadTimeDays;
    @Column(name = "min_order_quantity")
    private Integer minOrderQuantity;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false, length = 24)
    private Lifecycle lifecycle;
    private Boolean rohs;
    private Boolean reach;
    @Column(name = "datasheet_ref", length = 200)
    private String datasheetRef;
    @Column(length = 2000)
    private String notes;

    @Column(nullable = false)
    private boolean archived;
    @Version
    private long version;
    @Column(name = "created_at", nullable = false)
    private Instant createdAt;
    @Column(name = "created_by", nullable = false, length = 64)
    private String createdBy;
    @Column(name = "updated_at", nullable = false)
    private Instant updatedAt;
    @Column(name = "updated_by", nullable = false, length = 64)
    private String updatedBy;

    protected ModuleEntry() {
    }

    ModuleEntry(ModuleDefinition definition, Instant now, String actor) {
        this.createdAt = now;
        this.createdBy = actor;
        apply(definition, now, actor);
    }

    /** Replaces every entered value with the definition's and recomputes the derived ones. */
    void apply(ModuleDefinition d, Instant now, String actor) {
        supplier = d.supplier();
        partNumber = d.partNumber();
        description = d.description();
        route = d.route();
        RatedInputs r = d.ratings();
        imaxA = r == null ? null : r.imaxA();
        vmaxV = r == null ? null : r.vmaxV();
        qmaxW = r == null ? null : r.qmaxW();
        dtmaxK = r == null ? null : r.dtmaxK();
        hotSideC = r == null ? null : r.hotSideC();
        ratingsMethod = r == null ? null : r.method();
        testAtmosphere = r == null ? null : r.testAtmosphere();
        ConstructionInputs c = d.construction();
        couples = c == null ? null : c.couples();
        legAreaMm2 = c == null ? null : c.legAreaMm2();
        legAreaNMm2 = c == null ? null : c.legAreaNMm2();
        legLengthMm = c == null ? null : c.legLengthMm();
        seebeckPVPerK = c == null ? null : c.seebeckPVPerK();
        seebeckNVPerK = c == null ? null : c.seebeckNVPerK();
        resistivityPOhmM = c == null ? null : c.resistivityPOhmM();
        resistivityNOhmM = c == null ? null : c.resistivityNOhmM();
        conductivityPWPerMK = c == null ? null : c.conductivityPWPerMK();
        conductivityNWPerMK = c == null ? null : c.conductivityNWPerMK();
        contactResistivityOhmM2 = c == null ? null : c.contactResistivityOhmM2();

        ModuleDerivation derived = ModuleDerivation.of(d);
        ModuleParameters p = derived.parameters();
        seebeckVPerK = p.seebeckVPerK();
        resistanceOhm = p.resistanceOhm();
        conductanceWPerK = p.conductanceWPerK();
        figureOfMeritPerK = p.figureOfMeritPerK();
        MaxRatings listed = derived.ratings();
        listImaxA = listed.imaxA();
        listVmaxV = listed.vmaxV();
        listQmaxW = listed.statedQmaxW().orElse(listed.impliedQmaxW());
        listDtmaxK = listed.dtmaxK();
        listHotSideC = Units.celsiusFromKelvin(listed.hotSideK());

        widthMm = d.widthMm();
        lengthMm = d.lengthMm();
        heightMm = d.heightMm();
        maxOperatingC = d.maxOperatingC();
        currency = d.currency();
        prices.clear();
        d.prices().forEach(b -> prices.add(new StoredPriceBreak(b)));
        leadTimeDays = d.leadTimeDays();
        minOrderQuantity = d.minOrderQuantity();
        lifecycle = d.lifecycle();
        rohs = d.rohs();
        reach = d.reach();
        datasheetRef = d.datasheetRef();
        notes = d.notes();
        touch(now, actor);
    }

    void archive(Instant now, String actor) {
        archived = true;
        touch(now, actor);
    }

    void restore(Instant now, String actor) {
        archived = false;
        touch(now, actor);
    }

    private void touch(Instant now, String actor) {
        updatedAt = now;
        updatedBy = actor;
    }

    ModuleDefinition toDefinition() {
        RatedInputs r = route == EntryRoute.RATINGS
                ? new RatedInputs(imaxA, vmaxV, qmaxW, dtmaxK, hotSideC, ratingsMethod, testAtmosphere) : null;
        ConstructionInputs c = route == EntryRoute.CONSTRUCTION
                ? new ConstructionInputs(couples, legAreaMm2, legAreaNMm2, legLengthMm, seebeckPVPerK, seebeckNVPerK,
                        resistivityPOhmM, resistivityNOhmM, conductivityPWPerMK, conductivityNWPerMK,
                        contactResistivityOhmM2)
                : null;
        return new ModuleDefinition(supplier, partNumber, description, r, c, widthMm, lengthMm, heightMm,
                maxOperatingC, currency, prices.stream().map(StoredPriceBreak::toPriceBreak).toList(), leadTimeDays,
                minOrderQuantity, lifecycle, rohs, reach, datasheetRef, notes);
    }

    ModuleSpec toSpec() {
        ModuleDefinition definition = toDefinition();
        ModuleDerivation derived = ModuleDerivation.of(definition);
        return new ModuleSpec(id, version, definition, derived.parameters(), derived.ratings(), archived,
                createdAt, createdBy, updatedAt, updatedBy);
    }

    Long getId() {
        return id;
    }

    long getVersion() {
        return version;
    }

    String getSupplier() {
        return supplier;
    }

    String getPartNumber() {
        return partNumber;
    }

    boolean isArchived() {
        return archived;
    }
}
