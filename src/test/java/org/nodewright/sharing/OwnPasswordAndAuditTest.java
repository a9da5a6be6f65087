package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.nodewright.TemporaryDataDirectory;
import org.nodewright.TestProperties;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpSession;
import org.springframework.test.context.ContextConfiguration;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;
import tools.jackson.databind.json.JsonMapper;

/** LAN mode: changing one's own password, an admin's reset, signing out everywhere, and the audit trail. */
@SpringBootTest(properties = {"app.sharing.lan=true", "app.sharing.admin-password=" + OwnPasswordAndAuditTest.ADMIN_PW,
        "app.sharing.max-failures=3", TestProperties.NO_WARM_UP, TestProperties.NO_BANNER})
@AutoConfigureMockMvc
@ContextConfiguration(initializers = TemporaryDataDirectory.class)
class OwnPasswordAndAuditTest {

    static final String ADMIN_PW = "harrowgate-admin-9";
    private static final AtomicInteger NAMES = new AtomicInteger();
    private static final AtomicInteger ADDRESSES = new AtomicInteger(10);


    @Autowired
    MockMvc mvc;
    @Autowired
    JsonMapper mapper;

    private String newAccount(String role, String password) throws Exception {
        String name = "maker-" + NAMES.incrementAndGet();
        mvc.perform(post("/api/v1/accounts").with(httpBasic("admin", ADMIN_PW)).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON)
                        .content("{\"username\":\"" + name + "\",\"password\":\"" + password + "\",\"role\":\"" + role + "\"}"))
                .andExpect(status().isCreated());
        return name;
    }

    private static String change(String current, String next) {
        return "{\"currentPassword\":\"" + current + "\",\"newPassword\":\"" + next + "\"}";
    }

    @Test
    void changingOnesOwnPasswordIs204AndOnlyTheNewOneSignsIn() throws Exception {
        String name = newAccount("viewer", "spruce-top-42");
        mvc.perform(put("/api/v1/accounts/me/password").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON).content(change("spruce-top-42", "rosewood-back-43")))
                .andExpect(status().isNoContent());
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress())))
                .andExpect(status().isUnauthorized());
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "rosewood-back-43")).with(from(nextAddress())))
                .andExpect(status().isOk());
    }

    @Test
    void aWeakNewPasswordIs400NamingNewPasswordAndChangesNothing() throws Exception {
        String name = newAccount("editor", "spruce-top-42");
        for (String weak : List.of("short", "password123", name, "QWERTYUIOP")) {
            mvc.perform(put("/api/v1/accounts/me/password").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress()))
                            .contentType(MediaType.APPLICATION_JSON).content(change("spruce-top-42", weak)))
                    .andExpect(status().isBadRequest())
                    .andExpect(header().string("Content-Type", "application/problem+json"))
                    .andExpect(jsonPath("$.errors[0].field").value("newPassword"));
        }
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress())))
                .andExpect(status().isOk());
    }

    @Test
    void aWrongCurrentPasswordIs403AndCountsAsAFailedSignIn() throws Exception {
        String name = newAccount("viewer", "spruce-top-42");
        String address = nextAddress();
        for (int i = 0; i < 3; i++) {
            mvc.perform(put("/api/v1/accounts/me/password").with(httpBasic(name, "spruce-top-42")).with(from(address))
                            .contentType(MediaType.APPLICATION_JSON).content(change("not-my-password", "rosewood-back-43")))
                    .andExpect(status().isForbidden())
                    .andExpect(jsonPath("$.errors[0].field").value("currentPassword"));
        }
        // max-failures=3: the address is now locked out, even with the account's right password (each
        // Basic call signs in anew, which clears the account's own count but never the address's).
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "spruce-top-42")).with(from(address)))
                .andExpect(status().isTooManyRequests())
                .andExpect(header().exists("Retry-After"));
    }

    @Test
    void anAdminsResetForcesAChangeAtTheNextSignIn() throws Exception {
        String name = newAccount("editor", "spruce-top-42");
        mvc.perform(put("/api/v1/accounts/" + name + "/password").with(httpBasic("admin", ADMIN_PW)).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON).content("{\"password\":\"bench-reset-77\"}"))
                .andExpect(status().isOk());
        MockHttpSession session = new MockHttpSession();
        mvc.perform(post("/login").session(session).with(csrf()).with(from(nextAddress()))
                        .param("username", name).param("password", "bench-reset-77"))
                .andExpect(redirectedUrl("/account/password?required"));
        mvc.perform(get("/library").session(session)).andExpect(redirectedUrl("/account/password?required"));
        mvc.perform(get("/account/password").session(session)).andExpect(status().isOk());
        mvc.perform(post("/account/password").session(session).with(csrf())
                        .param("currentPassword", "bench-reset-77").param("newPassword", "maple-neck-88")
                        .param("repeatPassword", "maple-neck-88"))
                .andExpect(redirectedUrl("/account/password"));
        // The page's own session stays signed in; the library opens now.
        mvc.perform(get("/library").session(session)).andExpect(status().isOk());
    }

    @Test
    void signOutEverywhereEndsTheAccountsBrowserSessions() throws Exception {
        String name = newAccount("viewer", "spruce-top-42");
        MockHttpSession session = new MockHttpSession();
        mvc.perform(post("/login").session(session).with(csrf()).with(from(nextAddress()))
                        .param("username", name).param("password", "spruce-top-42"))
                .andExpect(redirectedUrl("/"));
        mvc.perform(get("/library").session(session)).andExpect(status().isOk());
        mvc.perform(post("/api/v1/accounts/" + name + "/sign-out").with(httpBasic("admin", ADMIN_PW))
                        .with(from(nextAddress())))
                .andExpect(status().isNoContent());
        mvc.perform(get("/library").session(session)).andExpect(redirectedUrl("/login"));
        // A fresh sign-in after that works again.
        MockHttpSession fresh = new MockHttpSession();
        mvc.perform(post("/login").session(fresh).with(csrf()).with(from(nextAddress()))
                .param("username", name).param("password", "spruce-top-42")).andExpect(redirectedUrl("/"));
        mvc.perform(get("/library").session(fresh)).andExpect(status().isOk());
    }

    @Test
    void theAuditListsEventsNewestFirstWithoutPasswordsAndOnlyForAdmins() throws Exception {
        String name = newAccount("editor", "spruce-top-42");
        mvc.perform(get("/api/v1/materials").with(httpBasic(name, "wrong-guess-1")).with(from("10.9.9.9")))
                .andExpect(status().isUnauthorized());
        mvc.perform(post("/api/v1/designs").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\":\"Audited string\",\"kind\":\"string\",\"parameters\":{\"lengthMm\":650.0,"
                                + "\"tensionN\":70.0,\"material\":\"plain-steel\",\"diameterMm\":0.30}}"))
                .andExpect(status().isCreated());
        mvc.perform(put("/api/v1/accounts/me/password").with(httpBasic(name, "spruce-top-42")).with(from(nextAddress()))
                        .contentType(MediaType.APPLICATION_JSON).content(change("spruce-top-42", "rosewood-back-43")))
                .andExpect(status().isNoContent());

        String body = mvc.perform(get("/api/v1/audit").param("limit", "100").with(httpBasic("admin", ADMIN_PW))
                        .with(from(nextAddress())))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        List<Map<String, Object>> events = mapper.readValue(body, mapper.getTypeFactory()
                .constructCollectionType(List.class, Map.class));
        List<Map<String, Object>> mine = events.stream().filter(e -> name.equals(e.get("username"))).toList();
        assertThat(mine).extracting(e -> e.get("action"))
                .containsSubsequence("password-changed", "design-created", "sign-in", "sign-in-failed");
        assertThat(mine.get(mine.size() - 1).get("target")).asString().doesNotContain("wrong-guess");
        assertThat(events).allSatisfy(e -> assertThat(e).containsKeys("at", "username", "action", "target"));
        List<String> times = events.stream().map(e -> (String) e.get("at")).toList();
        assertThat(times).isSortedAccordingTo(java.util.Comparator.reverseOrder());
        assertThat(body).doesNotContain("spruce-top-42").doesNotContain("rosewood-back-43")
                .doesNotContain("wrong-guess-1").doesNotContain("$2a$");
        assertThat(events.stream().filter(e -> "account-created".equals(e.get("action")))
                .map(e -> (String) e.get("target"))).anyMatch(t -> t.contains(name));

        mvc.perform(get("/api/v1/audit").param("action", "design-created").with(httpBasic("admin", ADMIN_PW))
                        .with(from(nextAddress())))
                .andExpect(status().isOk()).andExpect(jsonPath("$[0].action").value("design-created"));
        mvc.perform(get("/api/v1/audit").param("action", "juggling").with(httpBasic("admin", ADMIN_PW))
                        .with(from(nextAddress())))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.errors[0].field").value("action"));
        mvc.perform(get("/api/v1/audit").param("limit", "0").with(httpBasic("admin", ADMIN_PW))
                        .with(from(nextAddress())))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.errors[0].field").value("limit"));

        String viewer = newAccount("viewer", "spruce-top-42");
        mvc.perform(get("/api/v1/audit").with(httpBasic(viewer, "spruce-top-42")).with(from(nextAddress())))
                .andExpect(status().isForbidden());
        mvc.perform(get("/api/v1/audit").with(httpBasic(name, "rosewood-back-43")).with(from(nextAddress())))
                .andExpect(status().isForbidden());
        mvc.perform(get("/api/v1/audit")).andExpect(status().isUnauthorized());
        mvc.perform(get("/admin/audit").with(httpBasic("admin", ADMIN_PW)).with(from(nextAddress()))
                        .param("action", "sign-in-failed"))
                .andExpect(status().isOk());
    }

    @Test
    void httpsResponsesCarryHsts() throws Exception {
        mvc.perform(get("/login").secure(true))
                .andExpect(header().string("Strict-Transport-Security", "max-age=" + LanSecurityConfig.HSTS_SECONDS));
    }

    private static String nextAddress() {
        return "10.4.0." + ADDRESSES.incrementAndGet();
    }

    private static RequestPostProcessor from(String address) {
        return request -> {
            request.setRemoteAddr(address);
            return request;
        };
    }
}
