/**
 * The standard atmosphere (U.S. Standard Atmosphere 1976 / ISO 2533) and flight conditions:
 * altitude, true airspeed and the derived Mach number, dynamic pressure and equivalent airspeed.
 * Depends only on {@code org.flexmargin.model} for its validation exception and range constants.
 */
package org.flexmargin.atmosphere;
