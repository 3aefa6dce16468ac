package org.chillwright.harvest.api;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.chillwright.catalog.CatalogService;
import org.chillwright.harvest.HarvestTestCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.assertj.MockMvcTester;
import org.springframework.test.web.servlet.assertj.MvcTestResult;

/** The harvest ranking through JSON, without signing in (a computation, open on the embedded default). */
@SpringBootTest(properties = HarvestTestCatalog.OWN_DATABASE)
@AutoConfigureMockMvc
class HarvestApiControllerTest {

    @Autowired
    MockMvcTester mvc;
    @Autowired
    CatalogService catalog;

    @BeforeEach
    void catalog() {
        HarvestTestCatalog.ensure(catalog);
    }

    /** The harvest test modules between 100 °C and 30 °C junctions (check case S13), with overrides. */
    private MvcTestResult rank(String fields) {
        String body = "{\"hotSourceC\":100,\"coldSinkC\":30,\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0,"
                + "\"maxModules\":1,\"supplier\":\"" + HarvestTestCatalog.SUPPLIER + "\"" + fields + "}";
        return mvc.post().uri("/api/v1/harvest/rankings").contentType(MediaType.APPLICATION_JSON).content(body)
                .exchange();
    }

    private static double number(MvcTestResult result, String path) throws Exception {
        return ((Number) com.jayway.jsonpath.JsonPath.read(result.getResponse().getContentAsString(
                java.nio.charset.StandardCharsets.UTF_8), path)).doubleValue();
    }

    @Test
    void bestDesignGivesTheMatchedPowerOfCheckCaseS13() throws Exception {
        // check case S13 (Ioffe 1957; Rowe, CRC Handbook 1995, from memory): P_max = Voc²/4R = 0.8166666667 W
        var result = rank("");
        assertThat(result).hasStatusOk();
        assertThat(number(result, "$.candidates[0].powerW")).isCloseTo(0.8166666667, within(1e-6));
    }

    @Test
    void bestDesignRunsOnTheInternalResistanceWithIdealExchangers() throws Exception {
        // check case S13: RL = R = 2.4 Ω; the flat optimum pins the load to about 1e-4 Ω
        assertThat(number(rank(""), "$.candidates[0].loadOhm")).isCloseTo(2.4, within(1e-3));
    }

    @Test
    void eachCandidateCarriesItsOpenCircuitVoltageAndJunctionsInCelsius() throws Exception {
        // check case S13: Voc = S·ΔT = 0.04 · 70 = 2.8 V; the junctions are the source and sink
        var result = rank("");
        assertThat(number(result, "$.candidates[0].openCircuitV")).isCloseTo(2.8, within(1e-6));
        assertThat(number(result, "$.candidates[0].hotJunctionC")).isCloseTo(100, within(1e-6));
        assertThat(number(result, "$.candidates[0].coldJunctionC")).isCloseTo(30, within(1e-6));
    }

    @Test
    void obsoleteModulesAreLeftOutByDefault() {
        assertThat(rank("")).hasStatusOk().bodyJson().extractingPath("$.candidates[*].partNumber").asArray()
                .contains("HRV-A", "HRV-HALF").doesNotContain("HRV-OLD");
    }

    @Test
    void moduleThatWouldRunAboveItsLimitIsRefusedWithItsReason() {
        // 150 °C source through 0.5 K/W: one TM-A's hot face reaches 138 °C open-circuit (hand arithmetic,
        // the node balances at I = 0), above HRV-COOL's 80 °C
        var result = rank(",\"hotSourceC\":150,\"hotResistanceKPerW\":0.5,\"coldResistanceKPerW\":0.5");
        assertThat(result).hasStatusOk().bodyJson().extractingPath("$.infeasible[?(@.partNumber=='HRV-COOL')].reason.code")
                .asArray().containsExactly("HOT_SIDE_ABOVE_LIMIT");
    }

