package org.chillwright.selection.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.allOf;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.StringReader;
import org.apache.commons.csv.CSVFormat;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.text.PDFTextStripper;
import org.chillwright.catalog.CatalogService;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/** Case → ranking → candidate → compare → exports, through the pages. */
@SpringBootTest
@AutoConfigureMockMvc
class SelectionPagesTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    CatalogService catalog;

    @BeforeEach
    void catalog() {
        TestCatalog.ensure(catalog);
    }

    /** check case S10 typed into the form in °C and W, with any field replaced by {@code overrides}. */
    private static MockHttpServletRequestBuilder s10(String path, String... overrides) {
        var fields = new java.util.LinkedHashMap<String, String>();
        fields.put("temperatureUnit", "C");
        fields.put("powerUnit", "W");
        fields.put("setPointTemperature", "5");
        fields.put("ambientTemperature", "25");
        fields.put("activeLoad", "10");
        fields.put("sinkResistanceKPerW", "0.3");
        fields.put("coldInterfaceKPerW", "0.1");
        fields.put("hotInterfaceKPerW", "0.05");
        fields.put("maxModules", "2");
        fields.put("objective", "COP");
        fields.put("lifecycles", "ACTIVE");
        for (int n = 0; n < overrides.length; n += 2) {
            fields.put(overrides[n], overrides[n + 1]);
        }
        var request = get(path);
        fields.forEach(request::param);
        return request;
    }

    @Test
    void newCasePageOffersAnExampleCase() throws Exception {
        mvc.perform(get("/cases/new")).andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("name=\"setPointTemperature\""),
                        containsString("value=\"25\""), containsString("Rank the catalog"))));
    }

    @Test
    void rankingPageListsCandidatesAndRefusals() throws Exception {
        mvc.perform(s10("/cases/rank")).andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("TMA-1"), containsString("designs evaluated"),
                        containsString("Modules that cannot do this job"), containsString("TMA-TINY"),
                        not(containsString("TMA-OLD")))));
    }

    @Test
    void mistypedNumberComesBackBesideItsFieldAsTyped() throws Exception {
        mvc.perform(s10("/cases/rank", "ambientTemperature", "25,5")).andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("enter a number"),
                        containsString("name=\"ambientTemperature\" value=\"25,5\" aria-describedby=\"ambientTemperature-hint\" aria-invalid=\"true\""))));
    }

    @Test
    void fahrenheitCaseRanksTheSameAsCelsius() throws Exception {
        // 41 °F = 5 °C and 77 °F = 25 °C by the °F definition (NIST SP 811, 2008)
        String celsius = mvc.perform(s10("/cases/rank.csv")).andReturn().getResponse().getContentAsString();
        String fahrenheit = mvc.perform(s10("/cases/rank.csv", "temperatureUnit", "F",
                        "setPointTemperature", "41", "ambientTemperature", "77"))
                .andReturn().getResponse().getContentAsString();
        assertThat(fahrenheit).isEqualTo(celsius);
    }

    @Test
    void candidatePageShowsThePointAndChartData() throws Exception {
        long id = catalog.search(org.chillwright.catalog.ModuleQuery.text("TMA-1")).items().get(0).id();
        mvc.perform(s10("/cases/candidate").param("moduleId", String.valueOf(id)).param("series", "1")
                        .param("parallel", "1"))
                .andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("Operating point"), containsString("data-chart="),
                        containsString("uPlot.iife.min.js"), containsString("more margin"))));
    }

    @Test
    void coldestDayAddsAHeatingCheckToEveryDesign() throws Exception {
        // 5 °C set-point, -20 °C coldest day: conduction through the idle module (K = 0.25 W/K per TM-A)
        // drains far more than the 10 W the object dissipates, so every design must heat
        mvc.perform(s10("/cases/rank", "coldestAmbientTemperature", "-20", "activeLoad", "1"))
                .andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("Coldest day"), containsString("heats at"))));
        long id = catalog.search(org.chillwright.catalog.ModuleQuery.text("TMA-1")).items().get(0).id();
        mvc.perform(s10("/cases/candidate", "coldestAmbientTemperature", "-20", "activeLoad", "1")
                        .param("moduleId", String.valueOf(id)))
                .andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("with the current reversed"),
                        containsString("H-bridge"))));
    }

    @Test
    void coldestAmbientAboveTheSetPointIsRefusedBesideTheField() throws Exception {
        mvc.perform(s10("/cases/rank", "coldestAmbientTemperature", "30"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("below the set-point")));
    }

    @Test
    void unknownModuleOnTheCandidatePageIsA404() throws Exception {
        mvc.perform(s10("/cases/candidate").param("moduleId", "999999")).andExpect(status().isNotFound());
    }

    @Test
    void compareShowsPurchasingFiguresAndASecondSource() throws Exception {
        long a = catalog.search(org.chillwright.catalog.ModuleQuery.text("TMA-1")).items().get(0).id();
        long half = catalog.search(org.chillwright.catalog.ModuleQuery.text("TMA-HALF")).items().get(0).id();
        mvc.perform(s10("/cases/compare").param("design", a + ":1x1").param("design", half + ":1x2"))
                .andExpect(status().isOk())
                .andExpect(content().string(allOf(containsString("Second source"), containsString("Lead time"),
                        containsString("21 days"), containsString(TestCatalog.SUPPLIER_B))));
    }

    @Test
    void comparingFiveIsRefused() throws Exception {
        mvc.perform(s10("/cases/compare").param("design", "1:1x1", "2:1x1", "3:1x1", "4:1x1", "5:1x1"))
                .andExpect(status().isBadRequest());
    }

    @Test
    void rankingCsvParsesWithOneRowPerDesignAndRefusal() throws Exception {
        var response = mvc.perform(s10("/cases/rank.csv")).andExpect(status().isOk())
                .andExpect(header().string("Content-Disposition", containsString("attachment"))).andReturn().getResponse();
        var records = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(response.getContentAsString())).getRecords();
        assertThat(records).isNotEmpty();
        assertThat(records.get(0).get("rank")).isEqualTo("1");
        assertThat(records.get(0).get("feasible")).isEqualTo("true");
        assertThat(Double.parseDouble(records.get(0).get("cop"))).isPositive();
        assertThat(records).anySatisfy(r -> {
            assertThat(r.get("partNumber")).isEqualTo("TMA-TINY");
            assertThat(r.get("reason")).startsWith("LOAD_ABOVE_CAPACITY");
        });
    }

    @Test
    void partNumbersThatLookLikeFormulasAreDefusedInTheCsv() throws Exception {
        // a tenth of TM-A cannot carry the case, so it only appears among the refusals
        var ratings = new org.chillwright.catalog.RatedInputs(TestCatalog.TM_A_IMAX_A * 0.1, TestCatalog.TM_A_VMAX_V,
                null, TestCatalog.TM_A_DTMAX_K, TestCatalog.TM_A_HOT_SIDE_C,
                org.chillwright.physics.RatingsMethod.IMAX_VMAX_DTMAX, null);
        if (catalog.search(org.chillwright.catalog.ModuleQuery.text("=2+3")).total() == 0) {
            catalog.create(new org.chillwright.catalog.ModuleDefinition("Formula Test Parts", "=2+3", null, ratings,
                    null, null, null, null, null, null, java.util.List.of(), null, null,
                    org.chillwright.catalog.Lifecycle.ACTIVE, null, null, null, null), "test");
        }
        String csv = mvc.perform(s10("/cases/rank.csv")).andReturn().getResponse().getContentAsString();
        assertThat(csv).contains("'=2+3").doesNotContain(",=2+3");
    }

    @Test
    void pdfReportCarriesTheCaseCandidatesSourcesAndCautions() throws Exception {
        byte[] pdf = mvc.perform(s10("/cases/report.pdf")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsByteArray();
        java.nio.file.Files.write(java.nio.file.Path.of("target", "ranking-report.pdf"), pdf); // for a person to look at
        try (var document = Loader.loadPDF(pdf)) {
            String text = new PDFTextStripper().getText(document).replaceAll("\\s+", " ");
            assertThat(text).contains("Chillwright ranking report", "Object set-point", "5.0 °C", "TMA-1",
                    "Curves: TMA-1", "Alduchov", "Never power a module without its heat sink");
        }
    }
}
