package org.flexmargin.sweep;

import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.ReducedFrequencyInterpolant;
import org.flexmargin.aero.StripTheoryAero;

/**
 * The generalized aerodynamic forces used by the frequency-domain loop of a configuration (margins,
 * structural peaks, closed-loop onset refinement, loop charts): strip theory through a
 * {@link ReducedFrequencyInterpolant} built once per configuration on first use, any other
 * source (force tables, which are cheap to evaluate) as it is. The open-loop flutter and
 * divergence solutions and the rational fit always use the exact source.
 *
 * <p>Interpolation: k from {@value #K_LOW} to {@value #K_HIGH} (below and above, exact), nodes
 * {@value #STEP_LN} apart in ln k, every interval checked at its midpoint to {@value #TOLERANCE}
 * of the largest |Q_ij| (see docs/validation.md, "Reduced-frequency interpolant"). Thread-safe.
 */
public final class LoopAerodynamics {
  /** Lowest interpolated reduced frequency. */
  public static final double K_LOW = 1e-5;
  /** Highest interpolated reduced frequency. */
  public static final double K_HIGH = 20.0;
  /** Node spacing in ln k. */
  public static final double STEP_LN = 0.0125;
  /** Accepted midpoint error relative to the largest |Q_ij| (intervals above it are exact). */
  public static final double TOLERANCE = 1e-8;

  private final AeroSource exact;
  private final boolean interpolate;
  private volatile AeroSource built;

  private LoopAerodynamics(AeroSource exact, boolean interpolate) {
    this.exact = exact;
    this.interpolate = interpolate && exact instanceof StripTheoryAero;
  }

  /** @return the interpolated route for strip theory (other sources as they are) */
  public static LoopAerodynamics of(AeroSource exact) {
    return new LoopAerodynamics(exact, true);
  }

  /** @return the exact route (every evaluation from the source itself) */
  public static LoopAerodynamics exact(AeroSource exact) {
    return new LoopAerodynamics(exact, false);
  }

  /** @return true if the loop's forces are interpolated */
  public boolean interpolated() {
    return interpolate;
  }

  /** @return the source for the loop, built on the first call */
  public AeroSource source() {
    if (!interpolate) {
      return exact;
    }
    AeroSource s = built;
    if (s == null) {
      synchronized (this) {
        s = built;
        if (s == null) {
          s = new ReducedFrequencyInterpolant(exact, K_LOW, K_HIGH, STEP_LN, TOLERANCE);
          built = s;
        }
      }
    }
    return s;
  }
}
