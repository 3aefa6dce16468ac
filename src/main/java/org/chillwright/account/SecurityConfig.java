package org.chillwright.account;

import static org.springframework.http.HttpMethod.GET;
import static org.springframework.http.HttpMethod.POST;

import org.chillwright.web.ProblemWriter;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.chillwright.web.RequestLogFilter;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpStatus;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.springframework.security.authentication.AuthenticationManager;
import org.springframework.security.authentication.ProviderManager;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.config.Customizer;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.config.annotation.method.configuration.EnableMethodSecurity;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.annotation.web.configurers.AbstractHttpConfigurer;
import org.springframework.security.config.annotation.web.configurers.HeadersConfigurer;
import org.springframework.security.config.http.SessionCreationPolicy;
import org.springframework.security.crypto.factory.PasswordEncoderFactories;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.access.ExceptionTranslationFilter;
import org.springframework.security.web.header.writers.ReferrerPolicyHeaderWriter.ReferrerPolicy;

/**
 * Two filter chains over the same accounts: the API is stateless HTTP Basic without CSRF (it takes
 * no cookies, so there is nothing to forge); pages use form login with CSRF protection.
 * With {@code chillwright.access.open-reads} (the embedded default) computations and catalog reads
 * are open so a newcomer can try the tool at once; writes always need an account with a role,
 * checked again per method with {@code @PreAuthorize}. Every sign-in, by form or by Basic, goes
 * through the {@link LoginThrottle}.
 */
@Configuration
@EnableMethodSecurity
class SecurityConfig {

    /** API routes that only compute: no state changes, so open on the embedded default. */
    static final String[] API_COMPUTATIONS = {
        "/api/v1/derive", "/api/v1/operating-point", "/api/v1/rankings", "/api/v1/cascade/**",
        "/api/v1/cooldown", "/api/v1/generator/**", "/api/v1/harvest/**"
    };
    /** API reads open on the embedded default. */
    static final String[] API_OPEN_READS = {"/api/v1/modules", "/api/v1/modules/**", "/api/v1/dew-point"};
    /** Page form posts that only compute (solve a case, evaluate a generator). */
    static final String[] PAGE_COMPUTATIONS = {"/cases/**", "/harvest/**"};
    static final String[] ALWAYS_OPEN = {
        "/login", "/error", "/css/**", "/js/**", "/img/**", "/webjars/**", "/favicon.ico", "/actuator/health/**"
    };
    static final String[] API_DOCS = {"/v3/api-docs/**", "/api-docs", "/swagger-ui/**", "/swagger-ui.html"};
    /** No page needs any of these browser features, so none may use them (nor anything framed, were it allowed). */
    static final String PERMISSIONS_POLICY = "accelerometer=(), ambient-light-sensor=(), autoplay=(), bluetooth=(), "
            + "camera=(), display-capture=(), encrypted-media=(), geolocation=(), gyroscope=(), hid=(), "
            + "magnetometer=(), microphone=(), midi=(), payment=(), publickey-credentials-get=(), "
            + "screen-wake-lock=(), serial=(), usb=(), xr-spatial-tracking=()";
    /** A year, the usual HSTS lifetime (common practice, no source). */
    static final long HSTS_MAX_AGE_S = 31_536_000;

    private final boolean openReads;

    SecurityConfig(@Value("${chillwright.access.open-reads:false}") boolean openReads) {
        this.openReads = openReads;
    }

    /** The sign-in part of the OpenAPI document, from the same route lists as the filter chain below. */
    @Bean
    OpenApiCustomizer apiSecurityDocs() {
        return new ApiSecurityDocs(openReads);
    }

    @Bean
    PasswordEncoder passwordEncoder() {
        return PasswordEncoderFactories.createDelegatingPasswordEncoder(); // bcrypt by default
    }

    /** The one way in for both chains: the throttle first, then the bcrypt check against the accounts. */
    @Bean
    AuthenticationManager authenticationManager(AccountService accounts, PasswordEncoder passwordEncoder,
            LoginThrottle throttle) {
        var passwords = new DaoAuthenticationProvider(accounts);
        passwords.setPasswordEncoder(passwordEncoder);
        return new ProviderManager(new ThrottledAuthenticationProvider(passwords, throttle));
    }

