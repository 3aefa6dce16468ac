package org.chillwright.account.web;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;
import org.chillwright.account.Passwords;
import org.chillwright.web.Secret;
import org.chillwright.web.SecretFields;

/** A user's own password change: the current one proves it is them. None of the three is ever shown again. */
record PasswordChangeForm(
        @Secret @NotBlank String currentPassword,
        @Secret @NotBlank @Size(min = Passwords.MIN_LENGTH, max = Passwords.MAX_LENGTH,
                message = Passwords.LENGTH_MESSAGE) String newPassword,
        @Secret @NotBlank String confirmPassword) {

    @Override
    public String toString() {
        return SecretFields.toString(this);
    }
}
