package org.chillwright.approval;

import java.util.Optional;

/**
 * What approval needs to know about catalog modules, and nothing more. The catalog implements it;
 * approval itself never reads catalog tables, so the dependency points from the catalog to here.
 */
public interface ModuleDirectory {

    /** The module with this id, or empty when the catalog has none. */
    Optional<ModuleSummary> find(long moduleId);
}
