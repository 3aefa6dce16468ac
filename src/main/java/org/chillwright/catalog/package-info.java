/** The team's module catalog: entries by ratings or construction, purchasing data, CSV in and out, and the solver snapshot. */
package org.chillwright.catalog;
