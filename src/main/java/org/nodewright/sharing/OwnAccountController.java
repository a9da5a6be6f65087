package org.nodewright.sharing;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpSession;
import java.net.URI;
import java.security.Principal;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.nodewright.web.FieldProblem;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.web.ErrorResponseException;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * {@code PUT /api/v1/accounts/me/password}: the signed-in account changes its own password. 204 when
 * done; 403 for a wrong current password, which counts as a failed sign-in of the account and the
 * address; 429 while they are locked out; 400 naming {@code newPassword} when the new one breaks
 * {@link PasswordRule}.
 */
@RestController
@ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
class OwnAccountController {

    record PasswordChange(String currentPassword, String newPassword) {
    }

    private final OwnPassword ownPassword;

    OwnAccountController(OwnPassword ownPassword) {
        this.ownPassword = ownPassword;
    }

    @PutMapping("/api/v1/accounts/me/password")
    ResponseEntity<Void> change(@RequestBody PasswordChange body, Principal me, HttpServletRequest request) {
        ownPassword.change(me.getName(), body.currentPassword(), body.newPassword(), request);
        return ResponseEntity.noContent().build();
    }

    /** The part shared by the JSON endpoint and the page: throttle, check, change, keep this session. */
    @org.springframework.stereotype.Component
    @ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
    static class OwnPassword {

        private final AccountService accounts;
        private final LoginThrottle throttle;

        OwnPassword(AccountService accounts, LoginThrottle throttle) {
            this.accounts = accounts;
            this.throttle = throttle;
        }

        void change(String username, String current, String next, HttpServletRequest request) {
            String userKey = LoginThrottle.userKey(username);
            String addressKey = LoginThrottle.addressKey(request.getRemoteAddr());
            Optional<Duration> locked = throttle.lockedFor(userKey).or(() -> throttle.lockedFor(addressKey));
            if (locked.isPresent()) {
                throw lockedOut(locked.get());
            }
            Instant now = AccountService.now();
            AccountService.OwnChange outcome = accounts.changeOwnPassword(username, current, next, now);
            if (outcome == AccountService.OwnChange.WRONG_CURRENT) {
                throttle.failed(userKey);
                throttle.failed(addressKey);
                throw wrongCurrent();
            }
            HttpSession session = request.getSession(false);
            if (session != null) {
                session.setAttribute(AccountRefreshFilter.SIGNED_IN_AT, now);
            }
        }

        private static ErrorResponseException wrongCurrent() {
            ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.FORBIDDEN,
                    "The current password is wrong; nothing was changed. This counts as a failed sign-in.");
            pd.setTitle("Wrong current password");
            pd.setType(URI.create("urn:nodewright:problem:wrong-current-password"));
            pd.setProperty("errors", List.of(new FieldProblem("currentPassword", "is wrong")));
            return new ErrorResponseException(HttpStatus.FORBIDDEN, pd, null);
        }

        private static ErrorResponseException lockedOut(Duration retryAfter) {
            ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.TOO_MANY_REQUESTS,
                    "Too many failed sign-ins for this account or from this address; try again later.");
            pd.setTitle("Too many failed sign-ins");
            ErrorResponseException e = new ErrorResponseException(HttpStatus.TOO_MANY_REQUESTS, pd, null);
            e.getHeaders().set(HttpHeaders.RETRY_AFTER, Long.toString(Math.max(1, retryAfter.toSeconds())));
            return e;
        }
    }
}
