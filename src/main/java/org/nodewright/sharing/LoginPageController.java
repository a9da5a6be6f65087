package org.nodewright.sharing;

import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The sign-in page of LAN mode; on this machine only (no accounts) it leads back to the start page. */
@Controller
class LoginPageController {

    static final String VIEW = "login";

    private final SharingProperties properties;

    LoginPageController(SharingProperties properties) {
        this.properties = properties;
    }

    @GetMapping("/login")
    String login(Authentication authentication) {
        boolean signedIn = authentication != null && authentication.isAuthenticated()
                && !(authentication instanceof AnonymousAuthenticationToken);
        if (!properties.lan() || signedIn) {
            return "redirect:/";
        }
        return VIEW;
    }
}
