package org.chillwright.web;

import io.swagger.v3.core.converter.ModelConverter;
import io.swagger.v3.oas.models.Components;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.info.Info;
import io.swagger.v3.oas.models.info.License;
import io.swagger.v3.oas.models.media.ArraySchema;
import io.swagger.v3.oas.models.media.IntegerSchema;
import io.swagger.v3.oas.models.media.ObjectSchema;
import io.swagger.v3.oas.models.media.Schema;
import io.swagger.v3.oas.models.media.StringSchema;
import io.swagger.v3.oas.models.servers.Server;
import java.util.List;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springdoc.core.customizers.OperationCustomizer;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/**
 * The OpenAPI document ({@code /v3/api-docs}): its introduction (units, authentication, errors, versioning and
 * the cautions a script's author must see before acting on a result), the problem-body schema, and the
 * customizers that complete what springdoc reads from the controllers ({@link ApiSchemas}, {@link ApiOperations},
 * {@link ApiExamples}). A committed copy, {@code docs/api/openapi.json}, is what the build generates its test
 * client from; {@code OpenApiDocumentTest} fails when the two differ.
 */
@Configuration
class ApiDocsConfig {

    static final String DESCRIPTION = """
            Thermoelectric modules as coolers and as generators: module parameters, operating points, catalog \
            rankings, cascades, cool-down, dew and frost point, the team's catalog and its approved part lists. \
            The same server has pages for people; this API is for scripts. Worked examples in curl and Python: \
            `docs/examples/` in the source.

            **Units.** SI throughout, temperatures in °C and temperature differences in K. Every field carries its \
            unit in its name: `currentA`, `voltageV`, `powerW`, `heatLoadW`, `dtmaxK`, `sinkResistanceKPerW`, \
            `legAreaMm2`, `leadTimeDays`; the cooled part's temperature is `setPointC`. Fractions run from 0 to 1 \
            and say so (`fractionOfImax`, `efficiency`, `cop`); percentages end in `Pct`. A figure that does not \
            exist (a COP with no power drawn, the dew point when no humidity was given, any figure of a design \
            that cannot work) is `null`, and the schemas say which fields can be.

            **Authentication.** HTTP Basic with an account's user name and password (`Authorization: Basic …`), \
            or a personal API token (`Authorization: Bearer …`), which you create with `POST /api/v1/tokens` and \
            which is shown only once. The API keeps no session and needs no CSRF token. On the embedded default, \
            computations and catalog reads are open without an account (those operations list an empty security \
            requirement); a team deployment needs an account for every call. Every change needs an account with \
            the right role: `ADMIN`, `ENGINEER`, `PURCHASING` or `APPROVER`. By default, after 5 failed sign-ins \
            for one user name, or 20 from one address, within 15 minutes, sign-ins are refused for 15 minutes \
            with `429` and `Retry-After`.

            **Errors.** Every error is an RFC 9457 problem body (`application/problem+json` with `type`, \
            `title`, `status` and `detail`). Bad input is `400` with `errors: [{"field", "message"}]` naming \
            each bad field (a CSV import adds `row` and `column`); `401` means no or wrong credentials, `403` \
            that the account's roles do not allow the request, `404` an unknown id, `409` a stale `version` \
            (send back the one you read, reload on 409), a name already taken or a change the approval workflow \
            refuses, `415` a body of a type the route does not read, `429` too many failed sign-ins. Input is \
            never answered with a `500`. Send JSON as `application/json`; a field a request does not know is a \
            `400` naming it, so a misspelt field is never silently ignored.

            **Versioning.** Everything under `/api/v1` changes only by addition: new routes, new optional request \
            fields, new response fields, new values of codes and enumerations (`warnings[].code`, \
            `reason.code`, `lifecycle`). Write clients that ignore response fields and code values they do not \
            know. Within v1 nothing is removed or renamed and no field changes its meaning or unit; such a change \
            comes as a new version (`/api/v2`) beside v1.

            **Cautions.** Results are engineering estimates from lumped constant-property models: confirm them by \
            test before relying on them, and follow the applicable standards, local codes and licensed practice.

            *Cooling.* Keep every module and driver within its electrical limits (Imax, Vmax, the supply's own \
            ratings). Never power a module without its heat sink: if a fan or pump fails the hot side overheats \
            within seconds and can pass the solder limit, so fit an over-temperature cut-off that does not depend \
            on the temperature controller. A cold surface below the dew point (the frost point below 0 °C) \
            collects water on electronics and optics: seal, insulate or purge the cold side, or raise the \
            set-point. Arrays above 60 V DC are flagged SHOCK_HAZARD_VOLTAGE: guard live parts against touch.

            *Harvesting.* Heat sources and a generator's hot side can burn on touch and ignite nearby material: \
            guard hot surfaces, keep flammables away, and use leads and insulation rated for the temperature. A hot \
            junction above the module's stated maximum temperature is warned about, not refused; a module that \
            states none is flagged HOT_SIDE_LIMIT_UNCHECKED: ask its supplier. Clamp modules with the force the \
            supplier specifies; open-circuit voltages above 60 V DC are a shock hazard.""";

