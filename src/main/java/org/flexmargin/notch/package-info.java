/**
 * Structural notch placement: notch filters in the feedback paths chosen so that every structural
 * loop-gain peak meets the gain-stabilisation limit across airspeed, configurations and a modal
 * frequency uncertainty, at the least phase loss at the rigid-body gain crossovers.
 *
 * <p>The loop broken at the actuator command is split once per sample into the part through the
 * paths that will carry the notches and the rest, L = L_rest + L_path (negative-feedback
 * convention of {@link org.flexmargin.ase.ServoLoop}); with notches N_i in those paths
 * L = L_rest + L_path prod N_i exactly, so candidate notch sets are evaluated without re-solving
 * the aircraft. The optimiser is Powell's BOBYQA (M. J. D. Powell, "The BOBYQA algorithm for bound
 * constrained optimization without derivatives", Cambridge report DAMTP 2009/NA06) from Commons
 * Math, on a penalty objective. The chosen notches are then checked independently by the
 * existing margin code on the full loop. Gain stabilisation limit (-6 dB) and +-10 % frequency
 * uncertainty are common practice, not taken from a specification.
 */
package org.flexmargin.notch;
