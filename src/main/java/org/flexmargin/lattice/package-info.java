/**
 * Lifting-surface aerodynamics: the subsonic doublet-lattice method (Albano and Rodden, 1969, with
 * the quartic kernel approximation of Rodden, Taylor and McIntosh, 1998) on flat trapezoidal
 * surfaces with sweep, taper and dihedral, and its steady limit, the vortex lattice.
 *
 * <p>Axes: x aft, y starboard, z up (m). Normalwash and mode shapes are positive up; a positive
 * pressure coefficient jump is lift along the box normal. Reduced frequency k = omega b_ref / U.
 */
package org.flexmargin.lattice;
