package org.chillwright.account;

import java.time.Instant;

/**
 * One line of the account audit trail.
 *
 * @param by the user who made the change ({@code system} for the first administrator made at start-up)
 * @param subject the account changed, or the name of the team setting
 * @param detail what changed, in words; never a password
 */
public record AccountAuditView(Instant at, String by, AccountEvent event, String subject, String detail) {
}
