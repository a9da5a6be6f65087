package org.nodewright.sharing;

import org.springframework.boot.context.properties.EnableConfigurationProperties;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.boot.web.server.servlet.CookieSameSiteSupplier;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.security.authentication.AuthenticationManager;
import org.springframework.security.authentication.ProviderNotFoundException;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.header.writers.ReferrerPolicyHeaderWriter.ReferrerPolicy;

/**
 * Local mode (the default): the server listens on 127.0.0.1 only and asks for no login. The JSON
 * API needs {@code application/json} bodies, which a foreign page cannot send without a CORS
 * preflight, so CSRF tokens are not required on it here. Security headers stay on in both modes;
 * LAN mode is {@link LanSecurityConfig}.
 */
@Configuration(proxyBeanMethods = false)
@EnableConfigurationProperties(SharingProperties.class)
class SecurityConfig {

    static final String CONTENT_SECURITY_POLICY = "default-src 'self'; img-src 'self' data: blob:; "
            + "style-src 'self' 'unsafe-inline'; media-src 'self' blob:; object-src 'none'; "
            + "frame-ancestors 'none'; base-uri 'self'; form-action 'self'";

    @Bean
    PasswordEncoder passwordEncoder() {
        return new BCryptPasswordEncoder();
    }

    /** Session cookies are not sent on cross-site POSTs (a second line behind the CSRF token). */
    @Bean
    CookieSameSiteSupplier laxSessionCookie() {
        return CookieSameSiteSupplier.ofLax();
    }

    @Bean
    @ConditionalOnProperty(name = "app.sharing.lan", havingValue = "false", matchIfMissing = true)
    SecurityFilterChain localOnly(HttpSecurity http) throws Exception {
        http.authorizeHttpRequests(auth -> auth.anyRequest().permitAll())
                .csrf(csrf -> csrf.ignoringRequestMatchers("/api/**"));
        headers(http);
        return http.build();
    }

    /** Local mode has no accounts: nothing can sign in (and no generated default user is made). */
    @Bean
    @ConditionalOnProperty(name = "app.sharing.lan", havingValue = "false", matchIfMissing = true)
    AuthenticationManager noSignInOnThisMachine() {
        return authentication -> {
            throw new ProviderNotFoundException("Local mode has no accounts");
        };
    }

    /** CSP, no framing, no MIME sniffing, no referrer to other sites; shared by both modes. */
    static void headers(HttpSecurity http) throws Exception {
        http.headers(h -> h
                .contentSecurityPolicy(csp -> csp.policyDirectives(CONTENT_SECURITY_POLICY))
                .frameOptions(frame -> frame.deny())
                .contentTypeOptions(nosniff -> { })
                .referrerPolicy(referrer -> referrer.policy(ReferrerPolicy.SAME_ORIGIN)));
    }
}
