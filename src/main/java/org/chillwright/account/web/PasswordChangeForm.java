package org.chillwright.account.web;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;

/** A user's own password change: the current one proves it is them. */
record PasswordChangeForm(
        @NotBlank String currentPassword,
        @NotBlank @Size(min = 12, max = 128, message = "must be 12 to 128 characters long") String newPassword,
        @NotBlank String confirmPassword) {
}
