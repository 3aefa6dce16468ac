/** The same modules evaluated as generators: heat harvesting between a hot source and a cold sink. */
package org.chillwright.harvest;
