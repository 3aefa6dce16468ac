package org.chillwright;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.junit.jupiter.api.Test;

/** Which PostgreSQL server the @PostgresDatabase tests use, decided from the environment. */
class PostgresTestServerTest {

    @Test
    void withoutANamedServerTheEmbeddedOneIsUsed() {
        assertThat(PostgresTestServer.named(Map.of())).isEmpty();
        assertThat(PostgresTestServer.named(Map.of("CHILLWRIGHT_TEST_DB_URL", " "))).isEmpty();
    }

    @Test
    void aNamedServerIsUsedWithItsUserAndPassword() {
        var database = PostgresTestServer.named(Map.of("CHILLWRIGHT_TEST_DB_URL", "jdbc:postgresql://db.test:5433/mine",
                "CHILLWRIGHT_TEST_DB_USER", "me", "CHILLWRIGHT_TEST_DB_PASSWORD", "secret"));

        assertThat(database).contains(new PostgresTestServer.Database("jdbc:postgresql://db.test:5433/mine", "me", "secret"));
    }

    @Test
    void aNamedServerWithoutUserOrPasswordIsReachedAsChillwrightTest() {
        var database = PostgresTestServer.named(Map.of("CHILLWRIGHT_TEST_DB_URL", "jdbc:postgresql://127.0.0.1:5432/x"));

        assertThat(database).hasValueSatisfying(d -> {
            assertThat(d.user()).isEqualTo("chillwright_test");
            assertThat(d.password()).isEqualTo("chillwright_test");
        });
    }

    @Test
    void settingsBecomeSpringPropertiesAndCommandLineArguments() {
        var database = new PostgresTestServer.Database("jdbc:postgresql://localhost:1/d", "u", "p");

        assertThat(database.asArguments()).containsExactly("--spring.datasource.url=jdbc:postgresql://localhost:1/d",
                "--spring.datasource.username=u", "--spring.datasource.password=p");
    }
}
