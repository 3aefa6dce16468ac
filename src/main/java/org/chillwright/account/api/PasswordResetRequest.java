package org.chillwright.account.api;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;
import org.chillwright.account.Passwords;
import org.chillwright.web.Secret;
import org.chillwright.web.SecretFields;

/** {@code PUT /api/v1/users/{id}/password} and the accounts page: an administrator's new password for someone else. */
public record PasswordResetRequest(@Secret @NotBlank @Size(min = Passwords.MIN_LENGTH, max = Passwords.MAX_LENGTH,
        message = Passwords.LENGTH_MESSAGE) String password) {

    @Override
    public String toString() {
        return SecretFields.toString(this);
    }
}
