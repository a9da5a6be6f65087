package org.nodewright.sharing;

import org.springframework.beans.factory.ObjectProvider;
import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.ui.Model;
import org.springframework.security.core.Authentication;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The sign-in page of LAN mode; on this machine only (no accounts) it leads back to the start page. */
@Controller
class LoginPageController {

    static final String VIEW = "login";

    private final SharingProperties properties;
    private final ObjectProvider<LanCertificate> certificate;

    LoginPageController(SharingProperties properties, ObjectProvider<LanCertificate> certificate) {
        this.properties = properties;
        this.certificate = certificate;
    }

    @GetMapping("/login")
    String login(Authentication authentication, Model model) {
        boolean signedIn = authentication != null && authentication.isAuthenticated()
                && !(authentication instanceof AnonymousAuthenticationToken);
        if (!properties.lan() || signedIn) {
            return "redirect:/";
        }
        LanCertificate cert = certificate.getIfAvailable();
        if (cert != null) {
            model.addAttribute("fingerprint", cert.fingerprint());
            model.addAttribute("selfSigned", cert.selfSigned());
        }
        return VIEW;
    }
}
