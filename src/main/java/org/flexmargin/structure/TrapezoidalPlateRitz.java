package org.flexmargin.structure;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplinePoint;

/**
 * Normal modes of a thin cantilever plate on a swept, tapered planform by the Rayleigh-Ritz
 * method: a Kirchhoff plate (no transverse shear, no rotary inertia) of variable thickness and
 * orthotropic material, clamped along its root chord, free elsewhere.
 *
 * <p><b>Basis.</b> On the unit square of {@link PlatePlanform} the deflection is
 * w = sum_ij a_ij P_i(xi) eta^2 P_j(eta), with P_n the Legendre polynomials shifted to [0, 1]
 * ({@link ShiftedLegendre}), i &lt; chordwise terms, j &lt; spanwise terms. The factor eta^2 makes
 * w and its spanwise slope vanish on the root (clamped); the free edges carry no condition (natural
 * boundary conditions of the energy). Bases of higher order contain those of lower order, so each
 * frequency falls (or stays) as terms are added and stays above the exact plate frequency.
 *
 * <p><b>Energies.</b> Strain energy (1/2) int kappa^T D kappa dA with kappa = (w_xx, w_yy, w_xy)
 * and D of {@link OrthotropicLamina} at the local thickness; kinetic energy
 * (1/2) int rho t w'^2 dA (consistent mass). The physical curvatures follow from the unit-square
 * derivatives by the chain rule with the inverse-map derivatives of {@link PlatePlanform}:
 *
 * <pre>
 *   w_xx = w_xixi xi_x^2
 *   w_yy = w_xixi xi_y^2 + 2 w_xieta xi_y eta_y + w_etaeta eta_y^2 + w_xi xi_yy
 *   w_xy = w_xixi xi_x xi_y + w_xieta xi_x eta_y + w_xi xi_xy
 * </pre>
 *
 * <p><b>Quadrature.</b> Gauss-Legendre (Commons Math). Chordwise in u with xi = u^2, so the square
 * root of a rounded leading edge (thickness ~ sqrt(xi)) becomes a polynomial in u:
 * {@code 4 (chordwise terms) + 24} nodes, exact for the polynomial integrands of a uniform plate and
 * of the four-digit thickness law; spanwise {@code 2 (spanwise terms) + 16} nodes (the integrands
 * are polynomial in eta over powers of the linear chord; exact for an untapered planform).
 *
 * <p><b>Modes.</b> K a = omega^2 M a is solved by {@link GeneralizedSymmetricEigen}. Mode shapes
 * are given at chosen points of the planform as vertical displacement (positive up) and streamwise
 * pitch -dw/dx (positive nose up), scaled so that the largest |w| over those points is +1 m; the
 * generalized mass (kg) is reported with that scaling.
 *
 * <p>Immutable.
 */
public final class TrapezoidalPlateRitz {
  /** Largest number of terms in either direction. */
  public static final int MAX_TERMS = 16;

  private final PlatePlanform planform;
  private final int nx;
  private final int ny;
  private final double massKg;
  private final double[] frequenciesHz;
  /** Mass-normalised Ritz coefficients, column = mode. */
  private final DMatrixRMaj vectors;

  /**
   * Builds and solves the Ritz model.
   *
   * @param planform the planform (root clamped)
   * @param material the material and its axis direction
   * @param thickness the thickness law
   * @param chordwiseTerms Legendre terms along the chord, 1 to {@link #MAX_TERMS}
   * @param spanwiseTerms Legendre terms along the span, 1 to {@link #MAX_TERMS}
   * @throws IllegalArgumentException for term counts out of range
   */
  public TrapezoidalPlateRitz(PlatePlanform planform, OrthotropicLamina material, PlateThickness thickness,
      int chordwiseTerms, int spanwiseTerms) {
    if (chordwiseTerms < 1 || chordwiseTerms > MAX_TERMS || spanwiseTerms < 1 || spanwiseTerms > MAX_TERMS) {
      throw new IllegalArgumentException("Ritz terms per direction must lie in 1.." + MAX_TERMS + "; got "
          + chordwiseTerms + " x " + spanwiseTerms);
    }
    this.planform = planform;
    this.nx = chordwiseTerms;
    this.ny = spanwiseTerms;
    int n = nx * ny;
    DMatrixRMaj k = new DMatrixRMaj(n, n);
    DMatrixRMaj m = new DMatrixRMaj(n, n);
    this.massKg = assemble(material, thickness, k, m);
    GeneralizedSymmetricEigen.Solution sol = GeneralizedSymmetricEigen.solve(k, m);
    this.frequenciesHz = new double[n];
    for (int i = 0; i < n; i++) {
      frequenciesHz[i] = Math.sqrt(Math.max(sol.eigenvalues()[i], 0)) / (2 * Math.PI);
    }
    this.vectors = sol.vectors();
  }

