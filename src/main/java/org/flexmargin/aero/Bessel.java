package org.flexmargin.aero;

/**
 * Bessel functions of the first kind J<sub>0</sub>, J<sub>1</sub> and of the second kind
 * Y<sub>0</sub>, Y<sub>1</sub> (Weber's functions) of a real argument x &ge; 0, as needed by
 * Theodorsen's function.
 *
 * <p>Three published methods, each used where it is accurate in double precision:
 *
 * <ul>
 *   <li>0 &lt; x &le; 2: the ascending series, M. Abramowitz and I. A. Stegun, <i>Handbook of
 *       Mathematical Functions</i> (NBS AMS 55, 1964), eqs. 9.1.10 (J<sub>n</sub>), 9.1.13
 *       (Y<sub>0</sub>) and 9.1.11 with &psi;(k+1) = &minus;&gamma; + H<sub>k</sub> (Y<sub>1</sub>).
 *       Its largest term is below I<sub>0</sub>(2) &asymp; 2.3, so there is no cancellation.
 *   <li>2 &lt; x &le; 25: J<sub>0</sub>, J<sub>1</sub>, J<sub>2</sub>, ... by Miller's backward
 *       recurrence J<sub>m-1</sub> = (2m/x) J<sub>m</sub> &minus; J<sub>m+1</sub>, normalised by
 *       J<sub>0</sub> + 2 &Sigma; J<sub>2k</sub> = 1 (A&amp;S 9.1.87; J. C. P. Miller, British
 *       Association Mathematical Tables vol. X, 1952; W. Gautschi, "Computational aspects of
 *       three-term recurrence relations", SIAM Review 9 (1967) 24-82), and the Neumann series
 *       A&amp;S 9.1.88 for Y<sub>0</sub> and 9.1.89 for Y<sub>1</sub>. Every term is bounded by
 *       one in magnitude, so the series avoid the large cancellation that the ascending series for
 *       Y would suffer at these arguments (its terms reach about e<sup>x</sup>). The recurrence
 *       starts at the smallest even N &gt; x with (e x / 2N)<sup>N</sup> &lt; e<sup>-40</sup>,
 *       which bounds the neglected J<sub>N</sub>(x) below about 1e-17.
 *   <li>x &gt; 25: Hankel's asymptotic expansion, A&amp;S 9.2.5, 9.2.6, 9.2.9, 9.2.10, summed
 *       until a term falls below 1e-17; at x = 25 the smallest term of the divergent series is
 *       near e<sup>-2x</sup> &asymp; 2e-22, so the truncation is far below rounding. The phase
 *       x &minus; &pi;/4 (or 3&pi;/4) is expanded with exact sin x and cos x so that no rounding of
 *       a shifted argument enters.
 * </ul>
 *
 * <p>Accuracy (checked in the tests against quadrature of the integral representations, the
 * Wronskian and A&amp;S Table 9.1; during development also against a 40-digit evaluation):
 * errors of a few units of 1e-16 absolute for 1e-4 &le; x &le; 1e3, and a few units of 1e-15
 * relative wherever the value is not close to a zero of the function.
 *
 * <p>Special arguments: x = 0 gives J<sub>0</sub> = 1, J<sub>1</sub> = 0 and Y<sub>0</sub> =
 * Y<sub>1</sub> = &minus;&infin;; x = +&infin; gives zeros; NaN gives NaN; x &lt; 0 is rejected
 * (Y is complex there).
 *
 * <p>Stateless and thread-safe. {@link #evaluate} allocates nothing.
 */
public final class Bessel {
  /** Euler's constant &gamma; (A&amp;S 6.1.3). */
  static final double EULER_GAMMA = 0.57721566490153286060651209;

  /** Largest argument handled by the ascending series. */
  private static final double SERIES_LIMIT = 2.0;

  /** Largest argument handled by Miller's recurrence; above it the Hankel expansion is used. */
  private static final double RECURRENCE_LIMIT = 25.0;

