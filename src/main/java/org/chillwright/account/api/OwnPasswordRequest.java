package org.chillwright.account.api;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;
import org.chillwright.account.Passwords;
import org.chillwright.web.Secret;
import org.chillwright.web.SecretFields;

/** {@code PUT /api/v1/account/password}: the signed-in user's new password; the current one proves it is them. */
public record OwnPasswordRequest(
        @Secret @NotBlank String currentPassword,
        @Secret @NotBlank @Size(min = Passwords.MIN_LENGTH, max = Passwords.MAX_LENGTH,
                message = Passwords.LENGTH_MESSAGE) String newPassword) {

    @Override
    public String toString() {
        return SecretFields.toString(this);
    }
}
