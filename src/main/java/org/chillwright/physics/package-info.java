/** Lumped thermoelectric module physics: parameters, ratings, operating points, arrays, cascades and two-stage stacks, generators, cool-downs, drive ripple, driver sheets and dew point, in SI units with kelvin. */
package org.chillwright.physics;