  /** Terms of the series below this absolute size are neglected (values are of order one). */
  private static final double SERIES_TOLERANCE = 1e-18;

  /** Terms of the asymptotic expansion below this size are neglected (P and Q are near 1). */
  private static final double ASYMPTOTIC_TOLERANCE = 1e-17;

  private Bessel() {}

  /**
   * Writes J<sub>n</sub>(x) and Y<sub>n</sub>(x) for order n = 0 or 1 into {@code jy}.
   *
   * @param order 0 or 1
   * @param x argument, x &ge; 0 (or NaN, giving NaN)
   * @param jy output, length &ge; 2: {@code jy[0] = J_n(x)}, {@code jy[1] = Y_n(x)}. Modified.
   * @throws IllegalArgumentException if the order is not 0 or 1, x &lt; 0, or {@code jy} is too
   *     short
   */
  public static void evaluate(int order, double x, double[] jy) {
    if (order != 0 && order != 1) {
      throw new IllegalArgumentException("Bessel order must be 0 or 1, found " + order);
    }
    if (jy == null || jy.length < 2) {
      throw new IllegalArgumentException("output array needs length >= 2");
    }
    if (x < 0) {
      throw new IllegalArgumentException("Bessel argument must be >= 0, found " + x);
    }
    if (Double.isNaN(x)) {
      jy[0] = Double.NaN;
      jy[1] = Double.NaN;
    } else if (x == 0.0) {
      jy[0] = order == 0 ? 1.0 : 0.0;
      jy[1] = Double.NEGATIVE_INFINITY;
    } else if (x == Double.POSITIVE_INFINITY) {
      jy[0] = 0.0;
      jy[1] = 0.0;
    } else if (x <= SERIES_LIMIT) {
      if (order == 0) {
        ascendingOrder0(x, jy);
      } else {
        ascendingOrder1(x, jy);
      }
    } else if (x <= RECURRENCE_LIMIT) {
      millerNeumann(order, x, jy);
    } else {
      hankelAsymptotic(order, x, jy);
    }
  }

  /**
   * @param x argument, x &ge; 0
   * @return J<sub>0</sub>(x)
   */
  public static double j0(double x) {
    double[] jy = new double[2];
    evaluate(0, x, jy);
    return jy[0];
  }

  /**
   * @param x argument, x &ge; 0
   * @return J<sub>1</sub>(x)
   */
  public static double j1(double x) {
    double[] jy = new double[2];
    evaluate(1, x, jy);
    return jy[0];
  }

  /**
   * @param x argument, x &ge; 0
   * @return Y<sub>0</sub>(x) (&minus;&infin; at x = 0)
   */
  public static double y0(double x) {
    double[] jy = new double[2];
    evaluate(0, x, jy);
    return jy[1];
  }

  /**
   * @param x argument, x &ge; 0
   * @return Y<sub>1</sub>(x) (&minus;&infin; at x = 0)
   */
  public static double y1(double x) {
    double[] jy = new double[2];
    evaluate(1, x, jy);
    return jy[1];
  }

  /**
   * A&amp;S 9.1.10 and 9.1.13 with z = x<sup>2</sup>/4: J<sub>0</sub> = &Sigma; t<sub>k</sub>,
   * t<sub>k</sub> = (&minus;z)<sup>k</sup>/(k!)<sup>2</sup>; Y<sub>0</sub> = (2/&pi;)[(ln(x/2) +
   * &gamma;) J<sub>0</sub> &minus; &Sigma;<sub>k&ge;1</sub> H<sub>k</sub> t<sub>k</sub>],
   * H<sub>k</sub> the harmonic numbers.
   */
  private static void ascendingOrder0(double x, double[] jy) {
    double z = 0.25 * x * x;
    double term = 1.0;
    double sumJ = 1.0;
    double sumH = 0.0;
    double harmonic = 0.0;
    for (int k = 1; k < 100; k++) {
      term *= -z / ((double) k * k);
      harmonic += 1.0 / k;
      sumJ += term;
      sumH += harmonic * term;
      if (Math.abs(term) * (1.0 + harmonic) < SERIES_TOLERANCE) {
        break;
      }
    }
    jy[0] = sumJ;
    jy[1] = (2.0 / Math.PI) * ((Math.log(0.5 * x) + EULER_GAMMA) * sumJ - sumH);
  }

