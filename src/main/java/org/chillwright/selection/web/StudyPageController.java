package org.chillwright.selection.web;

import jakarta.validation.Valid;
import java.security.Principal;
import org.chillwright.selection.StudyService;
import org.chillwright.web.InvalidRequestException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/** Saved studies: list, one study with its stable link, a re-run against today's catalog, a refresh. */
@Controller
@RequestMapping("/studies")
class StudyPageController {

    static final int MAX_NAME = 120;

    private final StudyService studies;

    StudyPageController(StudyService studies) {
        this.studies = studies;
    }

    @GetMapping
    String list(Model model) {
        model.addAttribute("studies", studies.all());
        return "studies/list";
    }

    @GetMapping("/{id}")
    String show(@PathVariable long id, Model model) {
        model.addAttribute("study", studies.get(id));
        return "studies/show";
    }

    /** Saves the case it is posted with (the ranking page's hidden fields) and its ranking now. */
    @PostMapping
    String save(@Valid @ModelAttribute("caseForm") CaseForm form, BindingResult errors,
                @RequestParam String name, @RequestParam(required = false) String description,
                Principal principal, RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            throw new InvalidRequestException("case", "the case to save is not valid; rank it again first");
        }
        if (name.isBlank() || name.length() > MAX_NAME) {
            throw new InvalidRequestException("name", "give the study a name of 1 to " + MAX_NAME + " characters");
        }
        var study = studies.save(name, description, form.toQuery(), form.toSpec(), principal.getName());
        redirect.addFlashAttribute("saved", true);
        return "redirect:/studies/" + study.id();
    }

    /** The saved case ranked against today's catalog, and what changed. Computes, stores nothing. */
    @GetMapping("/{id}/rerun")
    String rerun(@PathVariable long id, Model model) {
        var study = studies.get(id);
        var form = CaseForms.parse(study.caseQuery());
        model.addAttribute("study", study);
        model.addAttribute("changes", studies.rerun(id, form.toSpec()));
        return "studies/rerun";
    }

    @PostMapping("/{id}/refresh")
    String refresh(@PathVariable long id, @RequestParam long version, RedirectAttributes redirect) {
        var study = studies.get(id);
        studies.refresh(id, version, CaseForms.parse(study.caseQuery()).toSpec());
        redirect.addFlashAttribute("refreshed", true);
        return "redirect:/studies/" + id;
    }
}
