package org.nodewright.sharing;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.servlet.http.HttpSession;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.GrantedAuthority;
import org.springframework.security.core.authority.SimpleGrantedAuthority;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.web.context.HttpSessionSecurityContextRepository;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * Keeps signed-in browser sessions in step with the accounts table: a disabled or removed account
 * is signed out on its next request, a changed role applies at once.
 */
final class AccountRefreshFilter extends OncePerRequestFilter {

    private final AccountStore store;
    private final HttpSessionSecurityContextRepository sessions = new HttpSessionSecurityContextRepository();

    AccountRefreshFilter(AccountStore store) {
        this.store = store;
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        SecurityContext context = SecurityContextHolder.getContext();
        Authentication auth = context.getAuthentication();
        if (auth instanceof UsernamePasswordAuthenticationToken && auth.isAuthenticated()) {
            Optional<AccountStore.Credentials> account = store.credentials(auth.getName());
            if (account.isEmpty() || !account.get().enabled()) {
                SecurityContextHolder.clearContext();
                HttpSession session = request.getSession(false);
                if (session != null) {
                    session.invalidate();
                }
            } else {
                String authority = account.get().role().authority();
                List<String> roles = auth.getAuthorities().stream().map(GrantedAuthority::getAuthority)
                        .filter(a -> a.startsWith("ROLE_")).toList();
                if (!roles.equals(List.of(authority))) {
                    List<GrantedAuthority> authorities = new ArrayList<>();
                    auth.getAuthorities().stream().filter(a -> !a.getAuthority().startsWith("ROLE_"))
                            .forEach(authorities::add);
                    authorities.add(new SimpleGrantedAuthority(authority));
                    UsernamePasswordAuthenticationToken updated = UsernamePasswordAuthenticationToken.authenticated(
                            auth.getPrincipal(), null, authorities);
                    updated.setDetails(auth.getDetails());
                    SecurityContext fresh = SecurityContextHolder.createEmptyContext();
                    fresh.setAuthentication(updated);
                    SecurityContextHolder.setContext(fresh);
                    if (request.getSession(false) != null) {
                        sessions.saveContext(fresh, request, response);
                    }
                }
            }
        }
        chain.doFilter(request, response);
    }
}
