package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.chillwright.approval.ApprovalFixtures;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/**
 * In Chromium, through the pages: an engineer proposes a module on a list and sends it to
 * qualification, an approver signs in and approves it, and the list shows it approved with the
 * audit trail of all three steps; a ranking restricted to the list then considers only that module.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ApprovalJourneyIT extends BrowserJourney {

    @Autowired
    AccountService accounts;
    @Autowired
    ApprovedListService lists;
    @Autowired
    CatalogService catalog;

    @Test
    void engineerProposesApproverApprovesAndTheListShowsItWithItsAuditTrail() throws Exception {
        TestCatalog.ensure(catalog);
        long moduleId = catalog.search(ModuleQuery.text("TMA-HALF")).items().get(0).id();
        ApprovalFixtures.account(accounts, "journey-engineer", EnumSet.of(Role.ENGINEER));
        ApprovalFixtures.account(accounts, "journey-approver", EnumSet.of(Role.APPROVER));
        var list = lists.create(ApprovalFixtures.unique("Laser driver line"), "modules for the 1550 nm head",
                ApprovalFixtures.ADMIN);
        String listPage = url("/lists/" + list.id());
        var driver = browser.driver();

        signIn("journey-engineer", ApprovalFixtures.PASSWORD);
        driver.get(listPage);
        String entryId = propose(moduleId, "holds 20 °C at 45 °C ambient with the 0.4 K/W sink");
        move(entryId, "QUALIFYING", "datasheet and outline drawing received");
        signOut();

        signIn("journey-approver", ApprovalFixtures.PASSWORD);
        driver.get(listPage);
        move(entryId, "APPROVED", "pilot build held the set-point for 72 h");
        browser.screenshot("list-approved");

        assertThat(driver.findElement(By.cssSelector("#entry-" + entryId + " .changed-by")).getText())
                .isEqualTo("journey-approver");
        var audit = driver.findElements(By.cssSelector("table.audit tbody tr"));
        assertThat(audit).extracting(org.openqa.selenium.WebElement::getText).satisfiesExactly(
                proposed -> assertThat(proposed).contains("journey-engineer", "PROPOSED"),
                qualifying -> assertThat(qualifying).contains("journey-engineer", "QUALIFYING", "datasheet"),
                approved -> assertThat(approved).contains("journey-approver", "APPROVED", "pilot build"));

        // a ranking restricted to the list, through the case form, shows the approved module and no other
        driver.get(url("/cases/new"));
        new Select(driver.findElement(By.id("listId"))).selectByValue(String.valueOf(list.id()));
        var load = driver.findElement(By.id("activeLoad"));
        load.clear();
        load.sendKeys("3");
        driver.findElement(By.cssSelector("button.primary[type=submit]")).click();
        browser.waitUpTo(PAGE_LOAD).until(ExpectedConditions.presenceOfElementLocated(
                By.cssSelector("table.ranking")));
        browser.screenshot("ranking-restricted-to-list");
        assertThat(driver.findElements(By.cssSelector("table.ranking tbody td:nth-child(3)")))
                .extracting(org.openqa.selenium.WebElement::getText).isNotEmpty().containsOnly("TMA-HALF");
    }
}
