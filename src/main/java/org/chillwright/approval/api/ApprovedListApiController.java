package org.chillwright.approval.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.io.IOException;
import java.util.List;
import org.chillwright.approval.Actor;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.approval.AuditView;
import org.chillwright.approval.EntryView;
import org.chillwright.approval.ListSummary;
import org.chillwright.approval.ListView;
import org.springframework.http.HttpStatus;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.Authentication;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/**
 * The approved-list API. The roles on each write are the widest that could make it; the service
 * then applies the workflow's exact rule (who may move an entry into which state).
 */
@RestController
@RequestMapping("/api/v1/lists")
@Tag(name = "Approved lists", description = "Approved part lists, their entries' sign-off and the audit trail")
class ApprovedListApiController {

    private final ApprovedListService lists;

    ApprovedListApiController(ApprovedListService lists) {
        this.lists = lists;
    }

    @GetMapping
    @Operation(operationId = "listLists", summary = "Every approved list, with how many entries it has")
    List<ListSummary> index() {
        return lists.lists();
    }

    @GetMapping("/{id}")
    @Operation(operationId = "getList", summary = "One list with its entries")
    ListView show(@PathVariable long id) {
        return lists.list(id);
    }

    @PostMapping
    @ResponseStatus(HttpStatus.CREATED)
    @PreAuthorize("hasAnyRole('ENGINEER', 'APPROVER', 'ADMIN')")
    @Operation(operationId = "createList", summary = "Start a list")
    ListView create(@Valid @RequestBody CreateListRequest request, Authentication who) {
        return lists.create(request.name().strip(), request.description(), Actor.of(who));
    }

    @PutMapping("/{id}")
    @PreAuthorize("hasAnyRole('ENGINEER', 'APPROVER', 'ADMIN')")
    @Operation(operationId = "updateList",
            summary = "Rename a list or change its description; send the version you read")
    ListView edit(@PathVariable long id, @Valid @RequestBody EditListRequest request, Authentication who) {
        return lists.edit(id, request.version(), request.name().strip(), request.description(), Actor.of(who));
    }

    @PostMapping("/{id}/entries")
    @ResponseStatus(HttpStatus.CREATED)
    @PreAuthorize("hasAnyRole('ENGINEER', 'ADMIN')")
    @Operation(operationId = "proposeEntry", summary = "Propose a catalog module for the list (state PROPOSED)")
    EntryView propose(@PathVariable long id, @Valid @RequestBody ProposeEntryRequest request, Authentication who) {
        return lists.propose(id, request.moduleId(), request.note(), Actor.of(who));
    }

    @PostMapping("/{id}/entries/{entryId}/transitions")
    @PreAuthorize("hasAnyRole('ENGINEER', 'APPROVER', 'ADMIN')")
    @Operation(operationId = "transitionEntry", summary = "Move an entry to another state",
            description = "PROPOSED → QUALIFYING → APPROVED → RESTRICTED → OBSOLETE, each by its roles. With four "
                    + "eyes on, the account that proposed an entry or sent it to QUALIFYING may not approve it (409).")
    EntryView transition(@PathVariable long id, @PathVariable long entryId, @Valid @RequestBody TransitionRequest request,
            Authentication who) {
        return lists.transition(id, entryId, request.to(), request.reason(), request.version(),
                request.replacedByEntryId(), Actor.of(who));
    }

    @PutMapping("/{id}/entries/{entryId}/commercial-note")
    @PreAuthorize("hasAnyRole('PURCHASING', 'ADMIN')")
    @Operation(operationId = "setCommercialNote",
            summary = "Purchasing's note on an entry: second source, price, lead time")
    EntryView annotate(@PathVariable long id, @PathVariable long entryId, @Valid @RequestBody CommercialNoteRequest request,
            Authentication who) {
        return lists.annotate(id, entryId, request.commercialNote(), request.version(), Actor.of(who));
    }

    @GetMapping(value = "/{id}/audit", produces = "application/json")
    @Operation(operationId = "getListAudit", summary = "The list's audit trail, oldest first, as JSON or CSV")
    List<AuditView> audit(@PathVariable long id) {
        return lists.audit(id);
    }

    @GetMapping(value = "/{id}/audit", produces = "text/csv")
    @Operation(operationId = "getListAudit", summary = "The list's audit trail, oldest first, as JSON or CSV")
    void auditCsv(@PathVariable long id, HttpServletResponse response) throws IOException {
        AuditCsvResponse.write(lists, id, response);
    }
}
