package org.chillwright.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/** The demo catalog loads from the packaged CSV once per database, never twice. */
@SpringBootTest(properties = "spring.datasource.url=jdbc:h2:mem:demo-${random.uuid};DB_CLOSE_DELAY=-1")
class DemoCatalogLoaderTest {

    @Autowired
    DemoCatalogLoader loader;
    @Autowired
    CatalogService catalog;

    @Test
    void loadsOnceAndASecondStartAddsNothing() {
        assertThat(loader.loadOnce()).isEqualTo(48);
        long revision = catalog.snapshot().revision();

        assertThat(loader.loadOnce()).isZero();
        assertThat(catalog.snapshot().revision()).isEqualTo(revision);
        assertThat(catalog.snapshot().size()).isEqualTo(48);
    }
}
