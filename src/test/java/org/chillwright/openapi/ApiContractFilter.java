package org.chillwright.openapi;

import jakarta.servlet.DispatcherType;
import jakarta.servlet.FilterChain;
import jakarta.servlet.RequestDispatcher;
import jakarta.servlet.ServletException;
import jakarta.servlet.ServletRequest;
import jakarta.servlet.ServletResponse;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.chillwright.web.ApiPaths;
import org.springframework.web.filter.GenericFilterBean;
import org.springframework.web.util.ContentCachingResponseWrapper;

/**
 * Holds every answer under {@code /api/} to the committed OpenAPI document ({@link ApiContract}) and records what
 * does not fit in {@link ApiContractCheck}. It sits before the security filters, so refusals by them are checked
 * too, and also runs on the servlet container's error dispatch, where the body of an error sent with
 * {@code sendError} is written (MockMvc has no such dispatch, so there only the status of such an error is checked).
 */
class ApiContractFilter extends GenericFilterBean {

    /** The request's method, kept for the error dispatch, which may not carry it. */
    private static final String METHOD = ApiContractFilter.class.getName() + ".method";

    @Override
    public void doFilter(ServletRequest servletRequest, ServletResponse servletResponse, FilterChain chain)
            throws IOException, ServletException {
        var request = (HttpServletRequest) servletRequest;
        boolean errorDispatch = request.getDispatcherType() == DispatcherType.ERROR;
        String path = errorDispatch ? (String) request.getAttribute(RequestDispatcher.ERROR_REQUEST_URI)
                : request.getRequestURI().substring(request.getContextPath().length());
        if (!ApiPaths.isApi(path) || path.startsWith("/api-docs")) {
            chain.doFilter(servletRequest, servletResponse);
            return;
        }
        if (!errorDispatch) {
            request.setAttribute(METHOD, request.getMethod());
        }
        String method = errorDispatch && request.getAttribute(METHOD) != null ? (String) request.getAttribute(METHOD)
                : request.getMethod();
        var response = new Recording((HttpServletResponse) servletResponse);
        try {
            chain.doFilter(request, response);
        } finally {
            ApiContractCheck.record(ApiContract.committed().violations(method, path, response.getStatus(),
                    response.getContentType(), response.getContentAsByteArray(), response.errorSent));
            response.copyBodyToResponse();
        }
    }

    /** Keeps the body, and whether the answer was left to the container's error dispatch. */
    private static final class Recording extends ContentCachingResponseWrapper {

        boolean errorSent;

        Recording(HttpServletResponse response) {
            super(response);
        }

        @Override
        public void sendError(int status) throws IOException {
            errorSent = true;
            super.sendError(status);
        }

        @Override
        public void sendError(int status, String message) throws IOException {
            errorSent = true;
            super.sendError(status, message);
        }
    }
}
