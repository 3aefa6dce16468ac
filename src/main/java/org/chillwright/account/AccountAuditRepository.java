package org.chillwright.account;

import java.util.List;
import org.springframework.data.repository.Repository;

/** Insert and read only: the account audit trail has no update or delete. */
interface AccountAuditRepository extends Repository<AccountAuditRecord, Long> {

    AccountAuditRecord save(AccountAuditRecord record);

    List<AccountAuditRecord> findAllByOrderByOccurredAtAscIdAsc();

    List<AccountAuditRecord> findTop200ByOrderByOccurredAtDescIdDesc();
}
