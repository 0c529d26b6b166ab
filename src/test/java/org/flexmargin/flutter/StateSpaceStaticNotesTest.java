package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.flexmargin.aero.FitError;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;

/**
 * Notes of a real root of the state-space model crossing zero: given only when no tracked branch
 * reports that crossing itself.
 *
 * <p>Fixture ({@link #lagSpringModes}): uncoupled unit-mass modes, viscous damping c = 2 zeta
 * omega, and an exact rational model with one lag root, Q_ii(p) = q0_i + a_i p / (p + beta). With
 * a = (V/b) beta the lag pole (1/s) and K = omega^2 - q q0, the roots of one mode are those of
 *
 * <pre>  (s^2 + c s + K)(s + a) - q a_i s = s^3 + (a + c) s^2 + (c a + K - q a_i) s + a K = 0. </pre>
 *
 * The constant term a K vanishes at q_D = omega^2 / q0 whatever the lag: there s = 0 is a root
 * (static divergence) and the other two solve s^2 + (a + c) s + (c a - q_D a_i) = 0.
 *
 * <ul>
 *   <li>a_i = 0: the lag state is uncoupled and the structural pair splits on the real axis
 *       (roots 0 and -c at q_D); the tracked branch follows the larger real root through zero and
 *       reports the divergence as its own crossing at zero frequency.
 *   <li>a_i &lt; 0 with (a + c)^2 &lt; 4 (c a - q_D a_i): the pair still oscillates at q_D, so the
 *       root at zero is the one grown out of the lag pole, which no branch follows; only the note
 *       reports it.
 * </ul>
 */
class StateSpaceStaticNotesTest {

  static final double B = 0.5;
  static final double ZETA = PkClosedFormTest.ZETA;
  static final double BETA = 0.02;

  /**
   * @param fHz natural frequencies (Hz)
   * @param q0 static aerodynamic stiffness per mode (Q at p = 0)
   * @param lag lag coefficient a_i per mode (0: none)
   * @return the system of the class comment, its aerodynamics the exact rational model
   */
  static AeroelasticSystem lagSpringModes(double[] fHz, double[] q0, double[] lag) {
    int n = fHz.length;
    double[][][] a = new double[4][n][n];
    for (int i = 0; i < n; i++) {
      a[0][i][i] = q0[i];
      a[3][i][i] = lag[i];
    }
    RationalFit fit = new RationalFit(B, new double[] {BETA}, a, new double[] {0.0, 0.5, 1.0},
        new FitError(new double[n][n], new double[n][n], 0.0, 0, 0), 0.05, List.of(), "lag spring",
        RationalFit.ROGER);
    return new AeroelasticSystem(PkClosedFormTest.uncoupledModes(fHz), fit);
  }

  /** q_D = omega^2 / q0 (Pa). */
  static double divergencePa(double fHz, double q0) {
    double w = 2 * Math.PI * fHz;
    return w * w / q0;
  }

  /** Whether the two roots other than s = 0 at q_D are a complex pair (negative discriminant). */
  static boolean oscillatesAtDivergence(double fHz, double q0, double lag, double rho) {
    double w = 2 * Math.PI * fHz;
    double qd = divergencePa(fHz, q0);
    double a = Math.sqrt(2 * qd / rho) * BETA / B;
    double c = 2 * ZETA * w;
    return (a + c) * (a + c) < 4 * (c * a - qd * lag);
  }

  /** The dynamic pressure a note names (Pa). */
  static double notedPa(String note) {
    Matcher m = Pattern.compile("q = ([0-9.e+]+) Pa").matcher(note);
    return m.find() ? Double.parseDouble(m.group(1)) : Double.NaN;
  }

  static List<String> notes(FlutterSolution sol) {
    return sol.warnings().stream().filter(w -> w.contains("crosses zero")).toList();
  }

