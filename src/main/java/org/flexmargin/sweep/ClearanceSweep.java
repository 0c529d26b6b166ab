package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Supplier;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.clearance.CheckKey;
import org.flexmargin.clearance.CheckKind;
import org.flexmargin.clearance.ClearanceCheck;
import org.flexmargin.clearance.FlutterClearance;
import org.flexmargin.clearance.FlutterClearanceRule;
import org.flexmargin.clearance.MarginOnsets;
import org.flexmargin.clearance.ModeFrequency;
import org.flexmargin.clearance.OnsetSearch;
import org.flexmargin.clearance.PointAssessment;
import org.flexmargin.clearance.PointAssessor;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LoopSpec;

/**
 * Judges one configuration's sweep against the requirements table: every grid point's loop
 * margins and structural modes (with the closed-loop stability from the closed-loop eigenvalues),
 * the speed at which each requirement is first violated (refined by Brent's method on airspeed,
 * re-analysing the loop between the bracketing grid points), and the flutter speed margin and
 * minimum damping rule (open and closed loop). Stateless and thread-safe.
 */
public final class ClearanceSweep {
  /** The loop margins' search settings of the margin-onset refinement. */
  private final MarginOptions marginOptions;

  /** With the default margin search settings. */
  public ClearanceSweep() {
    this(MarginOptions.defaults());
  }

  /** @param marginOptions the loop margins' search settings of the margin-onset refinement */
  public ClearanceSweep(MarginOptions marginOptions) {
    this.marginOptions = Objects.requireNonNull(marginOptions, "margin options");
  }
  private static final int BRENT_MAX_EVALUATIONS = 30;

  /**
   * @param model configuration model
   * @param configuration configuration
   * @param loop loop, or null (flutter rule only)
   * @param path sweep path
   * @param flutter open-loop flutter solution
   * @param divergence static divergence (rigid body restrained)
   * @param servo loop results, or null
   * @param requirements the table
   * @param speedToleranceMps onset refinement tolerance (m/s EAS)
   * @return the verdict
   */
  public ClearanceResult assess(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      PlannedPath path, FlutterSolution flutter, DivergenceResult divergence, ServoResult servo,
      ClearanceRequirements requirements, double speedToleranceMps) {
    List<PointAssessment> points = new ArrayList<>();
    List<MarginOnset> onsets = new ArrayList<>();
    if (servo != null) {
      double maxHz = ServoMargins.bandTopHz(model);
      points.addAll(SweepParallel.map(servo.points().size(), p -> {
        ServoPoint sp = servo.points().get(p);
        ServoLoop sl = ServoMargins.loopAt(model, configuration, loop, sp.condition());
        ClosedLoopStability stability = servo.closedLoop().points().get(p).maxRealPart() < 0
            ? ClosedLoopStability.STABLE : ClosedLoopStability.UNSTABLE;
        return assessAt(requirements, sp.condition(), sp.margins(), stability, modesAt(flutter, p), sl);
      }));
      List<MarginOnsets.Bracket> brackets = MarginOnsets.brackets(points);
      onsets.addAll(SweepParallel.map(brackets.size(), i -> {
        MarginOnsets.Bracket b = brackets.get(i);
        return b.key().kind() == CheckKind.CLOSED_LOOP_STABILITY ? stabilityOnset(b, servo, points, requirements)
            : refine(b, model, configuration, loop, path, flutter, points, requirements, maxHz, speedToleranceMps);
      }));
    }
    List<OnsetSearch> searches = new ArrayList<>();
    double top = path.at(path.gridPoints() - 1).speedEasMps();
    OptionalDouble trusted = TrackingTrust.trustedUpToEasMps(flutter);
    searches.add(trusted.isPresent()
        ? OnsetSearch.trustedUpTo(OnsetSearch.OPEN_LOOP, firstOnset(flutter.crossings()), trusted.getAsDouble())
        : OnsetSearch.openLoop(firstOnset(flutter.crossings()), top));
    if (servo != null) {
      searches.add(OnsetSearch.closedLoop(firstOnset(servo.closedLoop().crossings()), top));
    }
    DampingPeak damping = highestG(flutter, servo, requirements);
    FlutterClearance fc = FlutterClearanceRule.assess(requirements, searches, damping.highestG(),
        divergence.found() ? OptionalDouble.of(divergence.speedEasMps()) : OptionalDouble.empty());
    return new ClearanceResult(points, onsets, fc, requirements.source(),
        rank(points, onsets, fc, damping, requirements.limitSpeedEasMps()));
  }

