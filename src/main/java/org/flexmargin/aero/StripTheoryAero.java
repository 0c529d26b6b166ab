package org.flexmargin.aero;

import java.util.Arrays;
import java.util.List;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;

/**
 * Generalized aerodynamic forces from two-dimensional incompressible unsteady theory applied strip
 * by strip (Theodorsen, NACA Report 496, 1935; strip application as in Bisplinghoff, Ashley and
 * Halfman, <i>Aeroelasticity</i>, 1955, ch. 5, and Hodges and Pierce, <i>Introduction to
 * Structural Dynamics and Aeroelasticity</i>, ch. 5).
 *
 * <h2>Per-strip forces</h2>
 *
 * Theodorsen's lift L (positive up) and moment M about the elastic axis (positive nose up), per
 * unit span, for plunge h (positive <b>down</b>) and pitch &alpha; (positive nose up), semichord
 * b, elastic axis at a semichords aft of mid-chord:
 *
 * <pre>
 *   L = pi rho b^2 (h'' + V alpha' - b a alpha'') + 2 pi rho V b C(k) W
 *   M = pi rho b^2 (b a h'' - V b (1/2 - a) alpha' - b^2 (1/8 + a^2) alpha'')
 *       + 2 pi rho V b^2 (a + 1/2) C(k) W
 *   W = h' + V alpha + b (1/2 - a) alpha'
 * </pre>
 *
 * The mode tables give the displacement w positive <b>up</b> and twist &theta; positive nose up,
 * so h = &minus;w and &alpha; = &theta;. For harmonic motion d/dt = i&omega; with local reduced
 * frequency k<sub>s</sub> = &omega; b / V = k b / b<sub>ref</sub>, and dividing by q = &rho;
 * V<sup>2</sup>/2, the forces per unit span per unit q are (with &sigma; = a<sub>0</sub>/(2&pi;)
 * scaling the circulatory terms, those with C, so that a strip of lift slope a<sub>0</sub> has
 * steady lift q c a<sub>0</sub> &alpha;, c = 2b):
 *
 * <pre>
 *   unit w (h = -1):   Lw = 2 pi k^2               - 2 a0 i k C
 *                      Mw = 2 pi a b k^2           - 2 a0 b (a + 1/2) i k C
 *   unit theta:        Ltheta = 2 pi b (i k + a k^2)               + 2 a0 b C (1 + i k (1/2 - a))
 *                      Mtheta = 2 pi b^2 ((1/8 + a^2) k^2 - i k (1/2 - a))
 *                               + 2 a0 b^2 (a + 1/2) C (1 + i k (1/2 - a))
 * </pre>
 *
 * (k, b, a and a<sub>0</sub> are the strip's own). At k = 0 these give L = q c a<sub>0</sub>
 * &theta; and M = e L with e = b (a + 1/2), the distance of the quarter chord ahead of the
 * elastic axis. The real k<sup>2</sup> terms are the apparent-mass forces: positive real because
 * &minus;m &times; (&minus;&omega;<sup>2</sup>) acts like a negative stiffness.
 *
 * <h2>Generalized forces</h2>
 *
 * By virtual work, with w<sub>i</sub>, &theta;<sub>i</sub> the shape of coordinate i at the strip
 * and &Delta;y the strip width:
 *
 * <pre>
 *   Q_ij = sum_strips dy ( w_i (Lw w_j + Ltheta theta_j) + theta_i (Mw w_j + Mtheta theta_j) )
 * </pre>
 *
 * so that the generalized force is q Q(ik) &xi; (see {@link AeroSource}). Units: m<sup>2</sup>
 * times the units of the shapes.
 *
 * <p>Valid for every finite k &ge; 0 ({@link #maxReducedFrequency()} is +&infin;). The Mach number
 * is ignored (incompressible theory). Instances are immutable and thread-safe; {@link #forces}
 * allocates three small arrays per call (Theodorsen's value and the basis weights) and nothing per
 * strip.
 */
