package org.flexmargin.loop;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.numerics.RealEigenvalues;
import org.flexmargin.numerics.RealEigenvaluesResult;

/**
 * Immutable continuous-time linear time-invariant system
 *
 * <pre>
 *   x' = A x + B u,   y = C x + D u
 * </pre>
 *
 * with n states, m inputs and p outputs, dense real matrices (copied in and out) and a name for
 * every input, output and state. Time in seconds, so frequencies are in rad/s.
 *
 * <p>Interconnections follow the usual block-diagram algebra (e.g. Franklin, Powell &amp;
 * Emami-Naeini, <i>Feedback Control of Dynamic Systems</i>, ch. 7; Zhou, Doyle &amp; Glover,
 * <i>Robust and Optimal Control</i>, sec. 3.6): {@link #series}, {@link #parallel},
 * {@link #feedback}, {@link #append}. Frequency responses use the Hessenberg method of Laub (IEEE
 * Trans. Automatic Control 26(2):407-408, 1981) through a {@link FrequencyResponseEvaluator}; a
 * dense complex-LU evaluation ({@link #frequencyResponseDenseLu}) is kept as an independent
 * cross-check.
 */
public final class StateSpace {
  private final DMatrixRMaj a;
  private final DMatrixRMaj b;
  private final DMatrixRMaj c;
  private final DMatrixRMaj d;
  private final List<String> inputNames;
  private final List<String> outputNames;
  private final List<String> stateNames;
  /** Lazily computed Hessenberg realisation; immutable once set, benign race. */
  private volatile HessenbergRealization hessenberg;

  /**
   * Creates a system from matrices and names.
   *
   * @param a n x n state matrix, 1/s
   * @param b n x m input matrix
   * @param c p x n output matrix
   * @param d p x m feed-through matrix
   * @param inputNames m input names
   * @param outputNames p output names
   * @param stateNames n state names
   * @throws InvalidInputException if dimensions disagree, an entry is not finite or a name is
   *     missing
   */
  public StateSpace(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, DMatrixRMaj d,
      List<String> inputNames, List<String> outputNames, List<String> stateNames) {
    require(a != null && b != null && c != null && d != null, "state_space", "four matrices",
        "a null matrix");
    int n = a.numRows;
    require(a.numCols == n, "state_space.a", "a square matrix", a.numRows + " x " + a.numCols);
    require(b.numRows == n, "state_space.b", n + " rows", b.numRows + " rows");
    require(c.numCols == n, "state_space.c", n + " columns", c.numCols + " columns");
    require(d.numRows == c.numRows, "state_space.d", c.numRows + " rows", d.numRows + " rows");
    require(d.numCols == b.numCols, "state_space.d", b.numCols + " columns", d.numCols + " columns");
    finite(a, "state_space.a");
    finite(b, "state_space.b");
    finite(c, "state_space.c");
    finite(d, "state_space.d");
    this.a = a.copy();
    this.b = b.copy();
    this.c = c.copy();
    this.d = d.copy();
    this.inputNames = names(inputNames, b.numCols, "state_space.input_names");
    this.outputNames = names(outputNames, c.numRows, "state_space.output_names");
    this.stateNames = names(stateNames, n, "state_space.state_names");
  }

  /**
   * Creates a system with default names u1.., y1.., x1...
   *
   * @param a n x n state matrix (rows), 1/s
   * @param b n x m input matrix; for n = 0 pass {@code new double[0][]} and the input count is
   *     taken from {@code d}
   * @param c p x n output matrix; for n = 0 pass p empty rows or {@code new double[0][]}
   * @param d p x m feed-through matrix
   * @return the system
   */
  public static StateSpace of(double[][] a, double[][] b, double[][] c, double[][] d) {
    require(a != null && b != null && c != null && d != null, "state_space", "four matrices",
        "a null matrix");
    int n = a.length;
    int p = d.length;
    int m = p == 0 ? (n == 0 ? 0 : b[0].length) : d[0].length;
    return of(matrix(a, n, n, "state_space.a"), matrix(b, n, m, "state_space.b"),
        matrix(c, p, n, "state_space.c"), matrix(d, p, m, "state_space.d"));
  }

