package org.chillwright;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.TestPropertySource;

/**
 * Runs a Spring test on the {@code postgres} profile against the test database that .ci/run creates
 * on 127.0.0.1:5432 (override with CHILLWRIGHT_TEST_DB_URL / _USER / _PASSWORD). Tests that start
 * applications themselves pass the same three settings, {@link #URL}, {@link #USER} and {@link #PASSWORD}.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@ActiveProfiles("postgres")
@TestPropertySource(properties = {PostgresDatabase.URL, PostgresDatabase.USER, PostgresDatabase.PASSWORD})
public @interface PostgresDatabase {

    String URL = "spring.datasource.url=${CHILLWRIGHT_TEST_DB_URL:jdbc:postgresql://127.0.0.1:5432/chillwright_test}";
    String USER = "spring.datasource.username=${CHILLWRIGHT_TEST_DB_USER:chillwright_test}";
    String PASSWORD = "spring.datasource.password=${CHILLWRIGHT_TEST_DB_PASSWORD:chillwright_test}";
}
