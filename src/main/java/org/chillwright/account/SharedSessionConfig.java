package org.chillwright.account;

import org.springframework.context.annotation.Configuration;
import org.springframework.context.annotation.Profile;
import org.springframework.session.jdbc.config.annotation.web.http.EnableJdbcHttpSession;

/**
 * On the team deployment, page sessions (the sign-in and its CSRF token) live in the database
 * (SPRING_SESSION tables, Flyway V11), so any instance behind the load balancer can serve any
 * request. The embedded default keeps them in the servlet container's memory.
 */
@Configuration(proxyBeanMethods = false)
@Profile("postgres")
@EnableJdbcHttpSession
class SharedSessionConfig {
}
