/** Cooling cases solved against modules and arrays: operating points, rankings, studies, comparison. */
package org.chillwright.selection;
