package org.nodewright.sharing;

import jakarta.servlet.DispatcherType;
import jakarta.servlet.http.HttpServletRequest;
import java.time.Clock;
import org.nodewright.audit.AuditTrail;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.security.web.authentication.AuthenticationSuccessHandler;
import org.springframework.security.web.authentication.SavedRequestAwareAuthenticationSuccessHandler;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpMethod;
import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.ProviderManager;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.access.AccessDeniedHandlerImpl;
import org.springframework.security.web.access.RequestMatcherDelegatingAccessDeniedHandler;
import org.springframework.security.web.authentication.DelegatingAuthenticationEntryPoint;
import org.springframework.security.web.authentication.LoginUrlAuthenticationEntryPoint;
import org.springframework.security.web.authentication.logout.SimpleUrlLogoutSuccessHandler;
import org.springframework.security.web.authentication.www.BasicAuthenticationFilter;
import org.springframework.security.web.savedrequest.HttpSessionRequestCache;
import org.springframework.security.web.util.matcher.AndRequestMatcher;
import org.springframework.security.web.util.matcher.NegatedRequestMatcher;
import org.springframework.security.web.util.matcher.OrRequestMatcher;
import org.springframework.security.web.util.matcher.RequestMatcher;

import static org.springframework.security.web.servlet.util.matcher.PathPatternRequestMatcher.pathPattern;

/**
 * LAN mode ({@code app.sharing.lan=true}): every request but the sign-in page, static assets and
 * the health check needs an account. Browsers sign in with a form (session + CSRF token); API
 * clients send HTTP Basic. Roles: viewer reads and runs analyses, editor also writes designs,
 * admin also manages accounts.
 */
@Configuration(proxyBeanMethods = false)
@ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
class LanSecurityConfig {

    /** Paths where a non-GET request changes saved designs (the shop library). */
    static final String[] DESIGN_WRITES = {"/api/v1/designs", "/api/v1/designs/**", "/api/v1/library/**",
            "/library/**", "/designs/**"};
    static final String[] ADMIN_ONLY = {"/api/v1/accounts", "/api/v1/accounts/**", "/admin", "/admin/**",
            "/api/v1/audit", "/api/v1/audit/**", "/api/v1/backup", "/api/v1/backup/**"};
    /** Every signed-in account manages its own password (before the admin-only rule on /api/v1/accounts/**). */
    static final String[] OWN_ACCOUNT = {"/api/v1/accounts/me", "/api/v1/accounts/me/**", "/account", "/account/**"};
    /** Strict-Transport-Security max-age: half a year (common practice; browsers ignore it for bare IP addresses). */
    static final long HSTS_SECONDS = 183L * 24 * 3600;
    static final String[] PUBLIC = {"/login", "/css/**", "/js/**", "/webjars/**", "/favicon.ico", "/error",
            "/actuator/health", "/actuator/health/**"};

    /** Lock-out counts in the store, so that every instance on one database shares them. */
    @Bean
    LoginThrottle loginThrottle(SharingProperties properties, JdbcClient jdbc, PlatformTransactionManager tx) {
        LoginThrottle throttle = new LoginThrottle(properties.maxFailures(), properties.lockout(), Clock.systemUTC(),
                new DatabaseSignInCounters(jdbc, new TransactionTemplate(tx)));
        throttle.purge();
        return throttle;
    }

    @Bean
    AuthenticationProvider lanAccounts(AccountStore store, PasswordEncoder encoder, LoginThrottle throttle,
            AuditTrail audit) {
        return new ThrottledAuthenticationProvider(store, encoder, throttle, audit);
    }

    @Bean
    AdminBootstrap adminBootstrap(AccountStore store, AccountService accounts, SharingProperties properties) {
        return new AdminBootstrap(store, accounts, properties);
    }

