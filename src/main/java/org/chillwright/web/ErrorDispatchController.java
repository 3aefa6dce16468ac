package org.chillwright.web;

import jakarta.servlet.RequestDispatcher;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.springframework.boot.webmvc.error.ErrorController;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.servlet.ModelAndView;

/**
 * Where the servlet container sends every error that no controller answered: unknown routes, wrong
 * methods and media types found before a controller was chosen, refusals sent by filters, and uncaught
 * exceptions. Under {@code /api/} the answer is an RFC 9457 problem body, like every other API error;
 * anywhere else it is the friendly error page. Neither ever carries an exception's message or a trace.
 * It takes the place of Spring Boot's own error controller, which answered the API with its own JSON.
 */
@Controller
@RequestMapping("${server.error.path:${error.path:/error}}")
class ErrorDispatchController implements ErrorController {

    private final ProblemWriter problems;

    ErrorDispatchController(ProblemWriter problems) {
        this.problems = problems;
    }

    @RequestMapping
    ModelAndView error(HttpServletRequest request, HttpServletResponse response) throws IOException {
        HttpStatus status = status(request);
        String path = (String) request.getAttribute(RequestDispatcher.ERROR_REQUEST_URI);
        if (ApiPaths.isApi(path)) {
            problems.write(response, status, status.getReasonPhrase(), detail(status, request, response));
            return null;
        }
        var page = new ModelAndView("error", status);
        page.addObject("status", status.value());
        page.addObject("path", path);
        return page;
    }

    /** The status the error was sent with; a visit to the error address itself is treated as not found. */
    private static HttpStatus status(HttpServletRequest request) {
        Object code = request.getAttribute(RequestDispatcher.ERROR_STATUS_CODE);
        HttpStatus status = code instanceof Integer value ? HttpStatus.resolve(value) : null;
        return status == null || !status.isError() ? HttpStatus.NOT_FOUND : status;
    }

    /** What went wrong in words for an API client; never the exception's own message. */
    private static String detail(HttpStatus status, HttpServletRequest request, HttpServletResponse response) {
        return switch (status) {
            case NOT_FOUND -> "There is no API route at this address; /api-docs lists them.";
            case METHOD_NOT_ALLOWED -> {
                // the error dispatch may not keep the original method, so name the allowed ones only
                String allowed = response.getHeader(HttpHeaders.ALLOW);
                yield "This route does not take this HTTP method"
                        + (allowed == null || allowed.isBlank() ? "." : "; it takes " + allowed + ".");
            }
            case UNSUPPORTED_MEDIA_TYPE -> "This route does not read "
                    + (request.getContentType() == null ? "a body without a Content-Type"
                            : "the content type " + request.getContentType()) + ".";
            case NOT_ACCEPTABLE -> "This route cannot answer in any media type the Accept header allows.";
            case BAD_REQUEST -> "The request could not be read.";
            case UNAUTHORIZED -> "This request needs an account: send HTTP Basic credentials.";
            case FORBIDDEN -> "Your account's roles do not allow this request.";
            default -> status.is5xxServerError()
                    ? "Something went wrong on our side. It was logged; if it persists, tell your administrator the time."
                    : status.getReasonPhrase() + ".";
        };
    }
}
