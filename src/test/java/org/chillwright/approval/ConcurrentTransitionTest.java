package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.chillwright.approval.ApprovalFixtures.entryIn;
import static org.chillwright.approval.ApprovalFixtures.newList;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Base64;
import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.Callable;
import org.chillwright.Together;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * Two people act on the same entry version at the same moment, over real HTTP: one wins, the other
 * gets 409, and the audit trail holds only the winner's move.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = TestModuleDirectory.ENABLED)
class ConcurrentTransitionTest {

    @LocalServerPort
    int port;
    @Autowired
    ApprovedListService lists;
    @Autowired
    AccountService accounts;

    private List<Integer> sendTogether(String path, String... bodies) throws Exception {
        String approver = ApprovalFixtures.account(accounts, "race-approver", EnumSet.of(Role.APPROVER));
        String basic = "Basic " + Base64.getEncoder().encodeToString(
                (approver + ":" + ApprovalFixtures.PASSWORD).getBytes(StandardCharsets.UTF_8));
        var http = HttpClient.newHttpClient();
        return Together.run(Arrays.stream(bodies).<Callable<Integer>>map(body -> () -> http.send(
                HttpRequest.newBuilder(URI.create("http://localhost:" + port + path)).header("Authorization", basic)
                        .header("Content-Type", "application/json").POST(HttpRequest.BodyPublishers.ofString(body))
                        .build(), HttpResponse.BodyHandlers.ofString()).statusCode()).toList());
    }

    @Test
    void approvalAndRejectionOfTheSameVersionLetExactlyOneWin() throws Exception {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        String path = "/api/v1/lists/" + list.id() + "/entries/" + entry.id() + "/transitions";
        var statuses = sendTogether(path,
                "{\"to\":\"APPROVED\",\"reason\":\"looks good\",\"version\":" + entry.version() + "}",
                "{\"to\":\"PROPOSED\",\"reason\":\"report missing\",\"version\":" + entry.version() + "}");

        assertThat(statuses).containsExactlyInAnyOrder(200, 409);
        var stored = lists.list(list.id()).entries().get(0).state();
        assertThat(lists.audit(list.id())).last().extracting(AuditView::to).isEqualTo(stored);
        assertThat(lists.audit(list.id())).filteredOn(line -> line.from() == EntryState.QUALIFYING).hasSize(1);
    }
}