  @Test
  void aDivergenceTheBranchReportsGetsNoNoteAndOneNoBranchFollowsKeepsIt() {
    double[] f = {2.0, 3.0};
    double[] q0 = {0.002, 0.003};
    double[] lag = {-0.004, 0.0};
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 500, 25));
    double rho = path.at(0).densityKgPerM3();
    assertTrue(oscillatesAtDivergence(f[0], q0[0], lag[0], rho), "premise: mode 1 diverges through its lag root");
    FlutterSolution sol = new StateSpaceMethod().solve(lagSpringModes(f, q0, lag), path, AnalysisOptions.defaults());

    // mode 2: its own branch crosses zero at zero frequency, at q_D2 = 118435 Pa (V = 439.7 m/s,
    // inside the sweep); the onset is refined to the default 0.01 m/s, 0.02 m/s allows Brent's
    // last step
    double vd2 = Math.sqrt(2 * divergencePa(f[1], q0[1]) / rho);
    FlutterCrossing own = sol.crossings().stream()
        .filter(x -> x.branch() == 1 && x.kind() == CrossingKind.FLUTTER_ONSET).findFirst()
        .orElseThrow(() -> new AssertionError(sol.crossings().toString()));
    assertEquals(0.0, own.frequencyHz(), 0.0);
    assertEquals(vd2, own.condition().speedTasMps(), 0.02);
    // mode 1's branch stays oscillating: no crossing of it at zero frequency
    assertTrue(sol.crossings().stream().noneMatch(x -> x.branch() == 0 && x.frequencyHz() == 0),
        sol.crossings().toString());

    // one note, for mode 1 only: six significant digits printed, half a unit of the sixth is 5e-6
    List<String> notes = notes(sol);
    assertEquals(1, notes.size(), sol.warnings().toString());
    double qd1 = divergencePa(f[0], q0[0]);
    assertEquals(qd1, notedPa(notes.get(0)), 5e-6 * qd1, notes.get(0));
    assertTrue(notes.get(0).contains("static divergence begins"), notes.get(0));
    // the root grown out of mode 1's lag root is unstable from q_D1 on and no branch follows it,
    // but it is real and the note already reports it: no second warning
    assertTrue(sol.warnings().stream().noneMatch(w -> w.contains("not followed by any branch")),
        sol.warnings().toString());
  }

  @Test
  void aTrackedDivergenceAloneLeavesNoNote() {
    // mode 2 of the case above on its own: its branch reports the divergence, nothing else does
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 20, 500, 25));
    FlutterSolution sol = new StateSpaceMethod().solve(
        lagSpringModes(new double[] {3.0}, new double[] {0.003}, new double[] {0.0}), path,
        AnalysisOptions.defaults());
    assertTrue(sol.crossings().stream().anyMatch(x -> x.frequencyHz() == 0
        && x.kind() == CrossingKind.FLUTTER_ONSET), sol.crossings().toString());
    assertEquals(List.of(), notes(sol));
    assertTrue(sol.warnings().stream().noneMatch(w -> w.contains("not followed by any branch")),
        sol.warnings().toString());
  }

  @Test
  void aRealRootUnstableFromTheStartWithoutANoteIsWarnedOf() {
    // one mode diverging through its lag root, swept from 1.1 to 1.4 times its divergence speed:
    // the root grown out of the lag root is unstable at every point, det A never changes sign, so
    // no note; the warning names the first point and the positive real root of the cubic there
    double fHz = 2.0;
    double q0 = 0.002;
    double lag = -0.004;
    double rho = PkClosedFormTest.RHO;
    double vd = Math.sqrt(2 * divergencePa(fHz, q0) / rho);
    PlannedPath path = new PlannedPath(new SpeedSweep(0.0, AirspeedKind.TRUE, 1.1 * vd, 1.4 * vd, 7));
    FlutterSolution sol = new StateSpaceMethod().solve(
        lagSpringModes(new double[] {fHz}, new double[] {q0}, new double[] {lag}), path, AnalysisOptions.defaults());
    assertEquals(List.of(), notes(sol));
    String warning = sol.warnings().stream().filter(w -> w.contains("not followed by any branch")).findFirst()
        .orElseThrow(() -> new AssertionError(sol.warnings().toString()));
    assertTrue(warning.contains(String.format(Locale.ROOT, "unstable from %.2f m/s EAS",
        path.at(0).speedEasMps())), warning);
    // the cubic of the class comment at the first point, solved by Commons Math
    double v = path.at(0).speedTasMps();
    double w = 2 * Math.PI * fHz;
    double c = 2 * ZETA * w;
    double a = v * BETA / B;
    double q = 0.5 * rho * v * v;
    double k = w * w - q * q0;
    Complex[] roots = new LaguerreSolver()
        .solveAllComplex(new double[] {a * k, c * a + k - q * lag, a + c, 1}, 0);
    double positive = Arrays.stream(roots).filter(r -> r.getReal() > 0)
        .mapToDouble(Complex::getReal).max().orElseThrow();
    Matcher m = Pattern.compile("s = ([-+0-9.e]+) ([-+0-9.e]+) i").matcher(warning);
    assertTrue(m.find(), warning);
    // printed to four significant digits: half a unit of the fourth is 5e-4 relative
    assertEquals(positive, Double.parseDouble(m.group(1)), 5e-4 * positive, warning);
    assertEquals(0.0, Double.parseDouble(m.group(2)), 0.0, warning);
  }
}
