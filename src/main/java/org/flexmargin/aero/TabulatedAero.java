package org.flexmargin.aero;

import java.util.Arrays;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.MachGafTable;

/**
 * Generalized aerodynamic forces interpolated in reduced frequency from a user table of Q(ik).
 *
 * <p><b>Interpolation.</b> The real and the imaginary part of every element are interpolated
 * separately by a cubic spline through the tabulated reduced frequencies with de Boor's
 * <i>not-a-knot</i> end conditions (C. de Boor, <i>A Practical Guide to Splines</i>, Springer
 * 1978, ch. IV: the third derivative is continuous at the second and the last-but-one knot). With
 * three knots this is the interpolating parabola, with two the straight line.
 *
 * <p>Why this spline. A cubic spline is twice continuously differentiable, which flutter solvers
 * iterating on k and damping-perturbation methods using dQ/dk need; Akima's interpolation is only
 * once differentiable (and needs five points). Among cubic splines, the natural end condition
 * (zero curvature at both ends, Commons Math {@code SplineInterpolator}) was tried first and
 * rejected: generalized forces grow like k<sup>2</sup> (apparent mass), so zero end curvature is
 * wrong, and on a strip-theory table (k = 0 ... 2, last step 0.5) it left errors of 5e-3 of the
 * largest element in the last interval. The not-a-knot spline reproduces every cubic exactly and
 * keeps the fourth-order accuracy up to the ends. Tables should still be dense near k = 0, where
 * Q behaves like k ln k. As with any interpolating spline, widely spaced nodes can overshoot.
 *
 * <p><b>Range.</b> Outside [k<sub>min</sub>, k<sub>max</sub>] of the table the value is
 * <b>clamped</b> to the end value (no extrapolation). The caller compares k with {@link
 * #minReducedFrequency()} and {@link #maxReducedFrequency()} and flags out-of-range use.
 *
 * <p><b>Cost.</b> The spline coefficients of all elements are precomputed once in a flat array
 * ordered like the {@link ZMatrixRMaj} data (interleaved real and imaginary parts) for each
 * interval; {@link #forces} finds the interval by binary search and evaluates one cubic per
 * number by Horner's rule, allocating nothing.
 *
 * <p>Instances are immutable and thread-safe. The Mach number of the table is reported in {@link
 * #description()} only; a table interpolated from tables at several Mach numbers ({@link
 * MachGafTable}) says so there too.
 */
public final class TabulatedAero implements AeroSource {
  private final int n;
  private final double referenceSemichordM;
  private final double machNumber;
  /** Words after the Mach number in the description ("" for a table at one Mach number). */
  private final String machNote;
  /** Tabulated reduced frequencies (knots), strictly increasing. */
  private final double[] knots;
  /**
   * Cubic coefficients about the left knot of each interval, index ((interval * 2 n^2) + e) * 4 +
   * power, with e the interleaved ZMatrixRMaj data index of the number.
   */
  private final double[] coefficients;

  /**
   * Builds the splines for every element of the table (one LU factorisation of the spline system,
   * shared by all elements).
   *
   * @param table the tabulated forces; validated by its own constructor
   */
  public TabulatedAero(GafTable table) {
    this(table, "");
  }

  /**
   * The forces of tables at several Mach numbers, interpolated to their sweep Mach number ({@link
   * MachGafTable#table()}).
   *
   * @param tables the tables; validated by their own constructor
   */
  public TabulatedAero(MachGafTable tables) {
    this(tables.table(), String.format(Locale.ROOT, " (tables at Mach %.3f to %.3f, beta Q interpolated)",
        tables.forces().lowestMach(), tables.forces().highestMach()));
  }

  private TabulatedAero(GafTable table, String machNote) {
    this.machNote = machNote;
    this.n = table.modeNames().size();
    this.referenceSemichordM = table.referenceSemichordM();
    this.machNumber = table.machNumber();
    this.knots = table.reducedFrequencies();
    int nk = knots.length;
    int numbers = 2 * n * n;
    int intervals = nk - 1;
    this.coefficients = new double[intervals * numbers * 4];
    double[] values = new double[nk];
    double[] secondDerivatives = new double[nk];
    DecompositionSolver solver = nk >= 3 ? endConditionSolver(knots) : null;
    double[] rhs = new double[nk];
    for (int e = 0; e < numbers; e++) {
      int r = e / (2 * n);
      int c = (e / 2) % n;
      for (int i = 0; i < nk; i++) {
        values[i] = (e & 1) == 0 ? table.realAt(i, r, c) : table.imagAt(i, r, c);
      }
      if (solver == null) {
        Arrays.fill(secondDerivatives, 0.0); // two nodes: the straight line
      } else {
        Arrays.fill(rhs, 0.0);
        for (int i = 1; i < nk - 1; i++) {
          rhs[i] =
              6.0
                  * ((values[i + 1] - values[i]) / (knots[i + 1] - knots[i])
                      - (values[i] - values[i - 1]) / (knots[i] - knots[i - 1]));
        }
        double[] m = solver.solve(new ArrayRealVector(rhs, false)).toArray();
        System.arraycopy(m, 0, secondDerivatives, 0, nk);
      }
      for (int s = 0; s < intervals; s++) {
        double h = knots[s + 1] - knots[s];
        double m0 = secondDerivatives[s];
        double m1 = secondDerivatives[s + 1];
        int offset = (s * numbers + e) * 4;
        coefficients[offset] = values[s];
        coefficients[offset + 1] = (values[s + 1] - values[s]) / h - h * (2.0 * m0 + m1) / 6.0;
        coefficients[offset + 2] = 0.5 * m0;
        coefficients[offset + 3] = (m1 - m0) / (6.0 * h);
      }
    }
  }

