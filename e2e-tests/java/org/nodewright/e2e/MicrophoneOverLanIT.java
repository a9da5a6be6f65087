package org.nodewright.e2e;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.springframework.test.context.TestPropertySource;

/**
 * The microphone in LAN mode: the page comes over HTTPS from a host name that is not this machine's
 * loopback name (as it would on a colleague's computer), so the browser treats it as secure and
 * gives it the (fake) microphone; the same string as in {@link MicrophoneIT} is fitted as well.
 */
@TestPropertySource(properties = {"app.sharing.lan=true", "app.sharing.admin-password=" + MicrophoneOverLanIT.ADMIN_PW})
class MicrophoneOverLanIT extends BrowserTestBase {

    static final String ADMIN_PW = "harrowgate-listen-1";

    @Override
    protected boolean https() {
        return true;
    }

    @Override
    protected List<String> browserArguments() throws IOException {
        List<String> args = new ArrayList<>(MicrophoneIT.fakeMicrophone());
        args.add("--host-resolver-rules=MAP workshop.nodewright.test 127.0.0.1");
        return args;
    }

    @AfterAll
    static void deleteRecording() throws IOException {
        MicrophoneIT.deleteRecording();
    }

    private String lanUrl(String path) {
        return "https://workshop.nodewright.test:" + port + path;
    }

    @Test
    void listensOverHttpsFromAnotherHostName() throws Exception {
        driver.get(lanUrl("/login"));
        waitFor(By.id("login-form"));
        driver.findElement(By.id("username")).sendKeys("admin");
        driver.findElement(By.id("password")).sendKeys(ADMIN_PW);
        driver.findElement(By.id("login-submit")).click();
        waitFor(By.id("signed-in-as"));
        MicrophoneIT.listenOnTheStringBench(this, lanUrl("/strings"), "microphone-lan-string-partials");
    }
}
