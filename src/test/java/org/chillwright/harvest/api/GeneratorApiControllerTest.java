package org.chillwright.harvest.api;

import static org.hamcrest.Matchers.closeTo;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.harvest.HarvestTestCatalog;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.assertj.MockMvcTester;
import org.springframework.test.web.servlet.assertj.MvcTestResult;

/**
 * Generator mode through JSON. With zero heat-exchanger resistances the junctions sit at the source and
 * sink temperatures, so check case S13 applies (Ioffe 1957; Rowe, CRC Handbook of Thermoelectrics
 * 1995, from memory; expected values by brute-force maximisation over the load).
 */
@SpringBootTest(properties = HarvestTestCatalog.OWN_DATABASE)
@AutoConfigureMockMvc
class GeneratorApiControllerTest {

    private static final String TM_A = "{\"seebeckVPerK\":0.04,\"resistanceOhm\":2.4,\"conductanceWPerK\":0.25}";

    @Autowired
    MockMvc mvc;
    @Autowired
    MockMvcTester tester;
    @Autowired
    CatalogService catalog;

    private MvcTestResult generator(String module, String fields) {
        return tester.post().uri("/api/v1/generator/operating-point").contentType(MediaType.APPLICATION_JSON)
                .content("{\"module\":" + module + ",\"coldSinkC\":30,\"hotResistanceKPerW\":0.5,"
                        + "\"coldResistanceKPerW\":0.5" + fields + "}")
                .exchange();
    }

    @Test
    void acceptsAFurnaceSourceOf1200CAndSaysTheLimitOfAnUnratedModuleIsUnchecked() {
        // Open circuit: ΔT = (1200 − 30)/(1 + (0.5 + 0.5)·0.25) = 936 K, Th = 1200 − 0.5·0.25·936 = 1083.0 °C
        // (the node balances at I = 0, hand arithmetic). Refused with a 400 before: the limit was 400 °C.
        var result = generator(TM_A, ",\"hotSourceC\":1200");
        assertThat(result).hasStatusOk().bodyJson().extractingPath("$.warnings[*].code").asArray()
                .contains("HOT_SIDE_LIMIT_UNCHECKED");
        assertThat(result).bodyJson().extractingPath("$.openCircuitHotJunctionC").asNumber().satisfies(
                c -> assertThat(c.doubleValue()).isCloseTo(1083.0, within(1e-9)));
        assertThat(result).bodyJson().extractingPath("$.maxHotSideC").isNull();
    }

    @Test
    void aHotJunctionAboveTheStatedMaximumIsWarnedAboutNotRefused() {
        // 600 °C source: open-circuit hot face 600 − 0.125·570/1.25 = 543.0 °C, above the stated 200 °C
        var module = TM_A.replace("}", ",\"maxOperatingC\":200}");
        var result = generator(module, ",\"hotSourceC\":600");
        assertThat(result).hasStatusOk().bodyJson().extractingPath("$.warnings[*].code").asArray()
                .containsExactly("HOT_SIDE_ABOVE_LIMIT");
        assertThat(result).bodyJson().extractingPath("$.powerW").asNumber().satisfies(
                p -> assertThat(p.doubleValue()).isPositive());
    }

    @Test
    void aSourceAbove1500CIsA400NamingIt() {
        assertThat(generator(TM_A, ",\"hotSourceC\":1501")).hasStatus(HttpStatus.BAD_REQUEST).bodyJson()
                .extractingPath("$.errors[*].field").asArray().contains("hotSourceC");
    }

    @Test
    void aCatalogModuleKeepsItsOwnMaximumTemperature() {
        HarvestTestCatalog.ensure(catalog);
        long id = catalog.search(ModuleQuery.text("HRV-COOL")).items().get(0).id();
        assertThat(generator("{\"moduleId\":" + id + ",\"maxOperatingC\":300}", ",\"hotSourceC\":90"))
                .hasStatus(HttpStatus.BAD_REQUEST).bodyJson().extractingPath("$.errors[*].field").asArray()
                .contains("module.maxOperatingC");
    }

    @Test
    void anArrayAbove60VOpenCircuitIsAShockHazard() {
        // eight TM-A in series given as one module (S 0.32 V/K, R 19.2 Ω, K 2 W/K) between junctions held at
        // 330 °C and 30 °C: Voc = S·ΔT = 0.32 V/K × 300 K = 96 V, above 60 V DC (common practice, no source)
        var array = "{\"seebeckVPerK\":0.32,\"resistanceOhm\":19.2,\"conductanceWPerK\":2.0}";
        var result = tester.post().uri("/api/v1/generator/operating-point").contentType(MediaType.APPLICATION_JSON)
                .content("{\"module\":" + array + ",\"hotSourceC\":330,\"coldSinkC\":30,"
                        + "\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0}")
                .exchange();
        assertThat(result).hasStatusOk().bodyJson().extractingPath("$.warnings[*].code").asArray()
                .contains("SHOCK_HAZARD_VOLTAGE");
        assertThat(result).bodyJson().extractingPath("$.openCircuitV").asNumber().satisfies(
                v -> assertThat(v.doubleValue()).isCloseTo(96.0, within(1e-9)));
    }

    @Test
    void idealHeatExchangersGiveTheMatchedLoadAndMaximumEfficiencyOfS13() throws Exception {
        mvc.perform(post("/api/v1/generator/operating-point").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"module\":" + TM_A + ",\"hotSourceC\":100,\"coldSinkC\":30,"
                                + "\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0}"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.openCircuitV").value(closeTo(2.8, 1e-9), Double.class))
                .andExpect(jsonPath("$.loadOhm").value(closeTo(2.4, 1e-4), Double.class))
                .andExpect(jsonPath("$.powerW").value(closeTo(0.8166666667, 1e-7), Double.class))
                .andExpect(jsonPath("$.maxEfficiency").value(closeTo(0.03244608572, 3e-8), Double.class))
                .andExpect(jsonPath("$.maxEfficiencyLoadOhm").value(closeTo(3.309680299, 1e-3), Double.class));
    }

    @Test
    void givenLoadIsUsed() throws Exception {
        // S13 matched point: RL = R = 2.4 Ω → I 0.5833 A, V 1.4 V, η 0.03165558721
        mvc.perform(post("/api/v1/generator/operating-point").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"module\":" + TM_A + ",\"hotSourceC\":100,\"coldSinkC\":30,"
                                + "\"hotResistanceKPerW\":0,\"coldResistanceKPerW\":0,\"loadOhm\":2.4}"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.currentA").value(closeTo(0.5833333333, 1e-9), Double.class))
                .andExpect(jsonPath("$.voltageV").value(closeTo(1.4, 1e-9), Double.class))
                .andExpect(jsonPath("$.efficiency").value(closeTo(0.03165558721, 1e-9), Double.class));
    }

    @Test
    void sourceNoWarmerThanSinkIsA400() throws Exception {
        mvc.perform(post("/api/v1/generator/operating-point").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"module\":" + TM_A + ",\"hotSourceC\":20,\"coldSinkC\":30,"
                                + "\"hotResistanceKPerW\":0.5,\"coldResistanceKPerW\":0.5}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("hotSourceC"));
    }
}