    @Bean
    @Order(1)
    SecurityFilterChain apiChain(HttpSecurity http, ProblemWriter problems, AuthenticationManager authentication)
            throws Exception {
        http.securityMatcher("/api/**")
                .authenticationManager(authentication)
                .headers(SecurityConfig::commonHeaders)
                .addFilterBefore(new RequestLogFilter(), ExceptionTranslationFilter.class)
                .csrf(AbstractHttpConfigurer::disable)
                .sessionManagement(s -> s.sessionCreationPolicy(SessionCreationPolicy.STATELESS))
                .httpBasic(basic -> basic.authenticationEntryPoint((request, response, e) -> signInRequired(
                        problems, response, e)))
                .exceptionHandling(e -> e
                        .authenticationEntryPoint((request, response, ex) -> signInRequired(problems, response, ex))
                        .accessDeniedHandler((request, response, ex) -> problems.write(
                                response, HttpStatus.FORBIDDEN, "Not allowed",
                                "Your account's roles do not allow this request.")))
                .authorizeHttpRequests(auth -> {
                    if (openReads) {
                        auth.requestMatchers(POST, API_COMPUTATIONS).permitAll();
                        auth.requestMatchers(GET, API_OPEN_READS).permitAll();
                    }
                    auth.anyRequest().authenticated();
                });
        return http.build();
    }

    /**
     * Headers on every response of both chains, beside Spring Security's defaults (nosniff, frame denial,
     * no caching): the address of a page never leaves the site in a Referer, no browser feature is
     * available to a page, and over HTTPS (also when a trusted balancer says so with X-Forwarded-Proto)
     * browsers are told to use HTTPS only.
     */
    private static void commonHeaders(HeadersConfigurer<HttpSecurity> headers) {
        headers.referrerPolicy(referrer -> referrer.policy(ReferrerPolicy.SAME_ORIGIN))
                .permissionsPolicyHeader(permissions -> permissions.policy(PERMISSIONS_POLICY))
                .httpStrictTransportSecurity(hsts -> hsts.includeSubDomains(true).maxAgeInSeconds(HSTS_MAX_AGE_S));
    }

    private static void signInRequired(ProblemWriter problems, HttpServletResponse response, AuthenticationException e)
            throws IOException {
        if (e instanceof LoginThrottledException throttled) {
            response.setHeader("Retry-After", String.valueOf(throttled.retryAfter().toSeconds()));
            problems.write(response, HttpStatus.TOO_MANY_REQUESTS, "Too many failed sign-ins", throttled.getMessage());
            return;
        }
        problems.write(response, HttpStatus.UNAUTHORIZED, "Sign-in required",
                "This request needs an account: send HTTP Basic credentials.");
    }

    @Bean
    @Order(2)
    SecurityFilterChain pageChain(HttpSecurity http, AuthenticationManager authentication) throws Exception {
        http.authenticationManager(authentication)
                .addFilterBefore(new RequestLogFilter(), ExceptionTranslationFilter.class)
                .formLogin(form -> form.loginPage("/login").permitAll()
                        .failureHandler((request, response, e) -> response.sendRedirect(request.getContextPath()
                                + (e instanceof LoginThrottledException ? "/login?locked" : "/login?error"))))
                .logout(logout -> logout.logoutSuccessUrl("/login?signedOut"))
                .httpBasic(Customizer.withDefaults())
                .headers(h -> commonHeaders(h.contentSecurityPolicy(csp -> csp.policyDirectives(
                        "default-src 'self'; img-src 'self' data: blob:; style-src 'self' 'unsafe-inline'; "
                                + "script-src 'self'; object-src 'none'; frame-ancestors 'none'"))))
                .authorizeHttpRequests(auth -> {
                    auth.requestMatchers(ALWAYS_OPEN).permitAll();
                    auth.requestMatchers("/admin/**").hasRole(Role.ADMIN.name());
                    auth.requestMatchers("/account/**").authenticated();
                    if (openReads) {
                        auth.requestMatchers(API_DOCS).permitAll();
                        auth.requestMatchers(POST, PAGE_COMPUTATIONS).permitAll();
                        auth.requestMatchers(GET, "/**").permitAll();
                    }
                    auth.anyRequest().authenticated();
                });
        return http.build();
    }
}
