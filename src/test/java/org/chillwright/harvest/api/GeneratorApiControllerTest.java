package org.chillwright.harvest.api;

import static org.hamcrest.Matchers.closeTo;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Generator mode through JSON. With zero heat-exchanger resistances the junctions sit at the source and
 * sink temperatures, so check-cases.json S13 applies (Ioffe 1957; Rowe, CRC Handbook of Thermoelectrics
 * 1995, from memory; expected values by brute-force maximisation over the load).
 */
@SpringBootTest
@AutoConfigureMockMvc
class GeneratorApiControllerTest {

    private static final String TM_A = "{\"seebeckVPerK\":0.04,\"resistanceOhm\":2.4,\"conductanceWPerK\":0.25}";

    @Autowired
    MockMvc mvc;

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