  /**
   * A&amp;S 9.1.10 and 9.1.11 for n = 1 with u<sub>k</sub> = (&minus;z)<sup>k</sup>/(k!(k+1)!):
   * J<sub>1</sub> = (x/2) &Sigma; u<sub>k</sub>; Y<sub>1</sub> = &minus;2/(&pi;x) + (2/&pi;)(ln(x/2)
   * + &gamma;) J<sub>1</sub> &minus; (x/(2&pi;)) &Sigma; (H<sub>k</sub> + H<sub>k+1</sub>)
   * u<sub>k</sub> (the &minus;2&gamma; part of &psi;(k+1) + &psi;(k+2) is folded into the log term).
   */
  private static void ascendingOrder1(double x, double[] jy) {
    double z = 0.25 * x * x;
    double term = 1.0;
    double sumJ = 1.0;
    double harmonicK = 0.0; // H_k
    double harmonicK1 = 1.0; // H_{k+1}
    double sumH = harmonicK + harmonicK1; // k = 0 term
    for (int k = 1; k < 100; k++) {
      term *= -z / ((double) k * (k + 1));
      harmonicK = harmonicK1;
      harmonicK1 += 1.0 / (k + 1);
      sumJ += term;
      sumH += (harmonicK + harmonicK1) * term;
      if (Math.abs(term) * (1.0 + harmonicK1) < SERIES_TOLERANCE) {
        break;
      }
    }
    double j1 = 0.5 * x * sumJ;
    jy[0] = j1;
    jy[1] =
        -2.0 / (Math.PI * x)
            + (2.0 / Math.PI) * (Math.log(0.5 * x) + EULER_GAMMA) * j1
            - (x / (2.0 * Math.PI)) * sumH;
  }

  /**
   * Miller's backward recurrence with the normalisation A&amp;S 9.1.87 and the Neumann series
   * A&amp;S 9.1.88, 9.1.89:
   *
   * <pre>
   *   (pi/2) Y0 = (ln(x/2) + gamma) J0 - 2 sum_{k&gt;=1} (-1)^k J_{2k} / k
   *   (pi/2) Y1 = -J0/x + (ln(x/2) + gamma - 1) J1 - sum_{m&gt;=1} (-1)^m (2m+1)/(m(m+1)) J_{2m+1}
   * </pre>
   *
   * The Y<sub>1</sub> series follows from differentiating the Y<sub>0</sub> series with
   * J<sub>n</sub>' = (J<sub>n-1</sub> &minus; J<sub>n+1</sub>)/2 and Y<sub>1</sub> =
   * &minus;Y<sub>0</sub>'.
   */
  private static void millerNeumann(int order, double x, double[] jy) {
    int start = recurrenceStart(x);
    double jNext = 0.0; // unnormalised J_{m+1}
    double jCur = 1.0; // unnormalised J_m, m = start (even)
    double norm = 0.0;
    double sum0 = 0.0;
    double sum1 = 0.0;
    double twoOverX = 2.0 / x;
    for (int m = start; m >= 1; m--) {
      if ((m & 1) == 0) {
        int k = m >> 1;
        norm += 2.0 * jCur;
        sum0 += ((k & 1) == 0 ? jCur : -jCur) / k;
      } else if (m >= 3) {
        int q = (m - 1) >> 1;
        double w = (2.0 * q + 1.0) / (q * (q + 1.0));
        sum1 += ((q & 1) == 0 ? w : -w) * jCur;
      }
      double jPrev = m * twoOverX * jCur - jNext;
      jNext = jCur;
      jCur = jPrev;
    }
    norm += jCur;
    double j0 = jCur / norm;
    double j1 = jNext / norm;
    double logTerm = Math.log(0.5 * x) + EULER_GAMMA;
    if (order == 0) {
      jy[0] = j0;
      jy[1] = (2.0 / Math.PI) * (logTerm * j0 - 2.0 * sum0 / norm);
    } else {
      jy[0] = j1;
      jy[1] = (2.0 / Math.PI) * (-j0 / x + (logTerm - 1.0) * j1 - sum1 / norm);
    }
  }

