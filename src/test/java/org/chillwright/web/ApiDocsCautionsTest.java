package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.assertj.MockMvcTester;

/** A script's author reads the OpenAPI document, not the pages: its description carries the cautions. */
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
}
