/** Approved part lists: entries move through the sign-off states by role, each move written to an append-only audit trail. */
package org.chillwright.approval;
