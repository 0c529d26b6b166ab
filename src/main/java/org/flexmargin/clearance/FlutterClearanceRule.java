package org.flexmargin.clearance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.flexmargin.model.Checks;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.InvalidInputException;

/**
 * The flutter clearance rule: no flutter up to flutter speed factor x V_L on equivalent airspeed
 * (1.15 recalled from MIL-A-8870C, and the +15 % EAS enlargement of 14 CFR/CS 25.629), and every
 * root at least the minimum damping up to V_L (g &gt;= 0.03 recalled from MIL-A-8870C).
 *
 * <p>Damping is in the V-g sign convention used by the flutter solvers: g = 2 Re(s)/Im(s),
 * negative = stable, g ~ -2 zeta. The damping requirement therefore reads: the highest g of any
 * root at any analysed speed V &lt;= V_L is at most -minimumDampingG. Both edges pass: an onset
 * exactly at factor x V_L, and a highest g exactly at -minimumDampingG.
 *
 * <p>A search that found no onset clears the speed requirement only if it reached factor x V_L;
 * its achieved value is then the highest speed analysed.
 */
public final class FlutterClearanceRule {
  private FlutterClearanceRule() {}

  /**
   * @param requirements the table (V_L, flutter speed factor, minimum damping)
   * @param searches one or more onset searches (open loop, closed loop, ...), labels unique
   * @param highestDampingGUpToLimitSpeed the highest (least stable) g of any root at any speed
   *     V &lt;= V_L, V-g convention (finite)
   * @return the verdict
   */
  public static FlutterClearance assess(ClearanceRequirements requirements,
      List<OnsetSearch> searches, double highestDampingGUpToLimitSpeed) {
    return assess(requirements, searches, highestDampingGUpToLimitSpeed, OptionalDouble.empty());
  }

  /**
   * The rule with the divergence check: static divergence (rigid body restrained) must also lie
   * at or above flutter speed factor x V_L (MIL-A-8870C names flutter, divergence and other
   * aeroelastic instabilities together, from memory).
   *
   * @param requirements the table
   * @param searches onset searches, labels unique
   * @param highestDampingGUpToLimitSpeed highest g up to V_L, V-g convention (finite)
   * @param divergenceEasMps divergence speed, m/s EAS, or empty when there is no divergence
   * @return the verdict
   */
  public static FlutterClearance assess(ClearanceRequirements requirements,
      List<OnsetSearch> searches, double highestDampingGUpToLimitSpeed,
      OptionalDouble divergenceEasMps) {
    if (requirements == null || searches == null || searches.isEmpty()) {
      throw new InvalidInputException("flutter_clearance",
          "requirements and at least one onset search", "nothing");
    }
    if (!Double.isFinite(highestDampingGUpToLimitSpeed)) {
      throw new InvalidInputException("highest_damping_g", "a finite g (V-g convention)",
          String.valueOf(highestDampingGUpToLimitSpeed));
    }
    double required = requirements.requiredFlutterSpeedEasMps();
    List<ClearanceCheck> checks = new ArrayList<>();
    List<String> labels = new ArrayList<>();
    for (OnsetSearch s : searches) {
      if (labels.contains(s.label())) {
        throw new InvalidInputException("searches", "unique labels",
            "\"" + s.label() + "\" twice");
      }
      labels.add(s.label());
      String words = s.label().replace('_', ' ');
      String text;
      double achieved;
      if (s.onsetEasMps().isPresent()) {
        achieved = s.onsetEasMps().getAsDouble();
        text = String.format(Locale.ROOT, "%s flutter onset speed against %.4g x V_L", words,
            requirements.flutterSpeedFactor());
      } else {
        achieved = s.highestAnalysedEasMps();
        text = String.format(Locale.ROOT,
            "%s: no flutter found up to %.4g m/s EAS (top of the analysed range) against %.4g"
                + " x V_L", words, achieved, requirements.flutterSpeedFactor());
      }
      checks.add(ClearanceCheck.of(CheckKind.FLUTTER_SPEED, s.label(), text, required, achieved,
          CheckUnit.METRE_PER_SECOND_EAS, RequiredSense.AT_LEAST, Double.NaN));
    }
    if (divergenceEasMps.isPresent()) {
      checks.add(ClearanceCheck.of(CheckKind.DIVERGENCE_SPEED, "",
          String.format(Locale.ROOT, "divergence speed (rigid body restrained) against %.4g x V_L",
              requirements.flutterSpeedFactor()),
          required, Checks.positive("divergence_eas_mps", divergenceEasMps.getAsDouble()),
          CheckUnit.METRE_PER_SECOND_EAS, RequiredSense.AT_LEAST, Double.NaN));
    }
    checks.add(ClearanceCheck.of(CheckKind.MINIMUM_DAMPING, "",
        String.format(Locale.ROOT, "least damping up to V_L: highest g (V-g, negative stable)"
            + " against -%.4g", requirements.minimumDampingG()),
        -requirements.minimumDampingG(), highestDampingGUpToLimitSpeed, CheckUnit.DAMPING_G,
        RequiredSense.AT_MOST, Double.NaN));
    return new FlutterClearance(requirements.limitSpeedEasMps(), required, checks);
  }
}
