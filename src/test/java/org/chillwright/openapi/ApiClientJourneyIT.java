package org.chillwright.openapi;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.Set;
import java.util.UUID;
import org.chillwright.client.ApiClient;
import org.chillwright.client.ApiException;
import org.chillwright.client.api.AccountsApi;
import org.chillwright.client.api.ApprovedListsApi;
import org.chillwright.client.api.CatalogApi;
import org.chillwright.client.api.ComputationsApi;
import org.chillwright.client.api.RankingsApi;
import org.chillwright.client.model.AuditView;
import org.chillwright.client.model.CreateListRequest;
import org.chillwright.client.model.CreateUserRequest;
import org.chillwright.client.model.DeriveRequest;
import org.chillwright.client.model.EntryView;
import org.chillwright.client.model.ModuleInput;
import org.chillwright.client.model.OperatingPointRequest;
import org.chillwright.client.model.OperatingPointResponse;
import org.chillwright.client.model.ProposeEntryRequest;
import org.chillwright.client.model.RankingRequest;
import org.chillwright.client.model.RankingResponseCandidate;
import org.chillwright.client.model.TransitionRequest;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * A script's journey through the API with the Java client the build generates from the committed OpenAPI document
 * (package org.chillwright.client), against the running application: import a catalog CSV, derive a module, solve
 * an operating point, rank and fetch the best candidate's detail, propose it to a list and take it through sign-off
 * with a second account (four eyes is on), and read the audit trail. Every answer is also held to the document by
 * {@link ApiContractCheck}.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ApiClientJourneyIT {

    private static final String ADMIN_PASSWORD = "admin-test-password";
    private static final String PASSWORD = "journey-password-1";
    /** Relative tolerance for values that are the same number computed twice on one server. */
    private static final double SAME = 1e-9;

    @LocalServerPort
    int port;

    private final String tag = UUID.randomUUID().toString().substring(0, 8);
    private final String supplier = "Journey Thermal " + tag;

    private ApiClient as(String user, String password) {
        var client = new ApiClient();
        client.updateBaseUri("http://localhost:" + port);
        String basic = "Basic " + Base64.getEncoder()
                .encodeToString((user + ":" + password).getBytes(StandardCharsets.UTF_8));
        client.setRequestInterceptor(request -> request.header("Authorization", basic));
        return client;
    }

    private String account(String name, Set<CreateUserRequest.RolesEnum> roles) throws ApiException {
        var created = new AccountsApi(as("admin", ADMIN_PASSWORD))
                .createUser(new CreateUserRequest().username(name + "-" + tag).password(PASSWORD).roles(roles));
        assertThat(created.getRoles()).hasSize(roles.size());
        return created.getUsername();
    }

    /** Two invented modules of an invented supplier, as a purchasing export would give them. */
    private String catalogCsv() {
        return "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC,currency,prices,leadTimeDays,lifecycle\n"
                + supplier + ",JT-071-04,3.9,8.4,19,68,25,EUR,1:12.40;100:8.90,21,ACTIVE\n"
                + supplier + ",JT-127-06,5.8,14.9,47,69,25,EUR,1:21.50;100:15.90,28,ACTIVE\n";
    }

    private static OperatingPointRequest theCase(long moduleId, int series, int parallel) {
        return new OperatingPointRequest().module(new ModuleInput().moduleId(moduleId)).seriesCount(series)
                .parallelCount(parallel).setPointC(20.0).ambientC(45.0).heatLoadW(12.0).sinkResistanceKPerW(0.25)
                .coldInterfaceKPerW(0.05).hotInterfaceKPerW(0.05).supplyMaxV(24.0).relativeHumidityPct(50.0);
    }

    @Test
    void aScriptImportsDerivesSolvesRanksAndSignsOffAModuleThroughTheGeneratedClient() throws Exception {
        String engineer = account("engineer", Set.of(CreateUserRequest.RolesEnum.ENGINEER,
                CreateUserRequest.RolesEnum.APPROVER));
        String approver = account("approver", Set.of(CreateUserRequest.RolesEnum.APPROVER));
        var asEngineer = as(engineer, PASSWORD);
        var asApprover = as(approver, PASSWORD);

        // import a catalog CSV
        var imported = new CatalogApi(asEngineer).importModules(catalogCsv(), false);
        assertThat(imported.getApplied()).isTrue();
        assertThat(imported.getCreated()).isEqualTo(2L);
        long bigModule = imported.getRows().stream().filter(r -> r.getPartNumber().equals("JT-127-06")).findFirst()
                .orElseThrow().getModuleId();

        // derive it: the ideal model restates the ratings it was derived from at their own hot side (round trip)
        var derived = new ComputationsApi(asEngineer).deriveModule(new DeriveRequest()
                .module(new ModuleInput().moduleId(bigModule)));
        assertThat(derived.getSeebeckVPerK()).isPositive();
        assertThat(derived.getRatingsAt().getHotSideC()).isCloseTo(25.0, within(1e-9));
        assertThat(derived.getRatingsAt().getImaxA()).isCloseTo(5.8, withinPercentage(1e-6));
        assertThat(derived.getRatingsAt().getVmaxV()).isCloseTo(14.9, withinPercentage(1e-6));
        assertThat(derived.getRatingsAt().getDtmaxK()).isCloseTo(69.0, withinPercentage(1e-6));

        // solve an operating point: a physically possible one
        OperatingPointResponse point = new ComputationsApi(asEngineer).solveOperatingPoint(theCase(bigModule, 1, 1));
        assertThat(point.getFeasible()).isTrue();
        assertThat(point.getHeatRejectedW()).as("heat rejected = load + electrical power")
                .isCloseTo(point.getHeatLoadW() + point.getPowerW(), withinPercentage(1e-6));
        assertThat(point.getPowerW()).as("P = V·I").isCloseTo(point.getVoltageV() * point.getCurrentA(),
                withinPercentage(1e-6));
        assertThat(point.getColdSideC()).isLessThanOrEqualTo(point.getSetPointC());
        assertThat(point.getHotSideC()).isGreaterThan(45.0);
        assertThat(point.getDewPointC()).as("humidity was given").isNotNull();

        // rank this supplier's modules, then fetch the best candidate's detail
        var ranking = new RankingsApi(asEngineer).rankCoolers(new RankingRequest().supplier(supplier).setPointC(20.0)
                .ambientC(45.0).heatLoadW(12.0).sinkResistanceKPerW(0.25).coldInterfaceKPerW(0.05)
                .hotInterfaceKPerW(0.05).supplyMaxV(24.0).relativeHumidityPct(50.0).maxModules(4).limit(10));
        assertThat(ranking.getCandidates()).isNotEmpty().allSatisfy(c -> assertThat(c.getSupplier()).isEqualTo(supplier));
        assertThat(ranking.getCandidates()).extracting(RankingResponseCandidate::getRank).isSorted();
        RankingResponseCandidate best = ranking.getCandidates().get(0);
        var module = new CatalogApi(asEngineer).getModule(best.getModuleId());
        assertThat(module.getPartNumber()).isEqualTo(best.getPartNumber());
        assertThat(module.getDerived().getSeebeckVPerK()).isPositive();
        var detail = new ComputationsApi(asEngineer).solveOperatingPoint(theCase(best.getModuleId(),
                best.getSeriesCount(), best.getParallelCount()));
        assertThat(detail.getFeasible()).isTrue();
        assertThat(detail.getCurrentA()).isCloseTo(best.getCurrentA(), withinPercentage(100 * SAME));
        assertThat(detail.getCop()).isCloseTo(best.getCop(), withinPercentage(100 * SAME));

        // propose it to a list and take it through sign-off; four eyes needs the second account
        var lists = new ApprovedListsApi(asEngineer);
        var list = lists.createList(new CreateListRequest().name("Journey list " + tag)
                .description("Coolers for the journey test"));
        EntryView entry = lists.proposeEntry(list.getId(), new ProposeEntryRequest().moduleId(best.getModuleId())
                .note("Best COP for 20 °C at 45 °C"));
        assertThat(entry.getState()).isEqualTo(EntryView.StateEnum.PROPOSED);
        entry = lists.transitionEntry(list.getId(), entry.getId(), new TransitionRequest()
                .to(TransitionRequest.ToEnum.QUALIFYING).reason("Samples ordered").version(entry.getVersion()));
        assertThat(entry.getState()).isEqualTo(EntryView.StateEnum.QUALIFYING);
        long entryId = entry.getId();
        long version = entry.getVersion();
        var refused = catchThrowableOfType(ApiException.class, () -> lists.transitionEntry(list.getId(), entryId,
                new TransitionRequest().to(TransitionRequest.ToEnum.APPROVED).reason("My own").version(version)));
        assertThat(refused.getCode()).isEqualTo(409);
        assertThat(refused.getResponseBody()).contains("Approval needs a second person");
        entry = new ApprovedListsApi(asApprover).transitionEntry(list.getId(), entryId, new TransitionRequest()
                .to(TransitionRequest.ToEnum.APPROVED).reason("Thermal cycling passed").version(version));
        assertThat(entry.getState()).isEqualTo(EntryView.StateEnum.APPROVED);

        // read the audit trail: who did what, the approval naming its proposer and qualifier
        var audit = new ApprovedListsApi(asApprover).getListAudit(list.getId());
        assertThat(audit).extracting(AuditView::getTo).containsExactly(AuditView.ToEnum.PROPOSED,
                AuditView.ToEnum.QUALIFYING, AuditView.ToEnum.APPROVED);
        AuditView approval = audit.get(2);
        assertThat(approval.getBy()).isEqualTo(approver);
        assertThat(approval.getProposedBy()).isEqualTo(engineer);
        assertThat(approval.getQualifiedBy()).isEqualTo(engineer);
        assertThat(audit.get(0).getFrom()).isNull();
    }
}
