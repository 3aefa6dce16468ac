package org.chillwright.account.web;

import jakarta.validation.Valid;
import java.security.Principal;
import java.util.EnumSet;
import java.util.Set;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.chillwright.account.api.CreateUserRequest;
import org.chillwright.account.api.PasswordResetRequest;
import org.chillwright.web.ConflictException;
import org.chillwright.web.InvalidRequestException;
import org.springframework.security.access.prepost.PreAuthorize;
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

/** {@code /admin/users}: create accounts, change their roles, disable them and reset passwords. */
@Controller
@RequestMapping("/admin/users")
@PreAuthorize("hasRole('ADMIN')")
class AccountAdminController {

    private static final String VIEW = "account/users";
    private static final String BACK = "redirect:/admin/users";

    private final AccountService accounts;

    AccountAdminController(AccountService accounts) {
        this.accounts = accounts;
    }

    @ModelAttribute("allRoles")
    Role[] allRoles() {
        return Role.values();
    }

    @GetMapping
    String list(Model model) {
        if (!model.containsAttribute("newAccount")) {
            model.addAttribute("newAccount", new CreateUserRequest("", "", EnumSet.of(Role.ENGINEER)));
        }
        model.addAttribute("accounts", accounts.list());
        return VIEW;
    }

    @PostMapping
    String create(@Valid @ModelAttribute("newAccount") CreateUserRequest form, BindingResult binding, Model model,
            Principal me, RedirectAttributes redirect) {
        if (!binding.hasErrors()) {
            try {
                accounts.create(form.username(), form.password(), form.roles(), me.getName());
                redirect.addFlashAttribute("done", "Created the account " + form.username() + ".");
                return BACK;
            } catch (ConflictException taken) {
                binding.rejectValue("username", "taken", taken.getMessage());
            }
        }
        model.addAttribute("accounts", accounts.list());
        return VIEW;
    }

    @PostMapping("/{id}/roles")
    String changeRoles(@PathVariable long id, @RequestParam(required = false) Set<Role> roles, Principal me,
            RedirectAttributes redirect) {
        return act(id, redirect, () -> accounts.changeRoles(id, roles == null ? Set.of() : roles, me.getName()),
                "Roles saved.");
    }

    @PostMapping("/{id}/enabled")
    String setEnabled(@PathVariable long id, @RequestParam boolean enabled, Principal me, RedirectAttributes redirect) {
        return act(id, redirect, () -> accounts.setEnabled(id, enabled, me.getName()),
                enabled ? "Account enabled." : "Account disabled: it can no longer sign in.");
    }

    @PostMapping("/{id}/password")
    String resetPassword(@PathVariable long id, @Valid PasswordResetRequest form, BindingResult binding, Principal me,
            RedirectAttributes redirect) {
        if (binding.hasErrors()) {
            redirect.addFlashAttribute("problemId", id);
            redirect.addFlashAttribute("problem", "New password " + binding.getFieldError("password").getDefaultMessage());
            return BACK;
        }
        return act(id, redirect, () -> accounts.resetPassword(id, form.password(), me.getName()),
                "Password reset. Tell the user through a channel other than e-mail, and ask them to change it.");
    }

    /** Runs one row's action; a refusal is shown beside that row after the redirect. */
    private static String act(long id, RedirectAttributes redirect, Runnable action, String done) {
        try {
            action.run();
            redirect.addFlashAttribute("doneId", id);
            redirect.addFlashAttribute("done", done);
        } catch (ConflictException | InvalidRequestException refused) {
            redirect.addFlashAttribute("problemId", id);
            redirect.addFlashAttribute("problem", refused instanceof InvalidRequestException invalid
                    ? invalid.problems().get(0).message() : refused.getMessage());
        }
        return BACK;
    }
}
