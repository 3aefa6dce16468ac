package org.chillwright.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/** The solver snapshot follows every committed change and leaves archived modules out. */
@SpringBootTest
class CatalogSnapshotTest {

    @Autowired
    CatalogService catalog;

    @Test
    void newModuleAppearsWithItsDerivedParametersAndANewRevision() {
        long before = catalog.snapshot().revision();
        var module = catalog.create(CatalogFixtures.rated("Snapshot Co " + UUID.randomUUID(), "S-1"), "tester");

        var snapshot = catalog.snapshot();
        int i = snapshot.indexOf(module.id());
        assertThat(snapshot.revision()).isGreaterThan(before);
        assertThat(i).isNotNegative();
        assertThat(snapshot.parameters(i)).isEqualTo(module.parameters());
        assertThat(snapshot.imaxA(i)).isEqualTo(6.0);
        assertThat(snapshot.unitPriceAt(i, 100)).isEqualTo(9.85);
        assertThat(snapshot.unitPriceAt(i, 99)).isEqualTo(12.4);
    }

    @Test
    void effectivePriceRoundsUpToALargerBreakWhenThatIsCheaper() {
        // breaks 1:12.40 and 100:9.85 (CatalogFixtures): 90 pieces cost 1116.00 bought exactly, but 100 pieces
        // cost 985.00, so one needed piece really costs 985.00 / 90 (hand arithmetic)
        var module = catalog.create(CatalogFixtures.rated("Snapshot Co " + UUID.randomUUID(), "S-3"), "tester");
        var snapshot = catalog.snapshot();
        int i = snapshot.indexOf(module.id());
        assertThat(snapshot.effectiveUnitPriceAt(i, 90)).isCloseTo(985.0 / 90, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(snapshot.effectiveUnitPriceAt(i, 50)).isEqualTo(12.4);
        assertThat(snapshot.effectiveUnitPriceAt(i, 200)).isEqualTo(9.85);
        assertThat(module.definition().effectiveUnitPriceAt(90))
                .hasValueSatisfying(p -> assertThat(p.doubleValue()).isCloseTo(985.0 / 90,
                        org.assertj.core.api.Assertions.within(1e-4)));
    }

    @Test
    void effectivePriceBuysAtLeastTheMinimumOrder() {
        // minimum order 25 with breaks 1:12.40 and 100:9.85: 3 needed pieces mean buying 25 at 12.40 = 310.00,
        // cheaper than 100 at 9.85 = 985.00, so one needed piece costs 310.00 / 3 (hand arithmetic)
        var fixture = CatalogFixtures.rated("Snapshot Co " + UUID.randomUUID(), "S-4");
        var definition = new ModuleDefinition(fixture.supplier(), fixture.partNumber(), fixture.description(),
                fixture.ratings(), null, fixture.widthMm(), fixture.lengthMm(), fixture.heightMm(),
                fixture.maxOperatingC(), fixture.currency(), fixture.prices(), fixture.leadTimeDays(), 25,
                fixture.lifecycle(), fixture.rohs(), fixture.reach(), fixture.datasheetRef(), fixture.notes());
        var module = catalog.create(definition, "tester");
        var snapshot = catalog.snapshot();
        assertThat(snapshot.effectiveUnitPriceAt(snapshot.indexOf(module.id()), 3))
                .isCloseTo(310.0 / 3, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(module.definition().effectiveUnitPriceAt(3))
                .hasValueSatisfying(p -> assertThat(p.doubleValue()).isCloseTo(310.0 / 3,
                        org.assertj.core.api.Assertions.within(1e-4)));
    }

    @Test
    void archivedModuleLeavesTheSnapshot() {
        var module = catalog.create(CatalogFixtures.rated("Snapshot Co " + UUID.randomUUID(), "S-2"), "tester");
        catalog.archive(module.id(), "tester");

        assertThat(catalog.snapshot().indexOf(module.id())).isEqualTo(-1);
        assertThat(catalog.find(module.id())).hasValueSatisfying(m -> assertThat(m.archived()).isTrue());
    }

    @Test
    void unchangedSnapshotIsReusedNotRebuilt() {
        catalog.create(CatalogFixtures.rated("Snapshot Co " + UUID.randomUUID(), "S-3"), "tester");

        assertThat(catalog.snapshot()).isSameAs(catalog.snapshot());
    }
}