  /**
   * @return the smallest even N &gt;= max(x, 2) with N ln(e x / (2N)) &lt; -40, i.e. the bound
   *     (x/2)<sup>N</sup>/N! &lt; (e x/2N)<sup>N</sup> on J<sub>N</sub>(x) below e<sup>-40</sup>
   */
  private static int recurrenceStart(double x) {
    int n = 2 * (int) Math.ceil(0.5 * Math.max(x, 2.0));
    while (n * Math.log(Math.E * x / (2.0 * n)) > -40.0) {
      n += 2;
    }
    return n;
  }

  /**
   * Hankel's expansion (A&amp;S 9.2.5-9.2.10) with &mu; = 4n<sup>2</sup> and terms
   * a<sub>k</sub> = a<sub>k-1</sub> (&mu; &minus; (2k&minus;1)<sup>2</sup>)/(8kx), a<sub>0</sub> =
   * 1: P = a<sub>0</sub> &minus; a<sub>2</sub> + a<sub>4</sub> &minus; ..., Q = a<sub>1</sub>
   * &minus; a<sub>3</sub> + ...; J<sub>n</sub> = &radic;(2/(&pi;x)) (P cos &chi; &minus; Q sin
   * &chi;), Y<sub>n</sub> = &radic;(2/(&pi;x)) (P sin &chi; + Q cos &chi;), &chi; = x &minus; (n/2 +
   * 1/4)&pi;.
   */
  private static void hankelAsymptotic(int order, double x, double[] jy) {
    double mu = 4.0 * order * order;
    double eightX = 8.0 * x;
    double p = 1.0;
    double q = 0.0;
    double a = 1.0;
    double previous = Double.POSITIVE_INFINITY;
    for (int k = 1; k < 200; k++) {
      double odd = 2.0 * k - 1.0;
      a *= (mu - odd * odd) / (k * eightX);
      double size = Math.abs(a);
      if (size > previous) {
        break; // the divergent tail starts; cannot happen above the switch-over argument
      }
      // a_k enters P (k even) or Q (k odd) with sign (-1)^floor(k/2)
      double signed = ((k >> 1) & 1) == 0 ? a : -a;
      if ((k & 1) == 0) {
        p += signed;
      } else {
        q += signed;
      }
      if (size < ASYMPTOTIC_TOLERANCE) {
        break;
      }
      previous = size;
    }
    double sin = Math.sin(x);
    double cos = Math.cos(x);
    // sqrt(2) cos(chi) and sqrt(2) sin(chi) from the angle-difference formulas
    double rootTwoCos;
    double rootTwoSin;
    if (order == 0) {
      rootTwoCos = cos + sin; // chi = x - pi/4
      rootTwoSin = sin - cos;
    } else {
      rootTwoCos = sin - cos; // chi = x - 3 pi/4
      rootTwoSin = -sin - cos;
    }
    double scale = 1.0 / Math.sqrt(Math.PI * x); // sqrt(2/(pi x)) / sqrt(2)
    jy[0] = scale * (p * rootTwoCos - q * rootTwoSin);
    jy[1] = scale * (p * rootTwoSin + q * rootTwoCos);
  }
}
