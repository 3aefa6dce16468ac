package org.chillwright.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.data.jpa.test.autoconfigure.DataJpaTest;
import org.springframework.boot.jpa.test.autoconfigure.TestEntityManager;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.data.domain.PageRequest;
import org.springframework.orm.ObjectOptimisticLockingFailureException;

/** The entity against the real Flyway schema (ddl-auto=validate would fail on a mismatch). */
@DataJpaTest
class ModuleEntryRepositoryTest {

    private static final Instant NOW = Instant.parse("2026-12-02T10:00:00Z");

    @Autowired
    ModuleEntryRepository modules;
    @Autowired
    TestEntityManager em;

    private ModuleEntry stored(ModuleDefinition definition) {
        var entry = modules.saveAndFlush(new ModuleEntry(definition, NOW, "tester"));
        em.clear();
        return entry;
    }

    @Test
    void roundTripsEveryEnteredValueWithPriceBreaks() {
        var definition = CatalogFixtures.rated("Frostline Components", "FC-127-06");
        long id = stored(definition).getId();

        var loaded = modules.findById(id).orElseThrow();
        assertThat(loaded.toDefinition()).isEqualTo(definition);
        assertThat(loaded.toDefinition().unitPriceAt(150)).contains(new BigDecimal("9.85"));
    }

    @Test
    void roundTripsAConstructedModule() {
        var definition = CatalogFixtures.constructed("Polar Ridge Thermal", "PRT-71-13");
        long id = stored(definition).getId();

        assertThat(modules.findById(id).orElseThrow().toDefinition()).isEqualTo(definition);
    }

    @Test
    void storesTheDerivedParametersForSearchAndSnapshot() {
        long id = stored(CatalogFixtures.rated("Frostline Components", "FC-127-06")).getId();

        var spec = modules.findById(id).orElseThrow().toSpec();
        // S = Vmax/Th (Vmax = S·Th, the ideal rating relations): 15.4 V / 298.15 K
        assertThat(spec.parameters().seebeckVPerK()).isCloseTo(15.4 / 298.15, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(spec.listedQmaxW()).isEqualTo(56.0);
    }

    @Test
    void schemaRefusesASecondEntryWithTheSameSupplierAndPartNumber() {
        stored(CatalogFixtures.rated("Frostline Components", "FC-127-06"));

        assertThatThrownBy(() -> modules.saveAndFlush(new ModuleEntry(
                CatalogFixtures.rated("Frostline Components", "FC-127-06"), NOW, "tester")))
                .isInstanceOf(DataIntegrityViolationException.class);
    }

    @Test
    void staleEditIsRefusedAtFlush() {
        long id = stored(CatalogFixtures.rated("Frostline Components", "FC-127-06")).getId();
        ModuleEntry stale = modules.findById(id).orElseThrow();
        ModuleDefinition staleRead = stale.toDefinition(); // loads the prices before the entry is detached
        em.detach(stale);
        ModuleEntry fresh = modules.findById(id).orElseThrow();
        fresh.apply(CatalogFixtures.withImax(fresh.toDefinition(), 6.2), NOW, "first");
        modules.saveAndFlush(fresh);

        stale.apply(CatalogFixtures.withImax(staleRead, 5.8), NOW, "second");
        assertThatThrownBy(() -> modules.saveAndFlush(stale))
                .isInstanceOf(ObjectOptimisticLockingFailureException.class);
    }

    @Test
    void searchHidesArchivedEntriesAndMatchesTextIgnoringCase() {
        stored(CatalogFixtures.rated("Frostline Components", "FC-127-06"));
        var archived = modules.findById(stored(CatalogFixtures.rated("Frostline Components", "FC-127-08")).getId())
                .orElseThrow();
        archived.archive(NOW, "tester");
        modules.saveAndFlush(archived);
        stored(CatalogFixtures.constructed("Polar Ridge Thermal", "PRT-71-13"));

        var query = ModuleQuery.text("frostline");
        var page = modules.findAll(ModuleSearch.matching(query), PageRequest.of(0, 10, ModuleSearch.sort(query)));

        assertThat(page.getContent()).extracting(ModuleEntry::getPartNumber).containsExactly("FC-127-06");
    }

    @Test
    void searchFiltersByListedRatingsRange() {
        stored(CatalogFixtures.rated("Frostline Components", "FC-127-06"));
        stored(CatalogFixtures.withImax(CatalogFixtures.rated("Frostline Components", "FC-127-12"), 12.0));

        var query = new ModuleQuery(null, null, null, 10.0, 15.0, null, null, null, null, false, ModuleSort.IMAX,
                false, 0, 10);
        var page = modules.findAll(ModuleSearch.matching(query), PageRequest.of(0, 10, ModuleSearch.sort(query)));

        assertThat(page.getContent()).extracting(ModuleEntry::getPartNumber).containsExactly("FC-127-12");
    }
}