  /**
   * Creates a system with default names u1.., y1.., x1...
   *
   * @param a state matrix
   * @param b input matrix
   * @param c output matrix
   * @param d feed-through matrix
   * @return the system
   */
  public static StateSpace of(DMatrixRMaj a, DMatrixRMaj b, DMatrixRMaj c, DMatrixRMaj d) {
    require(a != null && b != null && c != null && d != null, "state_space", "four matrices",
        "a null matrix");
    return new StateSpace(a, b, c, d, defaultNames("u", d.numCols), defaultNames("y", d.numRows),
        defaultNames("x", a.numRows));
  }

  /**
   * A memoryless SISO gain y = k u (no states).
   *
   * @param k gain
   * @return the system
   */
  public static StateSpace staticGain(double k) {
    return of(new DMatrixRMaj(0, 0), new DMatrixRMaj(0, 1), new DMatrixRMaj(1, 0),
        new DMatrixRMaj(new double[][] {{k}}));
  }

  /**
   * SISO realisation of a proper rational transfer function in controllable canonical form
   * (Kailath, <i>Linear Systems</i>, sec. 2.1). Polynomials in descending powers of s:
   * {@code {1, 3, 3}} is s^2 + 3 s + 3.
   *
   * @param numerator numerator coefficients, descending powers, degree at most that of the
   *     denominator
   * @param denominator denominator coefficients, descending powers, leading coefficient non-zero
   * @return a realisation with as many states as the denominator degree
   */
  public static StateSpace fromTransferFunction(double[] numerator, double[] denominator) {
    require(denominator != null && denominator.length >= 1 && denominator[0] != 0,
        "transfer_function.denominator", "a leading coefficient != 0", "none");
    require(numerator != null && numerator.length >= 1
        && numerator.length <= denominator.length, "transfer_function.numerator",
        "a degree <= denominator degree " + (denominator.length - 1),
        numerator == null ? "null" : "degree " + (numerator.length - 1));
    for (double v : numerator) {
      require(Double.isFinite(v), "transfer_function.numerator", "finite", v);
    }
    for (double v : denominator) {
      require(Double.isFinite(v), "transfer_function.denominator", "finite", v);
    }
    int n = denominator.length - 1;
    double lead = denominator[0];
    double[] den = new double[n + 1];
    double[] num = new double[n + 1];
    for (int i = 0; i <= n; i++) {
      den[i] = denominator[i] / lead;
    }
    int shift = n + 1 - numerator.length;
    for (int i = 0; i < numerator.length; i++) {
      num[shift + i] = numerator[i] / lead;
    }
    DMatrixRMaj aa = new DMatrixRMaj(n, n);
    DMatrixRMaj bb = new DMatrixRMaj(n, 1);
    DMatrixRMaj cc = new DMatrixRMaj(1, n);
    DMatrixRMaj dd = new DMatrixRMaj(1, 1);
    for (int j = 0; j < n; j++) {
      aa.set(0, j, -den[j + 1]);
      cc.set(0, j, num[j + 1] - num[0] * den[j + 1]);
    }
    for (int i = 1; i < n; i++) {
      aa.set(i, i - 1, 1.0);
    }
    if (n > 0) {
      bb.set(0, 0, 1.0);
    }
    dd.set(0, 0, num[0]);
    return of(aa, bb, cc, dd);
  }

  /** @return number of states n */
  public int stateCount() {
    return a.numRows;
  }

  /** @return number of inputs m */
  public int inputCount() {
    return b.numCols;
  }

  /** @return number of outputs p */
  public int outputCount() {
    return c.numRows;
  }

  /** @return true for one input and one output */
  public boolean isSiso() {
    return inputCount() == 1 && outputCount() == 1;
  }

  /** @return a copy of A (n x n, 1/s) */
  public DMatrixRMaj a() {
    return a.copy();
  }

  /** @return a copy of B (n x m) */
  public DMatrixRMaj b() {
    return b.copy();
  }

  /** @return a copy of C (p x n) */
  public DMatrixRMaj c() {
    return c.copy();
  }

  /** @return a copy of D (p x m) */
  public DMatrixRMaj d() {
    return d.copy();
  }

