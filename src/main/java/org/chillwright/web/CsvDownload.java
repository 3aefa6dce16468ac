package org.chillwright.web;

import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;

/** Sends a CSV as a download. The body is built first, so a failure while building it is still a clean error. */
public final class CsvDownload {

    /** Writes CSV text to {@code out}. */
    @FunctionalInterface
    public interface Body {
        void writeTo(Appendable out) throws IOException;
    }

    private CsvDownload() {
    }

    public static void send(HttpServletResponse response, String fileName, Body body) throws IOException {
        var csv = new StringBuilder();
        body.writeTo(csv);
        response.setContentType("text/csv;charset=UTF-8");
        response.setHeader("Content-Disposition", "attachment; filename=\"" + fileName + "\"");
        response.getWriter().write(csv.toString());
    }
}
