package org.chillwright.approval.web;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;
import org.chillwright.approval.Actor;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.approval.EntryState;
import org.chillwright.approval.EntryView;
import org.chillwright.approval.api.AuditCsvResponse;
import org.chillwright.approval.api.CommercialNoteRequest;
import org.chillwright.approval.api.CreateListRequest;
import org.chillwright.approval.api.EditListRequest;
import org.chillwright.approval.api.ProposeEntryRequest;
import org.chillwright.approval.api.TransitionRequest;
import org.chillwright.web.ConflictException;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.StaleEditException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.Authentication;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.validation.FieldError;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * {@code /lists} and {@code /lists/{id}}: the lists, one list's entries with the moves the signed-in
 * person may make, and its audit trail. A refused form comes back with the message beside the field
 * it is about; a change made meanwhile by someone else is shown as such, never overwritten.
 */
@Controller
@RequestMapping("/lists")
class ListPageController {

    private static final Actor NOBODY = new Actor("", Set.of());

    private final ApprovedListService lists;

    ListPageController(ApprovedListService lists) {
        this.lists = lists;
    }

    private static Actor actor(Authentication who) {
        return who == null ? NOBODY : Actor.of(who);
    }

    @GetMapping
    String index(Model model, Authentication who) {
        return index(model, who, new CreateListRequest("", ""), Map.of());
    }

    private String index(Model model, Authentication who, CreateListRequest form, Map<String, String> errors) {
        model.addAttribute("lists", lists.lists());
        model.addAttribute("mayCreate", lists.mayEditLists(actor(who)));
        model.addAttribute("form", form);
        model.addAttribute("errors", errors);
        return "approval/lists";
    }

    @PostMapping
    @PreAuthorize("hasAnyRole('ENGINEER', 'APPROVER', 'ADMIN')")
    String create(@Valid CreateListRequest form, BindingResult binding, Model model, Authentication who) {
        var errors = errors(binding);
        if (errors.isEmpty()) {
            try {
                var list = lists.create(form.name().strip(), form.description(), actor(who));
                return "redirect:/lists/" + list.id();
            } catch (ConflictException clash) {
                errors.put(clash.field(), clash.getMessage());
            }
        }
        return index(model, who, form, errors);
    }

    @GetMapping("/{id}")
    String show(@PathVariable long id, Model model, Authentication who) {
        return show(id, model, who, null, Map.of());
    }

    /** The list page; {@code failed} names the form that came back refused, with its {@code errors} by field. */
    private String show(long id, Model model, Authentication who, String failed, Map<String, String> errors) {
        var actor = actor(who);
        var list = lists.list(id);
        var targets = new LinkedHashMap<Long, Set<EntryState>>();
        for (EntryView entry : list.entries()) {
            targets.put(entry.id(), lists.targetsFor(actor, entry.state()));
        }
        model.addAttribute("list", list);
        model.addAttribute("targets", targets);
        model.addAttribute("fourEyesNotes", lists.fourEyesNotes(actor, list.entries()));
        model.addAttribute("fourEyes", lists.fourEyesApproval());
        model.addAttribute("audit", lists.audit(id));
        model.addAttribute("mayEdit", lists.mayEditLists(actor));
        model.addAttribute("mayPropose", lists.mayPropose(actor));
        model.addAttribute("mayAnnotate", lists.mayAnnotate(actor));
        model.addAttribute("failed", failed);
        model.addAttribute("errors", errors);
        return "approval/list";
    }

    @PostMapping("/{id}")
    @PreAuthorize("hasAnyRole('ENGINEER', 'APPROVER', 'ADMIN')")
    String edit(@PathVariable long id, @Valid EditListRequest form, BindingResult binding, Model model,
            Authentication who, RedirectAttributes redirect) {
        return attempt(id, "edit", binding, model, who, redirect, "List saved.",
                () -> lists.edit(id, form.version(), form.name().strip(), form.description(), actor(who)));
    }

    @PostMapping("/{id}/entries")
    @PreAuthorize("hasAnyRole('ENGINEER', 'ADMIN')")
    String propose(@PathVariable long id, @Valid ProposeEntryRequest form, BindingResult binding, Model model,
            Authentication who, RedirectAttributes redirect) {
        return attempt(id, "propose", binding, model, who, redirect, "Module proposed.",
                () -> lists.propose(id, form.moduleId(), form.note(), actor(who)));
    }

    @PostMapping("/{id}/entries/{entryId}/transitions")
    @PreAuthorize("hasAnyRole('ENGINEER', 'APPROVER', 'ADMIN')")
    String transition(@PathVariable long id, @PathVariable long entryId, @Valid TransitionRequest form,
            BindingResult binding, Model model, Authentication who, RedirectAttributes redirect) {
        return attempt(id, "transition-" + entryId, binding, model, who, redirect, "Entry moved.",
                () -> lists.transition(id, entryId, form.to(), form.reason(), form.version(), form.replacedByEntryId(),
                        actor(who)));
    }

    @PostMapping("/{id}/entries/{entryId}/commercial-note")
    @PreAuthorize("hasAnyRole('PURCHASING', 'ADMIN')")
    String annotate(@PathVariable long id, @PathVariable long entryId, @Valid CommercialNoteRequest form,
            BindingResult binding, Model model, Authentication who, RedirectAttributes redirect) {
        return attempt(id, "note-" + entryId, binding, model, who, redirect, "Commercial note saved.",
                () -> lists.annotate(id, entryId, form.commercialNote(), form.version(), actor(who)));
    }

    @GetMapping("/{id}/audit.csv")
    void auditCsv(@PathVariable long id, HttpServletResponse response) throws IOException {
        AuditCsvResponse.write(lists, id, response);
    }

    /** Runs one form's change; on a refusal shows the page again with the messages beside that form's fields. */
    private String attempt(long id, String form, BindingResult binding, Model model, Authentication who,
            RedirectAttributes redirect, String done, Supplier<?> change) {
        var errors = errors(binding);
        if (errors.isEmpty()) {
            try {
                change.get();
                redirect.addFlashAttribute("done", done);
                return "redirect:/lists/" + id;
            } catch (InvalidRequestException invalid) {
                invalid.problems().forEach(p -> errors.put(p.field(), p.message()));
            } catch (ConflictException clash) {
                errors.put(clash.field() == null ? "form" : clash.field(), clash.getMessage());
            } catch (StaleEditException | OptimisticLockingFailureException stale) {
                errors.put("form", "Someone else changed this while you were looking at it; the page now shows "
                        + "their change. Check it, then apply yours again if it still makes sense.");
            }
        }
        return show(id, model, who, form, errors);
    }

    private static Map<String, String> errors(BindingResult binding) {
        var errors = new LinkedHashMap<String, String>();
        for (FieldError error : binding.getFieldErrors()) {
            errors.putIfAbsent(error.getField(), error.isBindingFailure()
                    ? "could not be read from '" + error.getRejectedValue() + "'" : error.getDefaultMessage());
        }
        return errors;
    }
}
