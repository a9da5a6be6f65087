package org.nodewright.sharing;

import jakarta.servlet.http.HttpServletRequest;
import java.security.Principal;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.ErrorResponseException;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/** The "Change your password" page (LAN mode): a plain form with the CSRF token, answered by a redirect. */
@Controller
@ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
class OwnPasswordPageController {

    static final String PAGE = "/account/password";
    static final String VIEW = "account-password";

    private final OwnAccountController.OwnPassword ownPassword;
    private final AccountStore store;

    OwnPasswordPageController(OwnAccountController.OwnPassword ownPassword, AccountStore store) {
        this.ownPassword = ownPassword;
        this.store = store;
    }

    @GetMapping(PAGE)
    String show(Principal me, Model model) {
        model.addAttribute("minPasswordLength", PasswordRule.MIN_LENGTH);
        model.addAttribute("mustChange", store.credentials(me.getName())
                .map(AccountStore.Credentials::mustChangePassword).orElse(false));
        return VIEW;
    }

    @PostMapping(PAGE)
    String change(@RequestParam(defaultValue = "") String currentPassword,
            @RequestParam(defaultValue = "") String newPassword, @RequestParam(defaultValue = "") String repeatPassword,
            Principal me, HttpServletRequest request, RedirectAttributes redirect) {
        try {
            if (!newPassword.equals(repeatPassword)) {
                throw new BadRequestException("repeatPassword", "does not match the new password");
            }
            ownPassword.change(me.getName(), currentPassword, newPassword, request);
            redirect.addFlashAttribute("notice", "sharing.password.changed");
        } catch (BadRequestException e) {
            FieldProblem first = e.problems().get(0);
            redirect.addFlashAttribute("problemField", first.field());
            redirect.addFlashAttribute("problem", first.message());
        } catch (ErrorResponseException e) {
            redirect.addFlashAttribute("problemField", e.getStatusCode().value() == 403 ? "currentPassword" : "");
            redirect.addFlashAttribute("problem", e.getBody().getDetail());
        }
        return "redirect:" + PAGE;
    }
}
