package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.chillwright.approval.ApprovalFixtures;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.approval.EntryState;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.ModuleQuery;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/**
 * Four eyes in Chromium, through the pages: a lead who holds both the engineer and the approver role
 * proposes a module and sends it to qualification, tries to approve it and is refused with the reason
 * beside the form; a second person then approves it, and the audit trail names all of them.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class FourEyesJourneyIT extends BrowserJourney {

    @Autowired
    AccountService accounts;
    @Autowired
    ApprovedListService lists;
    @Autowired
    CatalogService catalog;

    @Test
    void theProposerIsRefusedApprovalAndASecondPersonApproves() throws Exception {
        TestCatalog.ensure(catalog);
        long moduleId = catalog.search(ModuleQuery.text("TMA-HALF")).items().get(0).id();
        String lead = ApprovalFixtures.account(accounts, "eyes-lead", EnumSet.of(Role.ENGINEER, Role.APPROVER));
        String approver = ApprovalFixtures.account(accounts, "eyes-approver", EnumSet.of(Role.APPROVER));
        var list = lists.create(ApprovalFixtures.unique("Detector line"), "cooled photodiode heads", ApprovalFixtures.ADMIN);
        String listPage = url("/lists/" + list.id());
        var driver = browser.driver();

        signIn(lead, ApprovalFixtures.PASSWORD);
        driver.get(listPage);
        String entryId = propose(moduleId, "holds -5 °C at 30 °C ambient");
        move(entryId, "QUALIFYING", "datasheet and outline drawing received");
        assertThat(driver.findElement(By.cssSelector("#entry-" + entryId + " .four-eyes")).getText())
                .as("the page says so before the lead tries")
                .contains("Approval needs a second person", "you proposed this entry and sent it to qualification");

        submitMove(entryId, "APPROVED", "I checked it myself");
        var refusal = browser.waitUpTo(PAGE_LOAD).until(ExpectedConditions.visibilityOfElementLocated(
                By.cssSelector("#entry-" + entryId + " form.transition .field-error")));
        browser.screenshot("four-eyes-refused");
        assertThat(refusal.getText()).contains("Approval needs a second person",
                "someone other than its proposer (eyes-lead) and its qualifier (eyes-lead) must approve it");
        assertThat(driver.findElement(By.cssSelector("#entry-" + entryId + " .state")).getText()).isEqualTo("QUALIFYING");
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.QUALIFYING);
        signOut();

        signIn(approver, ApprovalFixtures.PASSWORD);
        driver.get(listPage);
        assertThat(driver.findElements(By.cssSelector("#entry-" + entryId + " .four-eyes"))).isEmpty();
        move(entryId, "APPROVED", "pilot build held the set-point for 72 h");
        browser.screenshot("four-eyes-approved");

        assertThat(driver.findElement(By.cssSelector("#entry-" + entryId + " .changed-by")).getText()).isEqualTo(approver);
        assertThat(driver.findElements(By.cssSelector("table.audit tbody tr"))).extracting(WebElement::getText)
                .satisfiesExactly(
                        proposed -> assertThat(proposed).contains(lead, "PROPOSED"),
                        qualifying -> assertThat(qualifying).contains(lead, "QUALIFYING"),
                        approved -> assertThat(approved).contains(approver, "APPROVED",
                                "(proposed by eyes-lead, qualified by eyes-lead)", "pilot build"));
    }
}
