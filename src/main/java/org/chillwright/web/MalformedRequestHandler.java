package org.chillwright.web;

import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.http.HttpStatus;
import org.springframework.security.web.firewall.RequestRejectedException;
import org.springframework.security.web.firewall.RequestRejectedHandler;
import org.springframework.stereotype.Component;

/**
 * Answers a request that Spring Security's firewall refused (a ';', an encoded '%' or '/', '..' and the
 * like in the address, or a forbidden character in a header): 400 with a problem body under {@code /api/},
 * the friendly error page elsewhere. Spring Security picks this bean up for its filter chain. The refused
 * address is not repeated, in the answer or the log.
 */
@Component
class MalformedRequestHandler implements RequestRejectedHandler {

    private static final Logger log = LoggerFactory.getLogger(MalformedRequestHandler.class);

    private final ProblemWriter problems;

    MalformedRequestHandler(ProblemWriter problems) {
        this.problems = problems;
    }

    @Override
    public void handle(HttpServletRequest request, HttpServletResponse response, RequestRejectedException rejected)
            throws IOException, ServletException {
        log.debug("Refused a malformed {} request", request.getMethod());
        if (ApiPaths.isApi(request.getRequestURI())) {
            problems.write(response, HttpStatus.BAD_REQUEST, "Malformed request",
                    "The request address or a header holds characters this service does not accept "
                            + "(such as ';', an encoded '%' or '/', or '..'). Send a plain address.");
        } else {
            response.sendError(HttpStatus.BAD_REQUEST.value());
        }
    }
}
