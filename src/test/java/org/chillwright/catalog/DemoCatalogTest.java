package org.chillwright.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The committed demo catalog is what the generator makes, reads without errors and spans what the issue asks. */
class DemoCatalogTest {

    private static String committed;
    private static List<ModuleSpecLike> modules;

    /** A demo row with its derived values, computed without a database. */
    private record ModuleSpecLike(ModuleDefinition definition, ModuleDerivation derived) {
    }

    @BeforeAll
    static void readCommittedFile() throws IOException {
        committed = Files.readString(DemoCatalogGenerator.OUTPUT, StandardCharsets.UTF_8);
        ModuleCsv.Rows rows = ModuleCsv.read(new StringReader(committed));
        assertThat(rows.errors()).isEmpty();
        modules = rows.rows().stream().map(r -> ModuleText.parse(r.cells(), null))
                .peek(p -> assertThat(p.problems()).isEmpty())
                .map(p -> new ModuleSpecLike(p.definition(), ModuleDerivation.of(p.definition()))).toList();
    }

    @Test
    void committedFileIsWhatTheGeneratorWrites() {
        assertThat(committed).isEqualTo(DemoCatalogGenerator.csv());
    }

    @Test
    void holdsAtLeastFortyModulesFromAtLeastFourSuppliers() {
        assertThat(modules).hasSizeGreaterThanOrEqualTo(40);
        assertThat(modules.stream().map(m -> m.definition().supplier()).collect(Collectors.toSet()))
                .hasSizeGreaterThanOrEqualTo(4);
    }

    @Test
    void ratingsSpanTheAskedRanges() {
        var ratings = modules.stream().map(m -> m.derived().ratings()).toList();
        assertThat(ratings).allSatisfy(r -> {
            assertThat(r.imaxA()).isBetween(1.0, 15.0);
            assertThat(r.vmaxV()).isBetween(2.0, 25.0);
            assertThat(r.dtmaxK()).isBetween(64.0, 74.5);
        });
        assertThat(ratings.stream().mapToDouble(r -> r.imaxA()).min().orElseThrow()).isLessThan(2.5);
        assertThat(ratings.stream().mapToDouble(r -> r.imaxA()).max().orElseThrow()).isGreaterThan(12.0);
        assertThat(ratings.stream().mapToDouble(r -> r.vmaxV()).min().orElseThrow()).isLessThan(4.0);
        assertThat(ratings.stream().mapToDouble(r -> r.vmaxV()).max().orElseThrow()).isGreaterThan(18.0);
        var qmax = modules.stream().mapToDouble(m -> m.derived().ratings().statedQmaxW()
                .orElse(m.derived().ratings().impliedQmaxW())).summaryStatistics();
        assertThat(qmax.getMin()).isBetween(2.0, 8.0);
        assertThat(qmax.getMax()).isBetween(80.0, 120.0);
    }

    @Test
    void statedRatingsAgreeWithinAFewPercentAsRealOnesDo() {
        var ratios = modules.stream().filter(m -> m.definition().ratings() != null)
                .map(m -> m.derived().ratings().consistency().orElseThrow()).toList();
        assertThat(ratios).allSatisfy(r -> assertThat(r).isBetween(0.88, 1.06));
        assertThat(java.util.Collections.max(ratios) - java.util.Collections.min(ratios)).isGreaterThan(0.03);
    }

    @Test
    void purchasingDataVaries() {
        assertThat(modules.stream().map(m -> m.definition().lifecycle()).collect(Collectors.toSet()))
                .contains(Lifecycle.ACTIVE, Lifecycle.NOT_FOR_NEW_DESIGNS, Lifecycle.LAST_TIME_BUY);
        assertThat(modules).allSatisfy(m -> assertThat(m.definition().prices()).hasSizeGreaterThanOrEqualTo(3));
        assertThat(modules.stream().map(m -> m.definition().leadTimeDays()).distinct().count()).isGreaterThan(10);
        assertThat(modules.stream().filter(m -> m.definition().construction() != null)).isNotEmpty();
    }
}
