package org.flexmargin.aero;

import org.ejml.data.ZMatrixRMaj;

/**
 * A source of generalized aerodynamic forces Q(ik) for harmonic motion at reduced frequency
 * k = omega b_ref / V.
 *
 * <p>Normalisation (fixed): the generalized aerodynamic force vector is
 * {@code F = q_dyn * Q(ik) * xi}, with q_dyn = rho V^2 / 2 the dynamic pressure (Pa) and xi the
 * generalized coordinates of the structural model. Q therefore depends on the flight condition
 * only through k (and Mach, for tabulated data). Q<sub>ij</sub> is the generalized force on
 * coordinate i per unit coordinate j per pascal; mode shapes are positive up and nose up (see the
 * package documentation for the full sign convention).
 *
 * <p>Implementations are immutable and thread-safe: {@link #forces} writes only into the
 * caller's matrix.
 */
public interface AeroSource {
  /** @return number of generalized coordinates (rows and columns of Q) */
  int size();

  /** @return reference semichord b_ref (m) defining the reduced frequency */
  double referenceSemichordM();

  /** @return lowest reduced frequency at which the data are valid (inclusive) */
  double minReducedFrequency();

  /** @return highest reduced frequency at which the data are valid (inclusive); may be infinite */
  double maxReducedFrequency();

  /**
   * Writes Q(ik) into {@code out}.
   *
   * @param reducedFrequency k &gt;= 0; outside [min, max] an implementation clamps or extrapolates
   *     as its Javadoc says, and the caller is responsible for flagging it
   * @param out size() x size() complex matrix; the implementations in this package reshape it if
   *     its size differs. Modified.
   */
  void forces(double reducedFrequency, ZMatrixRMaj out);

  /** @return a one-line description for reports, e.g. "strip theory, 40 strips, Theodorsen" */
  String description();
}