  /**
   * Factorises the linear system for the knot second derivatives M<sub>i</sub> (it depends on the
   * knots only, so it is shared by all elements): the continuity rows h<sub>i-1</sub>
   * M<sub>i-1</sub> + 2(h<sub>i-1</sub> + h<sub>i</sub>) M<sub>i</sub> + h<sub>i</sub>
   * M<sub>i+1</sub> = 6 (&Delta;<sub>i</sub> &minus; &Delta;<sub>i-1</sub>) at interior knots, and
   * the not-a-knot rows (equal third derivative either side of the second and the last-but-one
   * knot) first and last. With three knots the end rows become M<sub>0</sub> = M<sub>1</sub> =
   * M<sub>2</sub>: the interpolating parabola.
   */
  private static DecompositionSolver endConditionSolver(double[] x) {
    int nk = x.length;
    int last = nk - 1;
    double[][] a = new double[nk][nk];
    for (int i = 1; i < last; i++) {
      double hl = x[i] - x[i - 1];
      double hr = x[i + 1] - x[i];
      a[i][i - 1] = hl;
      a[i][i] = 2.0 * (hl + hr);
      a[i][i + 1] = hr;
    }
    if (nk == 3) {
      a[0][0] = 1.0;
      a[0][1] = -1.0;
      a[last][last - 1] = 1.0;
      a[last][last] = -1.0;
    } else {
      double h0 = x[1] - x[0];
      double h1 = x[2] - x[1];
      a[0][0] = h1;
      a[0][1] = -(h0 + h1);
      a[0][2] = h0;
      double hb = x[last - 1] - x[last - 2];
      double he = x[last] - x[last - 1];
      a[last][last - 2] = he;
      a[last][last - 1] = -(hb + he);
      a[last][last] = hb;
    }
    return new LUDecomposition(new Array2DRowRealMatrix(a, false)).getSolver();
  }

  @Override
  public int size() {
    return n;
  }

  @Override
  public double referenceSemichordM() {
    return referenceSemichordM;
  }

  /** @return the lowest tabulated reduced frequency; below it values are clamped */
  @Override
  public double minReducedFrequency() {
    return knots[0];
  }

  /** @return the highest tabulated reduced frequency; above it values are clamped */
  @Override
  public double maxReducedFrequency() {
    return knots[knots.length - 1];
  }

  /**
   * Writes the interpolated Q(ik) into {@code out}, reshaped to size() x size() if needed. Outside
   * the tabulated range the end value is written (clamping).
   *
   * @param reducedFrequency k &ge; 0 (NaN rejected)
   * @param out the result. Modified.
   * @throws IllegalArgumentException if k is NaN
   */
  @Override
  public void forces(double reducedFrequency, ZMatrixRMaj out) {
    if (Double.isNaN(reducedFrequency)) {
      throw new IllegalArgumentException("reduced frequency is NaN");
    }
    int last = knots.length - 1;
    double k = Math.min(Math.max(reducedFrequency, knots[0]), knots[last]);
    int interval = intervalOf(k);
    double t = k - knots[interval];
    int numbers = 2 * n * n;
    out.reshape(n, n);
    double[] data = out.data;
    int offset = interval * numbers * 4;
    for (int e = 0; e < numbers; e++) {
      int o = offset + 4 * e;
      data[e] =
          coefficients[o]
              + t * (coefficients[o + 1] + t * (coefficients[o + 2] + t * coefficients[o + 3]));
    }
  }

  /** @return index i of the interval [knots[i], knots[i+1]] holding k (k within the range) */
  private int intervalOf(double k) {
    int lo = 0;
    int hi = knots.length - 1; // knots[lo] <= k <= knots[hi]
    while (hi - lo > 1) {
      int mid = (lo + hi) >>> 1;
      if (knots[mid] <= k) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return lo;
  }

  @Override
  public String description() {
    return String.format(
        Locale.ROOT,
        "tabulated forces, %d reduced frequencies %.4g to %.4g, Mach %.3f%s, not-a-knot cubic spline",
        knots.length,
        knots[0],
        knots[knots.length - 1],
        machNumber,
        machNote);
  }
}
