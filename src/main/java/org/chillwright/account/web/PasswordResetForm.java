package org.chillwright.account.web;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;

/** An administrator's new password for someone else's account. */
record PasswordResetForm(@NotBlank @Size(min = 12, max = 128, message = "must be 12 to 128 characters long") String password) {
}
