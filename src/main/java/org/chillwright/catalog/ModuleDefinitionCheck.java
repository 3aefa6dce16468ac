package org.chillwright.catalog;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import org.chillwright.physics.InvalidQuantityException;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.physics.Units;
import org.chillwright.web.FieldProblem;

/**
 * Every rule a module definition must meet before it is stored, with one message per bad field.
 * Field names are the flat names shared by the CSV columns and the form inputs ({@code imaxA},
 * {@code prices}); the API prefixes them with {@code ratings.} or {@code construction.}.
 */
final class ModuleDefinitionCheck {

    static final int SUPPLIER_MAX = 120;
    static final int PART_NUMBER_MAX = 80;
    static final int DESCRIPTION_MAX = 500;
    static final int DATASHEET_REF_MAX = 200;
    static final int NOTES_MAX = 2000;

    /** Physics parameter names that differ from the edge field they come from. */
    private static final Map<String, String> EDGE_FIELD = Map.of(
            "hotSideK", "hotSideC", "legAreaPM2", "legAreaMm2", "legAreaNM2", "legAreaNMm2",
            "legLengthM", "legLengthMm");

    private final List<FieldProblem> problems = new ArrayList<>();

    private ModuleDefinitionCheck() {
    }

    static List<FieldProblem> problems(ModuleDefinition d) {
        var check = new ModuleDefinitionCheck();
        check.text("supplier", d.supplier(), true, SUPPLIER_MAX);
        check.text("partNumber", d.partNumber(), true, PART_NUMBER_MAX);
        check.text("description", d.description(), false, DESCRIPTION_MAX);
        if (d.ratings() != null && d.construction() != null) {
            check.add("route", "give either ratings or construction, not both");
        } else if (d.ratings() != null) {
            check.ratings(d.ratings());
        } else if (d.construction() != null) {
            check.construction(d.construction());
        } else {
            check.add("route", "is required: give the ratings (imaxA, vmaxV, qmaxW, dtmaxK, hotSideC) "
                    + "or the construction (couples, leg geometry and materials)");
        }
        check.positiveOrAbsent("widthMm", d.widthMm());
        check.positiveOrAbsent("lengthMm", d.lengthMm());
        check.positiveOrAbsent("heightMm", d.heightMm());
        if (d.maxOperatingC() != null) {
            check.temperatureC("maxOperatingC", d.maxOperatingC());
        }
        check.purchasing(d);
        check.text("datasheetRef", d.datasheetRef(), false, DATASHEET_REF_MAX);
        check.text("notes", d.notes(), false, NOTES_MAX);
        if (check.problems.isEmpty()) {
            check.derivable(d);
        }
        return List.copyOf(check.problems);
    }

    private void ratings(RatedInputs r) {
        requiredPositive("imaxA", r.imaxA());
        requiredPositive("vmaxV", r.vmaxV());
        positiveOrAbsent("qmaxW", r.qmaxW());
        boolean dtmax = requiredPositive("dtmaxK", r.dtmaxK());
        boolean hot = required("hotSideC", r.hotSideC()) && temperatureC("hotSideC", r.hotSideC());
        if (dtmax && hot && !(r.dtmaxK() < Units.kelvinFromCelsius(r.hotSideC()))) {
            add("dtmaxK", "must be below the hot-side temperature in kelvin ("
                    + Units.kelvinFromCelsius(r.hotSideC()) + " K), was " + r.dtmaxK());
        }
        if (r.method() == RatingsMethod.QMAX_IMAX_DTMAX && r.qmaxW() == null) {
            add("qmaxW", "is required when ratingsMethod is QMAX_IMAX_DTMAX");
        }
    }

