package org.nodewright.sharing;

import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.web.SecurityFilterChain;

/**
 * Local mode (the default): the server listens on 127.0.0.1 only and asks for no login. The JSON
 * API needs {@code application/json} bodies, which a foreign page cannot send without a CORS
 * preflight, so CSRF tokens are not required on it here. Security headers stay on.
 */
@Configuration(proxyBeanMethods = false)
class SecurityConfig {

    @Bean
    @ConditionalOnProperty(name = "app.sharing.lan", havingValue = "false", matchIfMissing = true)
    SecurityFilterChain localOnly(HttpSecurity http) throws Exception {
        http.authorizeHttpRequests(auth -> auth.anyRequest().permitAll())
                .csrf(csrf -> csrf.ignoringRequestMatchers("/api/**"))
                .headers(h -> h.contentSecurityPolicy(csp -> csp.policyDirectives(
                        "default-src 'self'; img-src 'self' data: blob:; style-src 'self' 'unsafe-inline'; "
                                + "media-src 'self' blob:; object-src 'none'; frame-ancestors 'none'")));
        return http.build();
    }
}
