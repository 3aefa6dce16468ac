package org.chillwright.account;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/** The team deployment closes everything but sign-in and health to anonymous visitors. */
@SpringBootTest(properties = "chillwright.access.open-reads=false")
@AutoConfigureMockMvc
class ClosedAccessTest {

    @Autowired
    MockMvc mvc;

    @Test
    void homePageNeedsSignIn() throws Exception {
        mvc.perform(get("/").accept(MediaType.TEXT_HTML))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", org.hamcrest.Matchers.endsWith("/login")));
    }

    @Test
    void apiReadsNeedAnAccount() throws Exception {
        mvc.perform(get("/api/v1/dew-point").param("airC", "25").param("relativeHumidityPct", "60"))
                .andExpect(status().isUnauthorized());
    }

    @Test
    void apiDocsNeedSignIn() throws Exception {
        mvc.perform(get("/v3/api-docs").accept(MediaType.TEXT_HTML)).andExpect(status().isFound());
    }

    @Test
    void loginPageAndHealthStayOpen() throws Exception {
        mvc.perform(get("/login")).andExpect(status().isOk());
        mvc.perform(get("/actuator/health")).andExpect(status().isOk());
    }

    @Test
    void signedInUserSeesTheHomePage() throws Exception {
        mvc.perform(get("/").with(httpBasic("admin", "admin-test-password"))).andExpect(status().isOk());
    }
}
