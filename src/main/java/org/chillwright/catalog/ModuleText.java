package org.chillwright.catalog;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.web.FieldProblem;

/**
 * A module definition as named text cells: the CSV row and the HTML form share this codec, so a
 * value means the same and gets the same message on both. Numbers use a '.' decimal point and no
 * unit (the unit is in the name); price breaks are written {@code 1:12.40;100:9.85}
 * (quantity:unit price pairs separated by ';'); booleans {@code true}/{@code false}; enums by name.
 * An empty cell is an absent value.
 */
public final class ModuleText {

    public static final String SUPPLIER = "supplier";
    public static final String PART_NUMBER = "partNumber";
    public static final String ROUTE = "route";
    public static final String PRICES = "prices";

    /** Columns that carry ratings; with supplier and part number, the required columns of a CSV of rated modules. */
    public static final List<String> RATED_COLUMNS = List.of("imaxA", "vmaxV", "qmaxW", "dtmaxK", "hotSideC");
    /** Required columns of a CSV of constructed modules, beside supplier and part number. */
    public static final List<String> CONSTRUCTION_COLUMNS = List.of("couples", "legAreaMm2", "legLengthMm",
            "seebeckPVPerK", "seebeckNVPerK", "resistivityPOhmM", "resistivityNOhmM", "conductivityPWPerMK",
            "conductivityNWPerMK");
    private static final List<String> OPTIONAL_CONSTRUCTION_COLUMNS = List.of("legAreaNMm2", "contactResistivityOhmM2");
    private static final List<String> RATED_OPTIONAL_COLUMNS = List.of("ratingsMethod", "testAtmosphere");

    /** Every column, in the order the export writes them. */
    public static final List<String> COLUMNS = List.of(SUPPLIER, PART_NUMBER, ROUTE,
            "imaxA", "vmaxV", "qmaxW", "dtmaxK", "hotSideC", "ratingsMethod", "testAtmosphere",
            "couples", "legAreaMm2", "legAreaNMm2", "legLengthMm", "seebeckPVPerK", "seebeckNVPerK",
            "resistivityPOhmM", "resistivityNOhmM", "conductivityPWPerMK", "conductivityNWPerMK",
            "contactResistivityOhmM2", "description", "widthMm", "lengthMm", "heightMm", "maxOperatingC",
            "currency", PRICES, "leadTimeDays", "minOrderQuantity", "lifecycle", "rohs", "reach",
            "datasheetRef", "notes");

    private static final Set<String> RATED_CELLS = Set.copyOf(concat(RATED_COLUMNS, RATED_OPTIONAL_COLUMNS));
    private static final Set<String> CONSTRUCTION_CELLS =
            Set.copyOf(concat(CONSTRUCTION_COLUMNS, OPTIONAL_CONSTRUCTION_COLUMNS));

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern COMMA_DECIMAL = Pattern.compile("[+-]?\\d+,\\d+([eE][+-]?\\d+)?");
    private static final Pattern WITH_UNIT = Pattern.compile("[+-]?[\\d.,]+([eE][+-]?\\d+)?\\s*[^\\d\\s.,+-].*");
    private static final Pattern WHOLE = Pattern.compile("[+-]?\\d+");
    private static final Pattern NON_FINITE = Pattern.compile("[+-]?(nan|inf|infinity|∞)", Pattern.CASE_INSENSITIVE);

    private ModuleText() {
    }

    /** The cells of a definition, every column present, absent values empty. */
    public static Map<String, String> cells(ModuleDefinition d) {
        var cells = new LinkedHashMap<String, String>();
        COLUMNS.forEach(c -> cells.put(c, ""));
        cells.put(SUPPLIER, text(d.supplier()));
        cells.put(PART_NUMBER, text(d.partNumber()));
        cells.put(ROUTE, d.route().name());
        RatedInputs r = d.ratings();
        if (r != null) {
            cells.put("imaxA", number(r.imaxA()));
            cells.put("vmaxV", number(r.vmaxV()));
            cells.put("qmaxW", number(r.qmaxW()));
            cells.put("dtmaxK", number(r.dtmaxK()));
            cells.put("hotSideC", number(r.hotSideC()));
            cells.put("ratingsMethod", r.method().name());
            cells.put("testAtmosphere", r.testAtmosphere() == null ? "" : r.testAtmosphere().name());
        }
        ConstructionInputs c = d.construction();
        if (c != null) {
            cells.put("couples", c.couples() == null ? "" : c.couples().toString());
            cells.put("legAreaMm2", number(c.legAreaMm2()));
            cells.put("legAreaNMm2", number(c.legAreaNMm2()));
            cells.put("legLengthMm", number(c.legLengthMm()));
            cells.put("seebeckPVPerK", number(c.seebeckPVPerK()));
            cells.put("seebeckNVPerK", number(c.seebeckNVPerK()));
            cells.put("resistivityPOhmM", number(c.resistivityPOhmM()));
            cells.put("resistivityNOhmM", number(c.resistivityNOhmM()));
            cells.put("conductivityPWPerMK", number(c.conductivityPWPerMK()));
            cells.put("conductivityNWPerMK", number(c.conductivityNWPerMK()));
            cells.put("contactResistivityOhmM2", number(c.contactResistivityOhmM2()));
        }
        cells.put("description", text(d.description()));
        cells.put("widthMm", number(d.widthMm()));
        cells.put("lengthMm", number(d.lengthMm()));
        cells.put("heightMm", number(d.heightMm()));
        cells.put("maxOperatingC", number(d.maxOperatingC()));
        cells.put("currency", text(d.currency()));
        cells.put(PRICES, prices(d.prices()));
        cells.put("leadTimeDays", d.leadTimeDays() == null ? "" : d.leadTimeDays().toString());
        cells.put("minOrderQuantity", d.minOrderQuantity() == null ? "" : d.minOrderQuantity().toString());
        cells.put("lifecycle", d.lifecycle().name());
        cells.put("rohs", d.rohs() == null ? "" : d.rohs().toString());
        cells.put("reach", d.reach() == null ? "" : d.reach().toString());
        cells.put("datasheetRef", text(d.datasheetRef()));
        cells.put("notes", text(d.notes()));
        return cells;
    }

