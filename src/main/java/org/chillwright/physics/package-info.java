/** Lumped thermoelectric module physics: parameters, ratings, operating points, arrays, cascades, generators, transients and dew point, in SI units with kelvin. */
package org.chillwright.physics;
