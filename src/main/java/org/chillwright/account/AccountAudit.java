package org.chillwright.account;

import java.io.IOException;
import java.time.Clock;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.chillwright.web.SpreadsheetText;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Propagation;
import org.springframework.transaction.annotation.Transactional;

/**
 * The account audit trail: every change of an account or a team setting, with who, when and what.
 * Lines are written in the transaction of the change they describe, so the trail never misses a change
 * nor records one that was rolled back. A line never holds a password.
 */
@Service
public class AccountAudit {

    /** The actor of changes no person made, such as the first administrator created at start-up. */
    public static final String SYSTEM = "system";
    /** How many lines the audit page shows; the CSV export holds them all. */
    public static final int PAGE_LINES = 200;
    static final String[] CSV_HEADER = {"at", "by", "event", "subject", "detail"};

    private final AccountAuditRepository lines;
    private final Clock clock;

    AccountAudit(AccountAuditRepository lines, Clock clock) {
        this.lines = lines;
        this.clock = clock;
    }

    /** Adds a line; runs inside the caller's transaction (and refuses to run outside one). */
    @Transactional(propagation = Propagation.MANDATORY)
    void record(String actor, AccountEvent event, String subject, String detail) {
        lines.save(new AccountAuditRecord(clock.instant(), actor, event, subject, detail));
    }

    /** The newest {@link #PAGE_LINES} lines, newest first. */
    @Transactional(readOnly = true)
    public List<AccountAuditView> latest() {
        return lines.findTop200ByOrderByOccurredAtDescIdDesc().stream().map(AccountAuditRecord::view).toList();
    }

    /** Every line, oldest first. */
    @Transactional(readOnly = true)
    public List<AccountAuditView> all() {
        return lines.findAllByOrderByOccurredAtAscIdAsc().stream().map(AccountAuditRecord::view).toList();
    }

    /** Writes the whole trail as CSV (header row, oldest first), with formula-like text defused. */
    @Transactional(readOnly = true)
    public void writeCsv(Appendable out) throws IOException {
        var format = CSVFormat.DEFAULT.builder().setHeader(CSV_HEADER).setRecordSeparator("\r\n").get();
        try (var printer = new CSVPrinter(out, format)) {
            for (var line : all()) {
                printer.printRecord(line.at(), SpreadsheetText.safe(line.by()), line.event(),
                        SpreadsheetText.safe(line.subject()), SpreadsheetText.safe(line.detail()));
            }
        }
    }
}
