package org.chillwright.approval;

import java.util.Optional;
import org.springframework.context.annotation.Fallback;
import org.springframework.stereotype.Component;

/**
 * Stands in until the catalog provides its own {@link ModuleDirectory}: it knows no module, so
 * nothing can be proposed yet, but lists, pages and audit work. Any real directory bean wins over it.
 */
@Component
@Fallback
class CatalogNotConnectedModuleDirectory implements ModuleDirectory {

    @Override
    public Optional<ModuleSummary> find(long moduleId) {
        return Optional.empty();
    }
}
