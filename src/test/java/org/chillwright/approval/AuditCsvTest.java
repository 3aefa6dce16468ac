package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.junit.jupiter.api.Test;

class AuditCsvTest {

    private static final Instant AT = Instant.parse("2026-03-02T09:00:00Z");
    private static final EntryView ENTRY = new EntryView(7, 1, 101, "Example Thermal Ltd", "EXT-071-10", "ACTIVE",
            EntryState.QUALIFYING, null, null, null, "eng", AT, "eng", AT, "eng");
    private static final ListView LIST = new ListView(3, 0, "Line", null, "eng", AT, "eng", AT, List.of(ENTRY));

    private static String csv(String reason) throws Exception {
        var out = new StringBuilder();
        AuditCsv.write(LIST, List.of(new AuditView(AT, "eng", 7L, EntryState.PROPOSED, EntryState.QUALIFYING, reason,
                "TRANSITION", null, null)), out);
        return out.toString();
    }

    @Test
    void reasonWithCommasAndLineBreaksReadsBackWhole() throws Exception {
        String reason = "datasheet, outline\nand \"pilot\" report";
        var records = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new java.io.StringReader(csv(reason))).getRecords();
        assertThat(records.get(0).get("reason")).isEqualTo(reason);
    }

    @Test
    void textThatASpreadsheetWouldRunIsDefused() throws Exception {
        assertThat(csv("=HYPERLINK(\"x\")")).contains("'=HYPERLINK");
    }
}
