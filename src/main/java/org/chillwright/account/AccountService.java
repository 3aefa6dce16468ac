package org.chillwright.account;

import java.time.Clock;
import java.util.Set;
import org.chillwright.web.ConflictException;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.security.core.authority.SimpleGrantedAuthority;
import org.springframework.security.core.userdetails.User;
import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Creates accounts and tells Spring Security who a user is. */
@Service
public class AccountService implements UserDetailsService {

    private final UserAccountRepository accounts;
    private final PasswordEncoder passwordEncoder;
    private final Clock clock;

    AccountService(UserAccountRepository accounts, PasswordEncoder passwordEncoder, Clock clock) {
        this.accounts = accounts;
        this.passwordEncoder = passwordEncoder;
        this.clock = clock;
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
