package org.nodewright.aircolumns;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Properties;
import org.springframework.core.io.ClassPathResource;
import org.springframework.core.io.support.PropertiesLoaderUtils;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;

/**
 * The bore bench page. The page script asks the JSON API for every figure; this controller only
 * renders the page and hands it the names of the messages its script shows (keys {@code air.js.*}),
 * which the template resolves through the message source so they can be translated.
 */
@Controller
class AirColumnPagesController {

    static final String VIEW = "air-columns";
    static final String MESSAGES = "messages/aircolumns.properties";
    static final String SCRIPT_PREFIX = "air.js.";

    private final List<String> scriptKeys;

    AirColumnPagesController() {
        this.scriptKeys = loadScriptKeys();
    }

    @GetMapping("/air-columns")
    String page(Model model) {
        model.addAttribute("scriptKeys", scriptKeys);
        return VIEW;
    }

    private static List<String> loadScriptKeys() {
        try {
            Properties properties = PropertiesLoaderUtils.loadProperties(new ClassPathResource(MESSAGES));
            return properties.stringPropertyNames().stream()
                    .filter(k -> k.startsWith(SCRIPT_PREFIX))
                    .sorted()
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + MESSAGES, e);
        }
    }
}
