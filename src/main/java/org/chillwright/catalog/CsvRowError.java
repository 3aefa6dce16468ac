package org.chillwright.catalog;

/**
 * One bad cell (or header, or row) of an imported CSV.
 *
 * @param row    line of the file as a spreadsheet numbers it: the header is row 1
 * @param column the column name, or empty when the whole row is at fault
 */
public record CsvRowError(int row, String column, String message) {
}
