package org.chillwright.account.web;

import java.security.Principal;
import org.chillwright.account.TeamSettings;
import org.chillwright.web.StaleEditException;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/** {@code /admin/settings}: the team's settings, such as the four-eyes rule for approvals. */
@Controller
@RequestMapping("/admin/settings")
@PreAuthorize("hasRole('ADMIN')")
class TeamSettingsController {

    private final TeamSettings settings;

    TeamSettingsController(TeamSettings settings) {
        this.settings = settings;
    }

    @GetMapping
    String show(Model model) {
        model.addAttribute("settings", settings.current());
        return "account/settings";
    }

    /** An unticked checkbox sends nothing, hence the default. */
    @PostMapping
    String change(@RequestParam(defaultValue = "false") boolean fourEyesApproval, @RequestParam long version,
            Principal me, RedirectAttributes redirect) {
        try {
            var saved = settings.setFourEyesApproval(fourEyesApproval, version, me.getName());
            redirect.addFlashAttribute("done", saved.fourEyesApproval()
                    ? "Saved: approvals need a second person."
                    : "Saved: one person may now propose, qualify and approve the same entry.");
        } catch (StaleEditException stale) {
            redirect.addFlashAttribute("problem", "Someone else changed the settings meanwhile; the page now shows "
                    + "their change. Apply yours again if it still makes sense.");
        }
        return "redirect:/admin/settings";
    }
}
