package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.ClosedLoopPoint;
import org.flexmargin.sweep.ClosedLoopResult;
import org.flexmargin.sweep.ClosedLoopSweep;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoMargins;
import org.junit.jupiter.api.Test;

/**
 * Notch placement on constructed loops with closed-form requirements, and on the invented demo
 * with an independent re-run of the project's margin code and closed-loop eigenvalues.
 */
class NotchDesignTest {

  private static final double TWO_PI = 2 * Math.PI;

  /** Closed-form notch response of a designed notch ({@link ClosedForm#notch}): {|N|, arg N (rad)}. */
  private static double[] notch(DesignedNotch n, double omega) {
    return ClosedForm.notch(n.centreHz(), n.numeratorDampingRatio(), n.denominatorDampingRatio(), omega);
  }

  /**
   * A constructed loop L(s) = (wc/s) a/(s + a) + sum_i k_i wn_i s / (s^2 + 2 zeta wn_i s + wn_i^2):
   * an integrator crossing over near wc (phase margin 90 deg - atan(wc/a)), plus lightly damped
   * band-pass resonances whose peak is exactly k_i/(2 zeta) at wn_i (closed form: at s = j wn the
   * denominator is 2j zeta wn^2 and the numerator j k wn^2).
   */
  private static SisoFrequencyFunction loop(double wc, double lag, double zeta, double[] wn, double[] k) {
    return (w, out) -> {
      // (wc / (j w)) * a / (j w + a)
      double re = 0;
      double im = -wc / w;
      if (Double.isFinite(lag)) {
        double den = lag * lag + w * w;
        double lr = lag * lag / den;
        double li = -lag * w / den;
        double t = re * lr - im * li;
        im = re * li + im * lr;
        re = t;
      }
      for (int i = 0; i < wn.length; i++) {
        // k wn (j w) / (wn^2 - w^2 + 2j zeta wn w)
        double dr = wn[i] * wn[i] - w * w;
        double di = 2 * zeta * wn[i] * w;
        double nr = 0;
        double ni = k[i] * wn[i] * w;
        double d2 = dr * dr + di * di;
        re += (nr * dr + ni * di) / d2;
        im += (ni * dr - nr * di) / d2;
      }
      out[0] = re;
      out[1] = im;
    };
  }

  private static final SisoFrequencyFunction ZERO = (w, out) -> {
    out[0] = 0;
    out[1] = 0;
  };

  /** Samples of a constructed loop at the shift factors of the spec: every resonance shifted. */
  private static LoopSamples samples(NotchDesignSpec spec, double wc, double lag, double zeta, double[] fHz,
      double[] k) {
    LoopSamples.Builder b = LoopSamples.builder();
    for (double s : spec.shiftFactors()) {
      List<ElasticMode> modes = new ArrayList<>();
      double[] wn = new double[fHz.length];
      for (int i = 0; i < fHz.length; i++) {
        modes.add(new ElasticMode("mode_" + (i + 1), fHz[i] * s, zeta, 1.0, Map.of()));
        wn[i] = TWO_PI * fHz[i] * s;
      }
      int[] grids = new int[fHz.length];
      List<String> names = new ArrayList<>();
      for (int i = 0; i < fHz.length; i++) {
        double[] band = CaseLoopSampler.band(modes, i, spec.modeBandFraction());
        grids[i] = b.modeGrid(fHz[i] * s, zeta, band[0], band[1]);
        names.add("mode_" + (i + 1));
      }
      int rigid = b.rigidGrid(0.01, spec.rigidBandFraction() * fHz[0] * s);
      b.add(new SampleLabel("constructed", 0, Double.NaN, Double.NaN, s), ZERO, loop(wc, lag, zeta, wn, k), names,
          grids, rigid);
    }
    return b.build();
  }

