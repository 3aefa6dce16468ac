package org.chillwright.approval;

import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.context.annotation.Primary;
import org.springframework.stereotype.Component;

/**
 * A stand-in catalog of invented modules with fixed ids, for approval tests that need modules in
 * particular states without building catalog entries. Only tests that set
 * {@code chillwright.test.fake-catalog=true} get it; it then takes the place of the real catalog.
 */
@Component
@Primary
@ConditionalOnProperty(name = "chillwright.test.fake-catalog", havingValue = "true")
public class TestModuleDirectory implements ModuleDirectory {

    /** The test property that switches this stand-in on. */
    public static final String ENABLED = "chillwright.test.fake-catalog=true";

    public static final long ACTIVE = 101;
    public static final long OTHER_ACTIVE = 102;
    public static final long OBSOLETE_IN_CATALOG = 104;
    public static final long HOSTILE_PART_NUMBER = 105;
    public static final String HOSTILE = "<script>alert(1)</script>";
    /** Ids from here up to {@link #LAST_GENERATED} are plain active modules, for tests that need many. */
    public static final long FIRST_GENERATED = 200;
    public static final long LAST_GENERATED = 299;

    private static final Map<Long, ModuleSummary> MODULES = new TreeMap<>();

    static {
        add(new ModuleSummary(ACTIVE, "Example Thermal Ltd", "EXT-071-10", "ACTIVE"));
        add(new ModuleSummary(OTHER_ACTIVE, "Example Thermal Ltd", "EXT-127-14", "ACTIVE"));
        add(new ModuleSummary(103, "Sample Peltier Works", "SPW-031-06", "NOT_FOR_NEW_DESIGNS"));
        add(new ModuleSummary(OBSOLETE_IN_CATALOG, "Sample Peltier Works", "SPW-017-03", "OBSOLETE"));
        add(new ModuleSummary(HOSTILE_PART_NUMBER, "Sample Peltier Works", HOSTILE, "ACTIVE"));
        for (long id = FIRST_GENERATED; id <= LAST_GENERATED; id++) {
            add(new ModuleSummary(id, "Example Thermal Ltd", "EXT-GEN-" + id, "ACTIVE"));
        }
    }

    private static void add(ModuleSummary module) {
        MODULES.put(module.id(), module);
    }

    @Override
    public Optional<ModuleSummary> find(long moduleId) {
        return Optional.ofNullable(MODULES.get(moduleId));
    }
}