  private double assemble(OrthotropicLamina material, PlateThickness thickness, DMatrixRMaj k, DMatrixRMaj m) {
    int n = nx * ny;
    GaussIntegratorFactory factory = new GaussIntegratorFactory();
    GaussIntegrator chordRule = factory.legendre(4 * nx + 24, 0, 1);
    GaussIntegrator spanRule = factory.legendre(2 * ny + 16, 0, 1);
    double s = planform.semispanM();
    double total = 0;
    double[] value = new double[n];
    double[][] curvature = new double[n][3];
    double[][] dTimesCurvature = new double[n][3];
    for (int a = 0; a < spanRule.getNumberOfPoints(); a++) {
      double eta = spanRule.getPoint(a);
      double chord = planform.chordM(eta);
      for (int b = 0; b < chordRule.getNumberOfPoints(); b++) {
        double u = chordRule.getPoint(b);
        double xi = u * u;
        double t = thickness.thicknessM(xi, chord);
        double weight = spanRule.getWeight(a) * chordRule.getWeight(b) * 2 * u * chord * s;
        double rhoT = material.densityKgPerM3() * t * weight;
        total += rhoT;
        double[][] d = material.bendingStiffness(t);
        basis(xi, eta, value, curvature, null);
        for (int p = 0; p < n; p++) {
          for (int r = 0; r < 3; r++) {
            dTimesCurvature[p][r] = weight
                * (d[r][0] * curvature[p][0] + d[r][1] * curvature[p][1] + d[r][2] * curvature[p][2]);
          }
        }
        for (int p = 0; p < n; p++) {
          for (int q = p; q < n; q++) {
            k.data[p * n + q] += curvature[p][0] * dTimesCurvature[q][0]
                + curvature[p][1] * dTimesCurvature[q][1] + curvature[p][2] * dTimesCurvature[q][2];
            m.data[p * n + q] += rhoT * value[p] * value[q];
          }
        }
      }
    }
    for (int p = 0; p < n; p++) {
      for (int q = 0; q < p; q++) {
        k.data[p * n + q] = k.data[q * n + p];
        m.data[p * n + q] = m.data[q * n + p];
      }
    }
    return total;
  }

  /**
   * Values, physical curvatures (w_xx, w_yy, w_xy) and streamwise slopes of every basis function at
   * (xi, eta); index i ny + j.
   *
   * @param value out: w per unit coefficient (m)
   * @param curvature out, may be null: [function][w_xx, w_yy, w_xy] (1/m)
   * @param slopeX out, may be null: dw/dx (per unit coefficient)
   */
  void basis(double xi, double eta, double[] value, double[][] curvature, double[] slopeX) {
    double[][] px = ShiftedLegendre.evaluate(xi, nx);
    double[][] py = ShiftedLegendre.evaluate(eta, ny);
    double[] inv = planform.inverseDerivatives(xi, eta);
    double xiX = inv[0], xiY = inv[1], etaY = inv[2], xiXY = inv[3], xiYY = inv[4];
    double e2 = eta * eta;
    for (int j = 0; j < ny; j++) {
      // g = eta^2 P, g' = 2 eta P + eta^2 P', g'' = 2 P + 4 eta P' + eta^2 P''
      double g = e2 * py[0][j];
      double g1 = 2 * eta * py[0][j] + e2 * py[1][j];
      double g2 = 2 * py[0][j] + 4 * eta * py[1][j] + e2 * py[2][j];
      for (int i = 0; i < nx; i++) {
        int f = i * ny + j;
        double w = px[0][i] * g;
        double wXi = px[1][i] * g;
        value[f] = w;
        if (slopeX != null) {
          slopeX[f] = wXi * xiX;
        }
        if (curvature != null) {
          double wXiXi = px[2][i] * g;
          double wXiEta = px[1][i] * g1;
          double wEtaEta = px[0][i] * g2;
          curvature[f][0] = wXiXi * xiX * xiX;
          curvature[f][1] = wXiXi * xiY * xiY + 2 * wXiEta * xiY * etaY + wEtaEta * etaY * etaY + wXi * xiYY;
          curvature[f][2] = wXiXi * xiX * xiY + wXiEta * xiX * etaY + wXi * xiXY;
        }
      }
    }
  }