    @Test
    void acceptsSourcesUpTo1500CAndRanksTheModuleWithoutALimitWithItsWarning() {
        // 1,500 °C: furnace and stove generators; refused with a 400 before (the limit was 1,000 °C). The modules
        // rated 80 °C and 200 °C are refused for their hot face; HRV-HALF states no limit and is ranked, flagged.
        var result = rank(",\"hotSourceC\":1500,\"hotResistanceKPerW\":0.5,\"coldResistanceKPerW\":0.5");
        assertThat(result).hasStatusOk().bodyJson().extractingPath("$.candidates[*].partNumber").asArray()
                .containsOnly("HRV-HALF");
        assertThat(result).bodyJson().extractingPath("$.candidates[0].warnings[*].code").asArray()
                .contains("HOT_SIDE_LIMIT_UNCHECKED");
    }

    @Test
    void aSourceAbove1500CIsA400NamingIt() {
        assertThat(rank(",\"hotSourceC\":1501")).hasStatus(HttpStatus.BAD_REQUEST).bodyJson()
                .extractingPath("$.errors[*].field").asArray().contains("hotSourceC");
    }

    @Test
    void everyDesignOfAModuleWithoutAStatedMaximumIsFlagged() throws Exception {
        var result = rank(",\"maxModules\":4");
        assertThat(result).hasStatusOk();
        String body = result.getResponse().getContentAsString(java.nio.charset.StandardCharsets.UTF_8);
        java.util.List<Object> unrated = com.jayway.jsonpath.JsonPath.read(body,
                "$.candidates[?(@.partNumber=='HRV-HALF')]");
        java.util.List<Object> flagged = com.jayway.jsonpath.JsonPath.read(body,
                "$.candidates[?(@.partNumber=='HRV-HALF')].warnings[?(@.code=='HOT_SIDE_LIMIT_UNCHECKED')]");
        java.util.List<Object> ratedFlagged = com.jayway.jsonpath.JsonPath.read(body,
                "$.candidates[?(@.partNumber=='HRV-A')].warnings[?(@.code=='HOT_SIDE_LIMIT_UNCHECKED')]");
        assertThat(unrated).hasSize(8); // 1 to 4 modules: 1×1, 1×2, 2×1, 1×3, 3×1, 1×4, 2×2, 4×1
        assertThat(flagged).hasSameSizeAs(unrated);
        assertThat(ratedFlagged).isEmpty();
    }

    @Test
    void startUpVoltageKeepsOnlyDesignsThatReachIt() {
        // one module gives 1.4 V at the matched load (S13); two in series 2.8 V
        var result = rank(",\"maxModules\":2,\"minLoadVoltageV\":2");
        assertThat(result).hasStatusOk().bodyJson().extractingPath("$.candidates[*].seriesCount").asArray()
                .isNotEmpty().containsOnly(2);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "hotSourceC missing            | {\"coldSinkC\":30,\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0}                       | hotSourceC",
            "source not warmer than sink   | {\"hotSourceC\":20,\"coldSinkC\":30,\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0}     | hotSourceC",
            "negative hot resistance       | {\"hotSourceC\":90,\"coldSinkC\":30,\"hotResistanceKPerW\":-1,\"coldResistanceKPerW\":0}    | hotResistanceKPerW",
            "cold resistance missing       | {\"hotSourceC\":90,\"coldSinkC\":30,\"hotResistanceKPerW\":0}                               | coldResistanceKPerW",
            "too many modules              | {\"hotSourceC\":90,\"coldSinkC\":30,\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0,\"maxModules\":9} | maxModules",
            "negative start-up voltage     | {\"hotSourceC\":90,\"coldSinkC\":30,\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0,\"minLoadVoltageV\":-1} | minLoadVoltageV",
            "misspelt field                | {\"hotSideC\":90,\"coldSinkC\":30,\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0}       | hotSideC"})
    void badInputIsA400NamingTheField(String what, String body, String field) {
        var result = mvc.post().uri("/api/v1/harvest/rankings").contentType(MediaType.APPLICATION_JSON).content(body)
                .exchange();
        assertThat(result).hasStatus(HttpStatus.BAD_REQUEST).bodyJson().extractingPath("$.errors[*].field").asArray()
                .contains(field);
    }
}
