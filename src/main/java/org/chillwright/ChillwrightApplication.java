package org.chillwright;

import java.time.Clock;
import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;
import org.springframework.context.annotation.Bean;

/** Chooses thermoelectric coolers for a cooling case and keeps a team's approved part lists. */
@SpringBootApplication
public class ChillwrightApplication {

    public static void main(String[] args) {
        SpringApplication.run(ChillwrightApplication.class, args);
    }

    /** One clock for every "created at" and audit time, so tests can fix it. */
    @Bean
    Clock clock() {
        return Clock.systemUTC();
    }
}
