package org.chillwright.account.api;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import java.util.Set;
import org.chillwright.account.Role;

/** {@code POST /api/v1/users}: a new account. */
public record CreateUserRequest(
        @NotBlank @Size(min = 2, max = 64) @Pattern(regexp = "[A-Za-z0-9._-]+",
                message = "may hold only letters, digits, '.', '_' and '-'") String username,
        @NotBlank @Size(min = 12, max = 128, message = "must be 12 to 128 characters long") String password,
        @NotEmpty Set<Role> roles) {
}
