package org.chillwright.approval;

import java.util.List;
import org.springframework.data.repository.Repository;

/** Insert and read only: the audit trail has no update or delete. */
interface AuditRecordRepository extends Repository<AuditRecord, Long> {

    AuditRecord save(AuditRecord record);

    List<AuditRecord> findByListIdOrderByOccurredAtAscIdAsc(long listId);
}
