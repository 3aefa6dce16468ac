package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import org.chillwright.account.Role;
import org.junit.jupiter.api.Test;

/** The four-eyes rule as {@link Workflow} states it, apart from storage and HTTP. */
class WorkflowTest {

    private static final Actor ANA = new Actor("ana", EnumSet.of(Role.ENGINEER, Role.APPROVER));
    private static final Actor CARL = new Actor("carl", EnumSet.of(Role.APPROVER));

    @Test
    void anApproverWhoNeitherProposedNorQualifiedMayApprove() {
        assertThat(Workflow.fourEyesRefusal(EntryState.APPROVED, "ana", "ben", CARL, true)).isEmpty();
    }

    @Test
    void theProposerAndTheQualifierMayNotApprove() {
        assertThat(Workflow.fourEyesRefusal(EntryState.APPROVED, "ana", "ben", ANA, true))
                .hasValueSatisfying(why -> assertThat(why).contains("you proposed this entry", "(ana)", "(ben)"));
        assertThat(Workflow.fourEyesRefusal(EntryState.APPROVED, "ben", "ana", ANA, true))
                .hasValueSatisfying(why -> assertThat(why).contains("you sent this entry to qualification"));
    }

    @Test
    void theRuleOnlyConcernsApproval() {
        for (var to : EnumSet.complementOf(EnumSet.of(EntryState.APPROVED))) {
            assertThat(Workflow.fourEyesRefusal(to, "ana", "ana", ANA, true)).as(to.name()).isEmpty();
        }
    }

    @Test
    void aRelaxedRuleRefusesNobody() {
        assertThat(Workflow.fourEyesRefusal(EntryState.APPROVED, "ana", "ana", ANA, false)).isEmpty();
    }

    @Test
    void namesAreComparedExactly() {
        // user names are unique as typed, so "Ana" is another account than "ana"
        assertThat(Workflow.fourEyesRefusal(EntryState.APPROVED, "Ana", "ben", ANA, true)).isEmpty();
    }
}
