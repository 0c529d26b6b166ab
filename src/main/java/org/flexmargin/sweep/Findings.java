package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.FlutterMethodKind;

/** Builds the findings table of a sweep: per configuration, every finding in order of airspeed. */
public final class Findings {
  private Findings() {}

  /** Appended to the name of a finding that rests on mode tracking in doubt. */
  public static final String UNRELIABLE = " (unreliable)";

  /** Finding name of the last speed up to which open-loop mode tracking can be trusted. */
  public static final String TRACKING_IN_DOUBT = "mode tracking trusted only to here";

  /** Finding name of an open-loop root already unstable at the first sweep point. */
  public static final String OPEN_LOOP_UNSTABLE_AT_START = "open-loop unstable at sweep start";

  /** Finding name of a closed-loop root already unstable at the first sweep point. */
  public static final String CLOSED_LOOP_UNSTABLE_AT_START = "closed loop unstable at start";

  /**
   * @param result sweep result
   * @param sweepStart flight condition at the first sweep point (altitude for divergence TAS)
   * @return the findings, in configuration order
   */
  public static List<Finding> of(SweepResult result, FlightCondition sweepStart) {
    List<Finding> all = new ArrayList<>();
    for (ConfigurationResult c : result.configurations()) {
      List<Finding> out = new ArrayList<>();
      DivergenceResult d = c.divergence();
      if (d.found()) {
        double tas = d.speedTasMps(sweepStart.densityKgPerM3());
        String confirm = c.divergenceConfirmedPa().isPresent()
            ? String.format(Locale.ROOT, "confirmed in sweep (q %.1f Pa)", c.divergenceConfirmedPa().getAsDouble())
            : "beyond the sweep";
        out.add(new Finding(c.configuration(), "divergence", "-", d.speedEasMps(), tas,
            tas / sweepStart.speedOfSoundMps(), sweepStart.altitudeM(), 0.0,
            "rigid body restrained; " + confirm));
      } else {
        out.add(new Finding(c.configuration(), "no divergence", "-", Double.NaN, Double.NaN, Double.NaN,
            sweepStart.altitudeM(), Double.NaN, d.note()));
      }
      if (c.flutter().method() != FlutterMethodKind.K) {
        startStatus(out, c, result.analysisCase().options().dampingLimitG(), sweepStart);
      }
      for (FlutterCrossing x : c.flutter().crossings()) {
        FlightCondition fc = x.condition();
        boolean unreliable = TrackingTrust.unreliableAt(c.flutter(), fc.speedEasMps());
        out.add(new Finding(c.configuration(), label(x.kind()) + (unreliable ? UNRELIABLE : ""), x.branchName(),
            fc.speedEasMps(), fc.speedTasMps(), fc.mach(), fc.altitudeM(), x.frequencyHz(),
            (unreliable ? "mode tracking in doubt here even after re-solving with finer steps; " : "")
                + crossedRemark(x.thresholdG(), c.flutter().method().label() + " method")));
      }
      c.trackingTrustedUpToEasMps().ifPresent(v -> out.add(new Finding(c.configuration(), TRACKING_IN_DOUBT, "-",
          v, Double.NaN, Double.NaN, sweepStart.altitudeM(), Double.NaN,
          "open-loop findings above this speed are unreliable; no flutter-free speed is claimed beyond it")));
      if (c.servo() != null) {
        closedLoop(out, c);
      }
      if (c.clearance() != null) {
        for (MarginOnset m : c.clearance().marginOnsets()) {
          FlightCondition fc = m.condition();
          String subject = m.key().subject().isEmpty() ? "closed loop" : m.key().subject().replace('_', ' ')
              + (m.key().kind() == CheckKind.STRUCTURAL_MODE ? "" : " band");
          out.add(new Finding(c.configuration(), requirementOnset(m.key().kind()), subject,
              fc.speedEasMps(), fc.speedTasMps(), fc.mach(), fc.altitudeM(), 0.0,
              m.description() + (m.refined() ? "" : " (not refined: the check vanished between grid points)")));
        }
      }
      out.sort(Comparator.comparingDouble(f -> Double.isNaN(f.speedEasMps()) ? -1 : f.speedEasMps()));
      all.addAll(out);
    }
    return all;
  }

