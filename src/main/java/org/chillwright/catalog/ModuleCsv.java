package org.chillwright.catalog;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.apache.commons.csv.DuplicateHeaderMode;

/**
 * The catalog's CSV: a header row naming the columns of {@link ModuleText#COLUMNS} in any order,
 * then one module per row. Reading reports every bad header, row shape and duplicate as
 * (row, column, message); the cells themselves are read by {@link ModuleText}.
 */
final class ModuleCsv {

    private static final CSVFormat READ = CSVFormat.DEFAULT.builder()
            .setHeader().setSkipHeaderRecord(true)
            .setTrim(true).setIgnoreEmptyLines(true)
            .setDuplicateHeaderMode(DuplicateHeaderMode.DISALLOW)
            .setAllowMissingColumnNames(false)
            .get();
    private static final CSVFormat WRITE = CSVFormat.DEFAULT.builder()
            .setHeader(ModuleText.COLUMNS.toArray(String[]::new))
            .setRecordSeparator('\n')
            .get();

    private ModuleCsv() {
    }

    /** One data row: its spreadsheet row number and its cells by column name. */
    record Row(int row, Map<String, String> cells) {

        String key() {
            return key(cells.get(ModuleText.SUPPLIER), cells.get(ModuleText.PART_NUMBER));
        }

        static String key(String supplier, String partNumber) {
            return (supplier == null ? "" : supplier.strip()) + "\u0000" + (partNumber == null ? "" : partNumber.strip());
        }
    }

    record Rows(List<Row> rows, List<CsvRowError> errors) {
    }

    static Rows read(Reader reader) {
        var errors = new ArrayList<CsvRowError>();
        var rows = new ArrayList<Row>();
        CSVParser parser = null;
        try {
            parser = CSVParser.builder().setReader(withoutByteOrderMark(reader)).setFormat(READ).get();
            List<String> header = parser.getHeaderNames();
            checkHeader(header, errors);
            if (!errors.isEmpty()) {
                return new Rows(List.of(), errors);
            }
            var firstRowOfKey = new HashMap<String, Integer>();
            for (CSVRecord record : parser) {
                int row = (int) parser.getCurrentLineNumber(); // the line the record ends on; blank lines count
                if (record.size() != header.size()) {
                    errors.add(new CsvRowError(row, "", "has " + record.size() + " cells, the header has "
                            + header.size() + " columns"));
                    continue;
                }
                var cells = new LinkedHashMap<String, String>();
                for (int i = 0; i < header.size(); i++) {
                    cells.put(header.get(i), record.get(i));
                }
                var parsed = new Row(row, cells);
                Integer earlier = firstRowOfKey.putIfAbsent(parsed.key(), row);
                if (earlier != null) {
                    errors.add(new CsvRowError(row, ModuleText.PART_NUMBER, "repeats row " + earlier
                            + " (same supplier and part number): each module may appear once per file"));
                    continue;
                }
                rows.add(parsed);
            }
        } catch (IllegalArgumentException | IllegalStateException | UncheckedIOException | IOException e) {
            // the header is unreadable (a duplicate or empty column name) or a quote is left open
            int row = parser == null ? 1 : (int) parser.getCurrentLineNumber();
            errors.add(new CsvRowError(row, "", "cannot be read as CSV: " + e.getMessage()));
        }
        return new Rows(rows, errors);
    }

    private static void checkHeader(List<String> header, List<CsvRowError> errors) {
        if (header.isEmpty()) {
            errors.add(new CsvRowError(1, "", "the file is empty: the first row must name the columns, at least "
                    + String.join(",", requiredRated())));
            return;
        }
        for (String column : header) {
            if (!ModuleText.COLUMNS.contains(column)) {
                errors.add(new CsvRowError(1, column, "is not a known column (columns are case-sensitive; known: "
                        + String.join(", ", ModuleText.COLUMNS) + ")"));
            }
        }
        for (String column : List.of(ModuleText.SUPPLIER, ModuleText.PART_NUMBER)) {
            if (!header.contains(column)) {
                errors.add(new CsvRowError(1, column, "is a required column"));
            }
        }
        boolean rated = header.containsAll(ModuleText.RATED_COLUMNS);
        boolean constructed = header.containsAll(ModuleText.CONSTRUCTION_COLUMNS);
        if (!rated && !constructed) {
            ModuleText.RATED_COLUMNS.stream().filter(c -> !header.contains(c)).forEach(c -> errors.add(
                    new CsvRowError(1, c, "is a required column for rated modules (or give all the construction "
                            + "columns: " + String.join(", ", ModuleText.CONSTRUCTION_COLUMNS) + ")")));
        }
    }

    private static List<String> requiredRated() {
        var columns = new ArrayList<>(List.of(ModuleText.SUPPLIER, ModuleText.PART_NUMBER));
        columns.addAll(ModuleText.RATED_COLUMNS);
        return columns;
    }

    private static Reader withoutByteOrderMark(Reader reader) throws IOException {
        var buffered = reader.markSupported() ? reader : new java.io.BufferedReader(reader);
        buffered.mark(1);
        if (buffered.read() != '\uFEFF') {
            buffered.reset();
        }
        return buffered;
    }

    static void write(Iterable<ModuleDefinition> definitions, Writer out) {
        try {
            CSVPrinter printer = new CSVPrinter(out, WRITE);
            for (ModuleDefinition d : definitions) {
                printer.printRecord(ModuleText.cells(d).values());
            }
            printer.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The header row alone: a blank template with every column. */
    static String template() {
        var out = new java.io.StringWriter();
        write(List.of(), out);
        return out.toString();
    }
}
