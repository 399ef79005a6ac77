/**
 * The U.S. Standard Atmosphere 1976 from -2 km to 47 km geopotential altitude, with a temperature
 * offset from standard, and the airspeed and Reynolds-number helpers that use it.
 *
 * <p>Altitudes here are pressure altitudes, which in the standard atmosphere are geopotential
 * altitudes. All values are SI: metres, kelvin, pascal, kg/m^3, m/s, Pa s, m^2/s.
 */
package org.spanlift.atmosphere;
