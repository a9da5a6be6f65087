package org.nodewright.sharing;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import java.net.URI;
import java.security.Principal;
import java.util.List;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/** Accounts in LAN mode (admin only, see {@link LanSecurityConfig}). Listings never carry password material. */
@RestController
@RequestMapping("/api/v1/accounts")
@ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
class AccountController {

    record NewAccount(String username, String password, Role role) {
    }

    record RoleChange(@NotNull Role role) {
    }

    record EnabledChange(@NotNull Boolean enabled) {
    }

    record PasswordReset(String password) {
    }

    private final AccountService accounts;

    AccountController(AccountService accounts) {
        this.accounts = accounts;
    }

    @GetMapping
    List<Account> list() {
        return accounts.list();
    }

    @GetMapping("/{username}")
    Account one(@PathVariable String username) {
        return accounts.get(username);
    }

    @PostMapping
    ResponseEntity<Account> create(@RequestBody NewAccount body, Principal by) {
        Account created = accounts.create(body.username(), body.password(), body.role(), by.getName());
        return ResponseEntity.created(URI.create("/api/v1/accounts/" + created.username())).body(created);
    }

    @PutMapping("/{username}/role")
    Account changeRole(@PathVariable String username, @Valid @RequestBody RoleChange body, Principal by) {
        return accounts.changeRole(username, body.role(), by.getName());
    }

    @PutMapping("/{username}/enabled")
    Account setEnabled(@PathVariable String username, @Valid @RequestBody EnabledChange body, Principal by) {
        return accounts.setEnabled(username, body.enabled(), by.getName());
    }

    @PutMapping("/{username}/password")
    Account resetPassword(@PathVariable String username, @RequestBody PasswordReset body, Principal by) {
        return accounts.resetPassword(username, body.password(), by.getName());
    }

    /** Ends every open browser session of the account ("sign out everywhere"). */
    @PostMapping("/{username}/sign-out")
    ResponseEntity<Void> signOutEverywhere(@PathVariable String username, Principal by) {
        accounts.signOutEverywhere(username, by.getName());
        return ResponseEntity.noContent().build();
    }
}
