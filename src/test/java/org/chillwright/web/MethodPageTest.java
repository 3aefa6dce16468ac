package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.assertj.MockMvcTester;

/** The method page states the assumptions and limits a person needs to judge a result. */
@SpringBootTest
@AutoConfigureMockMvc
class MethodPageTest {

    @Autowired
    MockMvcTester mvc;

    @Test
    void statesThatTheQmaxMethodAssumesQmaxMeasuredAtImax() {
        assertThat(mvc.get().uri("/method")).hasStatusOk().bodyText()
                .contains("Qmax was measured at Imax").contains("Th²/(Th² − ΔTmax²)");
    }

    @Test
    void statesTheFrostPointAndTheExtrapolationOfTheDewPoint() {
        assertThat(mvc.get().uri("/method")).hasStatusOk().bodyText()
                .contains("22.587").contains("273.86").contains("with respect to water").contains("extrapolated");
    }

    @Test
    void statesTheShockHazardAndHotFaceLimits() {
        assertThat(mvc.get().uri("/method")).hasStatusOk().bodyText()
                .contains("SHOCK_HAZARD_VOLTAGE").contains("60 V DC").contains("HOT_SIDE_BEYOND_USE")
                .contains("250 °C");
    }
}
