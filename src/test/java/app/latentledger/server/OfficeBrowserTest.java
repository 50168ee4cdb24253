package app.latentledger.server;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.report.PlainWords;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The office page in a real browser: Debian's headless Chromium driven through Debian's chromedriver
 * (WebDriver). Logs in, searches, opens a visit and reads its verdict; a second company's office
 * user sees neither the visit in the search nor the page itself. Without Chromium the test is skipped
 * with a message, except where {@code LATENT_LEDGER_REQUIRE_DB=1} (CI), where it fails.
 */
class OfficeBrowserTest {
    static final String CHROMIUM = "/usr/bin/chromium";
    static final String DRIVER = "/usr/bin/chromedriver";

    private static TestServer t;
    private static WebDriver browser;
    private static Path profile;
    private static OfficeWeb.Made made;

    @BeforeAll
    static void start() throws Exception {
        if (!new File(CHROMIUM).canExecute() || !new File(DRIVER).canExecute()) {
            String why = "office browser test needs Debian's chromium and chromium-driver (" + CHROMIUM + ", " + DRIVER
                    + "); install them with .ci/chromium.sh";
            if ("1".equals(System.getenv("LATENT_LEDGER_REQUIRE_DB"))) {
                throw new IllegalStateException(why + " — required here (LATENT_LEDGER_REQUIRE_DB=1)");
            }
            Assumptions.abort("skipped: " + why);
        }
        t = TestServer.start(OfficeBrowserTest.class, 1000);
        t.company("Saltreed Cooling");
        t.company("Heron Spit Air");
        TestServer.Device alice = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 1");
        made = OfficeWeb.visit("Lantern Quay Chandlery", "9 Lantern Quay, Saltreed", "Alice Marsh");
        OfficeWeb.push(t, alice, made);

        profile = Files.createTempDirectory("office-chromium-");
        ChromeOptions o = new ChromeOptions();
        o.setBinary(CHROMIUM);
        // as root in CI: no sandbox; and nothing the browser would fetch or update on its own
        o.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--disable-dev-shm-usage", "--user-data-dir=" + profile);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(new File(DRIVER))
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, o);
        browser.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(60));
    }

    @AfterAll
    static void stop() throws Exception {
        if (browser != null) {
            browser.quit();
        }
        if (t != null) {
            t.close();
        }
        if (profile != null) {
            try (Stream<Path> all = Files.walk(profile)) {
                all.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private void logIn(String company) throws InterruptedException {
        browser.manage().deleteAllCookies();
        browser.get(t.base() + "/office");
        assertTrue(browser.getCurrentUrl().endsWith("/office/login"), "not logged in: the login page, " + browser.getCurrentUrl());
        browser.findElement(By.name("email")).sendKeys(OfficeWeb.email(company));
        browser.findElement(By.name("password")).sendKeys(OfficeWeb.PASSWORD);
        browser.findElement(By.cssSelector("main button[type=submit]")).click();
        assertTrue(text(By.tagName("header"), company).contains(company), "logged in as " + company);
        assertTrue(browser.getCurrentUrl().endsWith("/office"), browser.getCurrentUrl());
    }

    /** The element's text once the page after a click has loaded (a form post navigates while we look). */
    private static String text(By by, String expected) throws InterruptedException {
        String last = "";
        for (int i = 0; i < 100; i++) {
            try {
                last = browser.findElement(by).getText();
                if (last.contains(expected)) {
                    return last;
                }
            } catch (org.openqa.selenium.StaleElementReferenceException | org.openqa.selenium.NoSuchElementException e) {
                // the next page is still loading
            }
            Thread.sleep(100);
        }
        return last;
    }

    private void search(String words) throws InterruptedException {
        text(By.name("q"), "");
        var q = browser.findElement(By.name("q"));
        q.clear();
        q.sendKeys(words);
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
    }

    @Test
    void anOfficeUserFindsAVisitAndReadsItsVerdictAndAnotherCompanyCannot() throws Exception {
        logIn("Saltreed Cooling");
        search("Lantern");
        var table = text(By.tagName("tbody"), "Lantern Quay Chandlery");
        assertTrue(table.contains("Lantern Quay Chandlery"), table);
        browser.findElement(By.cssSelector("tbody a")).click();
        String visitUrl = browser.getCurrentUrl();
        assertTrue(visitUrl.endsWith("/office/visits/" + made.visit().id()), visitUrl);
        CoilResult expected = ReadingSetCheck.run(made.readings(), made.system(), made.site(), ThresholdSettings.DEFAULTS,
                UnitSystem.SI);
        assertEquals(PlainWords.verdict(expected.verdict()), browser.findElement(By.className("verdict")).getText());
        assertEquals(expected.findings().size(), browser.findElements(By.cssSelector("ul.findings li")).size());
        browser.findElement(By.cssSelector("header button")).click();
        text(By.tagName("h1"), "Log in");
        assertTrue(browser.getCurrentUrl().endsWith("/office/login"), "logged out: " + browser.getCurrentUrl());

        logIn("Heron Spit Air");
        search("Lantern");
        String none = text(By.tagName("main"), "No visit matches.");
        assertTrue(none.contains("No visit matches.") && !none.contains("Lantern Quay"), none);
        browser.get(visitUrl);
        String page = browser.findElement(By.tagName("main")).getText();
        assertTrue(page.contains("Not found"), page);
        assertFalse(page.contains("Lantern"), page);
    }
}
