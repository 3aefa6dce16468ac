package org.chillwright.catalog.api;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.endsWith;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import java.util.UUID;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.RequestPostProcessor;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/** Every status of the catalog API: 200/201, 400 naming the field, 401/403, 404, 409. */
@SpringBootTest
@AutoConfigureMockMvc
class ModuleApiControllerTest {

    private static final String ENGINEER = "catalog-engineer";
    private static final String BUYER = "catalog-buyer";
    private static final String PASSWORD = "catalog-test-password";

    @Autowired
    MockMvc mvc;
    @Autowired
    AccountService accounts;
    @Autowired
    ObjectMapper json;

    private String supplier;

    @BeforeEach
    void accountsAndAFreshSupplier() {
        if (!accounts.exists(ENGINEER)) {
            accounts.create(ENGINEER, PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
            accounts.create(BUYER, PASSWORD, EnumSet.of(Role.PURCHASING), "test-setup");
        }
        supplier = "Frostline Components " + UUID.randomUUID();
    }

    private static RequestPostProcessor engineer() {
        return httpBasic(ENGINEER, PASSWORD);
    }

    private String rated(String partNumber, String ratings) {
        return """
                {"supplier":"%s","partNumber":"%s","description":"Invented test module",
                 "ratings":%s,
                 "prices":[{"quantity":1,"unitPrice":12.40,"currency":"EUR"},{"quantity":100,"unitPrice":9.85,"currency":"EUR"}],
                 "leadTimeDays":21,"lifecycle":"ACTIVE"}""".formatted(supplier, partNumber, ratings);
    }

    private String rated(String partNumber) {
        return rated(partNumber, "{\"imaxA\":6.0,\"vmaxV\":15.4,\"qmaxW\":52.0,\"dtmaxK\":68.0,\"hotSideC\":25.0}");
    }

    private JsonNode created(String body) throws Exception {
        var result = mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                .content(body)).andExpect(status().isCreated()).andReturn();
        return json.readTree(result.getResponse().getContentAsString());
    }

    private static MockHttpServletRequestBuilder putJson(long id, String body) {
        return put("/api/v1/modules/" + id).with(engineer()).contentType(MediaType.APPLICATION_JSON).content(body);
    }