  /** @return the planform */
  public PlatePlanform planform() {
    return planform;
  }

  /** @return the plate's mass, the integral of rho t over the planform (kg) */
  public double massKg() {
    return massKg;
  }

  /** @return natural frequencies in ascending order (Hz), one per Ritz term */
  public double[] frequenciesHz() {
    return frequenciesHz.clone();
  }

  /**
   * Deflection of one mode, mass-normalised (a^T M a = 1), at a point.
   *
   * @param mode mode index, 0 = lowest
   * @param xM x of the point (m)
   * @param yM y of the point (m), 0 to the semispan
   * @return {w (m), dw/dx} of the mass-normalised mode
   */
  double[] deflection(int mode, double xM, double yM) {
    double eta = yM / planform.semispanM();
    double xi = (xM - planform.leadingEdgeXM(eta)) / planform.chordM(eta);
    int n = nx * ny;
    double[] value = new double[n], slope = new double[n];
    basis(xi, eta, value, null, slope);
    double w = 0, wx = 0;
    for (int f = 0; f < n; f++) {
      w += vectors.get(f, mode) * value[f];
      wx += vectors.get(f, mode) * slope[f];
    }
    return new double[] {w, wx};
  }

  /**
   * A grid of points on the planform: chord fractions i / (chordwise - 1) and span fractions
   * j / (spanwise - 1), root and tip, leading and trailing edges included; named
   * {@code prefix + i + "_" + j}.
   *
   * @param chordwise points along each chord, &gt;= 2
   * @param spanwise points along the span, &gt;= 2
   * @param prefix station name prefix
   * @return the points, chordwise index outermost
   */
  public List<SplinePoint> gridPoints(int chordwise, int spanwise, String prefix) {
    if (chordwise < 2 || spanwise < 2) {
      throw new IllegalArgumentException("a plate grid needs at least 2 x 2 points");
    }
    List<SplinePoint> pts = new ArrayList<>();
    for (int i = 0; i < chordwise; i++) {
      double xi = (double) i / (chordwise - 1);
      for (int j = 0; j < spanwise; j++) {
        double eta = (double) j / (spanwise - 1);
        pts.add(new SplinePoint(prefix + i + "_" + j, planform.xM(xi, eta), planform.yM(eta)));
      }
    }
    return pts;
  }

  /**
   * The lowest modes as a mode table at the given points, named {@code mode_1, mode_2, ...}:
   * displacement w (positive up) and streamwise pitch -dw/dx (positive nose up), scaled so that
   * the largest |w| over the points is +1 m, with the generalized mass for that scaling.
   *
   * @param name table name
   * @param modes how many modes, 1 to the Ritz term count
   * @param points stations on the planform (their x, y inside it)
   * @param dampingRatio viscous damping ratio of every mode, in [0, 1)
   * @return the mode table
   */
  public ModeTable modeTable(String name, int modes, List<SplinePoint> points, double dampingRatio) {
    if (modes < 1 || modes > frequenciesHz.length) {
      throw new IllegalArgumentException("mode count " + modes + " outside 1.." + frequenciesHz.length);
    }
    List<ElasticMode> list = new ArrayList<>();
    for (int mo = 0; mo < modes; mo++) {
      double[][] values = new double[points.size()][];
      double largest = 0;
      for (int p = 0; p < points.size(); p++) {
        values[p] = deflection(mo, points.get(p).xM(), points.get(p).yM());
        if (Math.abs(values[p][0]) > Math.abs(largest)) {
          largest = values[p][0];
        }
      }
      if (largest == 0) {
        throw new IllegalArgumentException("mode " + (mo + 1) + " vanishes at every given point");
      }
      Map<String, ShapeValue> shapes = new HashMap<>();
      for (int p = 0; p < points.size(); p++) {
        shapes.put(points.get(p).station(), new ShapeValue(values[p][0] / largest, -values[p][1] / largest));
      }
      list.add(new ElasticMode("mode_" + (mo + 1), frequenciesHz[mo], dampingRatio,
          1 / (largest * largest), shapes));
    }
    return new ModeTable(name, list);
  }
}
