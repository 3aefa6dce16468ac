package org.chillwright.account.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.security.Principal;
import org.chillwright.account.AccountService;
import org.chillwright.account.AccountView;
import org.springframework.http.HttpStatus;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/** Accounts, for administrators. */
@RestController
@RequestMapping("/api/v1/users")
@Tag(name = "Accounts", description = "Accounts, the account audit trail and your own password")
@PreAuthorize("hasRole('ADMIN')")
class UserApiController {

    private final AccountService accounts;

    UserApiController(AccountService accounts) {
        this.accounts = accounts;
    }

    @PostMapping
    @ResponseStatus(HttpStatus.CREATED)
    @Operation(operationId = "createUser", summary = "Create an account with its roles (administrators)")
    AccountView create(@Valid @RequestBody CreateUserRequest request, Principal me) {
        return accounts.create(request.username(), request.password(), request.roles(), me.getName());
    }

    /** Sets a new password for someone who lost theirs; their sessions end. */
    @PutMapping("/{id}/password")
    @ResponseStatus(HttpStatus.NO_CONTENT)
    @Operation(operationId = "resetUserPassword", summary = "Set a new password for someone else; their sessions end")
    void resetPassword(@PathVariable long id, @Valid @RequestBody PasswordResetRequest request, Principal me) {
        accounts.resetPassword(id, request.password(), me.getName());
    }
}
