package org.chillwright.catalog;

import java.util.Collection;
import java.util.List;
import java.util.Optional;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.JpaSpecificationExecutor;
import org.springframework.data.jpa.repository.Query;

interface ModuleEntryRepository extends JpaRepository<ModuleEntry, Long>, JpaSpecificationExecutor<ModuleEntry> {

    Optional<ModuleEntry> findBySupplierAndPartNumber(String supplier, String partNumber);

    List<ModuleEntry> findBySupplierIn(Collection<String> suppliers);

    List<ModuleEntry> findByArchivedFalseOrderBySupplierAscPartNumberAsc();

    List<ModuleEntry> findAllByOrderBySupplierAscPartNumberAsc();

    @Query("select distinct m.supplier from ModuleEntry m where m.archived = false order by m.supplier")
    List<String> activeSuppliers();
}
