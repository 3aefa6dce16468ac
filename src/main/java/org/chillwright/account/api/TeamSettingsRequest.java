package org.chillwright.account.api;

import jakarta.validation.constraints.NotNull;

/** {@code PUT /api/v1/settings}: {@code version} is the one read, so a change made meanwhile is not overwritten. */
public record TeamSettingsRequest(@NotNull Boolean fourEyesApproval, @NotNull Long version) {
}
