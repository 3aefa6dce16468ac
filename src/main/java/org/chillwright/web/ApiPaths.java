package org.chillwright.web;

/** Which request paths belong to the JSON API, whose errors are problem bodies rather than pages. */
public final class ApiPaths {

    private ApiPaths() {
    }

    /** Whether a request URI (as sent, without the query) is under {@code /api/}. */
    public static boolean isApi(String requestUri) {
        return requestUri != null && (requestUri.equals("/api") || requestUri.startsWith("/api/"));
    }
}
