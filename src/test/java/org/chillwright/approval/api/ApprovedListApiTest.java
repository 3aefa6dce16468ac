package org.chillwright.approval.api;

import static org.assertj.core.api.Assertions.assertThat;
import static org.chillwright.approval.ApprovalFixtures.ADMIN;
import static org.chillwright.approval.ApprovalFixtures.PASSWORD;
import static org.chillwright.approval.ApprovalFixtures.entryIn;
import static org.chillwright.approval.ApprovalFixtures.newList;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.chillwright.approval.ApprovalFixtures;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.approval.EntryState;
import org.chillwright.approval.TestModuleDirectory;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

/** The approved-list API: the workflow, its 400s, 403s and 409s, and the audit trail it writes. */
@SpringBootTest(properties = TestModuleDirectory.ENABLED)
@AutoConfigureMockMvc
class ApprovedListApiTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    ApprovedListService lists;
    @Autowired
    AccountService accounts;

    private String engineer;
    private String approver;
    private String purchasing;

    @BeforeEach
    void accounts() {
        engineer = ApprovalFixtures.account(accounts, "api-engineer", EnumSet.of(Role.ENGINEER));
        approver = ApprovalFixtures.account(accounts, "api-approver", EnumSet.of(Role.APPROVER));
        purchasing = ApprovalFixtures.account(accounts, "api-purchasing", EnumSet.of(Role.PURCHASING));
    }

    private ResultActions send(org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder request,
            String user, String json) throws Exception {
        return mvc.perform(request.with(httpBasic(user, PASSWORD)).contentType(MediaType.APPLICATION_JSON).content(json));
    }

    private ResultActions transition(long listId, long entryId, String user, String json) throws Exception {
        return send(post("/api/v1/lists/{id}/entries/{entryId}/transitions", listId, entryId), user, json);
    }

    @Test
    void createsAListAndNamesTheCreator() throws Exception {
        send(post("/api/v1/lists"), engineer, "{\"name\":\"Detector line A\",\"description\":\"cooled sensors\"}")
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.id").isNumber())
                .andExpect(jsonPath("$.version").value(0))
                .andExpect(jsonPath("$.createdBy").value("api-engineer"))
                .andExpect(jsonPath("$.entries").isEmpty());
    }

    @Test
    void takenListNameIsAConflictNamingTheField() throws Exception {
        var list = newList(lists);
        send(post("/api/v1/lists"), engineer, "{\"name\":\"" + list.name() + "\"}")
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.errors[0].field").value("name"));
    }

    @Test
    void proposalIsAnEntryInStateProposedWithTheCatalogPart() throws Exception {
        var list = newList(lists);
        send(post("/api/v1/lists/{id}/entries", list.id()), engineer,
                "{\"moduleId\":" + TestModuleDirectory.ACTIVE + ",\"note\":\"fits the 40 mm sink\"}")
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.state").value("PROPOSED"))
                .andExpect(jsonPath("$.partNumber").value("EXT-071-10"))
                .andExpect(jsonPath("$.proposedBy").value("api-engineer"))
                .andExpect(jsonPath("$.note").value("fits the 40 mm sink"));
    }

    @Test
    void unknownModuleIsABadRequestNamingModuleId() throws Exception {
        var list = newList(lists);
        send(post("/api/v1/lists/{id}/entries", list.id()), engineer, "{\"moduleId\":999999}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("moduleId"))
                .andExpect(jsonPath("$.errors[0].message").value(containsString("999999")));
    }

    @Test
    void missingModuleIdIsABadRequestNamingIt() throws Exception {
        var list = newList(lists);
        send(post("/api/v1/lists/{id}/entries", list.id()), engineer, "{\"note\":\"forgot the module\"}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("moduleId"));
    }

    @Test
    void moduleObsoleteInTheCatalogCannotBeProposed() throws Exception {
        var list = newList(lists);
        send(post("/api/v1/lists/{id}/entries", list.id()), engineer,
                "{\"moduleId\":" + TestModuleDirectory.OBSOLETE_IN_CATALOG + "}")
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.errors[0].field").value("moduleId"));
    }

    @Test
    void sameModuleTwiceOnOneListIsAConflict() throws Exception {
        var list = newList(lists);
        entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        send(post("/api/v1/lists/{id}/entries", list.id()), engineer, "{\"moduleId\":" + TestModuleDirectory.ACTIVE + "}")
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.errors[0].message").value(containsString("already on this list")));
    }

    @Test
    void approvalThroughQualifyingIsRecordedInTheAuditTrail() throws Exception {
        var list = newList(lists);
        var entry = lists.propose(list.id(), TestModuleDirectory.ACTIVE, "first try",
                new org.chillwright.approval.Actor(engineer, EnumSet.of(Role.ENGINEER)));
        transition(list.id(), entry.id(), engineer, "{\"to\":\"QUALIFYING\",\"reason\":\"datasheet complete\"}")
                .andExpect(status().isOk()).andExpect(jsonPath("$.state").value("QUALIFYING"));
        transition(list.id(), entry.id(), approver, "{\"to\":\"APPROVED\",\"reason\":\"pilot build passed\"}")
                .andExpect(status().isOk()).andExpect(jsonPath("$.state").value("APPROVED"))
                .andExpect(jsonPath("$.changedBy").value("api-approver"));

        mvc.perform(get("/api/v1/lists/{id}/audit", list.id()).with(httpBasic(purchasing, PASSWORD)))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.length()").value(3))
                .andExpect(jsonPath("$[0].from").doesNotExist())
                .andExpect(jsonPath("$[0].to").value("PROPOSED"))
                .andExpect(jsonPath("$[1].by").value("api-engineer"))
                .andExpect(jsonPath("$[1].from").value("PROPOSED"))
                .andExpect(jsonPath("$[1].to").value("QUALIFYING"))
                .andExpect(jsonPath("$[2].by").value("api-approver"))
                .andExpect(jsonPath("$[2].entryId").value(entry.id()))
                .andExpect(jsonPath("$[2].from").value("QUALIFYING"))
                .andExpect(jsonPath("$[2].to").value("APPROVED"))
                .andExpect(jsonPath("$[2].reason").value("pilot build passed"))
                .andExpect(jsonPath("$[2].at").isString());
    }

    @Test
    void moveTheStateDoesNotAllowIsAConflictAndChangesNothing() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        transition(list.id(), entry.id(), approver, "{\"to\":\"APPROVED\",\"reason\":\"skip qualification\"}")
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.errors[0].field").value("to"))
                .andExpect(jsonPath("$.detail").value(containsString("PROPOSED cannot move to APPROVED")));
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.PROPOSED);
        assertThat(lists.audit(list.id())).hasSize(1);
    }

    @Test
    void moveTheRoleMayNotMakeIsForbidden() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        transition(list.id(), entry.id(), engineer, "{\"to\":\"APPROVED\",\"reason\":\"I think it is fine\"}")
                .andExpect(status().isForbidden())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.QUALIFYING);
    }

    @Test
    void transitionWithoutReasonIsABadRequestNamingReason() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        transition(list.id(), entry.id(), engineer, "{\"to\":\"QUALIFYING\",\"reason\":\"  \"}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("reason"));
    }

    @Test
    void unknownStateIsABadRequestListingTheStates() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        transition(list.id(), entry.id(), engineer, "{\"to\":\"PREFERRED\",\"reason\":\"why not\"}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("to"))
                .andExpect(jsonPath("$.errors[0].message").value(containsString("QUALIFYING")));
    }

    @Test
    void staleEntryVersionIsAConflictAndChangesNothing() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        transition(list.id(), entry.id(), approver,
                "{\"to\":\"APPROVED\",\"reason\":\"old page\",\"version\":" + (entry.version() - 1) + "}")
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.title").value("Stale edit"));
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.QUALIFYING);
    }

    @Test
    void rejectionSendsTheEntryBackToProposedWithTheReason() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        transition(list.id(), entry.id(), approver, "{\"to\":\"PROPOSED\",\"reason\":\"no reliability report\"}")
                .andExpect(status().isOk()).andExpect(jsonPath("$.state").value("PROPOSED"));
        assertThat(lists.audit(list.id())).last().satisfies(line -> {
            assertThat(line.from()).isEqualTo(EntryState.QUALIFYING);
            assertThat(line.reason()).isEqualTo("no reliability report");
        });
    }

    @Test
    void obsoleteEntryNamesItsReplacement() throws Exception {
        var list = newList(lists);
        var old = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.RESTRICTED);
        var successor = entryIn(lists, list.id(), TestModuleDirectory.OTHER_ACTIVE, EntryState.APPROVED);
        transition(list.id(), old.id(), approver, "{\"to\":\"OBSOLETE\",\"reason\":\"end of life notice\","
                + "\"replacedByEntryId\":" + successor.id() + "}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.state").value("OBSOLETE"))
                .andExpect(jsonPath("$.replacedByEntryId").value(successor.id()));
    }

    @Test
    void replacementOnAnyOtherMoveIsABadRequest() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.APPROVED);
        var other = entryIn(lists, list.id(), TestModuleDirectory.OTHER_ACTIVE, EntryState.APPROVED);
        transition(list.id(), entry.id(), approver, "{\"to\":\"RESTRICTED\",\"reason\":\"r\",\"replacedByEntryId\":"
                + other.id() + "}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("replacedByEntryId"));
    }

    @Test
    void commercialNoteIsStoredAndAudited() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.APPROVED);
        send(put("/api/v1/lists/{id}/entries/{entryId}/commercial-note", list.id(), entry.id()), purchasing,
                "{\"commercialNote\":\"second source agreed; 12 weeks lead time\"}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.commercialNote").value("second source agreed; 12 weeks lead time"))
                .andExpect(jsonPath("$.state").value("APPROVED"));
        assertThat(lists.audit(list.id())).last().satisfies(line -> {
            assertThat(line.action()).isEqualTo("COMMERCIAL_NOTE");
            assertThat(line.by()).isEqualTo("api-purchasing");
        });
    }

    @Test
    void staleListEditIsAConflict() throws Exception {
        var list = newList(lists);
        lists.edit(list.id(), list.version(), list.name() + " (renamed)", null, ADMIN);
        send(put("/api/v1/lists/{id}", list.id()), engineer,
                "{\"name\":\"my rename\",\"version\":" + list.version() + "}")
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.detail").value(containsString("changed by someone else")));
        assertThat(lists.list(list.id()).name()).isEqualTo(list.name() + " (renamed)");
    }

    @Test
    void currentListEditIsSaved() throws Exception {
        var list = newList(lists);
        send(put("/api/v1/lists/{id}", list.id()), engineer,
                "{\"name\":\"" + list.name() + " v2\",\"description\":\"new scope\",\"version\":" + list.version() + "}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.version").value(list.version() + 1))
                .andExpect(jsonPath("$.description").value("new scope"));
    }

    @Test
    void unknownListIsNotFound() throws Exception {
        mvc.perform(get("/api/v1/lists/987654").with(httpBasic(engineer, PASSWORD))).andExpect(status().isNotFound());
    }

    @Test
    void veryLongNameIsABadRequestNamingIt() throws Exception {
        send(post("/api/v1/lists"), engineer, "{\"name\":\"" + "x".repeat(10_000) + "\"}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("name"))
                .andExpect(jsonPath("$.errors[0].message").value(containsString("120")));
    }

    @Test
    void binaryNoteIsABadRequestNamingIt() throws Exception {
        var list = newList(lists);
        send(post("/api/v1/lists/{id}/entries", list.id()), engineer,
                "{\"moduleId\":" + TestModuleDirectory.ACTIVE + ",\"note\":\"PK\\u0003\\u0004\\u0000\\u0000\"}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("note"))
                .andExpect(jsonPath("$.errors[0].message").value(containsString("plain text")));
        assertThat(lists.list(list.id()).entries()).isEmpty();
    }

    @Test
    void invalidUtf8BodyIsABadRequest() throws Exception {
        byte[] body = {'{', '"', 'n', 'a', 'm', 'e', '"', ':', '"', (byte) 0xC3, (byte) 0x28, (byte) 0xFF, '"', '}'};
        mvc.perform(post("/api/v1/lists").with(httpBasic(engineer, PASSWORD)).contentType(MediaType.APPLICATION_JSON)
                        .content(body))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
    }

    @Test
    void auditTrailExportsAsCsv() throws Exception {
        var list = newList(lists);
        entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        mvc.perform(get("/api/v1/lists/{id}/audit", list.id()).accept("text/csv").with(httpBasic(engineer, PASSWORD)))
                .andExpect(status().isOk())
                .andExpect(header().string("Content-Disposition", containsString("audit-list-" + list.id() + ".csv")))
                .andExpect(content().string(org.hamcrest.Matchers.startsWith(
                        "at,by,entryId,moduleId,partNumber,action,from,to,reason,proposedBy,qualifiedBy\r\n")))
                .andExpect(content().string(containsString(",admin,")))
                .andExpect(content().string(containsString("EXT-071-10,TRANSITION,PROPOSED,QUALIFYING,fixture step")));
    }
}
