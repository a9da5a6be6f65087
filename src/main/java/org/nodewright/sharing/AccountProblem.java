package org.nodewright.sharing;

import java.util.List;
import org.nodewright.web.FieldProblem;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.web.ErrorResponseException;

/**
 * An account request that cannot be carried out as asked (unknown account: 404; taken username or
 * the last admin: 409). Answered as a problem document naming the field.
 */
class AccountProblem extends ErrorResponseException {

    private final String field;
    private final String reason;

    private AccountProblem(HttpStatus status, String title, String field, String reason) {
        super(status, problem(status, title, field, reason), null);
        this.field = field;
        this.reason = reason;
    }

    static AccountProblem notFound(String username) {
        return new AccountProblem(HttpStatus.NOT_FOUND, "No such account", "username",
                "no account is called '" + username + "'");
    }

    static AccountProblem conflict(String field, String reason) {
        return new AccountProblem(HttpStatus.CONFLICT, "Account conflict", field, reason);
    }

    String field() {
        return field;
    }

    String reason() {
        return reason;
    }

    private static ProblemDetail problem(HttpStatus status, String title, String field, String reason) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(status, field + ": " + reason);
        pd.setTitle(title);
        pd.setProperty("errors", List.of(new FieldProblem(field, reason)));
        return pd;
    }
}
