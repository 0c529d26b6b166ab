package org.flexmargin.aero;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.model.AeroSpec;
import org.flexmargin.model.CouplingOrigin;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripPlacement;
import org.flexmargin.model.StripTheorySpec;

/**
 * Quasi-steady coupling of the elastic modes with the rigid-body short period and the elevator,
 * summed over placed strips ({@link StripPlacement}).
 *
 * <p>Each strip s (width w, semichord b, elastic axis a semichords aft of mid-chord, lift slope
 * a<sub>s</sub>, area A = 2 b w, elastic axis x<sub>s</sub> behind the centre of mass) carries its
 * quasi-steady lift at the quarter chord, x<sub>1/4</sub> = x<sub>s</sub> - b (a + 1/2), and feels
 * the angle of attack of the three-quarter-chord point, x<sub>3/4</sub> = x<sub>s</sub> + b (1/2 -
 * a), as in the steady limit of Theodorsen's theory (NACA Report 496). A mode moves the quarter
 * chord by d = h + b (a + 1/2) &theta; (h heave of the elastic axis, &theta; twist, per unit
 * coordinate). Per unit dynamic pressure:
 *
 * <pre>
 *   C_L,eta  =  sum a_s A theta / S
 *   C_m,eta  = -sum a_s A theta x_1/4 / (S c)
 *   Q_alpha  =  sum a_s A (1 - d eps/d alpha) d                 (m^2 per rad)
 *   Q_q      =  sum a_s A (2 x_3/4 / c) d                       (m^2 per unit q c / 2V)
 *   Q_delta  =  sum (a_s / 2 pi) A (c_l,delta d + 2 b c_m,delta theta)   (m^2 per rad)
 * </pre>
 *
 * <p>with S and c the rigid body's reference area and chord. The elevator's section lift and
 * quarter-chord moment per radian are Glauert's thin-aerofoil flap results (H. Glauert, <i>The
 * Elements of Aerofoil and Airscrew Theory</i>, 1926; as in Abbott &amp; von Doenhoff, <i>Theory
 * of Wing Sections</i>, 1959, sec. 8.2, and Anderson, <i>Fundamentals of Aerodynamics</i>, ch. 4;
 * from memory), with cos &theta;<sub>h</sub> = 2 E - 1 for an elevator of chord fraction E:
 *
 * <pre>
 *   c_l,delta = 2 (pi - theta_h) + 2 sin theta_h
 *   c_m,delta = -(1/2) sin theta_h (1 - cos theta_h)     (about the quarter chord, nose up +)
 * </pre>
 *
 * <p>both scaled by a<sub>s</sub> / 2&pi; so that a strip whose lift slope carries a
 * finite-span correction carries it on its flap too (common practice). Not modelled: the lag of
 * the downwash at the tail, the elastic modes' effect on the downwash, heave-rate terms (they are
 * in the elastic Q(ik), not in the rigid-body equations).
 */
public final class StripCoupling {

  private StripCoupling() {}

  /**
   * Glauert's flap lift per radian of a thin aerofoil with a flap of chord fraction E (2 &pi; per
   * radian lift slope).
   *
   * @param chordFraction E in [0, 1]
   * @return d c_l / d delta (1/rad)
   */
  public static double flapLiftPerRad(double chordFraction) {
    double th = hingeAngle(chordFraction);
    return 2 * (Math.PI - th) + 2 * Math.sin(th);
  }

  /**
   * Glauert's flap pitching moment about the quarter chord per radian (nose up positive, trailing
   * edge down deflection positive; negative for any flap).
   *
   * @param chordFraction E in [0, 1]
   * @return d c_m,1/4 / d delta (1/rad)
   */
  public static double flapQuarterChordMomentPerRad(double chordFraction) {
    double th = hingeAngle(chordFraction);
    return -0.5 * Math.sin(th) * (1 - Math.cos(th));
  }

  /**
   * Flap effectiveness tau = d alpha_0 / d delta = c_l,delta / 2 pi.
   *
   * @param chordFraction E in [0, 1]
   * @return tau (dimensionless)
   */
  public static double flapEffectiveness(double chordFraction) {
    return flapLiftPerRad(chordFraction) / (2 * Math.PI);
  }

  private static double hingeAngle(double chordFraction) {
    if (!(chordFraction >= 0 && chordFraction <= 1)) {
      throw new IllegalArgumentException("flap chord fraction must be in [0, 1], found " + chordFraction);
    }
    return Math.acos(2 * chordFraction - 1);
  }

