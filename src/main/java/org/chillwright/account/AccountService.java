package org.chillwright.account;

import java.time.Clock;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
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
 * raw only to be hashed here; no method returns or logs one.
 */
@Service
public class AccountService implements UserDetailsService {

    private final UserAccountRepository accounts;
    private final PasswordEncoder passwordEncoder;
    private final Clock clock;
    private final SignedInSessions sessions;

    AccountService(UserAccountRepository accounts, PasswordEncoder passwordEncoder, Clock clock,
            SignedInSessions sessions) {
        this.accounts = accounts;
        this.passwordEncoder = passwordEncoder;
        this.clock = clock;
        this.sessions = sessions;
    }

    /**
     * Creates an enabled account.
     *
     * @throws ConflictException when the user name is taken
     */
    @Transactional
    public AccountView create(String username, String rawPassword, Set<Role> roles) {
        if (accounts.existsByUsername(username)) {
            throw new ConflictException("username", "an account named '" + username + "' already exists");
        }
        try {
            var account = new UserAccount(username, passwordEncoder.encode(rawPassword), roles, clock.instant());
            return AccountView.of(accounts.saveAndFlush(account));
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
        account.setRoles(roles);
        return AccountView.of(accounts.saveAndFlush(account));
    }

    /** Enables or disables an account; a disabled account cannot sign in. Nobody can disable themselves. */
    @Transactional
    public AccountView setEnabled(long id, boolean enabled, String actingUsername) {
        var account = find(id);
        if (!enabled && account.getUsername().equals(actingUsername)) {
            throw new ConflictException("enabled", "you cannot disable your own account");
        }
        account.setEnabled(enabled);
        var saved = AccountView.of(accounts.saveAndFlush(account));
        if (!enabled) {
            sessions.endAllOf(account.getUsername());
        }
        return saved;
    }

    /** An administrator sets a new password for someone who lost theirs. */
    @Transactional
    public void resetPassword(long id, String rawPassword) {
        var account = find(id);
        account.setPasswordHash(passwordEncoder.encode(rawPassword));
        accounts.saveAndFlush(account);
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
