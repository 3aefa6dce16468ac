package org.chillwright.harvest.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.harvest.HarvestTestCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpStatus;
import org.springframework.test.web.servlet.assertj.MockMvcTester;
import org.springframework.test.web.servlet.assertj.MvcTestResult;

/** Harvest case → ranking → design through the pages, without signing in (open on the embedded default). */
@SpringBootTest(properties = HarvestTestCatalog.OWN_DATABASE)
@AutoConfigureMockMvc
class HarvestPagesTest {

    @Autowired
    MockMvcTester mvc;
    @Autowired
    CatalogService catalog;

    @BeforeEach
    void catalog() {
        HarvestTestCatalog.ensure(catalog);
    }

    /**
     * check case S13 typed into the form: junctions held at 100 °C and 30 °C (no heat-exchanger
     * resistance), one module, the harvest test supplier only; any field replaced by {@code overrides}.
     */
    private MvcTestResult s13(String path, String... overrides) {
        var fields = new LinkedHashMap<String, String>();
        fields.put("temperatureUnit", "C");
        fields.put("hotSource", "100");
        fields.put("coldSink", "30");
        fields.put("hotResistanceKPerW", "0");
        fields.put("coldResistanceKPerW", "0");
        fields.put("maxModules", "1");
        fields.put("objective", "POWER");
        fields.put("supplier", HarvestTestCatalog.SUPPLIER);
        fields.put("lifecycles", "ACTIVE");
        for (int n = 0; n < overrides.length; n += 2) {
            fields.put(overrides[n], overrides[n + 1]);
        }
        var request = mvc.get().uri(path);
        fields.forEach(request::param);
        return request.exchange();
    }

    private long moduleId(String partNumber) {
        return catalog.search(ModuleQuery.text(partNumber)).items().stream()
                .filter(m -> m.partNumber().equals(partNumber)).findFirst().orElseThrow().id();
    }

    @Test
    void formOffersAnExampleCase() {
        assertThat(mvc.get().uri("/harvest")).hasStatusOk().bodyText().contains("name=\"hotSource\"")
                .contains("value=\"90\"").contains("Rank the catalog as generators");
    }

    @Test
    void formExplainsTheModelAndItsLimits() {
        assertThat(mvc.get().uri("/harvest")).hasStatusOk().bodyText().contains("The model and its limits")
                .contains("is not simply equal to R");
    }

    @Test
    void theFormCarriesTheBurnAndFireCautions() {
        assertThat(mvc.get().uri("/harvest")).hasStatusOk().bodyText().contains("Burns and fire")
                .contains("burn on touch").contains("ignite").contains("local codes");
    }

    @Test
    void theRankingCarriesTheBurnAndFireCautions() {
        assertThat(s13("/harvest/rank")).hasStatusOk().bodyText().contains("Burns and fire")
                .contains("burn on touch").contains("ignite");
    }

    @Test
    void theDesignCarriesTheBurnAndFireCautions() {
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-A")))).hasStatusOk().bodyText()
                .contains("Burns and fire").contains("ignite");
    }

    @Test
    void navigationLeadsToTheHarvestPage() {
        assertThat(mvc.get().uri("/")).hasStatusOk().bodyText().contains("href=\"/harvest\"");
    }

    @Test
    void rankingListsTheActiveModulesWithTheirMatchedPower() {
        // check case S13: P_max = Voc²/4R = 0.8167 W for TM-A (HRV-A), shown as 817 mW
        assertThat(s13("/harvest/rank")).hasStatusOk().bodyText().contains("HRV-A").contains("817 mW")
                .contains("designs evaluated").doesNotContain("HRV-OLD");
    }

    @Test
    void rankingInFahrenheitIsTheSameCase() {
        // 212 °F = 100 °C and 86 °F = 30 °C (°F = °C × 9/5 + 32, NIST SP 811, 2008, B.8): S13 again
        assertThat(s13("/harvest/rank", "temperatureUnit", "F", "hotSource", "212", "coldSink", "86"))
                .hasStatusOk().bodyText().contains("817 mW").contains("212.0 °F");
    }

