package org.chillwright.approval.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.chillwright.approval.ApprovalFixtures.entryIn;
import static org.chillwright.approval.ApprovalFixtures.newList;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.chillwright.approval.ApprovalFixtures;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.approval.EntryState;
import org.chillwright.approval.TestModuleDirectory;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/** The list pages: what each role is offered, forms that refuse with a message beside the field, escaping. */
@SpringBootTest(properties = TestModuleDirectory.ENABLED)
@AutoConfigureMockMvc
class ListPagesTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    ApprovedListService lists;

    private static RequestPostProcessor engineer() {
        return user("page-engineer").roles("ENGINEER");
    }

    private static RequestPostProcessor approver() {
        return user("page-approver").roles("APPROVER");
    }

    @Test
    void indexLinksEveryList() throws Exception {
        var list = newList(lists);
        mvc.perform(get("/lists").with(engineer())).andExpect(status().isOk())
                .andExpect(content().string(containsString("/lists/" + list.id())));
    }

    @Test
    void navigationOffersListsToEveryoneAndAccountsToAdmins() throws Exception {
        mvc.perform(get("/lists").with(user("boss").roles("ADMIN")))
                .andExpect(content().string(containsString("href=\"/admin/users\"")));
        mvc.perform(get("/lists").with(engineer()))
                .andExpect(content().string(containsString("href=\"/lists\"")))
                .andExpect(content().string(not(containsString("href=\"/admin/users\""))));
    }

    @Test
    void createdListOpensItsPage() throws Exception {
        mvc.perform(post("/lists").with(engineer()).with(csrf()).param("name", ApprovalFixtures.unique("Page line")))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", org.hamcrest.Matchers.matchesPattern("/lists/\\d+")));
    }

    @Test
    void formWithoutCsrfTokenIsRefusedAndNothingIsStored() throws Exception {
        String name = ApprovalFixtures.unique("No token");
        mvc.perform(post("/lists").with(engineer()).param("name", name)).andExpect(status().isForbidden());
        assertThat(lists.lists()).noneMatch(l -> l.name().equals(name));
    }

    @Test
    void overlongNameIsShownBesideTheField() throws Exception {
        mvc.perform(post("/lists").with(engineer()).with(csrf()).param("name", "n".repeat(500)))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("class=\"field-error\">Name size must be between 0 and 120")));
    }

    @Test
    void binaryNameIsShownBesideTheField() throws Exception {
        mvc.perform(post("/lists").with(engineer()).with(csrf()).param("name", "bad\u0000\u0007name"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("Name must be plain text")));
    }

    @Test
    void hostileListNameIsShownEscaped() throws Exception {
        var list = lists.create(TestModuleDirectory.HOSTILE + ApprovalFixtures.unique(""), "<b>bold</b>",
                ApprovalFixtures.ADMIN);
        for (String page : new String[] {"/lists", "/lists/" + list.id()}) {
            mvc.perform(get(page).with(engineer()))
                    .andExpect(content().string(containsString("&lt;script&gt;alert(1)&lt;/script&gt;")))
                    .andExpect(content().string(not(containsString("<script>alert(1)"))))
                    .andExpect(content().string(not(containsString("<b>bold"))));
        }
    }

    @Test
    void hostilePartNumberAndNoteAreShownEscaped() throws Exception {
        var list = newList(lists);
        lists.propose(list.id(), TestModuleDirectory.HOSTILE_PART_NUMBER, "<img src=x onerror=alert(2)>",
                ApprovalFixtures.ADMIN);
        mvc.perform(get("/lists/{id}", list.id()).with(approver()))
                .andExpect(content().string(containsString("&lt;script&gt;alert(1)&lt;/script&gt;")))
                .andExpect(content().string(not(containsString("<script>alert(1)"))))
                .andExpect(content().string(not(containsString("<img src=x"))));
    }

    @Test
    void engineerIsOfferedQualifyingButNotApproval() throws Exception {
        var list = newList(lists);
        entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        mvc.perform(get("/lists/{id}", list.id()).with(engineer()))
                .andExpect(content().string(containsString("<option value=\"QUALIFYING\">")))
                .andExpect(content().string(not(containsString("<option value=\"APPROVED\">"))));
    }

    @Test
    void transitionByFormMovesTheEntryAndSignsTheAudit() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        mvc.perform(post("/lists/{id}/entries/{entryId}/transitions", list.id(), entry.id()).with(approver()).with(csrf())
                        .param("to", "APPROVED").param("reason", "qualification report accepted")
                        .param("version", String.valueOf(entry.version())))
                .andExpect(status().isFound());
        assertThat(lists.audit(list.id())).last().satisfies(line -> {
            assertThat(line.by()).isEqualTo("page-approver");
            assertThat(line.to()).isEqualTo(EntryState.APPROVED);
        });
    }

    @Test
    void transitionWithoutReasonIsShownBesideTheReason() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        mvc.perform(post("/lists/{id}/entries/{entryId}/transitions", list.id(), entry.id()).with(approver()).with(csrf())
                        .param("to", "APPROVED").param("reason", "").param("version", String.valueOf(entry.version())))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("Reason must not be blank")));
    }

    @Test
    void staleTransitionFormShowsTheConflictAndKeepsTheOtherChange() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        lists.transition(list.id(), entry.id(), EntryState.PROPOSED, "rejected first", entry.version(), null,
                ApprovalFixtures.ADMIN);
        mvc.perform(post("/lists/{id}/entries/{entryId}/transitions", list.id(), entry.id()).with(approver()).with(csrf())
                        .param("to", "APPROVED").param("reason", "looked fine to me")
                        .param("version", String.valueOf(entry.version())))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("Someone else changed this")));
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.PROPOSED);
    }

    @Test
    void unknownModuleIsShownBesideTheModuleField() throws Exception {
        var list = newList(lists);
        mvc.perform(post("/lists/{id}/entries", list.id()).with(engineer()).with(csrf()).param("moduleId", "99999"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("Module no catalog module has id 99999")));
    }

    @Test
    void purchasingMayNotProposeByForm() throws Exception {
        var list = newList(lists);
        mvc.perform(post("/lists/{id}/entries", list.id()).with(user("buyer").roles("PURCHASING")).with(csrf())
                        .param("moduleId", String.valueOf(TestModuleDirectory.ACTIVE)))
                .andExpect(status().isForbidden());
    }

    @Test
    void auditDownloadsAsCsv() throws Exception {
        var list = newList(lists);
        entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        mvc.perform(get("/lists/{id}/audit.csv", list.id()).with(engineer()))
                .andExpect(status().isOk())
                .andExpect(header().string("Content-Type", containsString("text/csv")))
                .andExpect(content().string(containsString("PROPOSED,fixture")));
    }
}
