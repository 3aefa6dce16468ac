package org.chillwright.web;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.info.Info;
import io.swagger.v3.oas.models.info.License;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/**
 * The OpenAPI document's own description: what the API is, its units, and the cautions a script's author
 * must see before acting on a result, for cooling and for harvesting alike.
 */
@Configuration
class ApiDocsConfig {

    static final String DESCRIPTION = """
            Thermoelectric modules as coolers and as generators: module parameters, operating points, catalog \
            rankings, cascades, cool-down, dew and frost point, approved part lists. JSON in SI units with \
            temperatures in °C; every field carries its unit in its name. Bad input is a 400 problem body naming \
            each field.

            **Cautions.** Results are engineering estimates from lumped constant-property models: confirm them by \
            test before relying on them, and follow the applicable standards, local codes and licensed practice.

            *Cooling.* Keep every module and driver within its electrical limits (Imax, Vmax, the supply's own \
            ratings). Never power a module without its heat sink: if a fan or pump fails the hot side overheats \
            within seconds and can pass the solder limit, so fit an over-temperature cut-off that does not depend \
            on the temperature controller. A cold surface below the dew point (the frost point below 0 °C) \
            collects water on electronics and optics: seal, insulate or purge the cold side, or raise the \
            set-point. Arrays above 60 V DC are flagged SHOCK_HAZARD_VOLTAGE: guard live parts against touch.

            *Harvesting.* Heat sources and a generator's hot side can burn on touch and ignite nearby material: \
            guard hot surfaces, keep flammables away, and use leads and insulation rated for the temperature. A hot \
            junction above the module's stated maximum temperature is warned about, not refused; a module that \
            states none is flagged HOT_SIDE_LIMIT_UNCHECKED: ask its supplier. Clamp modules with the force the \
            supplier specifies; open-circuit voltages above 60 V DC are a shock hazard.""";

    @Bean
    OpenAPI chillwrightOpenApi() {
        return new OpenAPI().info(new Info().title("Chillwright API").version("v1").description(DESCRIPTION)
                .license(new License().name("Apache License 2.0")));
    }
}
