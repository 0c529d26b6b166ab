package org.flexmargin.model;

/**
 * The axis a section pitch inertia is quoted about. Required, because published wing data are
 * quoted both ways and the choice moves flutter speeds by several percent.
 *
 * <p>Example: mass per length m = 35.71 kg/m, centre of mass 0.1829 m aft of the elastic axis,
 * inertia 8.64 kg m. {@code ELASTIC_AXIS}: I_EA = 8.64 kg m. {@code CENTRE_OF_MASS}: I_EA = 8.64 +
 * 35.71 * 0.1829^2 = 9.83 kg m (parallel-axis theorem).
 */
public enum InertiaAxis {
  /** Inertia given about the elastic (flexural) axis. */
  ELASTIC_AXIS,
  /** Inertia given about the section centre of mass; shifted to the elastic axis on use. */
  CENTRE_OF_MASS
}