  @Test
  void singleModeNotchMeetsTheClosedFormDepthAndItsPhaseLossIsTheNotchPhaseAtCrossover() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    double wc = TWO_PI * 1.0;
    double zeta = 0.01;
    double fn = 15.0;
    double k = 0.04; // peak k/(2 zeta) = 2, i.e. +6.02 dB
    LoopSamples s = samples(spec, wc, Double.POSITIVE_INFINITY, zeta, new double[] {fn}, new double[] {k});
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    assertTrue(r.feasible(), () -> String.join("; ", r.reasons()));
    assertEquals(1, r.notches().size());
    DesignedNotch n = DesignedNotch.of(r.notches().get(0));
    SisoFrequencyFunction plain = loop(wc, Double.POSITIVE_INFINITY, zeta, new double[] {TWO_PI * fn}, new double[] {k});
    double worstAfter = Double.NEGATIVE_INFINITY;
    for (double shift : spec.shiftFactors()) {
      double w = TWO_PI * fn * shift;
      SisoFrequencyFunction shifted = loop(wc, Double.POSITIVE_INFINITY, zeta, new double[] {w}, new double[] {k});
      // closed form: |L(j wn)| = |-j wc/wn + k/(2 zeta)| = sqrt((k/(2 zeta))^2 + (wc/wn)^2)
      double peakDb = 20 * Math.log10(Math.hypot(k / (2 * zeta), wc / w));
      assertEquals(peakDb, 20 * Math.log10(shifted.magnitude(w)), 1e-9, "closed-form peak of the constructed loop");
      double requiredDepthDb = peakDb - spec.peakLimitDb();
      double deliveredDb = -20 * Math.log10(notch(n, w)[0]);
      // the optimiser aims 0.5 dB (design margin) below the limit on a grid whose sampled peak is
      // within 0.3 dB of the true one, so the delivered attenuation at the resonance meets the
      // closed-form requirement with no further allowance
      assertTrue(deliveredDb >= requiredDepthDb, "shift " + shift + ": " + deliveredDb + " < " + requiredDepthDb);
      worstAfter = Math.max(worstAfter, peakDb - deliveredDb);
    }
    // least phase cost means no needless depth: the worst notched peak is within 1.5 dB of the
    // target limit - 0.5 dB (1.5 dB: the notch slope over the +-10 % shifts leaves the unshifted
    // resonance deeper than the binding shifted one)
    assertTrue(worstAfter > spec.peakLimitDb() - spec.designMarginDb() - 1.5, "over-designed: " + worstAfter);
    // phase loss: reported value = -arg N(j w_c) from the closed-form notch at the reported crossover
    // of the sample with the worst loss
    double[] loss = r.after().phaseLossDeg();
    int worst = 0;
    for (int i = 1; i < loss.length; i++) {
      worst = loss[i] > loss[worst] ? i : worst;
    }
    double crossHz = r.after().phaseLossCrossoverHz()[worst];
    // the resonance adds |k wn w/(wn^2 - w^2)| = 0.0027 to |L| near 1 Hz: crossover within 0.5 %
    assertEquals(1.0, crossHz, 0.005);
    double shiftedWn = TWO_PI * fn * s.label(worst).shiftFactor();
    SisoFrequencyFunction worstLoop = loop(wc, Double.POSITIVE_INFINITY, zeta, new double[] {shiftedWn},
        new double[] {k});
    // |L(j w_c)| = 1 by definition of the reported crossover (Brent-refined to 1e-10 in ln w)
    assertEquals(1.0, worstLoop.magnitude(TWO_PI * crossHz), 1e-8);
    assertTrue(plain.magnitude(TWO_PI * crossHz) > 0.99);
    double analytic = -Math.toDegrees(notch(n, TWO_PI * crossHz)[1]);
    // the same formula evaluated twice in different arithmetic order: rounding only
    assertEquals(analytic, r.after().worstPhaseLossDeg(), 1e-9);
    assertTrue(analytic > 0, "a notch lags below its centre");
  }

  @Test
  void twoModesFarApartGetTwoNotchesAndTwoModesFivePercentApartShareOne() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    double wc = TWO_PI * 0.8;
    // far apart: 10 and 30 Hz, each peaking at +4 dB (k/(2 zeta) = 1.585)
    LoopSamples far = samples(spec, wc, Double.POSITIVE_INFINITY, 0.015, new double[] {10, 30},
        new double[] {0.04755, 0.04755});
    OptimisedNotches a = new NotchOptimiser().optimise(far, spec);
    assertTrue(a.feasible(), () -> String.join("; ", a.reasons()));
    assertEquals(2, a.notches().size());
    List<Double> centres = a.notches().stream().map(NotchFilter::centreFrequencyHz).sorted().toList();
    // each notch sits on its mode: within the +-10 % uncertainty band widened by half
    assertEquals(10, centres.get(0), 1.5);
    assertEquals(30, centres.get(1), 4.5);
    // close: 20 and 21 Hz (5 % apart) form one cluster, served by one notch
    LoopSamples close = samples(spec, wc, Double.POSITIVE_INFINITY, 0.015, new double[] {20, 21},
        new double[] {0.04755, 0.04755});
    OptimisedNotches b = new NotchOptimiser().optimise(close, spec);
    assertTrue(b.feasible(), () -> String.join("; ", b.reasons()));
    assertEquals(1, b.notches().size());
    for (double[] row : b.after().peakDb()) {
      for (double p : row) {
        assertTrue(p <= spec.peakLimitDb(), "peak " + p);
      }
    }
  }

  @Test
  void peakNextToTheCrossoverIsRecognisedAsInfeasible() {
    NotchDesignSpec spec = NotchDesignSpec.defaults();
    double wc = TWO_PI * 0.8;
    // lag a = wc / tan(40 deg): phase margin 90 - 40 = 50 deg (closed form), only 5 deg to spare;
    // a +14 dB resonance at 2 Hz (2.5 x the crossover) needs ~20 dB over 1.8..2.2 Hz
    double lag = wc / Math.tan(Math.toRadians(40));
    LoopSamples s = samples(spec, wc, lag, 0.01, new double[] {2.0}, new double[] {0.1});
    OptimisedNotches r = new NotchOptimiser().optimise(s, spec);
    // the rigid phase margin before, computed independently: Commons Math Brent root of |L| = 1 on
    // the closed-form loop, then 180 + arg L; 0.5 deg allows the linear interpolation between the
    // 60-per-decade grid points of the sampled estimate
    SisoFrequencyFunction nominal = loop(wc, lag, 0.01, new double[] {TWO_PI * 2.0}, new double[] {0.1});
    double wx = new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-12).solve(100,
        w -> nominal.magnitude(w) - 1, 0.3 * wc, 1.0 * wc);
    double pmIndependent = 180 + Math.toDegrees(nominal.phaseRad(wx));
    assertEquals(pmIndependent, r.before().phaseMarginDeg()[1], 0.5);
    // margin to spare before notching: between 45 and 60 deg by construction (90 - 40 deg lag at wc,
    // crossover moved by the resonance's tail)
    assertTrue(pmIndependent > 45 && pmIndependent < 60, "PM " + pmIndependent);
    assertFalse(r.feasible());
    assertFalse(r.violations().isEmpty());
    String why = String.join("; ", r.reasons());
    assertTrue(why.contains("phase"), why);
  }

  @Test
  void splitLoopWithNotchesEqualsTheProjectsBrokenLoopWithTheFiltersInserted() {
    AnalysisCase c = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    List<Integer> paths = List.of(0);
    LoopSpec base = PathFilters.baseLoop(c.loop(), paths, ExistingNotches.REPLACE);
    List<NotchFilter> n = List.of(new NotchFilter(7.5, 0.05, 0.5), new NotchFilter(19, 0.1, 0.4));
    LoopSpec withNotches = PathFilters.withNotches(c.loop(), paths, ExistingNotches.REPLACE, n);
    Configuration cfg = c.configurations().get(0);
    ConfigurationModel m = ConfigurationModel.of(cfg);
    var fc = new PlannedPath(c.sweep()).at(20);
    CaseLoopSampler.SplitLoop split = new CaseLoopSampler.SplitLoop(ServoMargins.loopAt(m, cfg, base, fc), paths);
    SisoFrequencyFunction full = ServoMargins.loopAt(m, cfg, withNotches, fc).brokenLoop();
    double[] r = new double[2];
    double[] p = new double[2];
    double[] f = new double[2];
    double[] v = new double[2];
    for (double hz : new double[] {0.3, 1.2, 7.4, 12.0, 18.7}) {
      double w = TWO_PI * hz;
      split.rest().response(w, r);
      split.path().response(w, p);
      double nr = 1;
      double ni = 0;
      for (NotchFilter x : n) {
        x.response(w, v);
        double t = nr * v[0] - ni * v[1];
        ni = nr * v[1] + ni * v[0];
        nr = t;
      }
      full.response(w, f);
      double lr = r[0] + p[0] * nr - p[1] * ni;
      double li = r[1] + p[0] * ni + p[1] * nr;
      // same aircraft solve and blocks, summed in another order: rounding only
      assertEquals(0, Math.hypot(lr - f[0], li - f[1]), 1e-10 * Math.hypot(f[0], f[1]) + 1e-14, "at " + hz + " Hz");
    }
  }

  @Test
  void demoDesignPassesTheIndependentMarginRerunAndKeepsTheClosedLoopStableTo130() {
    AnalysisCase c = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    // normal envelope of the invented demo taken as 20..70 m/s EAS (with +-10 % uncertainty the
    // fuselage bending peaks above ~75 m/s cannot be notched within the 45 deg phase margin; the
    // optimiser reports that as infeasible). Every third grid point keeps the run short.
    NotchDesignSpec spec = NotchDesignSpec.defaults().withPoints(3, 70);
    NotchDesignResult r = new NotchDesigner().design(c, spec);
    assertTrue(r.feasible(), () -> String.join("; ", r.reasons()));
    assertFalse(r.notches().isEmpty());
    // independent re-run at EVERY grid point up to 70 m/s, nominal frequencies, both configurations
    PlannedPath path = new PlannedPath(c.sweep());
    int checkedPoints = 0;
    for (Configuration cfg : c.configurations()) {
      for (int p = 0; p < path.gridPoints() && path.at(p).speedEasMps() <= 70; p++) {
        List<CheckedPeak> peaks = new ArrayList<>();
        RigidMargins before = IndependentCheck.at(c, c.loop(), spec, cfg, 1.0, p, null);
        RigidMargins after = IndependentCheck.at(c, r.designedLoop(), spec, cfg, 1.0, p, peaks);
        for (CheckedPeak cp : peaks) {
          // -6 dB limit (common practice, docs/validation.md 10.2); 0.05 dB: the Brent-refined peak may exceed
          // the optimiser's grid-sampled one by its sampling error (< 0.3 dB), which the 0.5 dB
          // design margin covers
          assertTrue(cp.peakDb() <= spec.peakLimitDb() + 0.05, cp.toString());
        }
        if (before.meetsRequirement()) {
          assertTrue(after.meetsRequirement(), "margins lost at " + after);
        }
        checkedPoints++;
      }
    }
    assertTrue(checkedPoints >= 2 * 12);
    // closed loop with the designed filters: stable from 20 to 130 m/s EAS (state space, Roger
    // aerodynamics, Pade delays: ClosedLoopSweep); 12 points, every 10 m/s
    PlannedPath stab = new PlannedPath(new SpeedSweep(3000, AirspeedKind.EQUIVALENT, 20, 130, 12));
    for (Configuration cfg : c.configurations()) {
      ConfigurationModel m = ConfigurationModel.of(cfg);
      FlutterSolution ol = new PkMethod().solve(m.system(), stab, c.options());
      ClosedLoopResult cl = new ClosedLoopSweep().analyse(m, cfg, r.designedLoop(), stab, ol, c.options());
      for (ClosedLoopPoint pt : cl.points()) {
        assertTrue(pt.maxRealPart() < 0, cfg.name() + " unstable at " + pt.condition().speedEasMps() + " m/s EAS");
      }
    }
  }

  @Test
  void commandWritesValidJsonAndExitsByTheResult(@org.junit.jupiter.api.io.TempDir Path tmp) throws Exception {
    java.io.StringWriter out = new java.io.StringWriter();
    java.io.StringWriter err = new java.io.StringWriter();
    int help = org.flexmargin.cli.FlexMargin.execute(new String[] {"notch-design", "--help"},
        new java.io.PrintWriter(out), new java.io.PrintWriter(err));
    assertEquals(0, help);
    assertTrue(out.toString().contains("Examples:"));
    Path dir = tmp.resolve("nd");
    int code = org.flexmargin.cli.FlexMargin.execute(new String[] {"notch-design", "mode-tables/demo/demo-case.json",
        "--out", dir.toString(), "--max-eas", "70", "--stride", "6"}, new java.io.PrintWriter(out),
        new java.io.PrintWriter(err));
    assertEquals(0, code, err.toString());
    com.fasterxml.jackson.databind.ObjectMapper json = new com.fasterxml.jackson.databind.ObjectMapper();
    var design = json.readTree(dir.resolve("notch-design.json").toFile());
    assertTrue(design.get("feasible").asBoolean());
    var filters = json.readTree(dir.resolve("notch-filters.json").toFile());
    var first = filters.get("paths").get(0);
    // the fragment keeps the path's low-pass and carries the designed notches, in case-file keys
    assertTrue(first.get("filters").toString().contains("\"low_pass\""));
    assertEquals(design.get("notches").size() + 1, first.get("filters").size());
    assertTrue(out.toString().contains("Cautions:"));
    // the case's own 8.6 Hz notch leaves the 7.5 Hz and 18.7 Hz modes above -6 dB: check fails, exit 3
    int check = org.flexmargin.cli.FlexMargin.execute(new String[] {"notch-design", "mode-tables/demo/demo-case.json",
        "--out", tmp.resolve("chk").toString(), "--max-eas", "70", "--stride", "6", "--check-only", "--quiet"},
        new java.io.PrintWriter(out), new java.io.PrintWriter(err));
    assertEquals(3, check);
    assertFalse(json.readTree(tmp.resolve("chk").resolve("notch-check.json").toFile()).get("passes").asBoolean());
  }
}
