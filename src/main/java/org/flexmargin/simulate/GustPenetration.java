package org.flexmargin.simulate;

import java.util.Locale;
import org.flexmargin.loop.PadeOrder;
import org.flexmargin.loop.PureDelay;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.InvalidInputException;

/**
 * Gust penetration: the tailplane meets a vertical gust later than the wing, by tau = d / V (d the
 * distance between them, V the true airspeed; frozen gust field).
 *
 * <p>The aircraft's forces per radian of angle of attack are split into the tailplane's share and
 * the rest (wing and body). The tailplane's share is taken as that of the elevator scaled by
 * (1 - d epsilon / d alpha) / tau_e: a gust angle w/V at the tail acts like an elevator angle of
 * (w/V) / tau_e (tau_e = d alpha_tail / d delta, the elevator effectiveness), reduced by the
 * downwash the wing's own gust lift sheds, which reaches the tail together with the gust itself.
 * The wing part sees w(t), the tailplane part w(t - tau). With tau = 0 the split changes nothing.
 * An angle-of-attack vane sees the gust at the wing's time.
 *
 * <p>The delay is realised as Padé sections (degree 6 each, enough sections that w tau per
 * section stays at most 6 up to the highest frequency given): phase error below about 1 deg
 * there. Example: d = 6 m at 110 m/s is tau = 0.055 s; up to 30 Hz, w tau = 10.3, two sections.
 * Immutable.
 *
 * @param wingToTailM distance from the wing's to the tailplane's aerodynamic centre (m), &gt;= 0
 * @param downwashGradient d epsilon / d alpha at the tail, in [0, 1)
 * @param elevatorEffectiveness tau_e = d alpha_tail / d delta, in (0, 1.5]
 */
public record GustPenetration(double wingToTailM, double downwashGradient, double elevatorEffectiveness) {
  private static final int SECTION_DEGREE = 6;
  private static final double SECTION_PHASE_SPAN = 6.0;

  /** Validates. */
  public GustPenetration {
    if (!(wingToTailM >= 0) || !Double.isFinite(wingToTailM)) {
      throw new InvalidInputException("gust_penetration.wing_to_tail_m", "a finite distance >= 0 m",
          String.valueOf(wingToTailM));
    }
    if (!(downwashGradient >= 0 && downwashGradient < 1)) {
      throw new InvalidInputException("gust_penetration.downwash_gradient", "a value in [0, 1)",
          String.valueOf(downwashGradient));
    }
    if (!(elevatorEffectiveness > 0 && elevatorEffectiveness <= 1.5)) {
      throw new InvalidInputException("gust_penetration.elevator_effectiveness", "a value in (0, 1.5]",
          String.valueOf(elevatorEffectiveness));
    }
  }

  /** @return (1 - d epsilon / d alpha) / tau_e: tail forces per radian of gust angle, in elevator radians */
  public double tailShareOfElevator() {
    return (1 - downwashGradient) / elevatorEffectiveness;
  }

  /**
   * @param speedTasMps V (m/s)
   * @return tau = d / V (s)
   */
  public double delayS(double speedTasMps) {
    return wingToTailM / speedTasMps;
  }

  /**
   * @param speedTasMps V (m/s)
   * @param maxOmegaRadPerS highest frequency the delay must follow (rad/s)
   * @return number of Padé sections: w tau per section at most {@value #SECTION_PHASE_SPAN}
   */
  int sections(double speedTasMps, double maxOmegaRadPerS) {
    return Math.max(1, (int) Math.ceil(maxOmegaRadPerS * delayS(speedTasMps) / SECTION_PHASE_SPAN));
  }

  /**
   * The delay from the gust at the wing to the gust at the tailplane.
   *
   * @param speedTasMps V (m/s)
   * @param maxOmegaRadPerS highest frequency the delay must follow (rad/s)
   * @return the Padé realisation (input and output in m/s)
   */
  StateSpace delay(double speedTasMps, double maxOmegaRadPerS) {
    double tau = delayS(speedTasMps);
    int n = sections(speedTasMps, maxOmegaRadPerS);
    StateSpace one = new PureDelay(tau / n, PadeOrder.ofDegree(SECTION_DEGREE)).stateSpace();
    StateSpace d = one;
    for (int i = 1; i < n; i++) {
      d = d.series(one);
    }
    return d;
  }

  /**
   * @param speedTasMps V (m/s)
   * @param maxOmegaRadPerS highest frequency the delay must follow (rad/s)
   * @return the model in words
   */
  String describe(double speedTasMps, double maxOmegaRadPerS) {
    double tau = delayS(speedTasMps);
    int n = sections(speedTasMps, maxOmegaRadPerS);
    return String.format(Locale.ROOT, "gust penetration: tailplane %.2f m behind the wing, delay %.4f s; tail share "
        + "of the angle-of-attack forces = elevator forces x (1 - %.2f) / %.2f; delay as %d Pade section(s) of "
        + "degree %d (w tau <= %.1f per section up to %.1f Hz); the vane sees the gust at the wing",
        wingToTailM, tau, downwashGradient, elevatorEffectiveness, n, SECTION_DEGREE,
        maxOmegaRadPerS * tau / n, maxOmegaRadPerS / (2 * Math.PI));
  }
}
