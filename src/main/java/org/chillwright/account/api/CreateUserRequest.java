package org.chillwright.account.api;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import java.util.Set;
import org.chillwright.account.Passwords;
import org.chillwright.account.Role;
import org.chillwright.web.Secret;
import org.chillwright.web.SecretFields;

/** {@code POST /api/v1/users}: a new account. */
public record CreateUserRequest(
        @NotBlank @Size(min = 2, max = 64) @Pattern(regexp = "^[A-Za-z0-9._-]+$",
                message = "may hold only letters, digits, '.', '_' and '-'") String username,
        @Secret @NotBlank @Size(min = Passwords.MIN_LENGTH, max = Passwords.MAX_LENGTH,
                message = Passwords.LENGTH_MESSAGE) String password,
        @NotEmpty Set<Role> roles) {

    @Override
    public String toString() {
        return SecretFields.toString(this);
    }
}
