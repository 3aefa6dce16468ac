package org.chillwright.account;

import java.time.Instant;

/**
 * The team's settings as pages and the API show them. Send {@code version} back with a change.
 *
 * @param fourEyesApproval whether an entry's approver must differ from its proposer and its qualifier
 */
public record TeamSettingsView(boolean fourEyesApproval, long version, String changedBy, Instant changedAt) {
}
