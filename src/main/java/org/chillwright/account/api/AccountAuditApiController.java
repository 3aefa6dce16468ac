package org.chillwright.account.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.List;
import org.chillwright.account.AccountAudit;
import org.chillwright.account.AccountAuditView;
import org.chillwright.web.CsvDownload;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RestController;

/** {@code GET /api/v1/users/audit}: the whole account audit trail, oldest first, as JSON or CSV. */
@RestController
@Tag(name = "Accounts")
@PreAuthorize("hasRole('ADMIN')")
class AccountAuditApiController {

    private static final String PATH = "/api/v1/users/audit";

    private final AccountAudit audit;

    AccountAuditApiController(AccountAudit audit) {
        this.audit = audit;
    }

    @GetMapping(value = PATH, produces = "application/json")
    @Operation(operationId = "getAccountAudit", summary = "The account audit trail, oldest first, as JSON or CSV")
    List<AccountAuditView> all() {
        return audit.all();
    }

    @GetMapping(value = PATH, produces = "text/csv")
    @Operation(operationId = "getAccountAudit", summary = "The account audit trail, oldest first, as JSON or CSV")
    void csv(HttpServletResponse response) throws IOException {
        CsvDownload.send(response, "account-audit.csv", audit::writeCsv);
    }
}
