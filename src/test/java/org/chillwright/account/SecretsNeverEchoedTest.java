package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestBuilders.formLogin;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;

import java.util.EnumSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.system.CapturedOutput;
import org.springframework.boot.test.system.OutputCaptureExtension;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.RequestBuilder;

/**
 * Every route that takes a password gets a bad one, and the value comes back nowhere: not in the
 * response (body, headers, flash attributes) and not in the log, with Spring's web and security
 * logging and our own turned up to DEBUG, where a rejected value would otherwise be printed.
 */
@SpringBootTest(properties = {"logging.level.org.springframework.web=DEBUG",
    "logging.level.org.springframework.security=DEBUG", "logging.level.org.chillwright=DEBUG"})
@AutoConfigureMockMvc
@ExtendWith(OutputCaptureExtension.class)
class SecretsNeverEchoedTest {

    private static final String ADMIN_PASSWORD = "admin-test-password";
    private static final String USER_PASSWORD = "secret-check-password";

    @Autowired
    MockMvc mvc;
    @Autowired
    AccountService accounts;

    /** Sends the request and checks that no part of the answer holds the secret. */
    private MvcResult refusedWithout(String secret, RequestBuilder request) throws Exception {
        var result = mvc.perform(request).andReturn();
        var response = result.getResponse();
        assertThat(response.getStatus()).as("not a success").isNotIn(201, 204);
        assertThat(response.getContentAsString()).doesNotContain(secret);
        for (String header : response.getHeaderNames()) {
            assertThat(response.getHeaders(header)).as(header).noneMatch(value -> value.contains(secret));
        }
        assertThat(String.valueOf(result.getFlashMap())).doesNotContain(secret);
        return result;
    }

    private long someone(String name) {
        if (!accounts.exists(name)) {
            accounts.create(name, USER_PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
        }
        return accounts.list().stream().filter(a -> a.username().equals(name)).findFirst().orElseThrow().id();
    }

    private static String json(String... fieldsAndValues) {
        var body = new StringBuilder("{");
        for (int i = 0; i < fieldsAndValues.length; i += 2) {
            body.append(i == 0 ? "" : ",").append('"').append(fieldsAndValues[i]).append("\":").append(fieldsAndValues[i + 1]);
        }
        return body.append('}').toString();
    }

    @Test
    void badPasswordsAreNamedButNeverEchoedByAnyRouteNorLogged(CapturedOutput output) throws Exception {
        long target = someone("secret-target");
        someone("secret-self");
        var secrets = new java.util.ArrayList<String>();

        // API: create an account with a password that is too short
        String tooShortCreate = "Xq7shrtA01";
        secrets.add(tooShortCreate);
        var created = refusedWithout(tooShortCreate, post("/api/v1/users").with(httpBasic("admin", ADMIN_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON)
                .content(json("username", "\"secret-new\"", "password", "\"" + tooShortCreate + "\"", "roles", "[\"ENGINEER\"]")));
        assertThat(created.getResponse().getStatus()).isEqualTo(400);
        assertThat(created.getResponse().getContentAsString()).contains("\"field\":\"password\"", "12 to 128");

        // API: a password of the wrong JSON shape
        String wrongShape = "Xq7shrtA02";
        secrets.add(wrongShape);
        refusedWithout(wrongShape, post("/api/v1/users").with(httpBasic("admin", ADMIN_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON)
                .content(json("username", "\"secret-new\"", "password", "[\"" + wrongShape + "\"]", "roles", "[\"ENGINEER\"]")));

        // API: a password that is not even valid JSON (no quotes), which a parser error would quote back
        String unquoted = "Xq7shrtA14";
        secrets.add(unquoted);
        refusedWithout(unquoted, post("/api/v1/users").with(httpBasic("admin", ADMIN_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON)
                .content(json("username", "\"secret-new\"", "password", unquoted, "roles", "[\"ENGINEER\"]")));

        // API: an administrator's reset with a password that is too short
        String tooShortReset = "Xq7shrtA03";
        secrets.add(tooShortReset);
        refusedWithout(tooShortReset, put("/api/v1/users/{id}/password", target).with(httpBasic("admin", ADMIN_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON).content(json("password", "\"" + tooShortReset + "\"")));

        // API: own change with a wrong current password and a new one that is too short, then a wrong current alone
        String wrongCurrent = "Xq7-wrong-current-A04";
        String tooShortNew = "Xq7shrtA05";
        secrets.add(wrongCurrent);
        secrets.add(tooShortNew);
        refusedWithout(tooShortNew, put("/api/v1/account/password").with(httpBasic("secret-self", USER_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON)
                .content(json("currentPassword", "\"" + wrongCurrent + "\"", "newPassword", "\"" + tooShortNew + "\"")));
        var wrong = refusedWithout(wrongCurrent, put("/api/v1/account/password").with(httpBasic("secret-self", USER_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON)
                .content(json("currentPassword", "\"" + wrongCurrent + "\"", "newPassword", "\"long-enough-new-password\"")));
        assertThat(wrong.getResponse().getContentAsString()).contains("\"field\":\"currentPassword\"");

        // pages: create an account, reset a password, change one's own
        String pageCreate = "Xq7shrtA06";
        secrets.add(pageCreate);
        var page = refusedWithout(pageCreate, post("/admin/users").with(user("admin").roles("ADMIN")).with(csrf())
                .param("username", "secret-page").param("password", pageCreate).param("roles", "ENGINEER"));
        assertThat(page.getResponse().getStatus()).as("the form is shown again").isEqualTo(200);

        String pageReset = "Xq7shrtA07";
        secrets.add(pageReset);
        refusedWithout(pageReset, post("/admin/users/{id}/password", target).with(user("admin").roles("ADMIN")).with(csrf())
                .param("password", pageReset));

        String pageCurrent = "Xq7-page-current-A08";
        String pageNew = "Xq7shrtA09";
        String pageConfirm = "Xq7-page-confirm-A10";
        secrets.add(pageCurrent);
        secrets.add(pageNew);
        secrets.add(pageConfirm);
        for (String secret : new String[] {pageCurrent, pageNew, pageConfirm}) {
            refusedWithout(secret, post("/account/password").with(user("secret-self")).with(csrf())
                    .param("currentPassword", pageCurrent).param("newPassword", pageNew).param("confirmPassword", pageConfirm));
        }
        String pageWrongCurrent = "Xq7-page-current-A11";
        secrets.add(pageWrongCurrent);
        refusedWithout(pageWrongCurrent, post("/account/password").with(user("secret-self")).with(csrf())
                .param("currentPassword", pageWrongCurrent).param("newPassword", "long-enough-new-password")
                .param("confirmPassword", "long-enough-new-password"));

        // sign-in: a wrong password by form and by HTTP Basic
        String loginForm = "Xq7-login-form-A12";
        String loginBasic = "Xq7-login-basic-A13";
        secrets.add(loginForm);
        secrets.add(loginBasic);
        refusedWithout(loginForm, formLogin("/login").user("secret-self").password(loginForm));
        refusedWithout(loginBasic, get("/api/v1/lists").with(httpBasic("secret-self", loginBasic)));

        // the bodies were logged at DEBUG, so a secret in a request's text would have shown
        assertThat(output.getAll()).as("the log").contains("to [CreateUserRequest[username=secret-new, password=[hidden]");
        for (String secret : secrets) {
            assertThat(output.getAll()).as("the log").doesNotContain(secret);
        }
    }
}
