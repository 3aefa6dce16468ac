package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The plain-text patterns mean what they meant when they were written with Java's {@code \p{Cntrl}}, now that
 * they use only what ECMA-262 also reads (so the OpenAPI document can carry them).
 */
class TextPatternsTest {

    /** The former definitions, as the oracle: Java's POSIX control class. */
    private static final Pattern FORMER_LINE = Pattern.compile("[^\\p{Cntrl}]*");
    private static final Pattern FORMER_LINES = Pattern.compile("[^\\p{Cntrl}]*(?:[\\r\\n\\t]+[^\\p{Cntrl}]*)*");
    private static final Pattern LINE = Pattern.compile(Text.LINE);
    private static final Pattern LINES = Pattern.compile(Text.LINES);

    @Test
    void everyCharacterOfTheBasicPlaneIsJudgedAsBefore() {
        for (char c = 0; c < Character.MAX_VALUE; c++) {
            String one = "a" + c + "b";
            assertThat(LINE.matcher(one).matches()).as("LINE U+%04X", (int) c)
                    .isEqualTo(FORMER_LINE.matcher(one).matches());
            assertThat(LINES.matcher(one).matches()).as("LINES U+%04X", (int) c)
                    .isEqualTo(FORMER_LINES.matcher(one).matches());
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "plain", "two\nlines", "a\r\n\tb", "trailing\n", "\nleading", "x\u0000", "\u0007",
        "PK\u0003\u0004", "tab\there", "del\u007F", "µ °C ΔT", "\r\n\r\n"})
    void wholeStringsAreJudgedAsBefore(String text) {
        assertThat(LINE.matcher(text).matches()).isEqualTo(FORMER_LINE.matcher(text).matches());
        assertThat(LINES.matcher(text).matches()).isEqualTo(FORMER_LINES.matcher(text).matches());
    }

    @Test
    void aLineEndingInALineBreakIsStillRefused() {
        // Java's $ also matches before a final line break; the whole-string match must not let it through
        assertThat(LINE.matcher("name\n").matches()).isFalse();
    }
}