    @Test
    void createsARatedModuleWithItsDerivedParameters() throws Exception {
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                        .content(rated("FC-127-06")))
                .andExpect(status().isCreated())
                .andExpect(header().string("Location", containsString("/api/v1/modules/")))
                .andExpect(jsonPath("$.version").value(0))
                .andExpect(jsonPath("$.ratings.imaxA").value(6.0))
                .andExpect(jsonPath("$.prices[1].unitPrice").value(9.85))
                .andExpect(jsonPath("$.prices[1].currency").value("EUR"))
                // S = Vmax/Th (Vmax = S·Th, the ideal rating relations) = 15.4/298.15
                .andExpect(jsonPath("$.derived.seebeckVPerK").value(org.hamcrest.Matchers.closeTo(0.051652, 1e-6), Double.class))
                .andExpect(jsonPath("$.derived.ratingsConsistency").exists())
                .andExpect(jsonPath("$.derived.ratingsAt[1].hotSideC").value(50.0))
                .andExpect(jsonPath("$.createdBy").value(ENGINEER));
    }

    @Test
    void createsAConstructedModule() throws Exception {
        String body = """
                {"supplier":"%s","partNumber":"PRT-71","construction":{"couples":71,"legAreaMm2":1.0,"legLengthMm":1.3,
                 "seebeckPVPerK":2.0e-4,"seebeckNVPerK":-1.95e-4,"resistivityPOhmM":1.0e-5,"resistivityNOhmM":1.05e-5,
                 "conductivityPWPerMK":1.5,"conductivityNWPerMK":1.45}}""".formatted(supplier);
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.route").value("CONSTRUCTION"))
                // S = N(αp − αn) (Goldsmid 2016, from memory) = 71 × 395 µV/K
                .andExpect(jsonPath("$.derived.seebeckVPerK").value(org.hamcrest.Matchers.closeTo(0.028045, 1e-9), Double.class))
                .andExpect(jsonPath("$.derived.listed.hotSideC").value(25.0));
    }

    @Test
    void readsAModuleWithoutSigningIn() throws Exception {
        long id = created(rated("FC-127-06")).get("id").asLong();
        mvc.perform(get("/api/v1/modules/" + id)).andExpect(status().isOk())
                .andExpect(jsonPath("$.partNumber").value("FC-127-06"));
    }

    @Test
    void searchesByText() throws Exception {
        created(rated("FC-127-06"));
        created(rated("FC-071-03"));
        mvc.perform(get("/api/v1/modules").param("q", supplier).param("sort", "IMAX"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.total").value(2))
                .andExpect(jsonPath("$.items.length()").value(2));
    }

    @Test
    void unknownIdIsNotFound() throws Exception {
        mvc.perform(get("/api/v1/modules/987654321")).andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
    }

    @Test
    void missingRatingIsABadRequestNamingTheField() throws Exception {
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                        .content(rated("FC-1", "{\"vmaxV\":15.4,\"dtmaxK\":68.0,\"hotSideC\":25.0}")))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.errors[0].field").value("ratings.imaxA"))
                .andExpect(jsonPath("$.errors[0].message").value("is required"));
    }

    @Test
    void deltaTmaxAtOrAboveTheHotSideInKelvinIsRefused() throws Exception {
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                        .content(rated("FC-1", "{\"imaxA\":6,\"vmaxV\":15.4,\"dtmaxK\":300,\"hotSideC\":25.0}")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("ratings.dtmaxK"))
                .andExpect(jsonPath("$.errors[0].message").value(containsString("298.15 K")));
    }

    @Test
    void misspeltFieldIsABadRequestNamingIt() throws Exception {
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                        .content(rated("FC-1", "{\"imaxA\":6,\"vmaxV\":15.4,\"dtmaxK\":68,\"hotSide\":25.0}")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("ratings.hotSide"));
    }

    @Test
    void unknownLifecycleIsABadRequestNamingIt() throws Exception {
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                        .content(rated("FC-1").replace("\"ACTIVE\"", "\"RETIRED\"")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("lifecycle"));
    }

    @Test
    void anonymousWriteNeedsSignIn() throws Exception {
        mvc.perform(post("/api/v1/modules").contentType(MediaType.APPLICATION_JSON).content(rated("FC-1")))
                .andExpect(status().isUnauthorized());
    }

    @Test
    void purchasingMayReadButNotWrite() throws Exception {
        mvc.perform(post("/api/v1/modules").with(httpBasic(BUYER, PASSWORD)).contentType(MediaType.APPLICATION_JSON)
                .content(rated("FC-1"))).andExpect(status().isForbidden());
    }

    @Test
    void secondEntryWithTheSamePartNumberIsAConflict() throws Exception {
        created(rated("FC-127-06"));
        mvc.perform(post("/api/v1/modules").with(engineer()).contentType(MediaType.APPLICATION_JSON)
                        .content(rated("FC-127-06")))
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.errors[0].field").value("partNumber"));
    }

    @Test
    void editWithTheCurrentVersionIsStored() throws Exception {
        long id = created(rated("FC-127-06")).get("id").asLong();
        String edit = rated("FC-127-06").replaceFirst("\\{", "{\"version\":0,").replace("\"leadTimeDays\":21",
                "\"leadTimeDays\":42");
        mvc.perform(putJson(id, edit)).andExpect(status().isOk())
                .andExpect(jsonPath("$.version").value(1))
                .andExpect(jsonPath("$.leadTimeDays").value(42));
    }

    @Test
    void staleEditIsAConflictAndOverwritesNothing() throws Exception {
        long id = created(rated("FC-127-06")).get("id").asLong();
        String first = rated("FC-127-06").replaceFirst("\\{", "{\"version\":0,").replace("21", "30");
        mvc.perform(putJson(id, first)).andExpect(status().isOk());

        String stale = rated("FC-127-06").replaceFirst("\\{", "{\"version\":0,").replace("21", "99");
        mvc.perform(putJson(id, stale)).andExpect(status().isConflict())
                .andExpect(jsonPath("$.currentVersion").value(1));
        mvc.perform(get("/api/v1/modules/" + id)).andExpect(jsonPath("$.leadTimeDays").value(30));
    }

    @Test
    void editWithoutVersionIsABadRequest() throws Exception {
        long id = created(rated("FC-127-06")).get("id").asLong();
        mvc.perform(putJson(id, rated("FC-127-06"))).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("version"));
    }

    @Test
    void deleteArchivesTheModuleWhichStaysReadableById() throws Exception {
        long id = created(rated("FC-127-06")).get("id").asLong();
        mvc.perform(delete("/api/v1/modules/" + id).with(engineer())).andExpect(status().isOk())
                .andExpect(jsonPath("$.archived").value(true));
        mvc.perform(get("/api/v1/modules/" + id)).andExpect(status().isOk());
        mvc.perform(get("/api/v1/modules").param("q", supplier)).andExpect(jsonPath("$.total").value(0));
    }

    @Test
    void importsACsvAndReportsWhatChanged() throws Exception {
        String csv = "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n"
                + supplier + ",FC-1,6,15.4,52,68,25\n" + supplier + ",FC-2,3.1,8.6,15.3,69,25\n";
        mvc.perform(post("/api/v1/modules/import").with(engineer()).contentType("text/csv").content(csv))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.applied").value(true))
                .andExpect(jsonPath("$.created").value(2));
    }

    @Test
    void csvWithABadRowIsABadRequestNamingRowAndColumn() throws Exception {
        String csv = "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n"
                + supplier + ",FC-1,6,15.4,52,68,25\n" + supplier + ",FC-2,\"3,1\",8.6,15.3,69,25\n";
        mvc.perform(post("/api/v1/modules/import").with(engineer()).contentType("text/csv").content(csv))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].row").value(3))
                .andExpect(jsonPath("$.errors[0].column").value("imaxA"))
                .andExpect(jsonPath("$.errors[0].field").value("row 3 imaxA"));
        mvc.perform(get("/api/v1/modules").param("q", supplier)).andExpect(jsonPath("$.total").value(0));
    }

    @Test
    void exportsCsvWithTheDocumentedHeader() throws Exception {
        created(rated("FC-127-06"));
        mvc.perform(get("/api/v1/modules/export"))
                .andExpect(status().isOk())
                .andExpect(content().contentTypeCompatibleWith("text/csv"))
                .andExpect(content().string(org.hamcrest.Matchers.startsWith(
                        "supplier,partNumber,route,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC,")))
                .andExpect(content().string(containsString(supplier + ",FC-127-06,RATINGS,6,15.4,52,68,25,")));
    }

    @Test
    void templateIsTheHeaderAlone() throws Exception {
        mvc.perform(get("/api/v1/modules/template")).andExpect(status().isOk())
                .andExpect(content().string(endsWith("datasheetRef,notes\n")));
    }
}
