package org.chillwright.account.web;

import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.chillwright.account.AccountAudit;
import org.chillwright.web.CsvDownload;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;

/** {@code /admin/audit}: who changed which account or team setting, when and how; and the same as CSV. */
@Controller
@PreAuthorize("hasRole('ADMIN')")
class AccountAuditController {

    private final AccountAudit audit;

    AccountAuditController(AccountAudit audit) {
        this.audit = audit;
    }

    @GetMapping("/admin/audit")
    String show(Model model) {
        model.addAttribute("lines", audit.latest());
        model.addAttribute("pageLines", AccountAudit.PAGE_LINES);
        return "account/audit";
    }

    @GetMapping("/admin/audit.csv")
    void csv(HttpServletResponse response) throws IOException {
        CsvDownload.send(response, "account-audit.csv", audit::writeCsv);
    }
}
