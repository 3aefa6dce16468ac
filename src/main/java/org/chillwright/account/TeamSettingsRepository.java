package org.chillwright.account;

import org.springframework.data.jpa.repository.JpaRepository;

interface TeamSettingsRepository extends JpaRepository<TeamSettingsRow, Integer> {
}
