package org.chillwright.selection.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.text.PDFTextStripper;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.assertj.MockMvcTester;
import org.springframework.test.web.servlet.assertj.MvcTestResult;

/**
 * An array above 60 V DC (the usual extra-low-voltage limit for dry locations, common practice) is flagged
 * SHOCK_HAZARD_VOLTAGE wherever a person or a script sees the design: ranking API, ranking page, candidate
 * page, PDF report. The case: the S10 set-up at 11 W, the second supplier's modules only, up to 8 modules,
 * ranked by cost; eight TMA-TINY in series need 63.3 V there (see OperatingPointSolverTest) and seven 67.6 V,
 * and being the cheapest designs they head the ranking and the report.
 */
@SpringBootTest
@AutoConfigureMockMvc
class ShockHazardShownTest {

    @Autowired
    MockMvcTester mvc;
    @Autowired
    CatalogService catalog;

    @BeforeEach
    void catalog() {
        TestCatalog.ensure(catalog);
    }

    private MvcTestResult page(String path, String... extra) {
        var fields = new LinkedHashMap<String, String>();
        fields.put("temperatureUnit", "C");
        fields.put("powerUnit", "W");
        fields.put("setPointTemperature", "5");
        fields.put("ambientTemperature", "25");
        fields.put("activeLoad", "11");
        fields.put("sinkResistanceKPerW", "0.3");
        fields.put("coldInterfaceKPerW", "0.1");
        fields.put("hotInterfaceKPerW", "0.05");
        fields.put("maxModules", "8");
        fields.put("objective", "COST");
        fields.put("supplier", TestCatalog.SUPPLIER_B);
        fields.put("lifecycles", "ACTIVE");
        for (int n = 0; n < extra.length; n += 2) {
            fields.put(extra[n], extra[n + 1]);
        }
        var request = mvc.get().uri(path);
        fields.forEach(request::param);
        return request.exchange();
    }

    @Test
    void theRankingApiFlagsTheEightInSeriesString() {
        var result = mvc.post().uri("/api/v1/rankings").contentType(MediaType.APPLICATION_JSON)
                .content("{\"setPointC\":5,\"ambientC\":25,\"heatLoadW\":11,\"sinkResistanceKPerW\":0.3,"
                        + "\"coldInterfaceKPerW\":0.1,\"hotInterfaceKPerW\":0.05,\"maxModules\":8,\"supplier\":\""
                        + TestCatalog.SUPPLIER_B + "\"}")
                .exchange();
        assertThat(result).hasStatusOk().bodyJson().extractingPath(
                        "$.candidates[?(@.partNumber=='TMA-TINY' && @.seriesCount==8)].warnings[*].code").asArray()
                .contains("SHOCK_HAZARD_VOLTAGE");
    }

    @Test
    void theRankingPageShowsTheTag() {
        assertThat(page("/cases/rank")).hasStatusOk().bodyText().contains("SHOCK_HAZARD_VOLTAGE");
    }

    @Test
    void theCandidatePageShowsTheWarningWithItsSentence() {
        long id = catalog.search(ModuleQuery.text("TMA-TINY")).items().get(0).id();
        assertThat(page("/cases/candidate", "moduleId", String.valueOf(id), "series", "8", "parallel", "1"))
                .hasStatusOk().bodyText().contains("SHOCK_HAZARD_VOLTAGE").contains("63.3 V")
                .contains("extra-low-voltage limit");
    }

    @Test
    void thePdfReportCarriesIt() throws Exception {
        byte[] pdf = page("/cases/report.pdf").getResponse().getContentAsByteArray();
        try (var document = Loader.loadPDF(pdf)) {
            String text = new PDFTextStripper().getText(document).replaceAll("\\s+", " ");
            assertThat(text).contains("SHOCK_HAZARD_VOLTAGE");
        }
    }
}
