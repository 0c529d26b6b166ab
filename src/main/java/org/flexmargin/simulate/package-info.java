/**
 * Time-domain simulation of the flexible aircraft with its loop: the closed-loop (or open-loop)
 * state space assembled from the same plant and control law as the sweep, exact discretisation of
 * the linear part (matrix exponential), pilot inputs and discrete gusts, continuous turbulence by
 * shaping filters with an exact covariance, a rate- and position-limited actuator integrated with
 * an adaptive Dormand-Prince integrator, and describing functions of saturation and rate limiting.
 *
 * <p>SI inside: seconds, radians, metres, m/s; the normal acceleration of a sensor is in g as in
 * {@link org.flexmargin.ase.AircraftPlant}. Nothing prints or reads files; results carry their
 * own diagnostics. Depends on {@code ase}, {@code loop}, {@code sweep} and the layers below.
 */
package org.flexmargin.simulate;
