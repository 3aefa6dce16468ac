package org.chillwright.web;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/** Bad input on the API is a 400 problem body naming the field, never a 500. */
@SpringBootTest
@AutoConfigureMockMvc
class ApiErrorAdviceTest {

    private static final String ADMIN_PASSWORD = "admin-test-password";

    @Autowired
    MockMvc mvc;

    private org.springframework.test.web.servlet.ResultActions postUser(String body) throws Exception {
        return mvc.perform(post("/api/v1/users").with(httpBasic("admin", ADMIN_PASSWORD))
                .contentType(MediaType.APPLICATION_JSON).content(body));
    }

    @Test
    void malformedJsonIsAProblemNamingTheBody() throws Exception {
        postUser("{\"username\": \"ana\", broken")
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.status").value(400))
                .andExpect(jsonPath("$.errors[0].field").value("body"))
                .andExpect(jsonPath("$.errors[0].message").value(org.hamcrest.Matchers.containsString("not valid JSON")));
    }

    @Test
    void emptyBodyIsAProblem() throws Exception {
        postUser("").andExpect(status().isBadRequest()).andExpect(jsonPath("$.errors[0].field").value("body"));
    }

    @Test
    void unknownFieldIsNamed() throws Exception {
        postUser("{\"username\":\"ana\",\"password\":\"long-enough-secret\",\"roles\":[\"ENGINEER\"],\"rolez\":1}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("rolez"))
                .andExpect(jsonPath("$.errors[0].message").value(org.hamcrest.Matchers.containsString("roles")));
    }

    @Test
    void wrongEnumValueNamesTheFieldAndTheChoices() throws Exception {
        postUser("{\"username\":\"ana\",\"password\":\"long-enough-secret\",\"roles\":[\"WIZARD\"]}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("roles[0]"))
                .andExpect(jsonPath("$.errors[0].message").value(org.hamcrest.Matchers.allOf(
                        org.hamcrest.Matchers.containsString("ENGINEER"), org.hamcrest.Matchers.containsString("WIZARD"))));
    }

    @Test
    void wrongJsonTypeNamesTheField() throws Exception {
        postUser("{\"username\":\"ana\",\"password\":\"long-enough-secret\",\"roles\":{\"a\":1}}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("roles"));
    }

    @Test
    void everyInvalidFieldIsListed() throws Exception {
        postUser("{\"username\":\"\",\"password\":\"short\",\"roles\":[]}")
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.title").value("Invalid request"))
                .andExpect(jsonPath("$.errors[?(@.field=='username')]").exists())
                .andExpect(jsonPath("$.errors[?(@.field=='password')]").exists())
                .andExpect(jsonPath("$.errors[?(@.field=='roles')]").exists());
    }

    @Test
    void takenNameIsAConflict() throws Exception {
        String body = "{\"username\":\"dup-user\",\"password\":\"long-enough-secret\",\"roles\":[\"ENGINEER\"]}";
        postUser(body).andExpect(status().isCreated()).andExpect(jsonPath("$.username").value("dup-user"))
                .andExpect(jsonPath("$.password").doesNotExist());
        postUser(body).andExpect(status().isConflict())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.errors[0].field").value("username"));
    }
}
