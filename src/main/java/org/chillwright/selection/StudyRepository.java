package org.chillwright.selection;

import java.util.List;
import org.springframework.data.jpa.repository.JpaRepository;

interface StudyRepository extends JpaRepository<Study, Long> {

    List<Study> findAllByOrderByCreatedAtDesc();
}
