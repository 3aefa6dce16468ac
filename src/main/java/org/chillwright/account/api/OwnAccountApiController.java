package org.chillwright.account.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.security.Principal;
import org.chillwright.account.AccountService;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/** The signed-in user's own account. */
@RestController
@RequestMapping("/api/v1/account")
@Tag(name = "Accounts")
class OwnAccountApiController {

    private final AccountService accounts;

    OwnAccountApiController(AccountService accounts) {
        this.accounts = accounts;
    }

    /** Changes the caller's password; a wrong current password is a 400 naming {@code currentPassword}. */
    @PutMapping("/password")
    @ResponseStatus(HttpStatus.NO_CONTENT)
    @Operation(operationId = "changeOwnPassword", summary = "Change your own password")
    void changePassword(@Valid @RequestBody OwnPasswordRequest request, Principal me) {
        accounts.changeOwnPassword(me.getName(), request.currentPassword(), request.newPassword());
    }
}
