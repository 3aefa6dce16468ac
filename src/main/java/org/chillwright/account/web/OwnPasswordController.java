package org.chillwright.account.web;

import jakarta.validation.Valid;
import java.security.Principal;
import org.chillwright.account.AccountService;
import org.chillwright.web.InvalidRequestException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.validation.FieldError;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/** {@code /account/password}: a signed-in user changes their own password. */
@Controller
@RequestMapping("/account/password")
class OwnPasswordController {

    private static final String VIEW = "account/password";

    private final AccountService accounts;

    OwnPasswordController(AccountService accounts) {
        this.accounts = accounts;
    }

    @GetMapping
    String form(Model model) {
        model.addAttribute("form", new PasswordChangeForm("", "", ""));
        return VIEW;
    }

    @PostMapping
    String change(@Valid @ModelAttribute("form") PasswordChangeForm form, BindingResult binding, Principal me,
            RedirectAttributes redirect) {
        if (!binding.hasFieldErrors("newPassword") && !form.newPassword().equals(form.confirmPassword())) {
            reject(binding, "confirmPassword", "does not match the new password");
        }
        if (binding.hasErrors()) {
            return VIEW;
        }
        try {
            accounts.changeOwnPassword(me.getName(), form.currentPassword(), form.newPassword());
        } catch (InvalidRequestException wrong) {
            reject(binding, "currentPassword", wrong.problems().get(0).message());
            return VIEW;
        }
        redirect.addFlashAttribute("done", "Your password has been changed.");
        return "redirect:/account/password";
    }

    /** Like {@code rejectValue}, but keeps no copy of the password that was typed. */
    private static void reject(BindingResult binding, String field, String message) {
        binding.addError(new FieldError(binding.getObjectName(), field, null, false, null, null, message));
    }
}
