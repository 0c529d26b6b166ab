/**
 * Linear-systems machinery for the aeroservoelastic loop: continuous-time state-space models and
 * their interconnections ({@link org.flexmargin.loop.StateSpace}), frequency responses by the
 * Hessenberg method (Laub, IEEE Trans. Automatic Control 26(2), 1981), a library of control-law
 * and filter blocks that carry both a state-space realisation and an exact frequency function
 * ({@link org.flexmargin.loop.LinearBlock}), and broken-loop stability margins (gain, phase,
 * delay and symmetric disk margins; {@link org.flexmargin.loop.LoopMargins}).
 *
 * <p>Nothing here knows about aircraft. Depends on EJML, Commons Math and
 * {@code org.flexmargin.model} (for {@link org.flexmargin.model.InvalidInputException}) only.
 * Nothing prints, reads files or keeps global state. Units: seconds, rad/s, Hz where named.
 */
package org.flexmargin.loop;
