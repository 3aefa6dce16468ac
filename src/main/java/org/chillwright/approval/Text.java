package org.chillwright.approval;

/**
 * What people may type into a list: printable text of bounded length. Control characters (other than
 * line breaks and tabs in notes) mean a binary or pasted-garbage field and are refused with a 400.
 * <p>
 * The patterns are written so that Java and ECMA-262 (the regular expressions of JSON Schema, and so of the
 * OpenAPI document) read them alike: the control characters are the range {@code [\x00-\x1F\x7F]}, which is
 * exactly Java's {@code \p{Cntrl}} (a class ECMA-262 does not have), and the anchors make the JSON Schema
 * {@code pattern}, which matches anywhere in the string, mean what Bean Validation's whole-string match means.
 */
public final class Text {

    public static final int NAME_MAX = 120;
    public static final int NOTE_MAX = 2000;
    /** One line: no control characters at all. */
    public static final String LINE = "^[^\\x00-\\x1F\\x7F]*$";
    /** Several lines: control characters other than CR, LF and TAB are refused. */
    public static final String LINES = "^[^\\x00-\\x1F\\x7F]*(?:[\\r\\n\\t]+[^\\x00-\\x1F\\x7F]*)*$";
    public static final String BINARY_MESSAGE = "must be plain text (no control characters or binary data)";

    private Text() {
    }
}
