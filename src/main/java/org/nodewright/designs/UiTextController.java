package org.nodewright.designs;

import java.util.Collections;
import java.util.Locale;
import java.util.Map;
import java.util.ResourceBundle;
import java.util.TreeMap;
import org.springframework.context.MessageSource;
import org.springframework.http.CacheControl;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * The library's and the design bar's user-facing text (messages/designs.properties) for the
 * scripts, which run on pages that other benches render. Placeholders stay as {0}, {1}.
 */
@RestController
class UiTextController {

    private final MessageSource messages;

    UiTextController(MessageSource messages) {
        this.messages = messages;
    }

    @GetMapping("/api/v1/designs/ui-text")
    ResponseEntity<Map<String, String>> text(Locale locale) {
        ResourceBundle bundle = ResourceBundle.getBundle("messages/designs", Locale.ROOT);
        Map<String, String> out = new TreeMap<>();
        for (String key : Collections.list(bundle.getKeys())) {
            out.put(key, messages.getMessage(key, null, bundle.getString(key), locale));
        }
        return ResponseEntity.ok().cacheControl(CacheControl.noCache()).body(out);
    }
}