    @Bean
    OpenAPI chillwrightOpenApi() {
        // one relative server: the document is the same whichever address the server is reached at
        return new OpenAPI().info(new Info().title("Chillwright API").version("v1").description(DESCRIPTION)
                        .license(new License().name("Apache License 2.0").identifier("Apache-2.0")))
                .servers(List.of(new Server().url("/").description("The server that serves this document")))
                .components(new Components()
                        .addSchemas(ApiOperations.PROBLEM, problemSchema())
                        .addSchemas(FIELD_PROBLEM, fieldProblemSchema()));
    }

    static final String FIELD_PROBLEM = "FieldProblem";

    /** RFC 9457 problem details as every error of the API carries them, with this API's {@code errors}. */
    private static Schema<?> problemSchema() {
        var problem = new ObjectSchema().description("An RFC 9457 problem body: what went wrong, in words; bad input "
                        + "also names each field in errors. Other members may be added (a stale edit adds "
                        + "sentVersion and currentVersion).")
                .addProperty("type", new StringSchema().description("A URI naming the kind of problem; about:blank "
                        + "when the status says it all"))
                .addProperty("title", new StringSchema().description("A short summary of the kind of problem"))
                .addProperty("status", new IntegerSchema().description("The HTTP status code"))
                .addProperty("detail", new StringSchema().description("What went wrong with this request, in words"))
                .addProperty("instance", new StringSchema().description("The request path"))
                .addProperty("errors", new ArraySchema().items(new Schema<>().$ref("#/components/schemas/"
                        + FIELD_PROBLEM)).description("On bad input: each bad field and what is wrong with it"));
        problem.setRequired(List.of("title", "status"));
        problem.setAdditionalProperties(true);
        return problem;
    }

    private static Schema<?> fieldProblemSchema() {
        var field = new ObjectSchema().description("One bad field; a CSV import adds the row and the column")
                .addProperty("field", new StringSchema().description("The field's path in the request, such as "
                        + "module.imaxA, or the query parameter's name"))
                .addProperty("message", new StringSchema().description("What was expected and what came in (never "
                        + "the value of a secret)"))
                .addProperty("row", new IntegerSchema().description("CSV import: the line as a spreadsheet "
                        + "numbers it (the header is row 1)"))
                .addProperty("column", new StringSchema().description("CSV import: the column's name, empty when "
                        + "the problem is the whole row"));
        field.setRequired(List.of("field", "message"));
        return field;
    }

    @Bean
    ModelConverter apiSchemas() {
        return new ApiSchemas();
    }

    @Bean
    OperationCustomizer apiOperations() {
        return new ApiOperations();
    }

    @Bean
    OpenApiCustomizer apiNullsAndExamples() {
        var examples = ApiExamples.load();
        return document -> {
            ApiSchemas.complete(document);
            examples.applyTo(document);
        };
    }
}
