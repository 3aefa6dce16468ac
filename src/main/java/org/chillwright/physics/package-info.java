/** Thermoelectric module physics in SI units with kelvin: lumped parameters, ratings, operating points, arrays, cascades, generators, transients and dew point; the detailed temperature-dependent leg model with material sets and the ratings fit; tolerance analysis and worst-case corners. */
package org.chillwright.physics;