  /**
   * Every requirement once, with the speed that ranks it: point checks at their first failing
   * point (the refined onset when one lies in the bracket) or where they are tightest; flutter
   * and divergence checks at their onset speed; the damping check at the first speed where a root
   * falls below the minimum damping (or where damping is least).
   */
  static List<RankedFinding> rank(List<PointAssessment> points, List<MarginOnset> onsets,
      FlutterClearance fc, DampingPeak damping, double limitEas) {
    Map<CheckKey, RankedFinding> byKey = new LinkedHashMap<>();
    for (int p = 0; p < points.size(); p++) {
      PointAssessment pa = points.get(p);
      double lower = p == 0 ? pa.speedEasMps() : points.get(p - 1).speedEasMps();
      for (ClearanceCheck c : pa.checks()) {
        RankedFinding before = byKey.get(c.key());
        if (before != null && (!before.check().passed() || c.passed()
            && before.check().normalisedExcess() <= c.normalisedExcess())) {
          continue;
        }
        double speed = c.passed() ? pa.speedEasMps() : onsetSpeed(onsets, c, lower, pa.speedEasMps());
        byKey.put(c.key(), RankedFinding.of(c, speed, limitEas));
      }
    }
    for (ClearanceCheck c : fc.checks()) {
      double speed = switch (c.kind()) {
        case MINIMUM_DAMPING -> c.passed() ? damping.highestAtEasMps() : damping.firstBelowMinimumEasMps();
        default -> c.achievedValue();
      };
      byKey.put(c.key(), RankedFinding.of(c, speed, limitEas));
    }
    return new ArrayList<>(byKey.values());
  }

  /** The refined onset of a check's requirement within [lower, upper] (EAS, m/s), else upper. */
  private static double onsetSpeed(List<MarginOnset> onsets, ClearanceCheck c, double lower, double upper) {
    for (MarginOnset m : onsets) {
      double v = m.condition().speedEasMps();
      if (m.key().equals(c.key()) && v >= lower && v <= upper) {
        return v;
      }
    }
    return upper;
  }

  private static OptionalDouble firstOnset(List<FlutterCrossing> crossings) {
    return crossings.stream().filter(c -> c.kind() == CrossingKind.FLUTTER_ONSET)
        .mapToDouble(c -> c.condition().speedEasMps()).min();
  }

  /**
   * The least damping up to V_L: highest g (V-g convention) of any open-loop root and any
   * closed-loop oscillatory root, the speed where it occurs, and the lowest speed at which any
   * root's g exceeds -minimum damping (NaN if none).
   */
  record DampingPeak(double highestG, double highestAtEasMps, double firstBelowMinimumEasMps) {
    DampingPeak add(double g, double eas, double limitG) {
      double first = g > limitG && !(firstBelowMinimumEasMps <= eas) ? eas : firstBelowMinimumEasMps;
      return g > highestG ? new DampingPeak(g, eas, first) : new DampingPeak(highestG, highestAtEasMps, first);
    }
  }

  static DampingPeak highestG(FlutterSolution flutter, ServoResult servo, ClearanceRequirements req) {
    double limitEas = req.limitSpeedEasMps();
    double limitG = -req.minimumDampingG();
    DampingPeak d = new DampingPeak(-1.0, flutter.branches().isEmpty() ? 0.0
        : flutter.branches().get(0).speedEasMps()[0], Double.NaN);
    for (BranchCurve b : flutter.branches()) {
      double[] eas = b.speedEasMps();
      double[] gg = b.dampingG();
      for (int i = 0; i < b.size(); i++) {
        if (b.converged()[i] && eas[i] <= limitEas && Double.isFinite(gg[i])) {
          d = d.add(gg[i], eas[i], limitG);
        }
      }
    }
    if (servo != null) {
      for (ClosedLoopPoint p : servo.closedLoop().points()) {
        if (p.condition().speedEasMps() <= limitEas) {
          for (ClosedLoopRoot r : p.roots()) {
            if (r.imagRadPerS() > 1e-6 && Double.isFinite(r.dampingG())) {
              d = d.add(r.dampingG(), p.condition().speedEasMps(), limitG);
            }
          }
        }
      }
    }
    return d;
  }

  /** Structural modes and their current (p-k) frequencies at grid point p. */
  static List<ModeFrequency> modesAt(FlutterSolution flutter, double t) {
    List<ModeFrequency> modes = new ArrayList<>();
    for (BranchCurve b : flutter.branches()) {
      int p = (int) Math.floor(t);
      int q = Math.min(p + 1, b.size() - 1);
      double w = t - p;
      double[] f = b.frequencyHz();
      double fp = b.converged()[p] ? f[p] : Double.NaN;
      double fq = b.converged()[q] ? f[q] : fp;
      double freq = Double.isNaN(fp) ? fq : fp + w * (fq - fp);
      if (Double.isFinite(freq) && freq > 0) {
        modes.add(new ModeFrequency(b.name(), freq));
      }
    }
    return modes;
  }

  private static PointAssessment assessAt(ClearanceRequirements requirements, FlightCondition fc,
      LoopMarginResult margins, ClosedLoopStability stability, List<ModeFrequency> modes, ServoLoop loop) {
    return PointAssessor.assess(requirements, fc.speedEasMps(), firstFrequencyHz(modes), margins, stability, modes,
        loop.brokenLoop());
  }