    private void construction(ConstructionInputs c) {
        if (c.couples() == null) {
            add("couples", "is required");
        } else if (c.couples() < 1) {
            add("couples", "must be >= 1, was " + c.couples());
        }
        requiredPositive("legAreaMm2", c.legAreaMm2());
        positiveOrAbsent("legAreaNMm2", c.legAreaNMm2());
        requiredPositive("legLengthMm", c.legLengthMm());
        boolean p = required("seebeckPVPerK", c.seebeckPVPerK()) && finite("seebeckPVPerK", c.seebeckPVPerK());
        boolean n = required("seebeckNVPerK", c.seebeckNVPerK()) && finite("seebeckNVPerK", c.seebeckNVPerK());
        if (p && n && !(c.seebeckNVPerK() < c.seebeckPVPerK())) {
            add("seebeckNVPerK", "must be below seebeckPVPerK (" + c.seebeckPVPerK() + "), was " + c.seebeckNVPerK()
                    + " (an n leg has a negative Seebeck coefficient)");
        }
        requiredPositive("resistivityPOhmM", c.resistivityPOhmM());
        requiredPositive("resistivityNOhmM", c.resistivityNOhmM());
        requiredPositive("conductivityPWPerMK", c.conductivityPWPerMK());
        requiredPositive("conductivityNWPerMK", c.conductivityNWPerMK());
        if (c.contactResistivityOhmM2() != null && !(c.contactResistivityOhmM2() >= 0
                && Double.isFinite(c.contactResistivityOhmM2()))) {
            add("contactResistivityOhmM2", "must be >= 0, was " + c.contactResistivityOhmM2());
        }
    }

    private void purchasing(ModuleDefinition d) {
        var quantities = new HashSet<Integer>();
        for (PriceBreak b : d.prices()) {
            if (b.quantity() == null || b.quantity() < 1) {
                add("prices", "each quantity must be a whole number >= 1, was " + b.quantity());
            } else if (!quantities.add(b.quantity())) {
                add("prices", "quantity " + b.quantity() + " appears twice");
            }
            if (b.unitPrice() == null || b.unitPrice().signum() < 0) {
                add("prices", "each unit price must be >= 0, was " + b.unitPrice());
            } else if (b.unitPrice().compareTo(new BigDecimal("1E10")) >= 0 || b.unitPrice().scale() > 4) {
                add("prices", "unit price " + b.unitPrice().toPlainString()
                        + " must be below 10,000,000,000 with at most 4 decimals");
            }
        }
        if (!d.prices().isEmpty() && d.currency() == null) {
            add("currency", "is required when prices are given (an ISO 4217 code such as EUR)");
        }
        if (d.currency() != null && !d.currency().matches("[A-Z]{3}")) {
            add("currency", "must be a three-letter ISO 4217 code such as EUR, was '" + d.currency() + "'");
        }
        if (d.leadTimeDays() != null && d.leadTimeDays() < 0) {
            add("leadTimeDays", "must be >= 0, was " + d.leadTimeDays());
        }
        if (d.minOrderQuantity() != null && d.minOrderQuantity() < 1) {
            add("minOrderQuantity", "must be >= 1, was " + d.minOrderQuantity());
        }
    }

    /** Last line of defence: whatever else physics refuses is named by its edge field. */
    private void derivable(ModuleDefinition d) {
        try {
            ModuleDerivation.of(d);
        } catch (InvalidQuantityException e) {
            add(EDGE_FIELD.getOrDefault(e.field(), e.field()), e.getMessage());
        }
    }

    private void text(String field, String value, boolean required, int maxLength) {
        if (value == null) {
            if (required) {
                add(field, "is required");
            }
        } else if (value.length() > maxLength) {
            add(field, "must be at most " + maxLength + " characters, was " + value.length());
        }
    }

    private boolean required(String field, Double value) {
        if (value == null) {
            add(field, "is required");
            return false;
        }
        return true;
    }

    private boolean finite(String field, Double value) {
        if (!Double.isFinite(value)) {
            add(field, "must be a finite number, was " + value);
            return false;
        }
        return true;
    }

    private boolean requiredPositive(String field, Double value) {
        return required(field, value) && positive(field, value);
    }

    private boolean positive(String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            add(field, "must be > 0, was " + value);
            return false;
        }
        return true;
    }

    private void positiveOrAbsent(String field, Double value) {
        if (value != null) {
            positive(field, value);
        }
    }

    private boolean temperatureC(String field, double value) {
        if (!Double.isFinite(value) || !(Units.kelvinFromCelsius(value) > 0)) {
            add(field, "must be a finite temperature above absolute zero (-273.15 °C), was " + value);
            return false;
        }
        return true;
    }

    private void add(String field, String message) {
        problems.add(new FieldProblem(field, message));
    }
}
