package org.chillwright.account;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.PathItem;
import io.swagger.v3.oas.models.security.SecurityRequirement;
import io.swagger.v3.oas.models.security.SecurityScheme;
import java.util.Arrays;
import java.util.List;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.http.server.PathContainer;
import org.springframework.web.util.pattern.PathPattern;
import org.springframework.web.util.pattern.PathPatternParser;

/**
 * The document's account of sign-in, from the same route lists {@link SecurityConfig} enforces: HTTP Basic or a
 * personal token on every operation, and, where this server opens computations and catalog reads
 * ({@code chillwright.access.open-reads}), an empty requirement on those operations, since they then need none.
 */
final class ApiSecurityDocs implements OpenApiCustomizer {

    static final String BASIC = "basicAuth";
    static final String BEARER = "bearerAuth";

    private final boolean openReads;
    private final List<PathPattern> openComputations;
    private final List<PathPattern> openReadRoutes;

    ApiSecurityDocs(boolean openReads) {
        this.openReads = openReads;
        this.openComputations = patterns(SecurityConfig.API_COMPUTATIONS);
        this.openReadRoutes = patterns(SecurityConfig.API_OPEN_READS);
    }

    @Override
    public void customise(OpenAPI document) {
        document.getComponents()
                .addSecuritySchemes(BASIC, new SecurityScheme().type(SecurityScheme.Type.HTTP).scheme("basic")
                        .description("An account's user name and password"))
                .addSecuritySchemes(BEARER, new SecurityScheme().type(SecurityScheme.Type.HTTP).scheme("bearer")
                        .description("A personal API token, created with POST /api/v1/tokens and shown once"));
        document.setSecurity(List.of(new SecurityRequirement().addList(BASIC), new SecurityRequirement().addList(BEARER)));
        if (!openReads || document.getPaths() == null) {
            return;
        }
        document.getPaths().forEach((path, item) -> item.readOperationsMap().forEach((method, operation) -> {
            if (open(method, path)) {
                operation.setSecurity(List.of(new SecurityRequirement(), new SecurityRequirement().addList(BASIC),
                        new SecurityRequirement().addList(BEARER)));
            }
        }));
    }

    private boolean open(PathItem.HttpMethod method, String path) {
        var container = PathContainer.parsePath(path);
        var routes = method == PathItem.HttpMethod.POST ? openComputations
                : method == PathItem.HttpMethod.GET ? openReadRoutes : List.<PathPattern>of();
        return routes.stream().anyMatch(pattern -> pattern.matches(container));
    }

    private static List<PathPattern> patterns(String[] routes) {
        return Arrays.stream(routes).map(PathPatternParser.defaultInstance::parse).toList();
    }
}
