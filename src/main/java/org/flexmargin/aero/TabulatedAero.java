package org.flexmargin.aero;

import java.util.Locale;
import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.GafTable;

/**
 * Generalized aerodynamic forces interpolated in reduced frequency from a user table of Q(ik).
 *
 * <p><b>Interpolation.</b> The real and the imaginary part of every element are interpolated
 * separately with a natural cubic spline through the tabulated reduced frequencies (Commons Math
 * {@link SplineInterpolator}; second derivative zero at both end points; with only two tabulated
 * frequencies the natural spline is the straight line). The spline is chosen over Akima's
 * interpolation because it is twice continuously differentiable: flutter solvers iterate on k
 * and damping-perturbation methods use dQ/dk, and Akima's curve has a discontinuous second
 * derivative (and needs at least five points). The price is possible mild overshoot between
 * widely spaced nodes and the natural end condition, which is less accurate in the first and last
 * interval; tables should therefore be dense near k = 0, where Q has a k ln k behaviour.
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
 * #description()} only.
 */
public final class TabulatedAero implements AeroSource {
  private final int n;
  private final double referenceSemichordM;
  private final double machNumber;
  /** Tabulated reduced frequencies (knots), strictly increasing. */
  private final double[] knots;
  /**
   * Cubic coefficients about the left knot of each interval, index ((interval * 2 n^2) + e) * 4 +
   * power, with e the interleaved ZMatrixRMaj data index of the number.
   */
  private final double[] coefficients;

  /**
   * Builds the splines for every element of the table.
   *
   * @param table the tabulated forces; validated by its own constructor
   */
  public TabulatedAero(GafTable table) {
    this.n = table.modeNames().size();
    this.referenceSemichordM = table.referenceSemichordM();
    this.machNumber = table.machNumber();
    this.knots = table.reducedFrequencies();
    int nk = knots.length;
    int numbers = 2 * n * n;
    int intervals = nk - 1;
    this.coefficients = new double[intervals * numbers * 4];
    double[] values = new double[nk];
    SplineInterpolator interpolator = new SplineInterpolator();
    for (int r = 0; r < n; r++) {
      for (int c = 0; c < n; c++) {
        for (int part = 0; part < 2; part++) {
          for (int i = 0; i < nk; i++) {
            values[i] = part == 0 ? table.realAt(i, r, c) : table.imagAt(i, r, c);
          }
          int e = 2 * (r * n + c) + part;
          if (nk == 2) {
            double slope = (values[1] - values[0]) / (knots[1] - knots[0]);
            coefficients[e * 4] = values[0];
            coefficients[e * 4 + 1] = slope;
          } else {
            PolynomialSplineFunction spline = interpolator.interpolate(knots, values);
            PolynomialFunction[] pieces = spline.getPolynomials();
            for (int s = 0; s < intervals; s++) {
              double[] p = pieces[s].getCoefficients(); // trailing zeros may be trimmed
              int offset = (s * numbers + e) * 4;
              for (int power = 0; power < p.length && power < 4; power++) {
                coefficients[offset + power] = p[power];
              }
            }
          }
        }
      }
    }
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
        "tabulated forces, %d reduced frequencies %.4g to %.4g, Mach %.3f, natural cubic spline",
        knots.length,
        knots[0],
        knots[knots.length - 1],
        machNumber);
  }
}
