package org.nodewright.web;

import java.util.Locale;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;

/**
 * User-facing sentences from {@code messages/*.properties}. The physics core returns codes and
 * figures; each feature words them through here. Arguments are inserted as text, numbers in
 * Java's own notation ({@code 3000.0}, {@code 120}) so that a sentence reads exactly as the
 * figure is written elsewhere in the answer.
 *
 * <p>As with every Spring message: a text with arguments is a {@link java.text.MessageFormat}
 * pattern (write an apostrophe as {@code ''}); a text without arguments is taken as written.
 */
@Component
public class UserTexts {

    private final MessageSource messages;

    UserTexts(MessageSource messages) {
        this.messages = messages;
    }

    /** The text of {@code code} with its arguments; a missing key is a programming error (it throws). */
    public String get(String code, Object... args) {
        Object[] text = new Object[args.length];
        for (int i = 0; i < args.length; i++) {
            text[i] = args[i] instanceof Number || args[i] == null ? String.valueOf(args[i]) : args[i];
        }
        return messages.getMessage(code, text.length == 0 ? null : text, Locale.ROOT);
    }
}
