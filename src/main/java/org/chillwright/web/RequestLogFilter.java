package org.chillwright.web;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * One log line per request in key=value form (method, path, status, duration, user), so an
 * operator can grep and a log shipper can parse it. Static assets are left out to keep it readable.
 * It runs inside each security filter chain, just before the filter that turns refusals into
 * 401/403, so it sees both who the user is and the refusals.
 */
public class RequestLogFilter extends OncePerRequestFilter {

    private static final Logger log = LoggerFactory.getLogger(RequestLogFilter.class);

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        long start = System.nanoTime();
        try {
            chain.doFilter(request, response);
        } finally {
            if (log.isInfoEnabled()) {
                var auth = SecurityContextHolder.getContext().getAuthentication();
                String user = auth == null || auth instanceof AnonymousAuthenticationToken ? "-" : auth.getName();
                log.info("request method={} path={} status={} durationMs={} user={}", request.getMethod(),
                        request.getRequestURI(), response.getStatus(), (System.nanoTime() - start) / 1_000_000, user);
            }
        }
    }

    @Override
    protected boolean shouldNotFilter(HttpServletRequest request) {
        String path = request.getRequestURI();
        return path.startsWith("/css/") || path.startsWith("/js/") || path.startsWith("/webjars/")
                || path.startsWith("/img/") || path.equals("/favicon.ico");
    }
}