  /** @return the input names (unmodifiable) */
  public List<String> inputNames() {
    return inputNames;
  }

  /** @return the output names (unmodifiable) */
  public List<String> outputNames() {
    return outputNames;
  }

  /** @return the state names (unmodifiable) */
  public List<String> stateNames() {
    return stateNames;
  }

  /**
   * Series connection: the outputs of this system drive the inputs of {@code next}; the result
   * maps this system's inputs to next's outputs, transfer matrix G_next(s) G_this(s). States are
   * this system's followed by next's.
   *
   * @param next downstream system with as many inputs as this has outputs
   * @return the series system
   */
  public StateSpace series(StateSpace next) {
    require(next.inputCount() == outputCount(), "series.next", outputCount() + " inputs",
        next.inputCount() + " inputs");
    int n1 = stateCount();
    int n2 = next.stateCount();
    DMatrixRMaj aa = new DMatrixRMaj(n1 + n2, n1 + n2);
    CommonOps_DDRM.insert(a, aa, 0, 0);
    CommonOps_DDRM.insert(next.a, aa, n1, n1);
    CommonOps_DDRM.insert(mult(next.b, c), aa, n1, 0);
    DMatrixRMaj bb = new DMatrixRMaj(n1 + n2, inputCount());
    CommonOps_DDRM.insert(b, bb, 0, 0);
    CommonOps_DDRM.insert(mult(next.b, d), bb, n1, 0);
    DMatrixRMaj cc = new DMatrixRMaj(next.outputCount(), n1 + n2);
    CommonOps_DDRM.insert(mult(next.d, c), cc, 0, 0);
    CommonOps_DDRM.insert(next.c, cc, 0, n1);
    return new StateSpace(aa, bb, cc, mult(next.d, d), inputNames, next.outputNames,
        concat(stateNames, next.stateNames));
  }

  /**
   * Parallel connection: both systems receive the same inputs and their outputs are added,
   * G_this(s) + G_other(s).
   *
   * @param other system with the same input and output counts
   * @return the parallel system
   */
  public StateSpace parallel(StateSpace other) {
    require(other.inputCount() == inputCount() && other.outputCount() == outputCount(),
        "parallel.other", outputCount() + " x " + inputCount() + " system",
        other.outputCount() + " x " + other.inputCount());
    int n1 = stateCount();
    int n2 = other.stateCount();
    DMatrixRMaj aa = new DMatrixRMaj(n1 + n2, n1 + n2);
    CommonOps_DDRM.insert(a, aa, 0, 0);
    CommonOps_DDRM.insert(other.a, aa, n1, n1);
    DMatrixRMaj bb = new DMatrixRMaj(n1 + n2, inputCount());
    CommonOps_DDRM.insert(b, bb, 0, 0);
    CommonOps_DDRM.insert(other.b, bb, n1, 0);
    DMatrixRMaj cc = new DMatrixRMaj(outputCount(), n1 + n2);
    CommonOps_DDRM.insert(c, cc, 0, 0);
    CommonOps_DDRM.insert(other.c, cc, 0, n1);
    DMatrixRMaj dd = new DMatrixRMaj(outputCount(), inputCount());
    CommonOps_DDRM.add(d, other.d, dd);
    return new StateSpace(aa, bb, cc, dd, inputNames, outputNames,
        concat(stateNames, other.stateNames));
  }