    @Test
    void rankingExplainsAModuleThatWouldRunTooHot() {
        // 150 °C through 0.5 K/W: 138 °C open-circuit hot face (the node balances at I = 0) above HRV-COOL's 80 °C
        assertThat(s13("/harvest/rank", "hotSource", "150", "hotResistanceKPerW", "0.5", "coldResistanceKPerW", "0.5"))
                .hasStatusOk().bodyText().contains("Modules that cannot do this job").contains("HRV-COOL")
                .contains("HOT_SIDE_ABOVE_LIMIT").contains("138.0 °C");
    }

    @Test
    void designPageCarriesItsCurvesForTheChartScript() {
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-A")))).hasStatusOk().bodyText()
                .contains("data-chart=\"{&quot;loadOhm&quot;:[").contains("/js/harvest-curves.js")
                .contains("Save image");
    }

    @Test
    void designPageShowsTheOperatingPointOfCheckCaseS13() {
        // check case S13: Voc 2.8 V, V 1.4 V and P 0.8167 W at the matched load
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-A")))).hasStatusOk().bodyText()
                .contains("2.800 V").contains("1.400 V").contains("817 mW");
    }

    @Test
    void designPageCautionsAboutHotSurfacesAndTheLimit() {
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-A")))).hasStatusOk().bodyText()
                .contains("Hot surfaces and the module").contains("rated for at most").contains("200.0 °C");
    }

    @Test
    void designPageOfAModuleWithoutAStatedLimitSaysSo() {
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-HALF")))).hasStatusOk()
                .bodyText().contains("the supplier states no maximum");
    }

    @Test
    void mistypedNumberComesBackBesideItsFieldAsTyped() {
        assertThat(s13("/harvest/rank", "hotSource", "9O")).hasStatusOk().bodyText()
                .contains("value=\"9O\"").contains("aria-invalid=\"true\"").contains("not &#39;9O&#39;");
    }

    @Test
    void sourceNoWarmerThanTheSinkIsShownBesideTheSourceField() {
        assertThat(s13("/harvest/rank", "hotSource", "20")).hasStatusOk().bodyText()
                .contains("the source must be warmer than the sink").contains("href=\"#hotSource\"");
    }

    @Test
    void aFurnaceSourceOf1200CIsRankedAndTheUnratedModuleIsFlagged() {
        // refused beside the field before ("at most 1000.0 °C"); now up to 1,500 °C as on the API
        assertThat(s13("/harvest/rank", "hotSource", "1200", "hotResistanceKPerW", "0.5", "coldResistanceKPerW",
                "0.5")).hasStatusOk().bodyText().contains("designs evaluated").contains("HRV-HALF")
                .contains("HOT_SIDE_LIMIT_UNCHECKED");
    }

    @Test
    void aSourceAbove1500CIsShownBesideTheSourceField() {
        assertThat(s13("/harvest/rank", "hotSource", "1600")).hasStatusOk().bodyText()
                .contains("the source must be at most 1500").contains("href=\"#hotSource\"");
    }

    @Test
    void designOfAModuleWithoutAStatedLimitCarriesTheUncheckedWarning() {
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-HALF")))).hasStatusOk()
                .bodyText().contains("HOT_SIDE_LIMIT_UNCHECKED").contains("is unchecked");
    }

    @Test
    void unknownModuleIsA404() {
        assertThat(s13("/harvest/design", "moduleId", "999999999")).hasStatus(HttpStatus.NOT_FOUND);
    }

    @Test
    void designOfMoreThanEightModulesIsA400() {
        assertThat(s13("/harvest/design", "moduleId", String.valueOf(moduleId("HRV-A")), "series", "3", "parallel",
                "3")).hasStatus(HttpStatus.BAD_REQUEST);
    }
}
