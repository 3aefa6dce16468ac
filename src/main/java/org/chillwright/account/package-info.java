/** Accounts, roles and the security configuration: who may read, compute and change what. */
package org.chillwright.account;
