package org.chillwright.approval;

import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.springframework.stereotype.Component;

/**
 * The catalog as approval tests see it until the real catalog is wired in: invented modules only.
 * Being a plain component it is found by every Spring test and wins over the production fallback.
 */
@Component
public class TestModuleDirectory implements ModuleDirectory {

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
