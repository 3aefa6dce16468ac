package org.chillwright.catalog;

import java.util.Optional;
import org.chillwright.approval.ModuleDirectory;
import org.chillwright.approval.ModuleSummary;
import org.springframework.stereotype.Component;

/** The catalog as approved part lists see it: a module's identity and lifecycle, archived ones too. */
@Component
class CatalogModuleDirectory implements ModuleDirectory {

    private final CatalogService catalog;

    CatalogModuleDirectory(CatalogService catalog) {
        this.catalog = catalog;
    }

    @Override
    public Optional<ModuleSummary> find(long moduleId) {
        return catalog.find(moduleId)
                .map(m -> new ModuleSummary(m.id(), m.supplier(), m.partNumber(), m.lifecycle().name()));
    }
}