    /**
     * Reads a definition from cells. With a {@code base} (the stored module an import row updates),
     * columns the row does not have keep the stored value; an empty cell clears it. The route is
     * the row's {@code route} cell, or else follows which cells the row fills.
     */
    public static Parsed parse(Map<String, String> row, ModuleDefinition base) {
        var cells = new LinkedHashMap<String, String>();
        var problems = new ArrayList<FieldProblem>();
        String route = cell(row, ROUTE);
        if (route.isEmpty()) {
            route = inferRoute(row, problems);
        }
        if (base != null) {
            cells.putAll(cells(base));
            if (!route.isEmpty() && !route.equalsIgnoreCase(base.route().name())) {
                (base.route() == EntryRoute.RATINGS ? RATED_CELLS : CONSTRUCTION_CELLS).forEach(c -> cells.put(c, ""));
            }
        }
        row.forEach((column, value) -> {
            if (COLUMNS.contains(column)) {
                cells.put(column, value == null ? "" : value.strip());
            }
        });
        if (!route.isEmpty()) {
            cells.put(ROUTE, route);
        }
        if (!problems.isEmpty()) {
            return new Parsed(null, problems);
        }
        return new Reader(cells).read();
    }

    /** A definition, or the problems that kept it from being one (field = column name). */
    public record Parsed(ModuleDefinition definition, List<FieldProblem> problems) {

        public boolean ok() {
            return problems.isEmpty();
        }
    }

    private static String inferRoute(Map<String, String> row, List<FieldProblem> problems) {
        boolean rated = RATED_COLUMNS.stream().anyMatch(c -> !cell(row, c).isEmpty());
        boolean constructed = CONSTRUCTION_COLUMNS.stream().anyMatch(c -> !cell(row, c).isEmpty());
        if (rated && constructed) {
            problems.add(new FieldProblem(ROUTE, "the row fills both rating and construction cells: "
                    + "give one of them, or say which in a route column (RATINGS or CONSTRUCTION)"));
            return "";
        }
        return rated ? EntryRoute.RATINGS.name() : constructed ? EntryRoute.CONSTRUCTION.name() : "";
    }

    /** Parses every cell, collecting one problem per bad cell. */
    private static final class Reader {

        private final Map<String, String> cells;
        private final List<FieldProblem> problems = new ArrayList<>();

        Reader(Map<String, String> cells) {
            this.cells = cells;
        }

        Parsed read() {
            EntryRoute route = enumValue(ROUTE, EntryRoute.class);
            if (route == null && problems.isEmpty()) {
                problems.add(new FieldProblem(ROUTE, "is required: fill the rating cells (" + String.join(", ",
                        RATED_COLUMNS) + ") or the construction cells (" + String.join(", ", CONSTRUCTION_COLUMNS)
                        + ")"));
            }
            RatedInputs ratings = null;
            ConstructionInputs construction = null;
            if (route == EntryRoute.RATINGS) {
                mustBeEmpty(CONSTRUCTION_CELLS, "a module entered by its ratings");
                ratings = new RatedInputs(decimal("imaxA"), decimal("vmaxV"), decimal("qmaxW"), decimal("dtmaxK"),
                        decimal("hotSideC"), enumValue("ratingsMethod", RatingsMethod.class),
                        enumValue("testAtmosphere", TestAtmosphere.class));
            } else if (route == EntryRoute.CONSTRUCTION) {
                mustBeEmpty(RATED_CELLS, "a module entered by its construction");
                construction = new ConstructionInputs(whole("couples"), decimal("legAreaMm2"), decimal("legAreaNMm2"),
                        decimal("legLengthMm"), decimal("seebeckPVPerK"), decimal("seebeckNVPerK"),
                        decimal("resistivityPOhmM"), decimal("resistivityNOhmM"), decimal("conductivityPWPerMK"),
                        decimal("conductivityNWPerMK"), decimal("contactResistivityOhmM2"));
            }
            var definition = new ModuleDefinition(cells.get(SUPPLIER), cells.get(PART_NUMBER), cells.get("description"),
                    ratings, construction, decimal("widthMm"), decimal("lengthMm"), decimal("heightMm"),
                    decimal("maxOperatingC"), cells.get("currency"), priceBreaks(), whole("leadTimeDays"),
                    whole("minOrderQuantity"), enumValue("lifecycle", Lifecycle.class), bool("rohs"), bool("reach"),
                    cells.get("datasheetRef"), cells.get("notes"));
            if (!problems.isEmpty()) {
                return new Parsed(null, List.copyOf(problems));
            }
            var invalid = ModuleDefinitionCheck.problems(definition);
            return invalid.isEmpty() ? new Parsed(definition, List.of()) : new Parsed(null, invalid);
        }