public final class StripTheoryAero implements AeroSource {
  private final double referenceSemichordM;
  private final int modeCount;
  private final int stripCount;
  /** Strip widths (m). */
  private final double[] widthM;
  /** Strip semichords (m). */
  private final double[] semichordM;
  /** Elastic axis aft of mid-chord (semichords). */
  private final double[] elasticAxisA;
  /** Lift-curve slopes (1/rad). */
  private final double[] liftSlopePerRad;
  /** Modal heave (m per unit coordinate, positive up), [strip * modeCount + mode]. */
  private final double[] heave;
  /** Modal twist (rad per unit coordinate, positive nose up), [strip * modeCount + mode]. */
  private final double[] twist;

  /**
   * Reads every strip's motion from the mode shapes at its station.
   *
   * @param spec strips and reference semichord
   * @param modes the modes whose shapes define the generalized coordinates, in order
   * @throws InvalidInputException with path {@code aero.strips[i].station} if a strip's station is
   *     missing from a mode's shapes
   */
  public StripTheoryAero(StripTheorySpec spec, ModeTable modes) {
    if (spec == null) {
      throw new InvalidInputException("aero", "strip-theory data", "none");
    }
    if (modes == null) {
      throw new InvalidInputException("modes", "a mode table", "none");
    }
    List<Strip> strips = spec.strips();
    List<ElasticMode> modeList = modes.modes();
    this.referenceSemichordM = spec.referenceSemichordM();
    this.modeCount = modeList.size();
    this.stripCount = strips.size();
    this.widthM = new double[stripCount];
    this.semichordM = new double[stripCount];
    this.elasticAxisA = new double[stripCount];
    this.liftSlopePerRad = new double[stripCount];
    this.heave = new double[stripCount * modeCount];
    this.twist = new double[stripCount * modeCount];
    for (int s = 0; s < stripCount; s++) {
      Strip strip = strips.get(s);
      widthM[s] = strip.widthM();
      semichordM[s] = strip.semichordM();
      elasticAxisA[s] = strip.elasticAxisA();
      liftSlopePerRad[s] = strip.liftSlopePerRad();
      for (int j = 0; j < modeCount; j++) {
        ElasticMode mode = modeList.get(j);
        ShapeValue shape = mode.shapes().get(strip.station());
        if (shape == null) {
          throw new InvalidInputException(
              "aero.strips[" + s + "].station",
              "a shape value at station \"" + strip.station() + "\" in mode \"" + mode.name() + "\"",
              "none");
        }
        heave[s * modeCount + j] = shape.displacementM();
        twist[s * modeCount + j] = shape.rotationRad();
      }
    }
    // strips sharing a semichord share C(k_s): evaluate Theodorsen's function once per group
    this.semichordGroup = new int[stripCount];
    double[] unique = new double[stripCount];
    int groups = 0;
    for (int s = 0; s < stripCount; s++) {
      int g = 0;
      while (g < groups && unique[g] != semichordM[s]) {
        g++;
      }
      if (g == groups) {
        unique[groups++] = semichordM[s];
      }
      semichordGroup[s] = g;
    }
    this.groupSemichordM = Arrays.copyOf(unique, groups);
    this.terms = groups * BASIS;
    this.basis = new double[terms * modeCount * modeCount];
    for (int st = 0; st < stripCount; st++) {
      accumulateBasis(st);
    }
  }

  /** Number of k-dependent basis functions: k_s^2, i k_s, C(k_s), i k_s C(k_s). */
  private static final int BASIS = 4;

  /**
   * Real matrices A[g][m] with Q(ik) = sum over semichord groups g and basis functions m of
   * phi_m(k_s) A[g][m] (m<sup>2</sup> per unit coordinate); flattened entry by entry, the terms of
   * one entry (i, j) next to each other: [(i * n + j) * terms + g * BASIS + m].
   */
  private final double[] basis;
  /** Terms per entry of Q: semichord groups x {@value #BASIS}. */
  private final int terms;

