package org.chillwright.selection.api;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

/**
 * The computation endpoints, end to end through JSON. Expected numbers are the external check cases
 * (src/test/resources/check-cases.json: computed independently by brute force on the raw equations, or the cited
 * formula), entered here at the API's edge units (°C = K − 273.15).
 */
@SpringBootTest
@AutoConfigureMockMvc
class ComputationApiControllerTest {

    /** Synthetic module TM-A of the check cases: S = 0.04 V/K, R = 2.4 Ω, K = 0.25 W/K. */
    private static final String TM_A = "{\"seebeckVPerK\":0.04,\"resistanceOhm\":2.4,\"conductanceWPerK\":0.25}";
    private static final String S10_CASE = "\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":%s,\"sinkResistanceKPerW\":0.3,"
            + "\"hotInterfaceKPerW\":0.05,\"coldInterfaceKPerW\":0.1";

    @Autowired
    MockMvc mvc;
    @Autowired
    tools.jackson.databind.ObjectMapper json;

    private ResultActions post(String path, String json) throws Exception {
        return mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post(path)
                .contentType(MediaType.APPLICATION_JSON).content(json));
    }

    @Test
    void operatingPointMatchesCheckCaseS10() throws Exception {
        // check case S10: brute-force nested root finding on the raw equations, rel 1e-6
        post("/api/v1/operating-point", "{\"module\":" + TM_A + "," + S10_CASE.formatted(10) + "}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.feasible").value(true))
                .andExpect(jsonPath("$.currentA").value(closeTo(1.961596365, 2e-6), Double.class))
                .andExpect(jsonPath("$.voltageV").value(closeTo(5.848443266, 6e-6), Double.class))
                .andExpect(jsonPath("$.powerW").value(closeTo(11.47228505, 1.2e-5), Double.class))
                .andExpect(jsonPath("$.cop").value(closeTo(0.8716659285, 1e-6), Double.class))
                .andExpect(jsonPath("$.hotSideC").value(closeTo(305.6652998 - 273.15, 3e-4), Double.class))
                .andExpect(jsonPath("$.coldSideC").value(closeTo(277.15 - 273.15, 1e-9), Double.class))
                .andExpect(jsonPath("$.heatRejectedW").value(closeTo(21.47228505, 2.2e-5), Double.class))
                // S10b's peak 14.69583508 W holds the cold face at the 10 W point; a larger load lowers the
                // cold face through the interface, so the capacity at the object temperature lies below it
                .andExpect(jsonPath("$.maxHeatLoadW").value(org.hamcrest.Matchers.both(
                        org.hamcrest.Matchers.greaterThan(10.0)).and(org.hamcrest.Matchers.lessThan(14.69583508)), Double.class))
                .andExpect(jsonPath("$.perModule.currentA").value(closeTo(1.961596365, 2e-6), Double.class));
    }

    @Test
    void loadAboveCapacityIsInfeasibleWithItsReason() throws Exception {
        // check case S11: 25 W cannot be removed; the achievable peak is about 14.1 W
        post("/api/v1/operating-point", "{\"module\":" + TM_A + "," + S10_CASE.formatted(25) + "}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.feasible").value(false))
                .andExpect(jsonPath("$.reason.code").value("LOAD_ABOVE_CAPACITY"))
                .andExpect(jsonPath("$.reason.message").value(containsString("14.1")))
                .andExpect(jsonPath("$.currentA").doesNotExist());
    }

    @Test
    void fixedCurrentReportsTheTemperatureReachedInCheckCaseS12() throws Exception {
        // check case S12: I = 2.5 A, 8 W, hot-side path 0.35 K/W, cold interface 0.1 K/W → Tobj 264.8909091 K
        post("/api/v1/operating-point", "{\"module\":" + TM_A + ",\"ambientC\":25,\"heatLoadW\":8,"
                + "\"sinkResistanceKPerW\":0.3,\"hotInterfaceKPerW\":0.05,\"coldInterfaceKPerW\":0.1,\"currentA\":2.5}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.setPointC").value(closeTo(264.8909091 - 273.15, 1e-6), Double.class))
                .andExpect(jsonPath("$.hotSideC").value(closeTo(307.7272727 - 273.15, 1e-6), Double.class))
                .andExpect(jsonPath("$.cop").value(closeTo(0.4131455399, 1e-8), Double.class));
    }

    @Test
    void arrayCarriesSupplyTotalsAndPerModuleShares() throws Exception {
        // circuit algebra of identical modules (circuit algebra of identical modules): 2 in series x 3 strings
        var body = post("/api/v1/operating-point", "{\"module\":" + TM_A + ",\"seriesCount\":2,\"parallelCount\":3,"
                + S10_CASE.formatted(15) + "}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.feasible").value(true))
                .andExpect(jsonPath("$.seriesCount").value(2))
                .andExpect(jsonPath("$.perModule.heatLoadW").value(closeTo(2.5, 1e-9), Double.class))
                .andReturn().getResponse().getContentAsString();
        var point = json.readTree(body);
        var perModule = point.get("perModule");
        assertThat(point.get("currentA").asDouble()).isCloseTo(3 * perModule.get("currentA").asDouble(), within(1e-9));
        assertThat(point.get("voltageV").asDouble()).isCloseTo(2 * perModule.get("voltageV").asDouble(), within(1e-9));
        assertThat(point.get("powerW").asDouble()).isCloseTo(6 * perModule.get("powerW").asDouble(), within(1e-9));
    }

    @Test
    void deriveFromImaxVmaxDtmaxMatchesCheckCaseS05AndReportsConsistencyOfS04() throws Exception {
        // check case S05 (Imax/Vmax/ΔTmax variant, after S. Luo, Electronics Cooling 2008, from memory) and
        // S04 (consistency ratio 0.9102923724); Th = 300 K = 26.85 °C
        post("/api/v1/derive", "{\"module\":{\"imaxA\":3.9,\"vmaxV\":12.4,\"qmaxW\":27,\"dtmaxK\":68,\"hotSideC\":26.85}}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.seebeckVPerK").value(closeTo(0.04133333333, 1e-10), Double.class))
                .andExpect(jsonPath("$.resistanceOhm").value(closeTo(2.458803419, 1e-8), Double.class))
                .andExpect(jsonPath("$.conductanceWPerK").value(closeTo(0.2749882353, 1e-9), Double.class))
                .andExpect(jsonPath("$.figureOfMeritPerK").value(closeTo(0.002526753864, 1e-11), Double.class))
                .andExpect(jsonPath("$.ratingsConsistency").value(closeTo(0.9102923724, 1e-9), Double.class))
                .andExpect(jsonPath("$.ratingsAt.hotSideC").value(closeTo(26.85, 1e-9), Double.class))
                .andExpect(jsonPath("$.ratingsAt.dtmaxK").value(closeTo(68.0, 1e-6), Double.class));
    }

    @Test
    void deriveByQmaxMethodMatchesCheckCaseS04() throws Exception {
        // check case S04: Qmax/Imax/ΔTmax variant (H.S. Lee, Thermoelectrics: Design and Materials, 2016, sec. 3.5)
        post("/api/v1/derive", "{\"module\":{\"imaxA\":3.9,\"vmaxV\":12.4,\"qmaxW\":27,\"dtmaxK\":68,\"hotSideC\":26.85,"
                + "\"method\":\"QMAX_IMAX_DTMAX\"}}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.seebeckVPerK").value(closeTo(0.03762541806, 1e-10), Double.class))
                .andExpect(jsonPath("$.resistanceOhm").value(closeTo(2.238229997, 1e-8), Double.class));
    }

    @Test
    void deriveFromConstructionMatchesCheckCaseS01() throws Exception {
        // check case S01: 100 couples, 1 mm², 1.2 mm, contact resistivity 5e-10 Ω·m² → R 2.6 Ω
        post("/api/v1/derive", "{\"module\":{\"couples\":100,\"legAreaMm2\":1,\"legLengthMm\":1.2,"
                + "\"seebeckPVPerK\":0.0002,\"seebeckNVPerK\":-0.0002,\"resistivityPOhmM\":1e-5,\"resistivityNOhmM\":1e-5,"
                + "\"conductivityPWPerMK\":1.5,\"conductivityNWPerMK\":1.5,\"contactResistivityOhmM2\":5e-10}}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.seebeckVPerK").value(closeTo(0.04, 1e-12), Double.class))
                .andExpect(jsonPath("$.resistanceOhm").value(closeTo(2.6, 1e-9), Double.class))
                .andExpect(jsonPath("$.conductanceWPerK").value(closeTo(0.25, 1e-12), Double.class));
    }

    @Test
    void ratingsAtAnotherHotSideMatchCheckCaseS02() throws Exception {
        // check case S02: ideal ratings of TM-A at Th = 300 K, by brute-force maximisation
        post("/api/v1/derive", "{\"module\":" + TM_A + ",\"atHotSideC\":26.85}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.ratingsAt.dtmaxK").value(closeTo(70.33066888, 1e-5), Double.class))
                .andExpect(jsonPath("$.ratingsAt.imaxA").value(closeTo(3.827822188, 1e-6), Double.class))
                .andExpect(jsonPath("$.ratingsAt.qmaxW").value(closeTo(28.35119901, 1e-5), Double.class));
    }

    @Test
    void cascadeAtFixedCurrentsMatchesCheckCaseS15() throws Exception {
        // check case S15: Ti 251.7577197 K, COP 0.1460899739 (brute-force root on Ti)
        post("/api/v1/cascade/operating-point", "{\"coldStage\":{\"module\":{\"couples\":30,\"legAreaMm2\":1,"
                + "\"legLengthMm\":1.2,\"seebeckPVPerK\":0.0002,\"seebeckNVPerK\":-0.0002,\"resistivityPOhmM\":1e-5,"
                + "\"resistivityNOhmM\":1e-5,\"conductivityPWPerMK\":1.5,\"conductivityNWPerMK\":1.5}},"
                + "\"hotStage\":{\"module\":" + TM_A + "},\"coldSideC\":-23.15,\"hotSideC\":26.85,"
                + "\"coldStageCurrentA\":2,\"hotStageCurrentA\":3}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.feasible").value(true))
                .andExpect(jsonPath("$.interstageC").value(closeTo(251.7577197 - 273.15, 1e-6), Double.class))
                .andExpect(jsonPath("$.heatLoadW").value(closeTo(4.428171021, 1e-7), Double.class))
                .andExpect(jsonPath("$.powerW").value(closeTo(30.31125891, 1e-6), Double.class))
                .andExpect(jsonPath("$.cop").value(closeTo(0.1460899739, 1e-8), Double.class));
    }

    @Test
    void cooldownMatchesCheckCaseS16() throws Exception {
        // check case S16: lumped capacitance (Incropera & DeWitt ch. 5, from memory), 27 °C = 300 K start
        post("/api/v1/cooldown", "{\"module\":" + TM_A + ",\"currentA\":2,\"hotSideC\":26.85,\"heatCapacityJPerK\":50,"
                + "\"heatLoadW\":2,\"ambientC\":26.85,\"leakResistanceKPerW\":20,\"startC\":26.85,\"timeS\":60,"
                + "\"targetC\":0}")
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.temperatureC").value(closeTo(283.4252579 - 273.15, 1e-6), Double.class))
                .andExpect(jsonPath("$.finalC").value(closeTo(254.7368421 - 273.15, 1e-6), Double.class))
                .andExpect(jsonPath("$.timeConstantS").value(closeTo(131.5789474, 1e-6), Double.class))
                .andExpect(jsonPath("$.timeToTargetS").isNumber())
                .andExpect(jsonPath("$.curve.length()").value(61));
    }

    @Test
    void dewPointMatchesCheckCaseS17() throws Exception {
        // check case S17: Alduchov & Eskridge, J. Appl. Meteorol. 35(4) 1996; 25 °C, 60 % → 16.70 °C
        mvc.perform(get("/api/v1/dew-point").param("airC", "25").param("relativeHumidityPct", "60"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.dewPointC").value(closeTo(16.70, 0.01), Double.class));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "missing object temperature | {\"module\":" + TM_A + ",\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | setPointC",
        "object below absolute zero | {\"module\":" + TM_A + ",\"setPointC\":-300,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | setPointC",
        "negative sink resistance   | {\"module\":" + TM_A + ",\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":-0.3} | sinkResistanceKPerW",
        "negative module resistance | {\"module\":{\"seebeckVPerK\":0.04,\"resistanceOhm\":-2.4,\"conductanceWPerK\":0.25},\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | module.resistanceOhm",
        "NaN load                   | {\"module\":" + TM_A + ",\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":\"NaN\",\"sinkResistanceKPerW\":0.3} | heatLoadW",
        "text for a number          | {\"module\":" + TM_A + ",\"setPointC\":\"cold\",\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | setPointC",
        "missing module             | {\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | module",
        "two module shapes at once  | {\"module\":{\"imaxA\":3,\"seebeckVPerK\":0.04},\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | module",
        "incomplete ratings         | {\"module\":{\"imaxA\":3,\"vmaxV\":12,\"hotSideC\":25},\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | module.dtmaxK",
        "ΔTmax above hot side in K  | {\"module\":{\"imaxA\":3,\"vmaxV\":12,\"dtmaxK\":400,\"hotSideC\":25},\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | module.dtmaxK",
        "current and voltage both   | {\"module\":" + TM_A + ",\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3,\"currentA\":1,\"voltageV\":3} | voltageV",
        "humidity above 100 %       | {\"module\":" + TM_A + ",\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3,\"relativeHumidityPct\":140} | relativeHumidityPct",
        "unknown ratings method     | {\"module\":{\"imaxA\":3,\"vmaxV\":12,\"dtmaxK\":68,\"hotSideC\":25,\"method\":\"GUESS\"},\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":5,\"sinkResistanceKPerW\":0.3} | module.method",
    })
    void badOperatingPointRequestIsA400NamingTheField(String what, String json, String field) throws Exception {
        post("/api/v1/operating-point", json)
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.errors[?(@.field=='" + field + "')]").exists());
    }

    @Test
    void dewPointBeyondTheExtrapolatedRangeIsA400() throws Exception {
        mvc.perform(get("/api/v1/dew-point").param("airC", "201").param("relativeHumidityPct", "50"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("airC"));
    }

    @Test
    void dewPointWithoutHumidityIsA400NamingIt() throws Exception {
        mvc.perform(get("/api/v1/dew-point").param("airC", "20"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("relativeHumidityPct"));
    }

    @Test
    void cascadeWithOnlyOneStageCurrentNamesTheMissingOne() throws Exception {
        post("/api/v1/cascade/operating-point", "{\"coldStage\":{\"module\":" + TM_A + "},\"hotStage\":{\"module\":"
                + TM_A + "},\"coldSideC\":-20,\"hotSideC\":25,\"coldStageCurrentA\":2}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("hotStageCurrentA"));
    }
}
