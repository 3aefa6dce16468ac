package org.chillwright.approval;

/**
 * What people may type into a list: printable text of bounded length. Control characters (other than
 * line breaks and tabs in notes) mean a binary or pasted-garbage field and are refused with a 400.
 */
public final class Text {

    public static final int NAME_MAX = 120;
    public static final int NOTE_MAX = 2000;
    /** One line: no control characters at all. */
    public static final String LINE = "[^\\p{Cntrl}]*";
    /** Several lines: control characters other than CR, LF and TAB are refused. */
    public static final String LINES = "[^\\p{Cntrl}]*(?:[\\r\\n\\t]+[^\\p{Cntrl}]*)*";
    public static final String BINARY_MESSAGE = "must be plain text (no control characters or binary data)";

    private Text() {
    }
}
