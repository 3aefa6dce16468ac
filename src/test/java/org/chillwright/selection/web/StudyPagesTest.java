package org.chillwright.selection.web;

import static org.hamcrest.Matchers.allOf;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.math.BigDecimal;
import java.util.List;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.catalog.ModuleDefinition;
import org.chillwright.catalog.PriceBreak;
import org.chillwright.catalog.RatedInputs;
import org.chillwright.catalog.TestAtmosphere;
import org.chillwright.physics.RatingsMethod;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/** Saving a study, opening its stable link, re-running it after the catalog changed. */
@SpringBootTest
@AutoConfigureMockMvc
class StudyPagesTest {

    /** A supplier only this test uses, so its catalog changes do not reach other tests' rankings. */
    private static final String SUPPLIER = "Study Bench Co";

    @Autowired
    MockMvc mvc;
    @Autowired
    CatalogService catalog;

    @BeforeEach
    void catalog() {
        TestCatalog.ensure(catalog);
    }

    private static MockHttpServletRequestBuilder withCase(MockHttpServletRequestBuilder request, String lifecycle) {
        return request.param("temperatureUnit", "C").param("setPointTemperature", "5").param("ambientTemperature", "25")
                .param("activeLoad", "10").param("sinkResistanceKPerW", "0.3").param("coldInterfaceKPerW", "0.1")
                .param("hotInterfaceKPerW", "0.05").param("maxModules", "1").param("supplier", SUPPLIER)
                .param("lifecycles", lifecycle);
    }

    private long addModule(String partNumber) {
        var ratings = new RatedInputs(TestCatalog.TM_A_IMAX_A, TestCatalog.TM_A_VMAX_V, TestCatalog.TM_A_QMAX_W,
                TestCatalog.TM_A_DTMAX_K, TestCatalog.TM_A_HOT_SIDE_C, RatingsMethod.IMAX_VMAX_DTMAX,
                TestAtmosphere.VACUUM);
        return catalog.create(new ModuleDefinition(SUPPLIER, partNumber, "invented", ratings, null, 30.0, 30.0, 3.6,
                80.0, "EUR", List.of(new PriceBreak(1, new BigDecimal("11.00"))), 14, 1, Lifecycle.ACTIVE, true, true,
                null, null), "test").id();
    }

    private String saveStudy(String name) throws Exception {
        return mvc.perform(withCase(post("/studies"), "ACTIVE").param("name", name)
                        .with(user("eng").roles("ENGINEER")).with(csrf()))
                .andExpect(status().is3xxRedirection())
                .andReturn().getResponse().getRedirectedUrl();
    }

    @Test
    void savedStudyHasAStableLinkShowingItsRanking() throws Exception {
        addModule("STUDY-A1");
        String link = saveStudy("Laser bench A");
        mvc.perform(get(link)).andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("Laser bench A"), containsString("STUDY-A1"),
                        containsString("Re-run against today"))));
        mvc.perform(get("/studies")).andExpect(status().isOk()).andExpect(content().string(containsString("Laser bench A")));
    }

    @Test
    void rerunSaysWhatChangedAfterAModuleIsArchived() throws Exception {
        long id = addModule("STUDY-B1");
        String link = saveStudy("Detector cooler B");
        mvc.perform(get(link + "/rerun")).andExpect(status().isOk())
                .andExpect(content().string(containsString("Nothing changed")));
        catalog.archive(id, "test");
        mvc.perform(get(link + "/rerun")).andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("No longer in the ranking"), containsString("STUDY-B1"))));
    }

    @Test
    void anonymousVisitorsCannotSave() throws Exception {
        mvc.perform(withCase(post("/studies"), "ACTIVE").param("name", "nope").with(csrf())
                        .accept(org.springframework.http.MediaType.TEXT_HTML))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", org.hamcrest.Matchers.endsWith("/login")));
    }

    @Test
    void purchasingCannotSave() throws Exception {
        mvc.perform(withCase(post("/studies"), "ACTIVE").param("name", "nope")
                        .with(user("buyer").roles("PURCHASING")).with(csrf()))
                .andExpect(status().isForbidden());
    }

    @Test
    void obsoleteModulesCannotBePartOfANewStudy() throws Exception {
        mvc.perform(withCase(post("/studies"), "OBSOLETE").param("name", "old parts")
                        .with(user("eng").roles("ENGINEER")).with(csrf()))
                .andExpect(status().isBadRequest());
    }

    @Test
    void staleRefreshIsRefused() throws Exception {
        addModule("STUDY-C1");
        String link = saveStudy("Sensor C");
        mvc.perform(post(link + "/refresh").param("version", "41").with(user("eng").roles("ENGINEER")).with(csrf()))
                .andExpect(status().isConflict());
    }

    @Test
    void unknownStudyIsA404() throws Exception {
        mvc.perform(get("/studies/987654")).andExpect(status().isNotFound());
    }
}
