package org.chillwright.approval;

import org.springframework.data.jpa.repository.JpaRepository;

interface ApprovedListRepository extends JpaRepository<ApprovedList, Long> {

    boolean existsByName(String name);

    boolean existsByNameAndIdNot(String name, long id);
}
