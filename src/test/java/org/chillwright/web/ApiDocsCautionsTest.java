package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.assertj.MockMvcTester;

/**
 * A script's author reads the OpenAPI document, not the pages: its description introduces units, sign-in, errors
 * and the versioning promise, and carries the cautions.
 */
@SpringBootTest
@AutoConfigureMockMvc
class ApiDocsCautionsTest {

    @Autowired
    MockMvcTester mvc;

    @Test
    void theOpenApiDescriptionCarriesTheCoolingAndHarvestingCautions() {
        assertThat(mvc.get().uri("/v3/api-docs")).hasStatusOk().bodyJson().extractingPath("$.info.description")
                .asString()
                .contains("Never power a module without its heat sink", "over-temperature cut-off", "dew point",
                        "frost point", "burn on touch", "ignite", "HOT_SIDE_LIMIT_UNCHECKED", "60 V DC",
                        "local codes and licensed practice");
    }

    @Test
    void theOpenApiDescriptionIntroducesUnitsSignInErrorsAndVersioning() {
        assertThat(mvc.get().uri("/v3/api-docs")).hasStatusOk().bodyJson().extractingPath("$.info.description")
                .asString()
                .contains("SI throughout, temperatures in °C", "unit in its name", "setPointC",
                        "HTTP Basic", "Authorization: Bearer", "POST /api/v1/tokens",
                        "RFC 9457", "application/problem+json", "errors: [{\"field\", \"message\"}]",
                        "/api/v1` changes only by addition", "new version (`/api/v2`)");
    }
}
