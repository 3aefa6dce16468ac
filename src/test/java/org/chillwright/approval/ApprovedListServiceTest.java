package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.chillwright.approval.ApprovalFixtures.entryIn;
import static org.chillwright.approval.ApprovalFixtures.newList;

import java.util.EnumSet;
import org.chillwright.account.Role;
import org.chillwright.web.NotFoundException;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.security.access.AccessDeniedException;

/** What other features call: the approved module ids of a list, and where a module stands. */
@SpringBootTest(properties = TestModuleDirectory.ENABLED)
class ApprovedListServiceTest {

    @Autowired
    ApprovedListService lists;

    @Test
    void approvedModuleIdsHoldOnlyApprovedEntries() {
        var list = newList(lists);
        entryIn(lists, list.id(), 201, EntryState.APPROVED);
        entryIn(lists, list.id(), 202, EntryState.QUALIFYING);
        entryIn(lists, list.id(), 203, EntryState.RESTRICTED);
        entryIn(lists, list.id(), 204, EntryState.PROPOSED);
        entryIn(lists, list.id(), 205, EntryState.APPROVED);
        assertThat(lists.approvedModuleIds(list.id())).containsExactly(201L, 205L);
    }

    @Test
    void approvedModuleIdsOfAnUnknownListIsNotFound() {
        assertThatThrownBy(() -> lists.approvedModuleIds(424242)).isInstanceOf(NotFoundException.class);
    }

    @Test
    void placementsNameEveryListAndTheStateThere() {
        var first = newList(lists);
        var second = newList(lists);
        entryIn(lists, first.id(), 250, EntryState.APPROVED);
        entryIn(lists, second.id(), 250, EntryState.QUALIFYING);
        assertThat(lists.placementsOf(250)).extracting(Placement::listName, Placement::state).containsExactly(
                org.assertj.core.groups.Tuple.tuple(first.name(), EntryState.APPROVED),
                org.assertj.core.groups.Tuple.tuple(second.name(), EntryState.QUALIFYING));
    }

    @Test
    void purchasingMayNotCreateLists() {
        var buyer = new Actor("buyer", EnumSet.of(Role.PURCHASING));
        assertThatThrownBy(() -> lists.create("Buyer's list", null, buyer)).isInstanceOf(AccessDeniedException.class);
    }

    @Test
    void engineerIsOfferedOnlyQualifyingFromProposed() {
        var engineer = new Actor("eng", EnumSet.of(Role.ENGINEER));
        assertThat(lists.targetsFor(engineer, EntryState.PROPOSED)).containsExactly(EntryState.QUALIFYING);
    }

    @Test
    void approverIsOfferedApprovalAndRejectionFromQualifying() {
        var approver = new Actor("app", EnumSet.of(Role.APPROVER));
        assertThat(lists.targetsFor(approver, EntryState.QUALIFYING))
                .containsExactlyInAnyOrder(EntryState.APPROVED, EntryState.PROPOSED);
    }

    @Test
    void obsoleteIsFinal() {
        assertThat(lists.targetsFor(ApprovalFixtures.ADMIN, EntryState.OBSOLETE)).isEmpty();
    }
}