  /**
   * Feedback connection around this system (forward path G) through {@code h} (feedback path
   * H): u_G = r + sign * H y, y = G u_G. The result maps r to y; with {@link
   * FeedbackSign#NEGATIVE} its transfer matrix is (I + G H)^-1 G.
   *
   * <p>Worked example: plant G(s) = 1/(s + 1) (A = -1, B = 1, C = 1, D = 0) with unity negative
   * feedback H = 1 gives A_cl = A - B C = -2, so the closed loop is 1/(s + 2).
   *
   * <p>Feed-through in both paths is handled through M = (I - sign D_G D_H)^-1; an algebraic
   * loop with singular I - sign D_G D_H is rejected.
   *
   * @param h feedback system: inputs = this system's outputs, outputs = this system's inputs
   * @param sign summation sign of the feedback signal (required)
   * @return the closed-loop system (states: this system's, then h's)
   */
  public StateSpace feedback(StateSpace h, FeedbackSign sign) {
    require(sign != null, "feedback.sign", "NEGATIVE or POSITIVE", "null");
    require(h.inputCount() == outputCount() && h.outputCount() == inputCount(), "feedback.h",
        inputCount() + " x " + outputCount() + " system",
        h.outputCount() + " x " + h.inputCount());
    double s = sign.factor();
    int p = outputCount();
    int m = inputCount();
    int n1 = stateCount();
    int n2 = h.stateCount();
    DMatrixRMaj e = CommonOps_DDRM.identity(p);
    DMatrixRMaj d1d2 = mult(d, h.d);
    CommonOps_DDRM.addEquals(e, -s, d1d2);
    DMatrixRMaj mm = e.copy();
    require(CommonOps_DDRM.invert(mm) && allFinite(mm), "feedback", "a well-posed loop "
        + "(I - sign D_G D_H invertible)", "a singular algebraic loop");
    DMatrixRMaj mc1 = mult(mm, c);
    DMatrixRMaj md1 = mult(mm, d);
    DMatrixRMaj md1c2 = mult(md1, h.c);
    // e = s D2 M C1 x1 + (s C2 + D2 M D1 C2) x2 + (I + s D2 M D1) r
    DMatrixRMaj ex1 = mult(h.d, mc1);
    CommonOps_DDRM.scale(s, ex1);
    DMatrixRMaj ex2 = mult(h.d, md1c2);
    CommonOps_DDRM.addEquals(ex2, s, h.c);
    DMatrixRMaj er = mult(h.d, md1);
    CommonOps_DDRM.scale(s, er);
    CommonOps_DDRM.addEquals(er, CommonOps_DDRM.identity(m));
    DMatrixRMaj aa = new DMatrixRMaj(n1 + n2, n1 + n2);
    DMatrixRMaj a11 = mult(b, ex1);
    CommonOps_DDRM.addEquals(a11, a);
    CommonOps_DDRM.insert(a11, aa, 0, 0);
    CommonOps_DDRM.insert(mult(b, ex2), aa, 0, n1);
    CommonOps_DDRM.insert(mult(h.b, mc1), aa, n1, 0);
    DMatrixRMaj a22 = mult(h.b, md1c2);
    CommonOps_DDRM.scale(s, a22);
    CommonOps_DDRM.addEquals(a22, h.a);
    CommonOps_DDRM.insert(a22, aa, n1, n1);
    DMatrixRMaj bb = new DMatrixRMaj(n1 + n2, m);
    CommonOps_DDRM.insert(mult(b, er), bb, 0, 0);
    CommonOps_DDRM.insert(mult(h.b, md1), bb, n1, 0);
    DMatrixRMaj cc = new DMatrixRMaj(p, n1 + n2);
    CommonOps_DDRM.insert(mc1, cc, 0, 0);
    DMatrixRMaj c2 = md1c2.copy();
    CommonOps_DDRM.scale(s, c2);
    CommonOps_DDRM.insert(c2, cc, 0, n1);
    return new StateSpace(aa, bb, cc, md1, inputNames, outputNames,
        concat(stateNames, h.stateNames));
  }

  /**
   * Block-diagonal append: the systems run side by side with stacked inputs, outputs and states,
   * transfer matrix diag(G_this, G_other).
   *
   * @param other the second system
   * @return the appended system
   */
  public StateSpace append(StateSpace other) {
    int n1 = stateCount();
    int n2 = other.stateCount();
    int m1 = inputCount();
    int p1 = outputCount();
    DMatrixRMaj aa = new DMatrixRMaj(n1 + n2, n1 + n2);
    CommonOps_DDRM.insert(a, aa, 0, 0);
    CommonOps_DDRM.insert(other.a, aa, n1, n1);
    DMatrixRMaj bb = new DMatrixRMaj(n1 + n2, m1 + other.inputCount());
    CommonOps_DDRM.insert(b, bb, 0, 0);
    CommonOps_DDRM.insert(other.b, bb, n1, m1);
    DMatrixRMaj cc = new DMatrixRMaj(p1 + other.outputCount(), n1 + n2);
    CommonOps_DDRM.insert(c, cc, 0, 0);
    CommonOps_DDRM.insert(other.c, cc, p1, n1);
    DMatrixRMaj dd = new DMatrixRMaj(p1 + other.outputCount(), m1 + other.inputCount());
    CommonOps_DDRM.insert(d, dd, 0, 0);
    CommonOps_DDRM.insert(other.d, dd, p1, m1);
    return new StateSpace(aa, bb, cc, dd, concat(inputNames, other.inputNames),
        concat(outputNames, other.outputNames), concat(stateNames, other.stateNames));
  }

