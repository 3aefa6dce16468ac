package org.chillwright;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.TestPropertySource;

/**
 * Runs a Spring test on the {@code postgres} profile against the test database that .ci/run creates
 * on 127.0.0.1:5432 (override with CHILLWRIGHT_TEST_DB_URL / _USER / _PASSWORD).
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@ActiveProfiles("postgres")
@TestPropertySource(properties = {
    "spring.datasource.url=${CHILLWRIGHT_TEST_DB_URL:jdbc:postgresql://127.0.0.1:5432/chillwright_test}",
    "spring.datasource.username=${CHILLWRIGHT_TEST_DB_USER:chillwright_test}",
    "spring.datasource.password=${CHILLWRIGHT_TEST_DB_PASSWORD:chillwright_test}"
})
public @interface PostgresDatabase {
}
