package org.nodewright.sharing;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.servlet.http.HttpSession;
import java.io.IOException;
import java.time.Instant;
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
 * Keeps signed-in requests in step with the accounts table: a disabled or removed account is
 * signed out on its next request, a browser session signed in before the account's "sign out
 * everywhere" (or a password change) ends, a changed role applies at once, and an account whose
 * password an admin reset may only change its password until it has.
 */
final class AccountRefreshFilter extends OncePerRequestFilter {

    /** Session attribute: when this browser session signed in (an {@link Instant}). */
    static final String SIGNED_IN_AT = "nodewright.signedInAt";

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
            HttpSession session = request.getSession(false);
            if (account.isEmpty() || !account.get().enabled() || signedOutMeanwhile(account.get(), session)) {
                SecurityContextHolder.clearContext();
                if (session != null) {
                    session.invalidate();
                }
            } else {
                refreshRole(request, response, auth, account.get());
                if (account.get().mustChangePassword() && !mayPassWhileChangeIsDue(request)) {
                    refuseUntilChanged(request, response);
                    return;
                }
            }
        }
        chain.doFilter(request, response);
    }

    private static boolean signedOutMeanwhile(AccountStore.Credentials account, HttpSession session) {
        if (session == null || account.sessionsValidAfter() == null) {
            return false;
        }
        Object at = session.getAttribute(SIGNED_IN_AT);
        Instant signedIn = at instanceof Instant i ? i : Instant.ofEpochMilli(session.getCreationTime());
        return signedIn.isBefore(account.sessionsValidAfter());
    }

    private void refreshRole(HttpServletRequest request, HttpServletResponse response, Authentication auth,
            AccountStore.Credentials account) {
        String authority = account.role().authority();
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

    /** While an admin's reset is pending: the password page and API, signing out, and what pages need to load. */
    private static boolean mayPassWhileChangeIsDue(HttpServletRequest request) {
        String path = request.getRequestURI().substring(request.getContextPath().length());
        return path.equals(OwnPasswordPageController.PAGE) || path.equals("/api/v1/accounts/me/password")
                || path.equals("/logout") || path.equals("/login") || path.equals("/error")
                || path.startsWith("/css/") || path.startsWith("/js/") || path.startsWith("/webjars/")
                || path.startsWith("/actuator/health") || path.equals("/favicon.ico");
    }

    private static void refuseUntilChanged(HttpServletRequest request, HttpServletResponse response)
            throws IOException {
        String path = request.getRequestURI().substring(request.getContextPath().length());
        if (path.startsWith("/api/") || request.getHeader("Authorization") != null) {
            response.setStatus(403);
            response.setContentType("application/problem+json");
            response.setCharacterEncoding("UTF-8");
            response.getWriter().write("{\"type\":\"urn:nodewright:problem:password-change-required\","
                    + "\"title\":\"Password change required\",\"status\":403,"
                    + "\"detail\":\"An admin reset this account's password: choose your own first with "
                    + "PUT /api/v1/accounts/me/password.\",\"instance\":"
                    + SecurityProblems.quote(request.getRequestURI()) + "}");
            return;
        }
        response.sendRedirect(request.getContextPath() + OwnPasswordPageController.PAGE + "?required");
    }
}
