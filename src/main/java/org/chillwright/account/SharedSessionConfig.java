package org.chillwright.account;

import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.context.annotation.Profile;
import org.springframework.session.jdbc.config.annotation.web.http.EnableJdbcHttpSession;
import org.springframework.session.web.http.DefaultCookieSerializer;

/**
 * On the team deployment, page sessions (the sign-in and its CSRF token) live in the database
 * (SPRING_SESSION tables, Flyway V11), so any instance behind the load balancer can serve any
 * request. The embedded default keeps them in the servlet container's memory.
 */
@Configuration(proxyBeanMethods = false)
@Profile("postgres")
@EnableJdbcHttpSession
class SharedSessionConfig {

    /**
     * The {@code SESSION} cookie: HttpOnly, {@code SameSite=Lax} like the embedded default's JSESSIONID
     * ({@code server.servlet.session.cookie.same-site}), and {@code Secure} whenever the request is secure,
     * which includes a request a trusted balancer forwarded from HTTPS ({@code X-Forwarded-Proto}, read by
     * {@code server.forward-headers-strategy=native}).
     */
    @Bean
    DefaultCookieSerializer cookieSerializer() {
        var cookies = new DefaultCookieSerializer();
        cookies.setCookieName("SESSION");
        cookies.setUseHttpOnlyCookie(true);
        cookies.setSameSite("Lax");
        // useSecureCookie left unset: Secure exactly when request.isSecure()
        return cookies;
    }
}
