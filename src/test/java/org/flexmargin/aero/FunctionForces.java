package org.flexmargin.aero;

import java.util.Objects;
import org.ejml.data.ZMatrixRMaj;

/**
 * A hand-made source of generalized aerodynamic forces for tests: Q(ik) is whatever {@link #fill}
 * writes, on a matrix already shaped size x size and zeroed, so a fill sets only the entries that
 * are not zero.
 *
 * @param size number of generalized coordinates (rows and columns of Q), at least 1
 * @param referenceSemichordM reference semichord b_ref (m), positive and finite
 * @param minReducedFrequency lowest valid reduced frequency (dimensionless), finite and &gt;= 0
 * @param maxReducedFrequency highest valid reduced frequency (dimensionless), &gt;= the lowest;
 *     may be infinite
 * @param fill writes Q(ik) (per pascal) for a reduced frequency k
 * @param description the one-line description the source reports
 */
public record FunctionForces(int size, double referenceSemichordM, double minReducedFrequency,
    double maxReducedFrequency, Fill fill, String description) implements AeroSource {

  /** Writes Q(ik) into a zeroed size x size matrix. */
  @FunctionalInterface
  public interface Fill {
    /**
     * @param k reduced frequency (dimensionless)
     * @param out size x size, all entries zero on entry; modified
     */
    void at(double k, ZMatrixRMaj out);
  }

  /** The fill of a source without forces: Q = 0 at every k. */
  public static final Fill NONE = (k, out) -> { };

  /** Checks the sizes and the reduced-frequency range. */
  public FunctionForces {
    if (size < 1) {
      throw new IllegalArgumentException("size must be at least 1: " + size);
    }
    if (!(referenceSemichordM > 0) || Double.isInfinite(referenceSemichordM)) {
      throw new IllegalArgumentException("semichord must be positive and finite: " + referenceSemichordM);
    }
    if (!(minReducedFrequency >= 0) || Double.isInfinite(minReducedFrequency)
        || !(maxReducedFrequency >= minReducedFrequency)) {
      throw new IllegalArgumentException(
          "reduced-frequency range must be 0 <= min <= max: " + minReducedFrequency + ", " + maxReducedFrequency);
    }
    Objects.requireNonNull(fill, "fill");
    Objects.requireNonNull(description, "description");
  }

  @Override
  public void forces(double reducedFrequency, ZMatrixRMaj out) {
    out.reshape(size, size);
    out.zero();
    fill.at(reducedFrequency, out);
  }
}
