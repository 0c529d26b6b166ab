package org.flexmargin.simulate;

import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.InvalidInputException;

/**
 * A two-term exponential approximation of an indicial lift function of thin-aerofoil theory,
 * psi(s) = 1 - a1 e^{-b1 s} - a2 e^{-b2 s}, in the reduced time s = V t / b (b the semichord):
 * the lift that builds up after a step change of angle of attack, as a fraction of its
 * quasi-steady value.
 *
 * <p>As a linear filter from an angle to the effective angle that acts on the lift slope, the
 * transfer function in the Laplace variable p of physical time is
 * (1 - a1 - a2) + a1 beta1 / (p + beta1) + a2 beta2 / (p + beta2), beta_i = b_i V / b, whose step
 * response is psi(V t / b). Immutable.
 *
 * @param name the function and its approximation, in words
 * @param a1 first amplitude (-), &gt;= 0
 * @param b1 first exponent per unit reduced time (-), &gt; 0
 * @param a2 second amplitude (-), &gt;= 0
 * @param b2 second exponent per unit reduced time (-), &gt; 0
 */
public record IndicialLift(String name, double a1, double b1, double a2, double b2) {
  /** Wagner's function (lift growth after a step in angle of attack), R. T. Jones' approximation. */
  public static final IndicialLift WAGNER = new IndicialLift("Wagner (R. T. Jones)", 0.165, 0.0455, 0.335, 0.3);
  /** Küssner's function (lift growth on entering a sharp-edged gust), Sears' approximation. */
  public static final IndicialLift KUSSNER = new IndicialLift("Kuessner (Sears)", 0.5, 0.13, 0.5, 1.0);

  /** Validates. */
  public IndicialLift {
    if (name == null || name.isBlank()) {
      throw new InvalidInputException("indicial_lift.name", "a name", String.valueOf(name));
    }
    if (!(a1 >= 0 && a2 >= 0 && a1 + a2 <= 1)) {
      throw new InvalidInputException("indicial_lift.amplitudes", "a1, a2 >= 0 with a1 + a2 <= 1",
          a1 + ", " + a2);
    }
    if (!(b1 > 0 && b2 > 0) || !Double.isFinite(b1) || !Double.isFinite(b2)) {
      throw new InvalidInputException("indicial_lift.exponents", "finite b1, b2 > 0", b1 + ", " + b2);
    }
  }

  /**
   * @param reducedTime s = V t / b (-), &gt;= 0
   * @return psi(s) (-)
   */
  public double value(double reducedTime) {
    return 1 - a1 * Math.exp(-b1 * reducedTime) - a2 * Math.exp(-b2 * reducedTime);
  }

  /** @return psi(0) = 1 - a1 - a2: the share of the lift that appears at once (-) */
  public double initialValue() {
    return 1 - a1 - a2;
  }

  /**
   * The filter in physical time: input an angle (rad), output the effective angle (rad).
   *
   * @param speedTasMps V (m/s), &gt; 0
   * @param semichordM b (m), &gt; 0
   * @return the two-state realisation (states x_i' = -beta_i x_i + u, output (1 - a1 - a2) u +
   *     sum a_i beta_i x_i)
   */
  public StateSpace filter(double speedTasMps, double semichordM) {
    if (!(speedTasMps > 0) || !(semichordM > 0)) {
      throw new IllegalArgumentException("speed and semichord must be > 0, found " + speedTasMps + ", "
          + semichordM);
    }
    double beta1 = b1 * speedTasMps / semichordM;
    double beta2 = b2 * speedTasMps / semichordM;
    DMatrixRMaj a = new DMatrixRMaj(new double[][] {{-beta1, 0}, {0, -beta2}});
    DMatrixRMaj b = new DMatrixRMaj(new double[][] {{1}, {1}});
    DMatrixRMaj c = new DMatrixRMaj(new double[][] {{a1 * beta1, a2 * beta2}});
    DMatrixRMaj d = new DMatrixRMaj(new double[][] {{initialValue()}});
    return new StateSpace(a, b, c, d, List.of("angle_rad"), List.of("effective_angle_rad"),
        List.of("lag1", "lag2"));
  }
}
