package org.flexmargin.aero;

import java.util.Optional;

/**
 * A source of generalized aerodynamic forces that also knows the forces of the loop's elevator (a
 * doublet-lattice control surface). The aircraft plant uses them in place of the quasi-steady
 * elevator coupling of the case's {@code mode_coupling} section.
 */
public interface ControlSurfaceForces {
  /**
   * @return the steady generalized force on each mode per unit dynamic pressure per radian of
   *     elevator, trailing edge down (m^2 per rad, one per mode in mode-table order), or empty when
   *     the source has no elevator
   */
  Optional<double[]> elevatorForcesM2PerRad();

  /** @return the elevator's name in the source, for the results' assumptions ("" without one) */
  String elevatorName();
}
