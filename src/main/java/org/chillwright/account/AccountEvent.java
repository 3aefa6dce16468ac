package org.chillwright.account;

/**
 * What kind of change a line of the account audit trail records. New kinds are added here (and
 * recorded with {@link AccountAudit#record}); the column is plain text, so no migration is needed.
 */
public enum AccountEvent {
    ACCOUNT_CREATED("account created"),
    ROLES_CHANGED("roles changed"),
    ACCOUNT_DISABLED("account disabled"),
    ACCOUNT_ENABLED("account enabled"),
    /** An administrator set a new password for someone else. */
    PASSWORD_RESET("password reset"),
    /** Someone changed their own password. */
    PASSWORD_CHANGED("password changed"),
    /** Reserved for personal API tokens ({@code POST /api/v1/tokens}), which are not issued yet. */
    TOKEN_CREATED("API token created"),
    /** Reserved for personal API tokens, which are not issued yet. */
    TOKEN_REVOKED("API token revoked"),
    /** A team setting such as the four-eyes rule for approvals. */
    SETTING_CHANGED("team setting changed");

    private final String words;

    AccountEvent(String words) {
        this.words = words;
    }

    /** The event as the audit page says it. */
    public String words() {
        return words;
    }
}
