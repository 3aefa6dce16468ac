package org.chillwright.selection.api;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.chillwright.approval.Actor;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.approval.EntryState;
import org.chillwright.catalog.CatalogService;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

/** {@code POST /api/v1/rankings} on the small catalog of {@link TestCatalog}. */
@SpringBootTest
@AutoConfigureMockMvc
class RankingApiControllerTest {

    /** check case S10: 10 W at 5 °C, 25 °C ambient, sink 0.3 K/W, interfaces 0.1 (cold) / 0.05 (hot) K/W. */
    private static final String S10 = "\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":10,\"sinkResistanceKPerW\":0.3,"
            + "\"coldInterfaceKPerW\":0.1,\"hotInterfaceKPerW\":0.05";

    @Autowired
    MockMvc mvc;
    @Autowired
    CatalogService catalog;
    @Autowired
    ApprovedListService lists;

    @BeforeEach
    void catalog() {
        TestCatalog.ensure(catalog);
    }

    private ResultActions rank(String json) throws Exception {
        return mvc.perform(post("/api/v1/rankings").contentType(MediaType.APPLICATION_JSON).content(json));
    }

    @Test
    void bestSingleModuleReproducesCheckCaseS10() throws Exception {
        // TMA-1 derives to TM-A (S03 round trip); S10 by brute force: I 1.961596365 A, COP 0.8716659285
        rank("{" + S10 + ",\"maxModules\":1,\"supplier\":\"" + TestCatalog.SUPPLIER_A + "\"}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.candidates[0].partNumber").value("TMA-1"))
                .andExpect(jsonPath("$.candidates[0].rank").value(1))
                .andExpect(jsonPath("$.candidates[0].currentA").value(closeTo(1.961596365, 1e-5), Double.class))
                .andExpect(jsonPath("$.candidates[0].cop").value(closeTo(0.8716659285, 1e-5), Double.class))
                // one piece needed, but the minimum order is 10 at 18.00: each needed piece costs 180.00
                .andExpect(jsonPath("$.candidates[0].unitPrice").value(closeTo(180.0, 1e-9), Double.class))
                .andExpect(jsonPath("$.evaluated").value(1))
                .andExpect(jsonPath("$.elapsedMs").isNumber());
    }

    @Test
    void modulesThatCannotDoItAreListedWithTheirReason() throws Exception {
        rank("{" + S10 + ",\"maxModules\":1}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.infeasible[?(@.partNumber=='TMA-TINY')].reason.code").value(hasItem("LOAD_ABOVE_CAPACITY")))
                .andExpect(jsonPath("$.infeasible[?(@.partNumber=='TMA-TINY')].reason.message").isNotEmpty());
    }

    @Test
    void obsoleteModulesAreLeftOutUnlessAskedFor() throws Exception {
        rank("{" + S10 + "}").andExpect(jsonPath("$.candidates[*].partNumber").value(not(hasItem("TMA-OLD"))));
        rank("{" + S10 + ",\"lifecycles\":[\"OBSOLETE\"]}")
                .andExpect(jsonPath("$.candidates[*].partNumber").value(hasItem("TMA-OLD")));
    }

    @Test
    void arraysAreRankedWithTheirSplit() throws Exception {
        rank("{" + S10 + ",\"maxModules\":2,\"supplier\":\"" + TestCatalog.SUPPLIER_A + "\",\"limit\":10}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.evaluated").value(3))
                .andExpect(jsonPath("$.candidates[0].perModule.heatLoadW").value(closeTo(5.0, 1e-9), Double.class));
    }

    @Test
    void sizingModeReportsTheSinkNeeded() throws Exception {
        rank("{\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":10,\"sinkRiseK\":8,\"maxModules\":1}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.candidates[0].requiredSinkKPerW").isNumber());
    }

    @Test
    void rankingRestrictedToAListConsidersOnlyItsApprovedEntries() throws Exception {
        var engineer = new Actor("eng-ranking", java.util.Set.of(org.chillwright.account.Role.ENGINEER));
        var approver = new Actor("approver-ranking", java.util.Set.of(org.chillwright.account.Role.APPROVER));
        var list = lists.create("Ranking list " + System.nanoTime(), "test", engineer);
        long half = catalog.search(org.chillwright.catalog.ModuleQuery.text("TMA-HALF")).items().get(0).id();
        long one = catalog.search(org.chillwright.catalog.ModuleQuery.text("TMA-1")).items().get(0).id();
        var approved = lists.propose(list.id(), half, "second source", engineer);
        lists.transition(list.id(), approved.id(), EntryState.QUALIFYING, "datasheet reviewed", null, null, engineer);
        lists.transition(list.id(), approved.id(), EntryState.APPROVED, "pilot build passed", null, null, approver);
        lists.propose(list.id(), one, "still proposed, must not take part", engineer);

        rank("{\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":4,\"sinkResistanceKPerW\":0.3,\"listId\":" + list.id() + "}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.candidates[*].partNumber").value(org.hamcrest.Matchers.everyItem(
                        org.hamcrest.Matchers.is("TMA-HALF"))))
                .andExpect(jsonPath("$.candidates.length()").value(org.hamcrest.Matchers.greaterThan(0)));
    }

    @Test
    void rankingOfAnUnknownListIsA404() throws Exception {
        rank("{" + S10 + ",\"listId\":987654}").andExpect(status().isNotFound());
    }

    @Test
    void coldestDayGivesEachDesignAHeatingCheck() throws Exception {
        rank("{" + S10 + ",\"maxModules\":1,\"coldestAmbientC\":-20,\"heatLoadAtColdestW\":1}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.candidates[0].heating.needsHeating").value(true))
                .andExpect(jsonPath("$.candidates[0].heating.currentA").isNumber())
                .andExpect(jsonPath("$.candidates[0].heating.heatNeededW").value(closeTo(-1.0, 1e-12), Double.class));
        rank("{" + S10 + "}").andExpect(jsonPath("$.candidates[0].heating").doesNotExist());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "no heat sink at all      | {\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":10} | sinkResistanceKPerW",
        "sink given twice         | {\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":10,\"sinkResistanceKPerW\":0.3,\"sinkRiseK\":5} | sinkRiseK",
        "too many modules         | {" + S10 + ",\"maxModules\":9} | maxModules",
        "unknown objective        | {" + S10 + ",\"objective\":\"FASTEST\"} | objective",
        "Imax fraction above one  | {" + S10 + ",\"maxFractionOfImax\":1.5} | maxFractionOfImax",
        "missing load             | {\"setPointC\":5,\"ambientC\":25,\"sinkResistanceKPerW\":0.3} | heatLoadW",
        "coldest day too warm     | {" + S10 + ",\"coldestAmbientC\":10} | coldestAmbientC",
        "cold load without a day  | {" + S10 + ",\"heatLoadAtColdestW\":2} | coldestAmbientC",
    })
    void badRankingRequestIsA400NamingTheField(String what, String json, String field) throws Exception {
        rank(json).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[?(@.field=='" + field + "')]").exists());
    }

    @Test
    void withAcceptTextCsvTheRankingIsOneCsvTableInRankOrder() throws Exception {
        var response = mvc.perform(post("/api/v1/rankings").contentType(MediaType.APPLICATION_JSON).accept("text/csv")
                .content("{" + S10 + ",\"maxModules\":1,\"supplier\":\"" + TestCatalog.SUPPLIER_A + "\"}"))
                .andReturn().getResponse();
        assertThat(response.getStatus()).isEqualTo(200);
        assertThat(response.getContentType()).startsWith("text/csv");
        var lines = response.getContentAsString(StandardCharsets.UTF_8).lines().toList();
        assertThat(lines.get(0)).startsWith("rank,feasible,moduleId,supplier,partNumber,");
        assertThat(lines.get(1)).startsWith("1,true,").contains(",TMA-1,");
    }

    @Test
    void withoutAnAcceptHeaderTheRankingIsJson() throws Exception {
        var response = rank("{" + S10 + ",\"maxModules\":1}").andReturn().getResponse();
        assertThat(response.getStatus()).isEqualTo(200);
        assertThat(response.getContentType()).startsWith("application/json");
    }
}
