package org.nodewright.sharing;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.security.web.AuthenticationEntryPoint;
import org.springframework.security.web.access.AccessDeniedHandler;
import org.springframework.security.web.csrf.CsrfException;

/**
 * RFC 9457 answers of the security layer for API clients: 401 with a Basic challenge, 429 while a
 * sign-in is locked out, 403 for a missing role or CSRF token.
 */
final class SecurityProblems {

    static final String REALM = "Nodewright";

    private SecurityProblems() {
    }

    /** 401 (or 429 while locked out) as a problem document with {@code WWW-Authenticate: Basic}. */
    static AuthenticationEntryPoint unauthorized() {
        return (request, response, ex) -> {
            if (ex instanceof SignInLockedException locked) {
                long seconds = Math.max(1, locked.retryAfter().toSeconds());
                response.setHeader(HttpHeaders.RETRY_AFTER, Long.toString(seconds));
                write(request, response, 429, "Too many failed sign-ins",
                        "Too many failed sign-ins for this account or from this address; try again in "
                                + minutes(locked.retryAfter()) + ".");
                return;
            }
            response.setHeader(HttpHeaders.WWW_AUTHENTICATE, "Basic realm=\"" + REALM + "\", charset=\"UTF-8\"");
            String detail = request.getHeader(HttpHeaders.AUTHORIZATION) != null
                    ? "Wrong username or password, or the account is disabled."
                    : "Sign in first: send the username and password of a Nodewright account with HTTP Basic.";
            write(request, response, 401, "Sign-in required", detail);
        };
    }

    /** 403 as a problem document: signed in, but the role (or the CSRF token) is missing. */
    static AccessDeniedHandler forbidden() {
        return (request, response, ex) -> write(request, response, 403, "Forbidden", detail(ex));
    }

    private static String detail(AccessDeniedException ex) {
        if (ex instanceof CsrfException) {
            return "The CSRF token is missing or wrong: send the X-CSRF-TOKEN header of the signed-in page, "
                    + "or use HTTP Basic without a session.";
        }
        return "Your account's role does not allow this.";
    }

    private static String minutes(Duration d) {
        long m = Math.max(1, (d.toSeconds() + 59) / 60);
        return m == 1 ? "1 minute" : m + " minutes";
    }

    private static void write(HttpServletRequest request, HttpServletResponse response, int status, String title,
            String detail) throws IOException {
        response.setStatus(status);
        response.setContentType(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
        response.setCharacterEncoding(StandardCharsets.UTF_8.name());
        String body = "{\"type\":\"about:blank\",\"title\":" + quote(title) + ",\"status\":" + status
                + ",\"detail\":" + quote(detail) + ",\"instance\":" + quote(request.getRequestURI()) + "}";
        response.getWriter().write(body);
    }

    /** A JSON string literal. */
    static String quote(String s) {
        StringBuilder sb = new StringBuilder("\"");
        for (char c : s.toCharArray()) {
            switch (c) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                default -> {
                    if (c < 0x20 || c == '<' || c == '>' || c == '&') {
                        sb.append(String.format("\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.append('"').toString();
    }
}
