package org.nodewright.audit;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Arrays;
import java.util.Optional;

/** What an audit entry records; the word is what the API lists and the page filters by. */
public enum AuditAction {
    SIGN_IN("sign-in"),
    SIGN_IN_FAILED("sign-in-failed"),
    SIGN_IN_LOCKED("sign-in-locked"),
    SIGNED_OUT_EVERYWHERE("signed-out-everywhere"),
    PASSWORD_CHANGED("password-changed"),
    PASSWORD_CHANGE_FAILED("password-change-failed"),
    PASSWORD_RESET("password-reset"),
    ACCOUNT_CREATED("account-created"),
    ACCOUNT_ROLE_CHANGED("account-role-changed"),
    ACCOUNT_ENABLED("account-enabled"),
    ACCOUNT_DISABLED("account-disabled"),
    DESIGN_CREATED("design-created"),
    DESIGN_SAVED("design-saved"),
    DESIGN_DELETED("design-deleted"),
    DESIGN_RESTORED("design-restored"),
    DESIGN_IMPORTED("design-imported"),
    DEMO_LIBRARY_ADDED("demo-library-added"),
    BACKUP_TAKEN("backup-taken"),
    BACKUP_FAILED("backup-failed");

    private final String word;

    AuditAction(String word) {
        this.word = word;
    }

    @JsonValue
    public String word() {
        return word;
    }

    public static Optional<AuditAction> fromWord(String word) {
        return Arrays.stream(values()).filter(a -> a.word.equals(word)).findFirst();
    }
}
