package org.chillwright.account.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.security.Principal;
import org.chillwright.account.TeamSettings;
import org.chillwright.account.TeamSettingsView;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/** {@code /api/v1/settings}: the team's settings; anyone signed in reads them, administrators change them. */
@RestController
@RequestMapping("/api/v1/settings")
@Tag(name = "Team settings", description = "Settings of the whole team, such as four eyes on approvals")
class TeamSettingsApiController {

    private final TeamSettings settings;

    TeamSettingsApiController(TeamSettings settings) {
        this.settings = settings;
    }

    @GetMapping
    @Operation(operationId = "getSettings", summary = "The team's settings")
    TeamSettingsView show() {
        return settings.current();
    }

    /** Changes the settings; the change is recorded in the account audit trail. */
    @PutMapping
    @PreAuthorize("hasRole('ADMIN')")
    @Operation(operationId = "updateSettings",
            summary = "Change the team's settings (administrators); recorded in the account audit trail")
    TeamSettingsView change(@Valid @RequestBody TeamSettingsRequest request, Principal me) {
        return settings.setFourEyesApproval(request.fourEyesApproval(), request.version(), me.getName());
    }
}
