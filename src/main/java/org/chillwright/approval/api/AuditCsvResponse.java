package org.chillwright.approval.api;

import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.chillwright.approval.ApprovedListService;

/** Sends a list's audit trail as a CSV download; shared by the API and the list page. */
public final class AuditCsvResponse {

    private AuditCsvResponse() {
    }

    public static void write(ApprovedListService lists, long listId, HttpServletResponse response) throws IOException {
        var csv = new StringBuilder();
        lists.writeAuditCsv(listId, csv); // built first, so an unknown list is still a clean 404
        response.setContentType("text/csv;charset=UTF-8");
        response.setHeader("Content-Disposition", "attachment; filename=\"audit-list-" + listId + ".csv\"");
        response.getWriter().write(csv.toString());
    }
}
