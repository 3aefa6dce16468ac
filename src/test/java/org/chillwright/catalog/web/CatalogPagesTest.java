package org.chillwright.catalog.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.endsWith;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.UUID;
import org.chillwright.catalog.CatalogFixtures;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockHttpSession;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/** The catalog pages render, keep bad input beside its field, refuse stale edits and preview imports. */
@SpringBootTest
@AutoConfigureMockMvc
class CatalogPagesTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    CatalogService catalog;

    private String supplier;

    @BeforeEach
    void freshSupplier() {
        supplier = "Icefield Devices " + UUID.randomUUID();
    }

    private static RequestPostProcessor engineer() {
        return user("page-engineer").roles("ENGINEER");
    }

    private long stored() {
        return catalog.search(ModuleQuery.text(supplier)).total();
    }

    private org.springframework.test.web.servlet.ResultActions upload(String csv, MockHttpSession session)
            throws Exception {
        return mvc.perform(multipart("/catalog/import").file(new MockMultipartFile("file", "upload.csv", "text/csv",
                csv.getBytes(StandardCharsets.UTF_8))).session(session).with(engineer()).with(csrf()));
    }

    @Test
    void listShowsModulesWithTheScanningColumns() throws Exception {
        catalog.create(CatalogFixtures.rated(supplier, "ID-127-06"), "tester");
        mvc.perform(get("/catalog").param("q", supplier))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("ID-127-06")))
                .andExpect(content().string(containsString("Price at 100")))
                .andExpect(content().string(containsString("9.85 EUR")));
    }

    @Test
    void unreadableFilterGetsAMessageBesideIt() throws Exception {
        mvc.perform(get("/catalog").param("imaxMinA", "3,5"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("uses &#39;,&#39; as the decimal mark")));
    }

    @Test
    void detailShowsDerivedParametersAndCurveData() throws Exception {
        long id = catalog.create(CatalogFixtures.rated(supplier, "ID-127-06"), "tester").id();
        mvc.perform(get("/catalog/" + id))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("id=\"figure-of-merit\"")))
                .andExpect(content().string(containsString("ZT at 300 K")))
                .andExpect(content().string(containsString("\"coldSideHeatW\"")))
                .andExpect(content().string(containsString("uPlot.iife.min.js")));
    }

    @Test
    void inconsistentRatingsGetAPlainWordsWarning() throws Exception {
        // implied Qmax = 6 × 15.4 × (298.15 + 68)/(2 × 298.15) = 56.8 W, so 45 W is 21 % below
        var definition = CatalogFixtures.rated(supplier, "ID-INCONSISTENT");
        var r = definition.ratings();
        var inconsistent = new org.chillwright.catalog.ModuleDefinition(definition.supplier(), definition.partNumber(),
                null, new org.chillwright.catalog.RatedInputs(r.imaxA(), r.vmaxV(), 45.0, r.dtmaxK(), r.hotSideC(),
                r.method(), null), null, null, null, null, null, null, java.util.List.of(), null, null, null, null,
                null, null, null);
        long id = catalog.create(inconsistent, "tester").id();
        mvc.perform(get("/catalog/" + id))
                .andExpect(content().string(containsString("id=\"consistency-warning\"")))
                .andExpect(content().string(containsString("below what Imax, Vmax and ΔTmax imply")));
    }

    @Test
    void consistentRatingsGetNoWarning() throws Exception {
        long id = catalog.create(CatalogFixtures.rated(supplier, "ID-127-06"), "tester").id();
        mvc.perform(get("/catalog/" + id)).andExpect(content().string(not(containsString("consistency-warning"))));
    }

    @Test
    void anonymousVisitorIsSentToSignInForTheForm() throws Exception {
        mvc.perform(get("/catalog/new").accept(org.springframework.http.MediaType.TEXT_HTML)).andExpect(status().isFound())
                .andExpect(header().string("Location", endsWith("/login")));
    }

    @Test
    void formCreatesAModuleAndShowsIt() throws Exception {
        mvc.perform(post("/catalog/new").with(engineer()).with(csrf())
                        .param("route", "RATINGS").param("supplier", supplier).param("partNumber", "ID-1")
                        .param("imaxA", "6").param("vmaxV", "15.4").param("qmaxW", "52").param("dtmaxK", "68")
                        .param("hotSideC", "25").param("lifecycle", "ACTIVE"))
                .andExpect(status().isFound())
                .andExpect(redirectedUrlPattern("/catalog/*"));
        assertThat(stored()).isEqualTo(1);
    }

    @Test
    void badValueIsShownBesideItsFieldAndNothingIsStored() throws Exception {
        mvc.perform(post("/catalog/new").with(engineer()).with(csrf())
                        .param("route", "RATINGS").param("supplier", supplier).param("partNumber", "ID-1")
                        .param("imaxA", "6 A").param("vmaxV", "15.4").param("dtmaxK", "68").param("hotSideC", "25"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("id=\"imaxA-error\"")))
                .andExpect(content().string(containsString("without a unit")));
        assertThat(stored()).isZero();
    }

    @Test
    void staleEditShowsTheStoredValuesAndTheConflictAndOverwritesNothing() throws Exception {
        var module = catalog.create(CatalogFixtures.rated(supplier, "ID-1"), "tester");
        catalog.update(module.id(), module.version(), CatalogFixtures.withImax(module.definition(), 6.4), "someone-else");

        var stale = org.chillwright.catalog.ModuleText.cells(CatalogFixtures.withImax(module.definition(), 5.5));
        var request = post("/catalog/" + module.id() + "/edit").with(engineer()).with(csrf())
                .param("version", Long.toString(module.version()));
        stale.forEach(request::param);
        mvc.perform(request)
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("id=\"stale-edit\"")))
                .andExpect(content().string(containsString("<td>5.5</td>")))
                .andExpect(content().string(containsString("value=\"6.4\"")));
        org.assertj.core.api.Assertions.assertThat(catalog.get(module.id()).ratedImaxA()).isEqualTo(6.4);
    }

    @Test
    void importPreviewListsRowErrorsAndStoresNothing() throws Exception {
        String csv = "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n" + supplier + ",ID-1,6,15.4,52,68,25\n"
                + supplier + ",ID-2,6,15.4,52,-68,25\n";
        upload(csv, new MockHttpSession())
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("nothing was stored")))
                .andExpect(content().string(containsString("<td>dtmaxK</td>")));
        assertThat(stored()).isZero();
    }

    @Test
    void importPreviewThenApplyStoresTheRows() throws Exception {
        String csv = "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n" + supplier + ",ID-1,6,15.4,52,68,25\n";
        var session = new MockHttpSession();
        var preview = upload(csv, session)
                .andExpect(content().string(containsString("1 new, 0 updated, 0 unchanged")))
                .andReturn().getResponse().getContentAsString();
        String previewId = preview.replaceAll("(?s).*name=\"previewId\" value=\"([^\"]+)\".*", "$1");

        mvc.perform(post("/catalog/import/apply").param("previewId", previewId).session(session).with(engineer()).with(csrf()))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("Imported")));
        assertThat(stored()).isEqualTo(1);
    }

    @Test
    void navigationLinksTheCatalog() throws Exception {
        mvc.perform(get("/")).andExpect(content().string(containsString("href=\"/catalog\"")));
    }
}
