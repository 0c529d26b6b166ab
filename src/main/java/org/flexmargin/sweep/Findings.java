package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.FlutterMethodKind;

/** Builds the findings table of a sweep: per configuration, every finding in order of airspeed. */
public final class Findings {
  private Findings() {}

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
      List<FlutterCrossing> crossings = new ArrayList<>(c.flutter().crossings());
      crossings.sort(Comparator.comparingDouble(x -> x.condition().speedEasMps()));
      for (FlutterCrossing x : crossings) {
        FlightCondition fc = x.condition();
        out.add(new Finding(c.configuration(), label(x.kind()), x.branchName(), fc.speedEasMps(),
            fc.speedTasMps(), fc.mach(), fc.altitudeM(), x.frequencyHz(),
            String.format(Locale.ROOT, "g = %.3f crossed (%s)", x.thresholdG(),
                c.flutter().method().label() + " method")));
      }
      if (c.servo() != null) {
        closedLoop(out, c);
      }
      if (c.clearance() != null) {
        for (MarginOnset m : c.clearance().marginOnsets()) {
          FlightCondition fc = m.condition();
          String subject = m.key().subject().isEmpty() ? "closed loop" : m.key().subject().replace('_', ' ');
          out.add(new Finding(c.configuration(), m.key().kind().key().replace('_', ' ') + " lost", subject,
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
    ClosedLoopPoint first = r.points().get(0);
    for (ClosedLoopRoot root : first.roots()) {
      if (root.realPerS() > 0) {
        FlightCondition fc = first.condition();
        out.add(new Finding(c.configuration(), "closed loop unstable at start", root.label(), fc.speedEasMps(),
            fc.speedTasMps(), fc.mach(), fc.altitudeM(), root.frequencyHz(),
            String.format(Locale.ROOT, "root %.3f %+.3fi 1/s at the first sweep point", root.realPerS(),
                root.imagRadPerS())));
      }
    }
    for (FlutterCrossing x : r.crossings()) {
      FlightCondition fc = x.condition();
      out.add(new Finding(c.configuration(), "closed-loop " + label(x.kind()), x.branchName(), fc.speedEasMps(),
          fc.speedTasMps(), fc.mach(), fc.altitudeM(), x.frequencyHz(),
          String.format(Locale.ROOT, "g = %.3f crossed (%s)", x.thresholdG(), r.routeOf(x))));
    }
  }

  /** Roots already unstable, or below the damping limit, at the first sweep point. */
  private static void startStatus(List<Finding> out, ConfigurationResult c, double limitG, FlightCondition start) {
    for (BranchCurve b : c.flutter().branches()) {
      double[] g = b.dampingG();
      if (b.size() == 0 || !b.converged()[0]) {
        continue;
      }
      String what = g[0] > 0 ? "unstable at sweep start" : g[0] > -limitG ? "damping below limit at start" : null;
      if (what != null) {
        out.add(new Finding(c.configuration(), what, b.name(), start.speedEasMps(), start.speedTasMps(),
            start.mach(), start.altitudeM(), b.frequencyHz()[0],
            String.format(Locale.ROOT, "g = %.4f at the first sweep point", g[0])));
      }
    }
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