        private void mustBeEmpty(Set<String> columns, String what) {
            COLUMNS.stream().filter(columns::contains).filter(c -> !get(c).isEmpty()).forEach(c -> problems.add(
                    new FieldProblem(c, "must be empty for " + what + ", was '" + get(c) + "'")));
        }

        private String get(String column) {
            return cell(cells, column);
        }

        private Double decimal(String column) {
            String text = get(column);
            if (text.isEmpty()) {
                return null;
            }
            String problem = numberProblem(text);
            if (problem != null) {
                problems.add(new FieldProblem(column, problem));
                return null;
            }
            return Double.parseDouble(text);
        }

        private Integer whole(String column) {
            String text = get(column);
            if (text.isEmpty()) {
                return null;
            }
            if (!WHOLE.matcher(text).matches() || text.replaceFirst("^[+-]", "").length() > 9) {
                problems.add(new FieldProblem(column, "must be a whole number such as 12, was '" + text + "'"));
                return null;
            }
            return Integer.parseInt(text);
        }

        private Boolean bool(String column) {
            String text = get(column).toLowerCase(Locale.ROOT);
            return switch (text) {
                case "" -> null;
                case "true" -> Boolean.TRUE;
                case "false" -> Boolean.FALSE;
                default -> {
                    problems.add(new FieldProblem(column, "must be true, false or empty (unknown), was '"
                            + get(column) + "'"));
                    yield null;
                }
            };
        }

        private <E extends Enum<E>> E enumValue(String column, Class<E> type) {
            String text = get(column);
            if (text.isEmpty()) {
                return null;
            }
            for (E constant : type.getEnumConstants()) {
                if (constant.name().equalsIgnoreCase(text)) {
                    return constant;
                }
            }
            problems.add(new FieldProblem(column, "must be one of " + Arrays.stream(type.getEnumConstants())
                    .map(Enum::name).collect(Collectors.joining(", ")) + ", was '" + text + "'"));
            return null;
        }

        private List<PriceBreak> priceBreaks() {
            String text = get(PRICES);
            if (text.isEmpty()) {
                return List.of();
            }
            var breaks = new ArrayList<PriceBreak>();
            for (String pair : text.split(";", -1)) {
                String[] parts = pair.strip().split(":", -1);
                if (parts.length != 2 || !WHOLE.matcher(parts[0].strip()).matches()
                        || numberProblem(parts[1].strip()) != null || parts[1].toLowerCase(Locale.ROOT).contains("e")) {
                    problems.add(new FieldProblem(PRICES, "must be quantity:unit price pairs separated by ';', "
                            + "such as 1:12.40;100:9.85 (currency in its own column), was '" + text + "'"));
                    return List.of();
                }
                breaks.add(new PriceBreak(Integer.valueOf(parts[0].strip()), new BigDecimal(parts[1].strip())));
            }
            return breaks;
        }
    }

    /** Why a text is not a plain decimal number, or null when it is one. */
    public static String numberProblem(String text) {
        if (DECIMAL.matcher(text).matches()) {
            return Double.isFinite(Double.parseDouble(text)) ? null : "must be a finite number, was '" + text + "'";
        }
        if (COMMA_DECIMAL.matcher(text).matches()) {
            return "uses ',' as the decimal mark: write " + text.replace(',', '.') + ", was '" + text + "'";
        }
        if (NON_FINITE.matcher(text).matches()) {
            return "must be a finite number, was '" + text + "'";
        }
        if (WITH_UNIT.matcher(text).matches()) {
            return "must be a plain number without a unit (the unit is in the column name), was '" + text + "'";
        }
        return "must be a number with a '.' decimal point, such as 12.5, was '" + text + "'";
    }

    static String number(Double value) {
        return value == null ? "" : BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /** Price breaks in the cell encoding, {@code 1:12.4;100:9.85}. */
    public static String prices(List<PriceBreak> breaks) {
        return breaks.stream().map(b -> b.quantity() + ":" + b.unitPrice().toPlainString())
                .collect(Collectors.joining(";"));
    }

    private static String text(String value) {
        return value == null ? "" : value;
    }

    private static String cell(Map<String, String> cells, String column) {
        String value = cells.get(column);
        return value == null ? "" : value.strip();
    }

    private static List<String> concat(List<String> a, List<String> b) {
        var all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }
}
