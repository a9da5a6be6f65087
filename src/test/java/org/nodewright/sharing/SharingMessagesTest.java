package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** Every message key the sharing pages and controllers use exists, so no page shows a raw key. */
class SharingMessagesTest {

    private static final Pattern TEMPLATE_KEY = Pattern.compile("#\\{'?(sharing\\.[A-Za-z.]+)'?[}(]");
    private static final Pattern CODE_KEY = Pattern.compile("\"(sharing\\.notice\\.[A-Za-z]+)\"");

    private static Properties messages() throws IOException {
        Properties p = new Properties();
        try (InputStream in = SharingMessagesTest.class.getResourceAsStream("/messages/sharing.properties")) {
            p.load(new java.io.InputStreamReader(in, StandardCharsets.UTF_8));
        }
        return p;
    }

    private static List<String> keys(Path file, Pattern pattern) throws IOException {
        List<String> keys = new ArrayList<>();
        Matcher m = pattern.matcher(Files.readString(file));
        while (m.find()) {
            keys.add(m.group(1));
        }
        return keys;
    }

    @Test
    void everyKeyUsedByTheSharingPagesExists() throws IOException {
        Properties messages = messages();
        List<String> used = new ArrayList<>();
        for (String template : List.of("login.html", "admin-accounts.html", "error/403.html", "fragments/layout.html")) {
            used.addAll(keys(Path.of("src/main/resources/templates", template), TEMPLATE_KEY));
        }
        used.addAll(keys(Path.of("src/main/java/org/nodewright/sharing/AccountsPageController.java"), CODE_KEY));
        assertThat(used).hasSizeGreaterThan(30);
        for (Role role : Role.values()) {
            used.add("sharing.role." + role.word());
        }
        assertThat(used).allSatisfy(key -> assertThat(messages.getProperty(key)).as(key).isNotBlank());
    }
}
