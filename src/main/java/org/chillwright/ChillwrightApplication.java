package org.chillwright;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

/** Chooses thermoelectric coolers for a cooling case and keeps a team's approved part lists. */
@SpringBootApplication
public class ChillwrightApplication {

    public static void main(String[] args) {
        SpringApplication.run(ChillwrightApplication.class, args);
    }
}
