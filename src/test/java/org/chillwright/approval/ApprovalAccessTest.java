package org.chillwright.approval;

import static org.chillwright.approval.ApprovalFixtures.entryIn;
import static org.chillwright.approval.ApprovalFixtures.newList;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.request;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import java.util.Set;
import java.util.stream.Stream;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpMethod;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Every write endpoint of accounts and approved lists, tried by every role and by nobody: anonymous
 * gets 401, a role outside the rule 403, a role inside it the success status. Each case gets a fresh
 * list with the entry already in the state the move starts from.
 */
@SpringBootTest(properties = TestModuleDirectory.ENABLED)
@AutoConfigureMockMvc
class ApprovalAccessTest {

    /** Who tries: one account per role, or nobody. */
    enum Who { ANONYMOUS, ENGINEER, PURCHASING, APPROVER, ADMIN }

    /** One write: its method, path (with {list} and {entry} filled in per case), body and the entry state it needs. */
    enum Write {
        CREATE_USER(HttpMethod.POST, "/api/v1/users", null, 201, Role.ADMIN),
        CREATE_LIST(HttpMethod.POST, "/api/v1/lists", null, 201, Role.ENGINEER, Role.APPROVER, Role.ADMIN),
        EDIT_LIST(HttpMethod.PUT, "/api/v1/lists/{list}", null, 200, Role.ENGINEER, Role.APPROVER, Role.ADMIN),
        PROPOSE(HttpMethod.POST, "/api/v1/lists/{list}/entries", null, 201, Role.ENGINEER, Role.ADMIN),
        TO_QUALIFYING(HttpMethod.POST, "/api/v1/lists/{list}/entries/{entry}/transitions", EntryState.PROPOSED, 200,
                Role.ENGINEER, Role.ADMIN),
        APPROVE(HttpMethod.POST, "/api/v1/lists/{list}/entries/{entry}/transitions", EntryState.QUALIFYING, 200,
                Role.APPROVER, Role.ADMIN),
        REJECT(HttpMethod.POST, "/api/v1/lists/{list}/entries/{entry}/transitions", EntryState.QUALIFYING, 200,
                Role.APPROVER, Role.ADMIN),
        RESTRICT(HttpMethod.POST, "/api/v1/lists/{list}/entries/{entry}/transitions", EntryState.APPROVED, 200,
                Role.APPROVER, Role.ADMIN),
        OBSOLETE(HttpMethod.POST, "/api/v1/lists/{list}/entries/{entry}/transitions", EntryState.RESTRICTED, 200,
                Role.APPROVER, Role.ADMIN),
        COMMERCIAL_NOTE(HttpMethod.PUT, "/api/v1/lists/{list}/entries/{entry}/commercial-note", EntryState.APPROVED, 200,
                Role.PURCHASING, Role.ADMIN);

        final HttpMethod method;
        final String path;
        final EntryState needs;
        final int success;
        final Set<Role> allowed;

        Write(HttpMethod method, String path, EntryState needs, int success, Role... allowed) {
            this.method = method;
            this.path = path;
            this.needs = needs;
            this.success = success;
            this.allowed = EnumSet.of(allowed[0], allowed);
        }
    }

    @Autowired
    MockMvc mvc;
    @Autowired
    ApprovedListService lists;
    @Autowired
    AccountService accounts;

    static Stream<Arguments> everyWriteByEveryone() {
        return Stream.of(Write.values()).flatMap(write -> Stream.of(Who.values()).map(who -> Arguments.of(write, who)));
    }

    @ParameterizedTest(name = "{0} by {1}")
    @MethodSource("everyWriteByEveryone")
    void onlyTheRolesInTheRuleMayWrite(Write write, Who who) throws Exception {
        var list = newList(lists);
        long entryId = write.needs == null ? 0 : entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, write.needs).id();
        String path = write.path.replace("{list}", String.valueOf(list.id())).replace("{entry}", String.valueOf(entryId));
        var request = request(write.method, path).contentType(MediaType.APPLICATION_JSON).content(body(write, list));
        if (who != Who.ANONYMOUS) {
            Role role = Role.valueOf(who.name());
            String user = ApprovalFixtures.account(accounts, "only-" + role.name().toLowerCase(), EnumSet.of(role));
            request.with(httpBasic(user, ApprovalFixtures.PASSWORD));
        }
        int expected = who == Who.ANONYMOUS ? 401 : write.allowed.contains(Role.valueOf(who.name())) ? write.success : 403;
        mvc.perform(request).andExpect(status().is(expected));
    }

    private static String body(Write write, ListView list) {
        return switch (write) {
            case CREATE_USER -> "{\"username\":\"" + ApprovalFixtures.unique("made") + "\","
                    + "\"password\":\"long-enough-secret\",\"roles\":[\"ENGINEER\"]}";
            case CREATE_LIST -> "{\"name\":\"" + ApprovalFixtures.unique("Access line") + "\"}";
            case EDIT_LIST -> "{\"name\":\"" + list.name() + " renamed\",\"version\":" + list.version() + "}";
            case PROPOSE -> "{\"moduleId\":" + TestModuleDirectory.OTHER_ACTIVE + "}";
            case TO_QUALIFYING -> "{\"to\":\"QUALIFYING\",\"reason\":\"datasheet in\"}";
            case APPROVE -> "{\"to\":\"APPROVED\",\"reason\":\"tests passed\"}";
            case REJECT -> "{\"to\":\"PROPOSED\",\"reason\":\"report missing\"}";
            case RESTRICT -> "{\"to\":\"RESTRICTED\",\"reason\":\"not for new designs\"}";
            case OBSOLETE -> "{\"to\":\"OBSOLETE\",\"reason\":\"end of life\"}";
            case COMMERCIAL_NOTE -> "{\"commercialNote\":\"price agreed for 1000 pieces\"}";
        };
    }
}
