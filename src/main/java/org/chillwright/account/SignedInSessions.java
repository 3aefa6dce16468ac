package org.chillwright.account;

import org.springframework.beans.factory.ObjectProvider;
import org.springframework.session.FindByIndexNameSessionRepository;
import org.springframework.session.Session;
import org.springframework.stereotype.Component;

/**
 * Ends a user's open sessions when an administrator disables the account or resets its password,
 * so that the change takes effect at once rather than when the session times out. Only the shared
 * session store can find sessions by user; without it (the embedded default) this does nothing.
 */
@Component
class SignedInSessions {

    private final ObjectProvider<FindByIndexNameSessionRepository<? extends Session>> store;

    SignedInSessions(ObjectProvider<FindByIndexNameSessionRepository<? extends Session>> store) {
        this.store = store;
    }

    void endAllOf(String username) {
        store.ifAvailable(sessions -> sessions.findByPrincipalName(username).keySet().forEach(sessions::deleteById));
    }
}
