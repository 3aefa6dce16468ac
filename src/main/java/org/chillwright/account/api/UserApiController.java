package org.chillwright.account.api;

import jakarta.validation.Valid;
import org.chillwright.account.AccountService;
import org.chillwright.account.AccountView;
import org.springframework.http.HttpStatus;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

@RestController
@RequestMapping("/api/v1/users")
class UserApiController {

    private final AccountService accounts;

    UserApiController(AccountService accounts) {
        this.accounts = accounts;
    }

    @PostMapping
    @ResponseStatus(HttpStatus.CREATED)
    @PreAuthorize("hasRole('ADMIN')")
    AccountView create(@Valid @RequestBody CreateUserRequest request) {
        return accounts.create(request.username(), request.password(), request.roles());
    }
}
