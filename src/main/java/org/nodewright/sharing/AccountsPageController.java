package org.nodewright.sharing;

import java.security.Principal;
import java.util.Optional;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * The admin's Accounts page: add an account, change its role, disable or enable it, reset its
 * password. Plain forms (with the CSRF token), each answered by a redirect back to the page.
 */
@Controller
@ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
class AccountsPageController {

    static final String VIEW = "admin-accounts";
    static final String PAGE = "/admin/accounts";
    private static final String BACK = "redirect:" + PAGE;

    private final AccountService accounts;
    private final LanCertificate certificate;

    AccountsPageController(AccountService accounts, LanCertificate certificate) {
        this.accounts = accounts;
        this.certificate = certificate;
    }

    @GetMapping(PAGE)
    String show(Model model) {
        model.addAttribute("fingerprint", certificate.fingerprint());
        model.addAttribute("selfSigned", certificate.selfSigned());
        model.addAttribute("accounts", accounts.list());
        model.addAttribute("roles", Role.values());
        model.addAttribute("minPasswordLength", AccountService.MIN_PASSWORD_LENGTH);
        return VIEW;
    }

    @PostMapping(PAGE)
    String add(@RequestParam(defaultValue = "") String username, @RequestParam(defaultValue = "") String password,
            @RequestParam(defaultValue = "") String role, Principal by, RedirectAttributes redirect) {
        return act(redirect, "sharing.notice.added", username,
                () -> accounts.create(username, password, role(role), by.getName()), true);
    }

    @PostMapping(PAGE + "/{username}/role")
    String changeRole(@PathVariable String username, @RequestParam(defaultValue = "") String role,
            Principal by, RedirectAttributes redirect) {
        return act(redirect, "sharing.notice.roleChanged", username,
                () -> accounts.changeRole(username, role(role), by.getName()), false);
    }

    @PostMapping(PAGE + "/{username}/enabled")
    String setEnabled(@PathVariable String username, @RequestParam boolean enabled, Principal by,
            RedirectAttributes redirect) {
        return act(redirect, enabled ? "sharing.notice.enabled" : "sharing.notice.disabled", username,
                () -> accounts.setEnabled(username, enabled, by.getName()), false);
    }

    @PostMapping(PAGE + "/{username}/password")
    String resetPassword(@PathVariable String username, @RequestParam(defaultValue = "") String password,
            Principal by, RedirectAttributes redirect) {
        return act(redirect, "sharing.notice.passwordReset", username,
                () -> accounts.resetPassword(username, password, by.getName()), false);
    }

    @PostMapping(PAGE + "/{username}/sign-out")
    String signOutEverywhere(@PathVariable String username, Principal by, RedirectAttributes redirect) {
        return act(redirect, "sharing.notice.signedOutEverywhere", username,
                () -> accounts.signOutEverywhere(username, by.getName()), false);
    }

    private String act(RedirectAttributes redirect, String notice, String username, Runnable action,
            boolean keepTyped) {
        try {
            action.run();
            redirect.addFlashAttribute("notice", notice);
            redirect.addFlashAttribute("noticeAccount", username);
        } catch (BadRequestException e) {
            FieldProblem first = e.problems().get(0);
            problem(redirect, username, first.field(), first.message());
            if (keepTyped) {
                redirect.addFlashAttribute("typedUsername", username);
            }
        } catch (AccountProblem e) {
            problem(redirect, username, e.field(), e.reason());
            if (keepTyped) {
                redirect.addFlashAttribute("typedUsername", username);
            }
        }
        return BACK;
    }

    private static void problem(RedirectAttributes redirect, String username, String field, String message) {
        redirect.addFlashAttribute("problemAccount", username);
        redirect.addFlashAttribute("problemField", field);
        redirect.addFlashAttribute("problem", message);
    }

    private static Role role(String word) {
        Optional<Role> role = Role.fromWord(word);
        if (role.isEmpty()) {
            throw new BadRequestException("role", "choose viewer, editor or admin");
        }
        return role.get();
    }
}
