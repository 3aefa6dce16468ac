package org.chillwright.web;

/** Text typed by people, made safe for a CSV that someone will open in a spreadsheet. */
public final class SpreadsheetText {

    private SpreadsheetText() {
    }

    /**
     * A leading =, +, -, @, tab or carriage return is prefixed with an apostrophe so that a spreadsheet
     * opening the file shows the text instead of running it as a formula. Use it for free text only, never
     * for numbers (a negative number would stop being one).
     */
    public static String safe(String text) {
        if (text != null && !text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0) {
            return "'" + text;
        }
        return text;
    }
}
