/**
 * Unsteady aerodynamics for harmonic motion: generalized aerodynamic forces Q(ik) behind one
 * interface, {@link org.flexmargin.aero.AeroSource}, built by {@link
 * org.flexmargin.aero.AeroSources#of}.
 *
 * <ul>
 *   <li>{@link org.flexmargin.aero.StripTheoryAero}: Theodorsen's two-dimensional theory strip by
 *       strip, valid at every k &ge; 0;
 *   <li>{@link org.flexmargin.aero.TabulatedAero}: the user's own tabulated Q(ik), interpolated by
 *       not-a-knot cubic splines and clamped outside the table;
 *   <li>{@link org.flexmargin.aero.Theodorsen}: C(k) = F + iG (NACA Report 496);
 *   <li>{@link org.flexmargin.aero.Bessel}: J<sub>0</sub>, J<sub>1</sub>, Y<sub>0</sub>,
 *       Y<sub>1</sub> of real argument, which Theodorsen's function needs.
 * </ul>
 *
 * <h2>Conventions (fixed)</h2>
 *
 * <ul>
 *   <li>Reduced frequency k = &omega; b<sub>ref</sub> / V (dimensionless), b<sub>ref</sub> the
 *       source's reference semichord (m); motion is harmonic, proportional to e<sup>i&omega;t</sup>.
 *   <li>Generalized aerodynamic force F = q Q(ik) &xi;, q = &rho; V<sup>2</sup>/2 (Pa). Q depends on
 *       the flight condition only through k (and, for tables, the Mach number they were made at).
 *       Q<sub>ij</sub> is the generalized force on coordinate i per unit coordinate j per pascal,
 *       positive when it does positive work on a positive coordinate i.
 *   <li>Mode-shape values: displacement positive <b>up</b> (m per unit coordinate), rotation
 *       positive <b>nose up</b> (rad per unit coordinate). Lift is positive up and pitching
 *       moment about the elastic axis positive nose up. Theodorsen's plunge h is positive down,
 *       so h = &minus;w inside {@link org.flexmargin.aero.StripTheoryAero}.
 *   <li>Theodorsen's a: elastic axis position aft of mid-chord in semichords.
 * </ul>
 *
 * <p>Everything here is immutable or stateless and thread-safe. The hot paths ({@code forces},
 * {@code Theodorsen.evaluate}, {@code Bessel.evaluate}) write into caller-owned outputs.
 */
package org.flexmargin.aero;