  /**
   * Scales every output by k (C and D multiplied by k), transfer matrix k G(s).
   *
   * @param k finite gain
   * @return the scaled system
   */
  public StateSpace scale(double k) {
    require(Double.isFinite(k), "scale.k", "a finite gain", k);
    DMatrixRMaj cc = c.copy();
    DMatrixRMaj dd = d.copy();
    CommonOps_DDRM.scale(k, cc);
    CommonOps_DDRM.scale(k, dd);
    return new StateSpace(a, b, cc, dd, inputNames, outputNames, stateNames);
  }

  /**
   * Eigenvalues of A (the poles, counting any that are uncontrollable or unobservable) by
   * balancing, Hessenberg reduction and Francis double-shift QR ({@link RealEigenvalues}).
   *
   * @return eigenvalues in rad/s, complex ones in conjugate pairs (positive imaginary part
   *     first), in the order the QR iteration deflates them along the diagonal
   * @throws ArithmeticException if the QR iteration does not converge
   */
  public Eigenvalues eigenvalues() {
    int n = stateCount();
    RealEigenvaluesResult r = new RealEigenvalues().solve(a);
    if (!r.converged()) {
      throw new ArithmeticException("eigenvalues of the " + n + "-state matrix: the QR iteration "
          + "did not converge in " + r.iterations() + " sweeps");
    }
    return new Eigenvalues(r.real(), r.imag());
  }

  /**
   * Frequency response G(j w) = C (j w I - A)^-1 B + D at each frequency by the Hessenberg
   * method (Laub 1981): one orthogonal reduction of A, then O(n^2) work per frequency.
   *
   * @param omegaRadPerS frequencies, rad/s (none may coincide with an imaginary-axis pole)
   * @return the response for every output/input pair
   */
  public FrequencyResponse frequencyResponse(double[] omegaRadPerS) {
    FrequencyResponseEvaluator ev = new FrequencyResponseEvaluator(this);
    int p = outputCount();
    int m = inputCount();
    double[] re = new double[omegaRadPerS.length * p * m];
    double[] im = new double[re.length];
    double[] wr = new double[p * m];
    double[] wi = new double[p * m];
    for (int k = 0; k < omegaRadPerS.length; k++) {
      ev.evaluate(omegaRadPerS[k], wr, wi);
      System.arraycopy(wr, 0, re, k * p * m, p * m);
      System.arraycopy(wi, 0, im, k * p * m, p * m);
    }
    return new FrequencyResponse(omegaRadPerS, p, m, re, im);
  }

