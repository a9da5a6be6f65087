package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.nodewright.NodewrightWebTest;
import org.nodewright.TemporaryDataDirectory;
import org.nodewright.TestProperties;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.core.env.Environment;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockHttpSession;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.test.context.ContextConfiguration;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * LAN mode end to end through the security filter chain, with the real schema and BCrypt. A mock
 * environment, not {@link NodewrightWebTest}'s real server: LAN mode would listen on every interface.
 */
@SpringBootTest(properties = {"app.sharing.lan=true", "app.sharing.admin-password=" + LanModeSecurityTest.ADMIN_PW,
    TestProperties.NO_WARM_UP, TestProperties.NO_BANNER})
@AutoConfigureMockMvc
@ContextConfiguration(initializers = TemporaryDataDirectory.class)
class LanModeSecurityTest {

    static final String ADMIN_PW = "harrowgate-admin-1";
    private static final AtomicInteger NAMES = new AtomicInteger();
    private static final AtomicInteger ADDRESSES = new AtomicInteger(10);

    @Autowired
    MockMvc mvc;
    @Autowired
    JdbcClient jdbc;
    @Autowired
    Environment environment;

    // --- without an account -------------------------------------------------------------------

    @Test
    void apiCallsWithoutAnAccountGet401ProblemsWithABasicChallenge() throws Exception {
        for (MockHttpServletRequestBuilder request : new MockHttpServletRequestBuilder[] {
                get("/api/v1/accounts"), get("/api/v1/materials"),
                post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON).content(designJson("Unsigned")),
                put("/api/v1/designs/1").contentType(MediaType.APPLICATION_JSON).content("{}"),
                post("/api/v1/strings/analyze").contentType(MediaType.APPLICATION_JSON).content("{}")}) {
            mvc.perform(request)
                    .andExpect(status().isUnauthorized())
                    .andExpect(header().string("WWW-Authenticate", org.hamcrest.Matchers.startsWith("Basic ")))
                    .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                    .andExpect(jsonPath("$.status").value(401));
        }
    }

    @Test
    void aWrongPasswordIs401AndNoWriteHappens() throws Exception {
        String editor = newAccount("editor");
        mvc.perform(post("/api/v1/designs").with(httpBasic(editor, "not-the-password")).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON).content(designJson("Wrong password")))
                .andExpect(status().isUnauthorized())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
        assertThat(designsNamed("Wrong password")).isZero();
    }

    @Test
    void pagesWithoutAnAccountRedirectToTheSignInPage() throws Exception {
        mvc.perform(get("/")).andExpect(status().isFound()).andExpect(redirectedUrl("/login"));
        mvc.perform(get("/admin/accounts")).andExpect(status().isFound()).andExpect(redirectedUrl("/login"));
        String html = mvc.perform(get("/login")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
        assertThat(html).contains("id=\"login-form\"").contains("name=\"_csrf\"");
    }

    @Test
    void healthStaysOpenForMonitoringButShowsNoDetails() throws Exception {
        mvc.perform(get("/actuator/health")).andExpect(status().isOk()).andExpect(jsonPath("$.status").value("UP"))
                .andExpect(jsonPath("$.components").doesNotExist());
    }

    // --- roles --------------------------------------------------------------------------------

    @Test
    void aViewerReadsAndAnalysesButGets403ForWritingADesign() throws Exception {
        String viewer = newAccount("viewer");
        mvc.perform(post("/api/v1/designs").with(httpBasic(viewer, pw(viewer)))
                        .contentType(MediaType.APPLICATION_JSON).content(designJson("Viewer's try")))
                .andExpect(status().isForbidden())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.status").value(403));
        mvc.perform(put("/api/v1/designs/1").with(httpBasic(viewer, pw(viewer)))
                .contentType(MediaType.APPLICATION_JSON).content("{}")).andExpect(status().isForbidden());
        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete("/api/v1/designs/1")
                .with(httpBasic(viewer, pw(viewer)))).andExpect(status().isForbidden());
        assertThat(designsNamed("Viewer's try")).isZero();
        // Analyses are reads: the security layer lets them through (whatever the endpoint then says).
        mvc.perform(post("/api/v1/strings/analyze").with(httpBasic(viewer, pw(viewer)))
                        .contentType(MediaType.APPLICATION_JSON).content(STRING_REQUEST))
                .andExpect(status().isOk()).andExpect(jsonPath("$.fundamentalHz").isNumber());
        mvc.perform(get("/api/v1/designs").with(httpBasic(viewer, pw(viewer)))).andExpect(status().isOk());
        mvc.perform(get("/api/v1/accounts").with(httpBasic(viewer, pw(viewer)))).andExpect(status().isForbidden());
    }

    @Test
    void anEditorMayWriteDesignsButNotManageAccounts() throws Exception {
        String editor = newAccount("editor");
        String created = mvc.perform(post("/api/v1/designs").with(httpBasic(editor, pw(editor)))
                        .contentType(MediaType.APPLICATION_JSON).content(designJson("Editor's archtop")))
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.author").value(editor))
                .andReturn().getResponse().getContentAsString();
        assertThat(designsNamed("Editor's archtop")).isEqualTo(1);
        long id = Long.parseLong(created.replaceAll(".*\"id\":(\\d+).*", "$1"));
        String viewer = newAccount("viewer");
        mvc.perform(get("/api/v1/designs/" + id).with(httpBasic(viewer, pw(viewer))))
                .andExpect(status().isOk()).andExpect(jsonPath("$.name").value("Editor's archtop"));
        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete("/api/v1/designs/" + id)
                .with(httpBasic(viewer, pw(viewer)))).andExpect(status().isForbidden());
        mvc.perform(post("/api/v1/designs/" + id + "/revisions/1/restore").with(httpBasic(viewer, pw(viewer))))
                .andExpect(status().isForbidden());
        assertThat(designsNamed("Editor's archtop")).isEqualTo(1);
        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete("/api/v1/designs/" + id)
                .with(httpBasic(editor, pw(editor)))).andExpect(status().is2xxSuccessful());
        assertThat(designsNamed("Editor's archtop")).isZero();

        mvc.perform(post("/api/v1/accounts").with(httpBasic(editor, pw(editor)))
                        .contentType(MediaType.APPLICATION_JSON)
                        .content(accountJson("sneaky" + NAMES.incrementAndGet(), "long-enough-pw", "admin")))
                .andExpect(status().isForbidden());
        mvc.perform(get("/admin/accounts").with(httpBasic(editor, pw(editor)))).andExpect(status().isForbidden());
    }

    @Test
    void theAdminManagesAccountsAndListingsCarryNoPasswordMaterial() throws Exception {
        String name = "bench" + NAMES.incrementAndGet();
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content(accountJson(name, "spruce-top-42", "viewer")))
                .andExpect(status().isCreated())
                .andExpect(header().string("Location", "/api/v1/accounts/" + name))
                .andExpect(jsonPath("$.username").value(name))
                .andExpect(jsonPath("$.role").value("viewer"))
                .andExpect(jsonPath("$.enabled").value(true));
        String listing = mvc.perform(get("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW)))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        assertThat(listing).contains("\"" + name + "\"").contains("\"admin\"")
                .doesNotContainIgnoringCase("password").doesNotContain("$2a$").doesNotContain("$2b$")
                .doesNotContain("spruce-top-42").doesNotContain(ADMIN_PW);
        // Stored as a BCrypt hash, checked with Spring Security's reference BCrypt implementation.
        String hash = jdbc.sql("SELECT password_hash FROM accounts WHERE username = ?").param(name)
                .query(String.class).single();
        assertThat(hash).startsWith("$2a$10$").doesNotContain("spruce-top-42");
        assertThat(new BCryptPasswordEncoder().matches("spruce-top-42", hash)).isTrue();

        mvc.perform(put("/api/v1/accounts/" + name + "/role").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"role\":\"editor\"}"))
                .andExpect(status().isOk()).andExpect(jsonPath("$.role").value("editor"));
        mvc.perform(put("/api/v1/accounts/" + name + "/password").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"password\":\"maple-back-77\"}"))
                .andExpect(status().isOk()).andExpect(jsonPath("$.password").doesNotExist());
        // The reset password signs in, but until the account chose its own only the password change is open.
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "maple-back-77")).with(from(nextAddress())))
                .andExpect(status().isForbidden())
                .andExpect(jsonPath("$.title").value("Password change required"));
        mvc.perform(put("/api/v1/accounts/me/password").with(httpBasic(name, "maple-back-77")).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON)
                        .content("{\"currentPassword\":\"maple-back-77\",\"newPassword\":\"maple-back-78\"}"))
                .andExpect(status().isNoContent());
        mvc.perform(get("/api/v1/accounts/" + name).with(httpBasic(name, "maple-back-78")).with(from(nextAddress())))
                .andExpect(status().isForbidden()); // signed in (new password works) but not an admin
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress())))
                .andExpect(status().isUnauthorized()); // the old password no longer does
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "maple-back-77")).with(from(nextAddress())))
                .andExpect(status().isUnauthorized()); // nor the one the admin set

        mvc.perform(put("/api/v1/accounts/" + name + "/enabled").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"enabled\":false}"))
                .andExpect(status().isOk()).andExpect(jsonPath("$.enabled").value(false));
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "maple-back-78")).with(from(nextAddress())))
                .andExpect(status().isUnauthorized());
        mvc.perform(put("/api/v1/accounts/" + name + "/enabled").with(httpBasic("admin", ADMIN_PW))
                .contentType(MediaType.APPLICATION_JSON).content("{\"enabled\":true}")).andExpect(status().isOk());
        int back = mvc.perform(get("/api/v1/designs").with(httpBasic(name, "maple-back-78")).with(from(nextAddress())))
                .andReturn().getResponse().getStatus();
        // Re-enabled, the account lists designs again: exactly 200 (the contract's answer to
        // GET /api/v1/designs), not merely "not refused", which would let a 500 through.
        assertThat(back).isEqualTo(200);
    }

    @Test
    void badAccountRequestsAre400sNamingTheField() throws Exception {
        String fresh = "fresh" + NAMES.incrementAndGet();
        expectFieldError(accountJson(fresh, "short", "viewer"), "password");
        expectFieldError(accountJson("Upper Case", "long-enough-pw", "viewer"), "username");
        expectFieldError(accountJson(fresh, "long-enough-pw", "owner"), "role");
        expectFieldError("{\"username\":\"" + fresh + "\",\"password\":\"long-enough-pw\"}", "role");
        expectFieldError("{\"username\":\"" + fresh + "\",\"password\":\"" + "é".repeat(37) + "\",\"role\":\"viewer\"}",
                "password"); // 74 bytes: more than BCrypt reads
        assertThat(jdbc.sql("SELECT COUNT(*) FROM accounts WHERE username = ?").param(fresh).query(Long.class).single())
                .isZero();
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW)).contentType(MediaType.APPLICATION_JSON)
                        .content(accountJson("admin", "long-enough-pw", "viewer")))
                .andExpect(status().isConflict()).andExpect(jsonPath("$.errors[0].field").value("username"));
        mvc.perform(put("/api/v1/accounts/nobody-here/role").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"role\":\"editor\"}"))
                .andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
    }

    @Test
    void theLastEnabledAdminCannotBeDisabledOrDemoted() throws Exception {
        long admins = jdbc.sql("SELECT COUNT(*) FROM accounts WHERE role = 'admin' AND enabled = TRUE")
                .query(Long.class).single();
        assertThat(admins).isEqualTo(1);
        mvc.perform(put("/api/v1/accounts/admin/enabled").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"enabled\":false}"))
                .andExpect(status().isConflict()).andExpect(jsonPath("$.errors[0].field").value("enabled"));
        mvc.perform(put("/api/v1/accounts/admin/role").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"role\":\"viewer\"}"))
                .andExpect(status().isConflict()).andExpect(jsonPath("$.errors[0].field").value("role"));
    }

    // --- CSRF ---------------------------------------------------------------------------------

    @Test
    void csrfIsEnforcedOnFormsAndOnBrowserSessions() throws Exception {
        mvc.perform(post("/login").param("username", "admin").param("password", ADMIN_PW))
                .andExpect(status().isForbidden()); // sign-in form without its token
        MockHttpSession session = signIn("admin", ADMIN_PW);
        String name = "formmade" + NAMES.incrementAndGet();
        mvc.perform(post("/admin/accounts").session(session)
                        .param("username", name).param("password", "long-enough-pw").param("role", "editor"))
                .andExpect(status().isForbidden());
        mvc.perform(post("/admin/accounts").session(session).param("_csrf", "forged-token")
                        .param("username", name).param("password", "long-enough-pw").param("role", "editor"))
                .andExpect(status().isForbidden());
        assertThat(accountExists(name)).isFalse();
        mvc.perform(post("/admin/accounts").session(session).with(csrf())
                        .param("username", name).param("password", "long-enough-pw").param("role", "editor"))
                .andExpect(status().isFound()).andExpect(redirectedUrl("/admin/accounts"));
        assertThat(accountExists(name)).isTrue();

        // The same browser session calling the JSON API needs the X-CSRF-TOKEN header too.
        String other = "fetchmade" + NAMES.incrementAndGet();
        mvc.perform(post("/api/v1/accounts").session(session).contentType(MediaType.APPLICATION_JSON)
                        .content(accountJson(other, "long-enough-pw", "viewer")))
                .andExpect(status().isForbidden())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
        mvc.perform(post("/api/v1/accounts").session(session).with(csrf().asHeader())
                        .contentType(MediaType.APPLICATION_JSON).content(accountJson(other, "long-enough-pw", "viewer")))
                .andExpect(status().isCreated());
        // Sign-out is a POST with the token as well.
        mvc.perform(post("/logout").session(session)).andExpect(status().isForbidden());
        mvc.perform(post("/logout").session(session).with(csrf())).andExpect(redirectedUrl("/login?signedOut"));
    }

    @Test
    void basicClientsWithoutASessionNeedNoTokenButCrossSiteBrowserRequestsDo() throws Exception {
        String plain = "scripted" + NAMES.incrementAndGet();
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content(accountJson(plain, "long-enough-pw", "viewer")))
                .andExpect(status().isCreated());
        // A browser that cached Basic credentials would attach them to a forged cross-site POST.
        String forged = "forged" + NAMES.incrementAndGet();
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW)).header("Sec-Fetch-Site", "cross-site")
                        .contentType(MediaType.APPLICATION_JSON).content(accountJson(forged, "long-enough-pw", "admin")))
                .andExpect(status().isForbidden());
        mvc.perform(post("/admin/accounts").with(httpBasic("admin", ADMIN_PW)).header("Sec-Fetch-Site", "same-site")
                        .param("username", forged).param("password", "long-enough-pw").param("role", "admin"))
                .andExpect(status().isForbidden());
        assertThat(accountExists(forged)).isFalse();
    }

    // --- sign-in, sessions, lockout -------------------------------------------------------------

    @Test
    void formSignInShowsWhoIsSignedInAndASignOutButton() throws Exception {
        String editor = newAccount("editor");
        mvc.perform(post("/login").with(csrf()).with(from(nextAddress()))
                        .param("username", editor).param("password", "wrong-password"))
                .andExpect(redirectedUrl("/login?error"));
        MockHttpSession session = signIn(editor, pw(editor));
        String html = mvc.perform(get("/").session(session)).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
        assertThat(html).contains("id=\"signed-in-as\"").contains("Signed in as " + editor).contains("id=\"sign-out\"")
                .doesNotContain("id=\"accounts-link\"");
        String adminHtml = mvc.perform(get("/").session(signIn("admin", ADMIN_PW)))
                .andReturn().getResponse().getContentAsString();
        assertThat(adminHtml).contains("id=\"accounts-link\"");
    }

    @Test
    void aDisabledAccountIsSignedOutAndARoleChangeAppliesAtOnce() throws Exception {
        String name = newAccount("viewer");
        MockHttpSession session = signIn(name, pw(name));
        mvc.perform(get("/api/v1/accounts").session(session)).andExpect(status().isForbidden());
        mvc.perform(put("/api/v1/accounts/" + name + "/role").with(httpBasic("admin", ADMIN_PW))
                .contentType(MediaType.APPLICATION_JSON).content("{\"role\":\"admin\"}")).andExpect(status().isOk());
        mvc.perform(get("/api/v1/accounts").session(session)).andExpect(status().isOk());
        mvc.perform(put("/api/v1/accounts/" + name + "/enabled").with(httpBasic("admin", ADMIN_PW))
                .contentType(MediaType.APPLICATION_JSON).content("{\"enabled\":false}")).andExpect(status().isOk());
        mvc.perform(get("/").session(session)).andExpect(redirectedUrl("/login"));
        mvc.perform(post("/login").with(csrf()).with(from(nextAddress()))
                .param("username", name).param("password", pw(name))).andExpect(redirectedUrl("/login?error"));
    }

    @Test
    void fiveFailedSignInsLockTheUsernameEvenForTheRightPassword() throws Exception {
        String name = newAccount("editor");
        for (int i = 0; i < 5; i++) {
            mvc.perform(get("/api/v1/materials").with(httpBasic(name, "guess-" + i)).with(from(nextAddress())))
                    .andExpect(status().isUnauthorized());
        }
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, pw(name))).with(from(nextAddress())))
                .andExpect(status().isTooManyRequests())
                .andExpect(header().exists("Retry-After"))
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
        mvc.perform(post("/login").with(csrf()).with(from(nextAddress()))
                .param("username", name).param("password", pw(name))).andExpect(redirectedUrl("/login?locked"));
        String page = mvc.perform(get("/login").param("locked", "")).andReturn().getResponse().getContentAsString();
        assertThat(page).contains("id=\"login-locked\"");
    }

    @Test
    void fiveFailedSignInsFromOneAddressLockThatAddressForEveryName() throws Exception {
        String address = nextAddress();
        for (int i = 0; i < 5; i++) {
            mvc.perform(post("/login").with(csrf()).with(from(address))
                    .param("username", "stranger" + NAMES.incrementAndGet()).param("password", "guess"))
                    .andExpect(redirectedUrl("/login?error"));
        }
        mvc.perform(get("/api/v1/materials").with(httpBasic("admin", ADMIN_PW)).with(from(address)))
                .andExpect(status().isTooManyRequests());
        int elsewhere = mvc.perform(get("/api/v1/materials").with(httpBasic("admin", ADMIN_PW))
                .with(from(nextAddress()))).andReturn().getResponse().getStatus();
        // Another address is not locked: the materials list answers 200 as for anyone signed in.
        assertThat(elsewhere).isEqualTo(200);
    }

    // --- headers, console, admin page ---------------------------------------------------------

    @Test
    void securityHeadersAreSetAndNoDatabaseConsoleIsServed() throws Exception {
        mvc.perform(get("/login"))
                .andExpect(header().string("X-Content-Type-Options", "nosniff"))
                .andExpect(header().string("X-Frame-Options", "DENY"))
                .andExpect(header().string("Referrer-Policy", "same-origin"))
                .andExpect(header().string("Content-Security-Policy",
                        org.hamcrest.Matchers.containsString("frame-ancestors 'none'")));
        mvc.perform(get("/h2-console").with(httpBasic("admin", ADMIN_PW))).andExpect(status().isForbidden());
        mvc.perform(get("/h2-console/login.do").with(httpBasic("admin", ADMIN_PW))).andExpect(status().isForbidden());
        assertThat(environment.getProperty("spring.h2.console.enabled")).isEqualTo("false");
    }

    @Test
    void theAccountsPageAddsReRolesDisablesAndResetsWithEscapedNames() throws Exception {
        MockHttpSession session = signIn("admin", ADMIN_PW);
        String name = "page" + NAMES.incrementAndGet();
        assertThat(submit(session, "/admin/accounts", "username", name, "password", "long-enough-pw", "role", "viewer"))
                .contains("Account " + name + " added.").contains("data-account=\"" + name + "\"");
        assertThat(submit(session, "/admin/accounts/" + name + "/role", "role", "editor"))
                .contains("Role of " + name + " changed.");
        assertThat(submit(session, "/admin/accounts/" + name + "/enabled", "enabled", "false"))
                .contains("Account " + name + " disabled");
        assertThat(submit(session, "/admin/accounts/" + name + "/password", "password", "fresh-password-9"))
                .contains("Password of " + name + " reset.");
        var row = jdbc.sql("SELECT role, enabled, password_hash FROM accounts WHERE username = ?").param(name)
                .query((rs, n) -> new Object[] {rs.getString(1), rs.getBoolean(2), rs.getString(3)}).single();
        assertThat(row[0]).isEqualTo("editor");
        assertThat(row[1]).isEqualTo(false);
        assertThat(new BCryptPasswordEncoder().matches("fresh-password-9", (String) row[2])).isTrue();

        assertThat(submit(session, "/admin/accounts/" + name + "/password", "password", "short"))
                .contains("id=\"accounts-problem\"").contains("at least 8 characters");
        // A refused name comes back as text, never as markup.
        String html = submit(session, "/admin/accounts", "username", "<script>x</script>", "password",
                "long-enough-pw", "role", "viewer");
        assertThat(html).contains("id=\"accounts-problem\"").doesNotContain("<script>x</script>")
                .contains("&lt;script&gt;x&lt;/script&gt;");
    }

    /** Posts a form on the accounts page (with its CSRF token) and returns the page it redirects to. */
    private String submit(MockHttpSession session, String path, String... params) throws Exception {
        var post = post(path).session(session).with(csrf());
        for (int i = 0; i < params.length; i += 2) {
            post.param(params[i], params[i + 1]);
        }
        mvc.perform(post).andExpect(status().isFound()).andExpect(redirectedUrl("/admin/accounts"));
        return mvc.perform(get("/admin/accounts").session(session)).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
    }

    @Test
    void theServerListensOnAllInterfacesInLanMode() {
        assertThat(environment.getProperty("server.address")).isEqualTo("0.0.0.0");
    }

    // --- helpers ------------------------------------------------------------------------------

    private void expectFieldError(String body, String field) throws Exception {
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.errors[0].field").value(field));
    }

    /** Creates an account through the API as admin; its password is {@link #pw(String)}. */
    private String newAccount(String role) throws Exception {
        String name = role + NAMES.incrementAndGet();
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW))
                        .contentType(MediaType.APPLICATION_JSON).content(accountJson(name, pw(name), role)))
                .andExpect(status().isCreated());
        return name;
    }

    private static String pw(String name) {
        return name + "-workshop-pw";
    }

    private MockHttpSession signIn(String username, String password) throws Exception {
        var result = mvc.perform(post("/login").with(csrf()).with(from(nextAddress()))
                        .param("username", username).param("password", password))
                .andExpect(status().isFound()).andExpect(redirectedUrl("/")).andReturn();
        return (MockHttpSession) result.getRequest().getSession(false);
    }

    private boolean accountExists(String name) {
        return jdbc.sql("SELECT COUNT(*) FROM accounts WHERE username = ?").param(name).query(Long.class).single() > 0;
    }

    private long designsNamed(String name) {
        boolean table = jdbc.sql("SELECT COUNT(*) FROM INFORMATION_SCHEMA.TABLES WHERE LOWER(TABLE_NAME) = 'designs'")
                .query(Long.class).single() > 0;
        return table ? jdbc.sql("SELECT COUNT(*) FROM designs WHERE name = ?").param(name).query(Long.class).single()
                : 0;
    }

    private static String accountJson(String username, String password, String role) {
        return "{\"username\":\"" + username + "\",\"password\":\"" + password + "\",\"role\":\"" + role + "\"}";
    }

    /** The contract's example string request (650 mm, 70 N, plain steel 0.30 mm). */
    private static final String STRING_REQUEST = "{\"lengthMm\":650.0,\"tensionN\":70.0,"
            + "\"material\":\"plain-steel\",\"diameterMm\":0.3,\"modeCount\":12}";

    private static String designJson(String name) {
        return "{\"name\":\"" + name + "\",\"kind\":\"string\",\"parameters\":" + STRING_REQUEST + "}";
    }

    private static String nextAddress() {
        return "10.0.7." + ADDRESSES.incrementAndGet();
    }

    private static RequestPostProcessor from(String address) {
        return request -> {
            request.setRemoteAddr(address);
            return request;
        };
    }
}
