package org.chillwright.openapi;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The contract check itself: it passes what the document describes and names each way an answer strays. */
class ApiContractTest {

    private static final String PROBLEM = "application/problem+json";
    private final ApiContract contract = ApiContract.committed();

    private static byte[] body(String json) {
        return json.getBytes(StandardCharsets.UTF_8);
    }

    /** An operating point as the server writes one: every field there, figures not worked out as null. */
    private static String point(String dewPoint) {
        return "{\"feasible\":true,\"reason\":null,\"currentA\":2.1,\"voltageV\":5.2,\"powerW\":10.9,\"cop\":1.1,"
                + "\"setPointC\":20,\"coldSideC\":19.4,\"hotSideC\":51.2,\"heatLoadW\":12,\"heatRejectedW\":22.9,"
                + "\"fractionOfImax\":0.36,\"maxHeatLoadW\":null,\"currentAtMaxHeatLoadA\":null,\"loadMarginPct\":null,"
                + "\"marginK\":null,\"copOptimalCurrentA\":null,\"maxCop\":null,\"dewPointC\":" + dewPoint
                + ",\"frostPointC\":null,\"warnings\":[{\"code\":\"NEAR_IMAX\",\"message\":\"close\"}],"
                + "\"perModule\":null,\"seriesCount\":1,\"parallelCount\":1}";
    }

    @Test
    void aDocumentedAnswerPasses() {
        assertThat(contract.violations("POST", "/api/v1/operating-point", 200, "application/json", body(point("9.3")),
                false)).isEmpty();
    }

    @Test
    void aNullWhereTheDocumentAdmitsNullPasses() {
        assertThat(contract.violations("POST", "/api/v1/operating-point", 200, "application/json", body(point("null")),
                false)).isEmpty();
    }

    @Test
    void aValueOfTheWrongTypeIsNamed() {
        assertThat(contract.violations("POST", "/api/v1/operating-point", 200, "application/json",
                body(point("\"warm\"")), false)).singleElement().asString().contains("/dewPointC");
    }

    @Test
    void aFieldTheDocumentDoesNotNameIsNamed() {
        String extra = point("1").replace("{\"feasible\"", "{\"surprise\":1,\"feasible\"");
        assertThat(contract.violations("POST", "/api/v1/operating-point", 200, "application/json", body(extra), false))
                .singleElement().asString().contains("$.surprise");
    }

    @Test
    void aFieldAnAnswerAlwaysHasIsMissedWhenAbsent() {
        String without = point("1").replace("\"frostPointC\":null,", "");
        assertThat(contract.violations("POST", "/api/v1/operating-point", 200, "application/json", body(without),
                false)).singleElement().asString().contains("frostPointC");
    }

    @Test
    void aStatusTheOperationDoesNotGiveIsNamed() {
        assertThat(contract.violations("POST", "/api/v1/operating-point", 500, PROBLEM,
                body("{\"title\":\"Internal Server Error\",\"status\":500}"), false))
                .singleElement().asString().contains("a status the document does not give");
    }

    @Test
    void anAnswerInAnotherMediaTypeIsNamed() {
        assertThat(contract.violations("POST", "/api/v1/operating-point", 200, "text/plain", body("ok"), false))
                .singleElement().asString().contains("as text/plain");
    }

    @Test
    void anErrorMustBeAProblemBody() {
        assertThat(contract.violations("GET", "/api/v1/modules/7", 404, PROBLEM,
                body("{\"title\":\"Not found\",\"status\":404,\"detail\":\"no module 7\"}"), false)).isEmpty();
        assertThat(contract.violations("GET", "/api/v1/modules/7", 404, PROBLEM, body("{\"detail\":\"gone\"}"), false))
                .isNotEmpty();
    }

    @Test
    void anUnknownRouteMayOnlyAnswerWithAnError() {
        assertThat(contract.violations("GET", "/api/v1/no-such-route", 404, PROBLEM,
                body("{\"title\":\"Not Found\",\"status\":404}"), false)).isEmpty();
        assertThat(contract.violations("GET", "/api/v1/no-such-route", 200, "application/json", body("{}"), false))
                .singleElement().asString().contains("no such operation");
    }

    @Test
    void anErrorLeftToTheContainerIsCheckedByStatusOnly() {
        assertThat(contract.violations("GET", "/api/v1/modules/7", 404, null, new byte[0], true)).isEmpty();
        assertThat(contract.violations("GET", "/api/v1/modules/7", 418, null, new byte[0], true)).isNotEmpty();
    }
}