  /**
   * The coupling of one mode.
   *
   * @param strips placed strips ({@link StripTheorySpec#placed()})
   * @param mode the mode, with shapes at every strip station
   * @param referenceAreaM2 S (m^2) of the rigid body's coefficients
   * @param referenceChordM c (m) of the rigid body's coefficients
   * @return the coupling, origin {@link CouplingOrigin#STRIPS}
   * @throws InvalidInputException if a strip has no placement or the mode no shape at a station
   */
  public static ModeCoupling of(StripTheorySpec strips, ElasticMode mode, double referenceAreaM2,
      double referenceChordM) {
    double lift = 0;
    double moment = 0;
    double perAlpha = 0;
    double perRate = 0;
    double perElevator = 0;
    List<Strip> list = strips.strips();
    for (int s = 0; s < list.size(); s++) {
      Strip strip = list.get(s);
      Geometry g = Geometry.of(strip, s);
      ShapeValue shape = mode.shapes().get(strip.station());
      if (shape == null) {
        throw new InvalidInputException("aero.strips[" + s + "].station",
            "a shape value at station \"" + strip.station() + "\" in mode \"" + mode.name() + "\"", "none");
      }
      double theta = shape.rotationRad();
      double d = shape.displacementM() + g.b * (strip.elasticAxisA() + 0.5) * theta;
      lift += g.slopeArea * theta;
      moment -= g.slopeArea * theta * g.xQuarter;
      perAlpha += g.slopeArea * (1 - g.downwash) * d;
      perRate += g.slopeArea * 2 * g.xThreeQuarter / referenceChordM * d;
      perElevator += g.flapLift * d + g.flapMoment * theta;
    }
    return new ModeCoupling(lift / referenceAreaM2, moment / (referenceAreaM2 * referenceChordM), perAlpha,
        perElevator, perRate, CouplingOrigin.STRIPS);
  }

  /**
   * The rigid body's derivatives as the placed strips give them, for comparison with the supplied
   * ones (the plant always uses the supplied rigid-body derivatives).
   *
   * @param strips placed strips
   * @param referenceAreaM2 S (m^2)
   * @param referenceChordM c (m)
   * @return the strip sums
   */
  public static StripDerivatives rigidDerivatives(StripTheorySpec strips, double referenceAreaM2,
      double referenceChordM) {
    double cla = 0;
    double cma = 0;
    double cmq = 0;
    double cld = 0;
    double cmd = 0;
    List<Strip> list = strips.strips();
    for (int s = 0; s < list.size(); s++) {
      Geometry g = Geometry.of(list.get(s), s);
      double alphaLift = g.slopeArea * (1 - g.downwash);
      cla += alphaLift;
      cma -= alphaLift * g.xQuarter;
      cmq -= g.slopeArea * 2 * g.xThreeQuarter / referenceChordM * g.xQuarter;
      cld += g.flapLift;
      cmd += -g.flapLift * g.xQuarter + g.flapMoment;
    }
    double s = referenceAreaM2;
    double sc = referenceAreaM2 * referenceChordM;
    return new StripDerivatives(cla / s, cma / sc, cmq / sc, cld / s, cmd / sc);
  }

  /**
   * The rigid body with every mode's coupling resolved: supplied coefficients are kept; modes
   * without them get coefficients computed from the strips when the configuration's strips are
   * placed; the others stay uncoupled ({@link CouplingOrigin#NONE}).
   *
   * @param rigid the rigid body as read (may be {@code null}: returned as is)
   * @param aero the configuration's aerodynamic data (strips, force table or lifting surfaces)
   * @param modes the configuration's mode table
   * @return a rigid body whose coupling map holds supplied and computed coefficients
   */
  public static RigidBody resolve(RigidBody rigid, AeroSpec aero, ModeTable modes) {
    if (rigid == null || !(aero instanceof StripTheorySpec strips) || !strips.placed()) {
      return rigid;
    }
    Map<String, ModeCoupling> all = new LinkedHashMap<>(rigid.modeCoupling());
    for (ElasticMode mode : modes.modes()) {
      if (!all.containsKey(mode.name())) {
        all.put(mode.name(), of(strips, mode, rigid.referenceAreaM2(), rigid.referenceChordM()));
      }
    }
    return rigid.withCoupling(all);
  }

  /**
   * One placed strip's sums: semichord b (m), lift slope times area (m^2), quarter- and
   * three-quarter-chord positions behind the centre of mass (m), downwash gradient, and the
   * elevator's lift (m^2, per rad, at the quarter chord) and quarter-chord moment (m^3 per rad).
   */
  private record Geometry(double b, double slopeArea, double xQuarter, double xThreeQuarter, double downwash,
      double flapLift, double flapMoment) {
    static Geometry of(Strip strip, int index) {
      StripPlacement p = strip.placement();
      if (p == null) {
        throw new InvalidInputException("aero.strips[" + index + "].elastic_axis_aft_of_cg_m",
            "the strip's position behind the centre of mass (m)", "none");
      }
      double b = strip.semichordM();
      double a = strip.elasticAxisA();
      double area = 2 * b * strip.widthM();
      double scale = strip.liftSlopePerRad() / (2 * Math.PI);
      double e = p.elevatorChordFraction();
      return new Geometry(b, strip.liftSlopePerRad() * area, p.elasticAxisAftOfCgM() - b * (a + 0.5),
          p.elasticAxisAftOfCgM() + b * (0.5 - a), p.downwashGradient(),
          p.hasElevator() ? scale * area * flapLiftPerRad(e) : 0.0,
          p.hasElevator() ? scale * area * 2 * b * flapQuarterChordMomentPerRad(e) : 0.0);
    }
  }
}