  /** Closed-loop instability at the sweep start and every refined closed-loop crossing. */
  private static void closedLoop(List<Finding> out, ConfigurationResult c) {
    ClosedLoopResult r = c.servo().closedLoop();
    ClosedLoopPoint first = r.start();
    for (ClosedLoopRoot root : first.roots()) {
      if (root.realPerS() > 0) {
        FlightCondition fc = first.condition();
        out.add(new Finding(c.configuration(), CLOSED_LOOP_UNSTABLE_AT_START, root.label(), fc.speedEasMps(),
            fc.speedTasMps(), fc.mach(), fc.altitudeM(), root.frequencyHz(),
            String.format(Locale.ROOT, "root %.3f %+.3fi 1/s at the first sweep point", root.realPerS(),
                root.imagRadPerS())));
      }
    }
    for (FlutterCrossing x : r.crossings()) {
      FlightCondition fc = x.condition();
      out.add(new Finding(c.configuration(), "closed-loop " + label(x.kind()), x.branchName(), fc.speedEasMps(),
          fc.speedTasMps(), fc.mach(), fc.altitudeM(), x.frequencyHz(),
          crossedRemark(x.thresholdG(), r.routeOf(x))));
    }
  }

  /** Roots already unstable, or below the damping limit, at the first sweep point. */
  private static void startStatus(List<Finding> out, ConfigurationResult c, double limitG, FlightCondition start) {
    for (BranchCurve b : c.flutter().branches()) {
      double[] g = b.dampingG();
      if (b.size() == 0 || !b.converged()[0]) {
        continue;
      }
      String what = g[0] > 0 ? OPEN_LOOP_UNSTABLE_AT_START : g[0] > -limitG ? "damping below limit at start" : null;
      if (what != null) {
        out.add(new Finding(c.configuration(), what, b.name(), start.speedEasMps(), start.speedTasMps(),
            start.mach(), start.altitudeM(), b.frequencyHz()[0],
            String.format(Locale.ROOT, "damping g = %.4f at the first sweep point (V-g g = %.4f)", -g[0], g[0])));
      }
    }
  }

  /**
   * The finding name of the speed at which a requirement is first violated: it says which
   * requirement is no longer met, never that something was lost from the analysis.
   *
   * @param kind the requirement
   * @return e.g. "structural mode not stabilised"
   */
  public static String requirementOnset(CheckKind kind) {
    return switch (kind) {
      case GAIN_INCREASE_MARGIN -> "gain-increase margin too small";
      case GAIN_REDUCTION_MARGIN -> "gain-reduction margin too small";
      case PHASE_MARGIN -> "phase margin too small";
      case STRUCTURAL_MODE -> "structural mode not stabilised";
      case CLOSED_LOOP_STABILITY -> "closed loop unstable";
      case FLUTTER_SPEED -> "flutter speed too low";
      case DIVERGENCE_SPEED -> "divergence speed too low";
      case MINIMUM_DAMPING -> "damping too low";
    };
  }

  /**
   * @param f a finding
   * @return whether it marks the speed at which a requirement is first violated
   */
  public static boolean isRequirementOnset(Finding f) {
    for (CheckKind k : CheckKind.values()) {
      if (f.what().equals(requirementOnset(k))) {
        return true;
      }
    }
    return false;
  }

  /**
   * @param f a finding
   * @return whether it is a closed-loop instability (an onset, or unstable from the first point)
   */
  public static boolean isClosedLoopInstability(Finding f) {
    return f.what().equals("closed-loop " + label(CrossingKind.FLUTTER_ONSET))
        || f.what().equals(CLOSED_LOOP_UNSTABLE_AT_START);
  }

  /**
   * The remark of a damping crossing, in the requirement convention (positive = damped) with the
   * V-g value the charts show beside it.
   */
  private static String crossedRemark(double thresholdVgG, String how) {
    return thresholdVgG == 0 ? "damping g = 0 reached (" + how + ")"
        : String.format(Locale.ROOT, "damping g = %.3f reached (V-g g = %.3f; %s)", -thresholdVgG, thresholdVgG, how);
  }

  /** @return plain words for a crossing kind */
  public static String label(CrossingKind k) {
    return switch (k) {
      case FLUTTER_ONSET -> "flutter onset";
      case FLUTTER_RECOVERY -> "flutter recovery";
      case DAMPING_BELOW_LIMIT -> "damping below limit";
      case DAMPING_ABOVE_LIMIT -> "damping back above limit";
    };
  }
}
