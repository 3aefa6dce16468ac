package org.chillwright.approval;

import java.util.List;
import java.util.Optional;
import org.springframework.data.jpa.repository.JpaRepository;

interface ListEntryRepository extends JpaRepository<ListEntry, Long> {

    List<ListEntry> findByListIdOrderByIdAsc(long listId);

    List<ListEntry> findByListIdAndStateOrderByModuleIdAsc(long listId, EntryState state);

    List<ListEntry> findByModuleIdOrderByListIdAsc(long moduleId);

    Optional<ListEntry> findByIdAndListId(long id, long listId);

    boolean existsByListIdAndModuleId(long listId, long moduleId);
}