    @Bean
    SecurityFilterChain lan(HttpSecurity http, AuthenticationProvider lanAccounts, AccountStore store,
            AdminBootstrap adminBootstrap) throws Exception {
        RequestMatcher api = new OrRequestMatcher(pathPattern("/api/**"), pathPattern("/actuator/**"),
                pathPattern("/v3/**"), LanSecurityConfig::sendsBasic);

        HttpSessionRequestCache requestCache = new HttpSessionRequestCache();
        requestCache.setRequestMatcher(new AndRequestMatcher(pathPattern(HttpMethod.GET, "/**"),
                new NegatedRequestMatcher(api)));

        var entryPoint = DelegatingAuthenticationEntryPoint.builder()
                .addEntryPointFor(SecurityProblems.unauthorized(), api)
                .defaultEntryPoint(new LoginUrlAuthenticationEntryPoint("/login"))
                .build();
        var denied = new RequestMatcherDelegatingAccessDeniedHandler(
                new java.util.LinkedHashMap<>(java.util.Map.of(api, SecurityProblems.forbidden())),
                new AccessDeniedHandlerImpl());

        http.authenticationManager(new ProviderManager(lanAccounts))
                .authorizeHttpRequests(auth -> auth
                        .dispatcherTypeMatchers(DispatcherType.ERROR, DispatcherType.FORWARD).permitAll()
                        .requestMatchers(PUBLIC).permitAll()
                        .requestMatchers("/h2-console", "/h2-console/**").denyAll()
                        .requestMatchers(OWN_ACCOUNT).authenticated()
                        .requestMatchers(ADMIN_ONLY).hasRole("ADMIN")
                        .requestMatchers(HttpMethod.GET, "/**").authenticated()
                        .requestMatchers(HttpMethod.HEAD, "/**").authenticated()
                        .requestMatchers(DESIGN_WRITES).hasAnyRole("EDITOR", "ADMIN")
                        // Analyses, measurements and template downloads are reads, whatever the method.
                        .anyRequest().authenticated())
                .formLogin(form -> form.loginPage("/login").permitAll()
                        .successHandler(signedIn(store))
                        .failureHandler((request, response, ex) -> response.sendRedirect(request.getContextPath()
                                + (ex instanceof SignInLockedException ? "/login?locked" : "/login?error"))))
                .httpBasic(basic -> basic.realmName(SecurityProblems.REALM)
                        .authenticationEntryPoint(SecurityProblems.unauthorized()))
                .logout(logout -> logout.logoutUrl("/logout").logoutSuccessHandler(signedOut()))
                .requestCache(cache -> cache.requestCache(requestCache))
                .exceptionHandling(e -> e.authenticationEntryPoint(entryPoint).accessDeniedHandler(denied))
                .csrf(csrf -> csrf.ignoringRequestMatchers(LanSecurityConfig::clientWithoutSession))
                .addFilterAfter(new AccountRefreshFilter(store), BasicAuthenticationFilter.class);
        SecurityConfig.headers(http);
        http.headers(h -> h.httpStrictTransportSecurity(hsts -> hsts.maxAgeInSeconds(HSTS_SECONDS)
                .includeSubDomains(false)));
        return http.build();
    }

    /**
     * After a form sign-in: note when this session signed in (for "sign out everywhere"), then go
     * to the password page when an admin's reset is pending, else where the browser was going.
     */
    private static AuthenticationSuccessHandler signedIn(AccountStore store) {
        SavedRequestAwareAuthenticationSuccessHandler onward = new SavedRequestAwareAuthenticationSuccessHandler();
        onward.setDefaultTargetUrl("/");
        return (request, response, authentication) -> {
            request.getSession().setAttribute(AccountRefreshFilter.SIGNED_IN_AT, AccountService.now());
            boolean mustChange = store.credentials(authentication.getName())
                    .map(AccountStore.Credentials::mustChangePassword).orElse(false);
            if (mustChange) {
                response.sendRedirect(request.getContextPath() + OwnPasswordPageController.PAGE + "?required");
                return;
            }
            onward.onAuthenticationSuccess(request, response, authentication);
        };
    }

    /** Always back to the sign-in page (the Basic defaults would answer some clients with a bare 204). */
    private static SimpleUrlLogoutSuccessHandler signedOut() {
        SimpleUrlLogoutSuccessHandler handler = new SimpleUrlLogoutSuccessHandler();
        handler.setDefaultTargetUrl("/login?signedOut");
        return handler;
    }

    private static boolean sendsBasic(HttpServletRequest request) {
        String authorization = request.getHeader(HttpHeaders.AUTHORIZATION);
        return authorization != null && authorization.regionMatches(true, 0, "Basic ", 0, 6);
    }

    /**
     * CSRF protects what a browser sends on its own: session cookies and cached credentials. A
     * request without a session that sends HTTP Basic (a script, a shop's own tool), or calls the
     * API anonymously (and so gets its 401), needs no token. A browser that has cached Basic
     * credentials would attach them to a forged cross-site request too, so a request whose Fetch
     * Metadata says it came from another site still needs the token. Forms (sign-in included)
     * always need it unless they come with Basic credentials and no session.
     */
    static boolean clientWithoutSession(HttpServletRequest request) {
        if (request.getRequestedSessionId() != null || request.getSession(false) != null) {
            return false;
        }
        if (!sendsBasic(request) && !request.getRequestURI().startsWith(request.getContextPath() + "/api/")) {
            return false;
        }
        String site = request.getHeader("Sec-Fetch-Site");
        return site == null || "same-origin".equals(site) || "none".equals(site);
    }
}