  /**
   * Adds strip st's contribution to the basis matrices. Per unit q and unit span, the strip's lift
   * and moment for unit heave w and unit twist theta are linear combinations of
   * phi = (k^2, i k, C, i k C) with real coefficients (see the class Javadoc for the derivation):
   * L_w = 2 pi k^2 - 2 a0 (ikC); M_w = b (2 pi a k^2 - 2 a0 e' (ikC));
   * L_t = b (2 pi a k^2 + 2 pi (ik) + 2 a0 C + 2 a0 r (ikC));
   * M_t = b^2 (2 pi (1/8 + a^2) k^2 - 2 pi r (ik) + 2 a0 e' C + 2 a0 e' r (ikC)),
   * with e' = a + 1/2 and r = 1/2 - a.
   */
  private void accumulateBasis(int st) {
    int n = modeCount;
    double b = semichordM[st];
    double a = elasticAxisA[st];
    double a0 = liftSlopePerRad[st];
    double width = widthM[st];
    double twoPi = 2.0 * Math.PI;
    double armE = a + 0.5;
    double rearA = 0.5 - a;
    double[] lw = {twoPi, 0.0, 0.0, -2.0 * a0};
    double[] mw = {b * twoPi * a, 0.0, 0.0, -2.0 * a0 * b * armE};
    double[] lt = {b * twoPi * a, b * twoPi, 2.0 * a0 * b, 2.0 * a0 * b * rearA};
    double[] mt = {b * b * twoPi * (0.125 + a * a), -b * b * twoPi * rearA, 2.0 * a0 * b * b * armE,
        2.0 * a0 * b * b * armE * rearA};
    int base = st * n;
    for (int m = 0; m < BASIS; m++) {
      int term = semichordGroup[st] * BASIS + m;
      for (int i = 0; i < n; i++) {
        double wi = heave[base + i];
        double ti = twist[base + i];
        for (int j = 0; j < n; j++) {
          double wj = heave[base + j];
          double tj = twist[base + j];
          basis[(i * n + j) * terms + term] +=
              width * (wi * (lw[m] * wj + lt[m] * tj) + ti * (mw[m] * wj + mt[m] * tj));
        }
      }
    }
  }

  /** Index into {@link #groupSemichordM} of each strip's semichord. */
  private final int[] semichordGroup;
  /** Distinct strip semichords (m). */
  private final double[] groupSemichordM;

  @Override
  public int size() {
    return modeCount;
  }

  @Override
  public double referenceSemichordM() {
    return referenceSemichordM;
  }

  /** @return 0: the theory holds down to steady flow */
  @Override
  public double minReducedFrequency() {
    return 0.0;
  }

  /** @return +&infin;: the theory holds at every finite k */
  @Override
  public double maxReducedFrequency() {
    return Double.POSITIVE_INFINITY;
  }

  /**
   * Writes Q(ik) (m<sup>2</sup> per unit coordinate) into {@code out}, reshaped to size() x size()
   * if needed.
   *
   * @param reducedFrequency k = &omega; b<sub>ref</sub>/V, finite and &ge; 0
   * @param out the result. Modified.
   * @throws IllegalArgumentException if k is negative, infinite or NaN
   */
  @Override
  public void forces(double reducedFrequency, ZMatrixRMaj out) {
    if (!(reducedFrequency >= 0) || Double.isInfinite(reducedFrequency)) {
      throw new IllegalArgumentException(
          "reduced frequency must be finite and >= 0, found " + reducedFrequency);
    }
    int n = modeCount;
    out.reshape(n, n);
    double[] q = out.data;
    double[] fg = new double[2];
    double[] phiRe = new double[terms];
    double[] phiIm = new double[terms];
    for (int g = 0; g < groupSemichordM.length; g++) {
      double k = reducedFrequency * groupSemichordM[g] / referenceSemichordM;
      Theodorsen.evaluate(k, fg);
      // phi = (k^2, i k, C, i k C) with C = F + i G and i k C = -k G + i k F
      int t = g * BASIS;
      phiRe[t] = k * k;
      phiIm[t + 1] = k;
      phiRe[t + 2] = fg[0];
      phiIm[t + 2] = fg[1];
      phiRe[t + 3] = -k * fg[1];
      phiIm[t + 3] = k * fg[0];
    }
    // each entry sums its terms in group and basis order (a zero term adds nothing)
    for (int idx = 0, at = 0; idx < n * n; idx++) {
      double re = 0.0;
      double im = 0.0;
      for (int t = 0; t < terms; t++, at++) {
        double v = basis[at];
        re += phiRe[t] * v;
        im += phiIm[t] * v;
      }
      q[2 * idx] = re;
      q[2 * idx + 1] = im;
    }
  }

  @Override
  public String description() {
    return "strip theory, " + stripCount + (stripCount == 1 ? " strip" : " strips")
        + ", Theodorsen function, incompressible";
  }
}
