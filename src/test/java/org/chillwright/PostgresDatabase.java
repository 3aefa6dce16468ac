package org.chillwright;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.ContextConfiguration;

/**
 * Runs a Spring test on the {@code postgres} profile against a real PostgreSQL server: a database of its
 * own on the embedded server, or the server named by CHILLWRIGHT_TEST_DB_URL ({@link PostgresTestServer}).
 * The same Flyway migrations run as in a team deployment. Tests that start applications themselves ask
 * {@link PostgresTestServer#newDatabase()} for the settings.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@ActiveProfiles("postgres")
@ContextConfiguration(initializers = PostgresTestServer.Initializer.class)
public @interface PostgresDatabase {
}
