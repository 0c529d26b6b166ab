/**
 * The aeroservoelastic model: the rigid-body short period coupled with the elastic modes, the
 * sensors that see both, and the fly-by-wire loop closed around them.
 *
 * <p>Two faces of the same model:
 *
 * <ul>
 *   <li>the frequency domain, exact: at each frequency the (2 + m) complex equations of the rigid
 *       short period and the m elastic modes are solved with the aerodynamics Q(ik) of the user's
 *       source at k = omega b / V (no fit error), then multiplied by the loop blocks' exact
 *       transfer functions (delays exact). This gives the broken-loop response and the margins;
 *   <li>the state space, approximate: the elastic aerodynamics by a rational function
 *       approximation with aerodynamic lag states, delays by Pade, the zero-order hold by a
 *       rational approximation that keeps its droop. This gives closed-loop
 *       eigenvalues, hence closed-loop flutter and structural-coupling onsets.
 * </ul>
 *
 * <p>Sign conventions: angle of attack and pitch rate positive nose up; elevator positive trailing
 * edge down; mode shapes positive up / nose up; normal acceleration positive up, in g.
 */
package org.flexmargin.ase;
