package org.nodewright.sharing;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import org.nodewright.web.BadRequestException;

/**
 * The password rule, the same for new accounts, resets and changes of one's own password:
 * <ul>
 * <li>at least {@value #MIN_LENGTH} characters (NIST SP 800-63B, 5.1.1.2: user-chosen secrets of at
 *     least 8 characters);</li>
 * <li>at most {@value #MAX_BYTES} bytes in UTF-8 (BCrypt reads no further; longer ones are
 *     refused, not cut);</li>
 * <li>not only spaces, not the account's own name;</li>
 * <li>not on the short list of common passwords shipped with the app
 *     ({@code sharing/common-passwords.txt}; SP 800-63B asks for a check against such a list),
 *     compared ignoring case.</li>
 * </ul>
 */
final class PasswordRule {

    static final int MIN_LENGTH = 8;
    static final int MAX_BYTES = 72;
    static final String LIST = "/sharing/common-passwords.txt";
    private static final Set<String> COMMON = load();

    private PasswordRule() {
    }

    /** Throws a 400 naming {@code field} when {@code password} breaks the rule. */
    static void check(String field, String password, String username) {
        String problem = problem(password, username);
        if (problem != null) {
            throw new BadRequestException(field, problem);
        }
    }

    /** What is wrong with the password, or null when it passes. */
    static String problem(String password, String username) {
        if (password == null || password.isEmpty()) {
            return "is required";
        }
        if (password.codePointCount(0, password.length()) < MIN_LENGTH) {
            return "must be at least " + MIN_LENGTH + " characters";
        }
        if (password.getBytes(StandardCharsets.UTF_8).length > MAX_BYTES) {
            return "must be at most " + MAX_BYTES + " bytes (UTF-8)";
        }
        if (password.isBlank()) {
            return "must not be only spaces";
        }
        String lower = password.toLowerCase(Locale.ROOT);
        if (username != null && !username.isBlank() && lower.equals(username.toLowerCase(Locale.ROOT))) {
            return "must not be the account's name";
        }
        if (COMMON.contains(lower)) {
            return "is one of the most common passwords; choose a longer phrase of your own";
        }
        return null;
    }

    static boolean isCommon(String password) {
        return password != null && COMMON.contains(password.toLowerCase(Locale.ROOT));
    }

    static int listSize() {
        return COMMON.size();
    }

    private static Set<String> load() {
        Set<String> out = new HashSet<>();
        try (InputStream in = PasswordRule.class.getResourceAsStream(LIST)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + LIST);
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line; (line = reader.readLine()) != null; ) {
                String t = line.strip();
                if (!t.isEmpty() && !t.startsWith("#")) {
                    out.add(t.toLowerCase(Locale.ROOT));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return Set.copyOf(out);
    }
}
