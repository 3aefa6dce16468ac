package org.chillwright.account;

import java.time.Clock;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.chillwright.web.ConflictException;
import org.chillwright.web.InvalidRequestException;
import org.chillwright.web.NotFoundException;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.security.core.authority.SimpleGrantedAuthority;
import org.springframework.security.core.userdetails.User;
import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Creates and administers accounts and tells Spring Security who a user is. Passwords are taken
 * raw only to be hashed here; no method returns or logs one. Every change is written to the
 * {@link AccountAudit account audit trail} in the same transaction, with who made it.
 */
@Service
public class AccountService implements UserDetailsService {

    private final UserAccountRepository accounts;
    private final PasswordEncoder passwordEncoder;
    private final Clock clock;
    private final SignedInSessions sessions;
    private final AccountAudit audit;

    AccountService(UserAccountRepository accounts, PasswordEncoder passwordEncoder, Clock clock,
            SignedInSessions sessions, AccountAudit audit) {
        this.accounts = accounts;
        this.passwordEncoder = passwordEncoder;
        this.clock = clock;
        this.sessions = sessions;
        this.audit = audit;
    }

    /**
     * Creates an enabled account.
     *
     * @param createdBy the administrator creating it, or {@link AccountAudit#SYSTEM}
     * @throws ConflictException when the user name is taken
     */
    @Transactional
    public AccountView create(String username, String rawPassword, Set<Role> roles, String createdBy) {
        if (accounts.existsByUsername(username)) {
            throw new ConflictException("username", "an account named '" + username + "' already exists");
        }
        try {
            var account = new UserAccount(username, passwordEncoder.encode(rawPassword), roles, clock.instant());
            var created = AccountView.of(accounts.saveAndFlush(account));
            audit.record(createdBy, AccountEvent.ACCOUNT_CREATED, username, "created with roles " + names(roles));
            return created;
        } catch (DataIntegrityViolationException raced) {
            // another instance created the same name between the check and the insert
            throw new ConflictException("username", "an account named '" + username + "' already exists");
        }
    }

    @Transactional(readOnly = true)
    public List<AccountView> list() {
        return accounts.findAll().stream().map(AccountView::of)
                .sorted(Comparator.comparing(AccountView::username)).toList();
    }

    /**
     * Replaces an account's roles. An administrator cannot take the ADMIN role from themselves, so
     * there is always someone left who can manage accounts.
     */
    @Transactional
    public AccountView changeRoles(long id, Set<Role> roles, String actingUsername) {
        if (roles.isEmpty()) {
            throw new InvalidRequestException("roles", "choose at least one role");
        }
        var account = find(id);
        if (account.getUsername().equals(actingUsername) && !roles.contains(Role.ADMIN)) {
            throw new ConflictException("roles", "you cannot remove the ADMIN role from your own account");
        }
        var before = account.getRoles();
        if (before.equals(roles)) {
            return AccountView.of(account);
        }
        account.setRoles(roles);
        var saved = AccountView.of(accounts.saveAndFlush(account));
        audit.record(actingUsername, AccountEvent.ROLES_CHANGED, account.getUsername(),
                "roles " + names(before) + " → " + names(roles));
        return saved;
    }

    /** Enables or disables an account; a disabled account cannot sign in. Nobody can disable themselves. */
    @Transactional
    public AccountView setEnabled(long id, boolean enabled, String actingUsername) {
        var account = find(id);
        if (!enabled && account.getUsername().equals(actingUsername)) {
            throw new ConflictException("enabled", "you cannot disable your own account");
        }
        if (account.isEnabled() == enabled) {
            return AccountView.of(account);
        }
        account.setEnabled(enabled);
        var saved = AccountView.of(accounts.saveAndFlush(account));
        if (enabled) {
            audit.record(actingUsername, AccountEvent.ACCOUNT_ENABLED, account.getUsername(), "may sign in again");
        } else {
            audit.record(actingUsername, AccountEvent.ACCOUNT_DISABLED, account.getUsername(),
                    "can no longer sign in; signed-in sessions ended");
            sessions.endAllOf(account.getUsername());
        }
        return saved;
    }

    /** An administrator sets a new password for someone who lost theirs; their sessions end. */
    @Transactional
    public void resetPassword(long id, String rawPassword, String actingUsername) {
        var account = find(id);
        account.setPasswordHash(passwordEncoder.encode(rawPassword));
        accounts.saveAndFlush(account);
        audit.record(actingUsername, AccountEvent.PASSWORD_RESET, account.getUsername(),
                "new password set by an administrator; signed-in sessions ended");
        sessions.endAllOf(account.getUsername());
    }

    /**
     * A signed-in user changes their own password, proving they know the current one.
     *
     * @throws InvalidRequestException naming {@code currentPassword} when it does not match
     */
    @Transactional
    public void changeOwnPassword(String username, String currentPassword, String newPassword) {
        var account = accounts.findByUsername(username)
                .orElseThrow(() -> new NotFoundException("account", username));
        if (!passwordEncoder.matches(currentPassword, account.getPasswordHash())) {
            throw new InvalidRequestException("currentPassword", "does not match your current password");
        }
        account.setPasswordHash(passwordEncoder.encode(newPassword));
        accounts.saveAndFlush(account);
        audit.record(username, AccountEvent.PASSWORD_CHANGED, username, "changed their own password");
    }

    private static String names(Set<Role> roles) {
        return roles.isEmpty() ? "(none)" : roles.stream().sorted().map(Role::name).collect(Collectors.joining(", "));
    }

    private UserAccount find(long id) {
        return accounts.findById(id).orElseThrow(() -> new NotFoundException("account", id));
    }

    @Transactional(readOnly = true)
    public boolean exists(String username) {
        return accounts.existsByUsername(username);
    }

    @Override
    @Transactional(readOnly = true)
    public UserDetails loadUserByUsername(String username) {
        var account = accounts.findByUsername(username)
                .orElseThrow(() -> new UsernameNotFoundException("no account " + username));
        return User.withUsername(account.getUsername())
                .password(account.getPasswordHash())
                .disabled(!account.isEnabled())
                .authorities(account.getRoles().stream().map(r -> new SimpleGrantedAuthority(r.authority())).toList())
                .build();
    }
}