  /**
   * Frequency response by a dense complex LU factorisation of (j w I - A) at every frequency
   * (EJML {@code LinearSolverFactory_ZDRM.lu}), O(n^3) per frequency. Independent of the
   * Hessenberg path; meant for cross-checks and benchmarks, not for production sweeps.
   *
   * @param omegaRadPerS frequencies, rad/s
   * @return the response for every output/input pair
   */
  public FrequencyResponse frequencyResponseDenseLu(double[] omegaRadPerS) {
    int n = stateCount();
    int p = outputCount();
    int m = inputCount();
    double[] re = new double[omegaRadPerS.length * p * m];
    double[] im = new double[re.length];
    ZMatrixRMaj mat = new ZMatrixRMaj(n, n);
    ZMatrixRMaj rhs = new ZMatrixRMaj(n, m);
    ZMatrixRMaj x = new ZMatrixRMaj(n, m);
    LinearSolverDense<ZMatrixRMaj> lu = LinearSolverFactory_ZDRM.lu(Math.max(n, 1));
    for (int k = 0; k < omegaRadPerS.length; k++) {
      double w = omegaRadPerS[k];
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          mat.set(i, j, -a.get(i, j), i == j ? w : 0.0);
        }
        for (int j = 0; j < m; j++) {
          rhs.set(i, j, b.get(i, j), 0.0);
        }
      }
      if (n > 0) {
        if (!lu.setA(mat.copy())) {
          throw new ArithmeticException("j w I - A is singular at w = " + w + " rad/s");
        }
        lu.solve(rhs, x);
      }
      int base = k * p * m;
      for (int i = 0; i < p; i++) {
        for (int j = 0; j < m; j++) {
          double sr = d.get(i, j);
          double si = 0;
          for (int l = 0; l < n; l++) {
            double cl = c.get(i, l);
            sr += cl * x.getReal(l, j);
            si += cl * x.getImag(l, j);
          }
          re[base + i * m + j] = sr;
          im[base + i * m + j] = si;
        }
      }
    }
    return new FrequencyResponse(omegaRadPerS, p, m, re, im);
  }

  /** @return the Hessenberg realisation, computed once */
  HessenbergRealization hessenberg() {
    HessenbergRealization h = hessenberg;
    if (h == null) {
      h = HessenbergRealization.of(a, b, c, d);
      hessenberg = h;
    }
    return h;
  }

  @Override
  public String toString() {
    return "StateSpace[" + stateCount() + " states, " + inputNames + " -> " + outputNames + "]";
  }

  // ---------------------------------------------------------------------------------------------

  private static DMatrixRMaj mult(DMatrixRMaj x, DMatrixRMaj y) {
    DMatrixRMaj r = new DMatrixRMaj(x.numRows, y.numCols);
    if (x.numCols == 0) {
      return r;
    }
    CommonOps_DDRM.mult(x, y, r);
    return r;
  }

  private static boolean allFinite(DMatrixRMaj m) {
    for (int i = 0; i < m.getNumElements(); i++) {
      if (!Double.isFinite(m.data[i])) {
        return false;
      }
    }
    return true;
  }

  private static void finite(DMatrixRMaj m, String field) {
    for (int i = 0; i < m.numRows; i++) {
      for (int j = 0; j < m.numCols; j++) {
        double v = m.get(i, j);
        if (!Double.isFinite(v)) {
          throw new InvalidInputException(field + "[" + i + "][" + j + "]", "a finite value",
              String.valueOf(v));
        }
      }
    }
  }

  private static DMatrixRMaj matrix(double[][] v, int rows, int cols, String field) {
    require(v != null, field, "a matrix", "null");
    DMatrixRMaj m = new DMatrixRMaj(rows, cols);
    if (rows == 0 || cols == 0) {
      return m;
    }
    require(v.length == rows, field, rows + " rows", v.length + " rows");
    for (int i = 0; i < rows; i++) {
      require(v[i] != null && v[i].length == cols, field + "[" + i + "]", cols + " columns",
          v[i] == null ? "null" : v[i].length + " columns");
      for (int j = 0; j < cols; j++) {
        m.set(i, j, v[i][j]);
      }
    }
    return m;
  }

  private static List<String> names(List<String> names, int count, String field) {
    require(names != null && names.size() == count, field, count + " names",
        names == null ? "null" : names.size() + " names");
    for (String s : names) {
      require(s != null && !s.isBlank(), field, "non-blank names", "a blank or null name");
    }
    return Collections.unmodifiableList(new ArrayList<>(names));
  }

  static List<String> defaultNames(String prefix, int count) {
    List<String> r = new ArrayList<>(count);
    for (int i = 1; i <= count; i++) {
      r.add(prefix + i);
    }
    return r;
  }

  private static List<String> concat(List<String> x, List<String> y) {
    List<String> r = new ArrayList<>(x);
    r.addAll(y);
    return r;
  }

  static void require(boolean ok, String field, String expected, String found) {
    if (!ok) {
      throw new InvalidInputException(field, expected, found);
    }
  }

  /** As {@link #require(boolean, String, String, String)}; the value is written out only on failure. */
  static void require(boolean ok, String field, String expected, double found) {
    if (!ok) {
      throw new InvalidInputException(field, expected, String.valueOf(found));
    }
  }
}
