package org.chillwright.approval;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.chillwright.web.SpreadsheetText;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** A list's audit trail as CSV, one row per line of the trail, for filing with a change record. */
final class AuditCsv {

    static final String[] HEADER = {"at", "by", "entryId", "moduleId", "partNumber", "action", "from", "to", "reason",
        "proposedBy", "qualifiedBy"};

    private AuditCsv() {
    }

    static void write(ListView list, List<AuditView> trail, Appendable out) throws IOException {
        Map<Long, EntryView> entries = list.entries().stream().collect(Collectors.toMap(EntryView::id, Function.identity()));
        var format = CSVFormat.DEFAULT.builder().setHeader(HEADER).setRecordSeparator("\r\n").get();
        try (var printer = new CSVPrinter(out, format)) {
            for (var line : trail) {
                var entry = line.entryId() == null ? null : entries.get(line.entryId());
                printer.printRecord(line.at(), cell(line.by()), line.entryId(),
                        entry == null ? null : entry.moduleId(), cell(entry == null ? null : entry.partNumber()),
                        line.action(), line.from(), line.to(), cell(line.reason()), cell(line.proposedBy()),
                        cell(line.qualifiedBy()));
            }
        }
    }

    private static String cell(String text) {
        return SpreadsheetText.safe(text);
    }
}