  /**
   * The checks of one requirement at a point, computing only what they need: a structural mode's
   * check needs that mode's peak search alone, a margin check the loop margins alone (checks of
   * other keys are left out; the excess of {@code key} is that of the full assessment).
   */
  static PointAssessment onlyKey(CheckKey key, ClearanceRequirements requirements, FlightCondition fc,
      List<ModeFrequency> modes, ServoLoop loop, Supplier<LoopMarginResult> margins) {
    double f1 = firstFrequencyHz(modes);
    if (key.kind() == CheckKind.STRUCTURAL_MODE) {
      List<ModeFrequency> mode = modes.stream().filter(m -> m.name().equals(key.subject())).toList();
      return PointAssessor.assessStructuralModes(requirements, fc.speedEasMps(), f1, mode, loop.brokenLoop());
    }
    // the margin checks' bands still depend on the lowest mode frequency
    return PointAssessor.assess(requirements, fc.speedEasMps(), f1, margins.get(), ClosedLoopStability.NOT_CHECKED,
        List.of(), loop.brokenLoop());
  }

  /** Lowest current mode frequency, Hz (1 Hz without modes). */
  private static double firstFrequencyHz(List<ModeFrequency> modes) {
    return modes.stream().mapToDouble(ModeFrequency::frequencyHz).min().orElse(1.0);
  }

  static MarginOnset stabilityOnset(MarginOnsets.Bracket b, ServoResult servo, List<PointAssessment> points,
      ClearanceRequirements requirements) {
    // the closed-loop onset itself is refined by the closed-loop sweep: take the first refined
    // closed-loop flutter onset inside the bracket, else the failing grid point
    for (FlutterCrossing x : servo.closedLoop().crossings()) {
      double v = x.condition().speedEasMps();
      if (x.kind() == CrossingKind.FLUTTER_ONSET && v >= b.passingSpeedEasMps() - 1e-9
          && v <= b.failingSpeedEasMps() + 1e-9) {
        return new MarginOnset(b.key(), "closed-loop stability (" + x.branchName() + ")", x.condition(), 0.0, "",
            x.evaluations(), true);
      }
    }
    FlightCondition at = servo.points().stream().filter(p -> p.condition().speedEasMps() == b.failingSpeedEasMps())
        .findFirst().orElseThrow().condition();
    return new MarginOnset(b.key(), "closed-loop stability", at, 0.0, "", 0, false);
  }

  private MarginOnset refine(MarginOnsets.Bracket b, ConfigurationModel model, Configuration configuration,
      LoopSpec loop, PlannedPath path, FlutterSolution flutter, List<PointAssessment> points,
      ClearanceRequirements requirements, double maxHz, double tolMps) {
    int p = indexOfSpeed(points, b.passingSpeedEasMps());
    ServoMargins margins = new ServoMargins(marginOptions);
    int[] evaluations = {0};
    DoubleUnaryOperator excess = MarginOnsets.excessAlongSpeed(v -> {
      evaluations[0]++;
      double t = p + (v - b.passingSpeedEasMps()) / (b.failingSpeedEasMps() - b.passingSpeedEasMps());
      FlightCondition fc = path.at(t);
      ServoLoop sl = ServoMargins.loopAt(model, configuration, loop, fc);
      return onlyKey(b.key(), requirements, fc, modesAt(flutter, t), sl,
          () -> margins.at(sl, ServoMargins.seeds(flutter, p), maxHz));
    }, b.key());
    double onset;
    boolean refined = true;
    try {
      BrentSolver solver = new BrentSolver(1e-12, tolMps);
      onset = solver.solve(BRENT_MAX_EVALUATIONS, v -> {
        double e = excess.applyAsDouble(v);
        // a check that disappears inside the bracket is treated as still met (left side)
        return Double.isNaN(e) ? Math.abs(b.passingExcess()) : e;
      }, b.passingSpeedEasMps(), b.failingSpeedEasMps());
    } catch (TooManyEvaluationsException | MathIllegalArgumentException e) {
      onset = b.failingSpeedEasMps();
      refined = false;
    }
    double t = p + (onset - b.passingSpeedEasMps()) / (b.failingSpeedEasMps() - b.passingSpeedEasMps());
    ClearanceCheck failing = points.get(p + 1).checks().stream().filter(c -> c.key().equals(b.key()))
        .min((x, y) -> Double.compare(x.excess(), y.excess())).orElseThrow();
    return new MarginOnset(b.key(), failing.description(), path.at(t), failing.requiredValue(),
        failing.unit().symbol(), evaluations[0], refined);
  }

  static int indexOfSpeed(List<PointAssessment> points, double eas) {
    for (int i = 0; i < points.size(); i++) {
      if (points.get(i).speedEasMps() == eas) {
        return i;
      }
    }
    throw new IllegalStateException("bracket speed " + eas + " is not a grid point");
  }
}
