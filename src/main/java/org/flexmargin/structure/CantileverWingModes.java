package org.flexmargin.structure;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.UniformCantileverWing;

/**
 * Normal modes of a {@link UniformCantileverWing} by the Rayleigh-Ritz method (the classical
 * treatment of Goland, "The Flutter of a Uniform Cantilever Wing", J. Appl. Mech. 12(4), 1945,
 * and Bisplinghoff, Ashley &amp; Halfman, <i>Aeroelasticity</i>, 1955).
 *
 * <p><b>Kinematics.</b> The spanwise coordinate y runs from the clamped root (y = 0) to the tip
 * (y = L). The elastic axis deflects w(y), positive up, and the section twists theta(y), positive
 * nose up. A section point at distance x aft of the elastic axis (x &gt; 0 towards the trailing
 * edge) then moves up by {@code w - x theta}: a nose-up rotation lowers the points behind the
 * axis. Ritz expansion: {@code w = sum_i q_i phi_i(y)} with the clamped-free beam modes phi_i
 * ({@link ClampedFreeBeamFunctions}) and {@code theta = sum_j p_j psi_j(y)},
 * {@code psi_j = sin((2j - 1) pi y / (2L))}, the clamped-free torsion modes.
 *
 * <p><b>Energies.</b> With m the mass per length, x_cg = (massAxis - elasticAxis) c the centre of
 * mass aft of the elastic axis and I_EA the pitch inertia per length about the elastic axis,
 * the kinetic energy per length is {@code 1/2 (m w'^2 - 2 m x_cg w' theta' + I_EA theta'^2)}
 * (dots omitted: time derivatives), since the integral of x^2 dm is I_EA and of x dm is m x_cg.
 * Hence the Ritz mass matrix
 *
 * <pre>
 *   M = [ m int(phi_i phi_j)          -m x_cg int(phi_i psi_j) ]
 *       [ -m x_cg int(psi_i phi_j)     I_EA int(psi_i psi_j)    ]
 * </pre>
 *
 * and from the strain energy {@code 1/2 int(EI w''^2 + GJ theta'^2)} the stiffness
 * {@code K = diag-blocks [EI int(phi_i'' phi_j''), GJ int(psi_i' psi_j')]}. The integrals are
 * evaluated by composite Gauss-Legendre quadrature (Commons Math, 16 nodes on each of
 * {@code 2 max(nb, nt) + 4} equal panels, so each panel holds at most about one half-wave of the
 * product of two functions; the quadrature error is then far below 1e-12 relative).
 *
 * <p><b>Normal modes.</b> {@code K v = omega^2 M v} is solved as a symmetric-definite problem
 * (Cholesky reduction, EJML) and the modes are ordered by frequency. Each mode is then scaled so
 * that the largest of |w| and (c/2)|theta| over 201 equally spaced stations from root to tip
 * (both included) equals 1 m, with that largest value positive; the generalized mass
 * {@code v^T M v} (kg) is reported with that scaling. The Rayleigh-Ritz frequencies are upper
 * bounds that decrease as functions are added; when the centre of mass lies on the elastic axis
 * the Ritz functions are the exact uncoupled modes and the frequencies are exact. All
 * {@code bendingModes + torsionModes} normal modes are returned; the highest are the least
 * converged, so use more functions than the modes the analysis needs.
 */
public final class CantileverWingModes {
  /** Gauss-Legendre nodes per quadrature panel. */
  private static final int NODES_PER_PANEL = 16;
  /** Stations (root to tip inclusive) sampled for the amplitude normalisation. */
  private static final int NORMALISATION_STATIONS = 201;

  private final UniformCantileverWing wing;
  private final ClampedFreeBeamFunctions bending;
  private final int nb;
  private final int nt;
  private final StructuralModel ritzModel;
  private final double[] omegaRadPerS;
  private final double[] generalizedMassKg;
  /** vectors[mode][ritz coordinate], scaled as in the class Javadoc. */
  private final double[][] vectors;

  private CantileverWingModes(UniformCantileverWing wing) {
    this.wing = wing;
    this.nb = wing.bendingModes();
    this.nt = wing.torsionModes();
    double length = wing.semiSpanM();
    this.bending = new ClampedFreeBeamFunctions(length, nb);
    this.ritzModel = assemble();
    int n = nb + nt;
    GeneralizedSymmetricEigen.Solution sol =
        GeneralizedSymmetricEigen.solve(ritzModel.stiffnessMatrix(), ritzModel.massMatrix());
    omegaRadPerS = new double[n];
    generalizedMassKg = new double[n];
    vectors = new double[n][n];
    double semichord = 0.5 * wing.chordM();
    for (int mode = 0; mode < n; mode++) {
      double lambda = sol.eigenvalues()[mode];
      if (!(lambda > 0)) {
        throw new IllegalStateException("non-positive eigenvalue " + lambda + " of the wing model");
      }
      omegaRadPerS[mode] = Math.sqrt(lambda);
      double[] v = new double[n];
      for (int r = 0; r < n; r++) {
        v[r] = sol.vectors().get(r, mode);
      }
      // amplitude normalisation
      double largest = 0;
      for (int s = 0; s < NORMALISATION_STATIONS; s++) {
        double y = length * s / (NORMALISATION_STATIONS - 1);
        double w = displacement(v, y);
        double t = semichord * rotation(v, y);
        if (Math.abs(w) > Math.abs(largest)) {
          largest = w;
        }
        if (Math.abs(t) > Math.abs(largest)) {
          largest = t;
        }
      }
      double scale = 1.0 / largest;
      for (int r = 0; r < n; r++) {
        v[r] *= scale;
      }
      vectors[mode] = v;
      // v was mass-normalised (v^T M v = 1) before scaling
      generalizedMassKg[mode] = scale * scale;
    }
  }

  /**
   * Builds the Ritz model of a wing and solves for its normal modes.
   *
   * @param wing the wing, not null
   * @return the normal modes
   */
  public static CantileverWingModes solve(UniformCantileverWing wing) {
    if (wing == null) {
      throw new InvalidInputException("structure", "a uniform cantilever wing", "nothing");
    }
    return new CantileverWingModes(wing);
  }

  /** @return the wing these modes belong to */
  public UniformCantileverWing wing() {
    return wing;
  }

  /** @return number of normal modes (bending plus torsion Ritz functions) */
  public int count() {
    return omegaRadPerS.length;
  }

  /**
   * @param mode mode index from 0, in ascending frequency
   * @return natural circular frequency (rad/s)
   */
  public double omegaRadPerS(int mode) {
    return omegaRadPerS[mode];
  }

  /**
   * @param mode mode index from 0
   * @return generalized mass with the amplitude normalisation of the class Javadoc (kg)
   */
  public double generalizedMassKg(int mode) {
    return generalizedMassKg[mode];
  }

  /**
   * @param mode mode index from 0
   * @param yM span station from the root, in [0, L] (m)
   * @return elastic-axis displacement w, positive up (m per unit modal coordinate)
   */
  public double displacementM(int mode, double yM) {
    return displacement(vectors[mode], yM);
  }

  /**
   * @param mode mode index from 0
   * @param yM span station from the root, in [0, L] (m)
   * @return twist theta, positive nose up (rad per unit modal coordinate)
   */
  public double rotationRad(int mode, double yM) {
    return rotation(vectors[mode], yM);
  }

  /**
   * @param mode mode index from 0
   * @param yM span station from the root, in [0, L] (m)
   * @return bending curvature w'' (1/m per unit modal coordinate)
   */
  public double curvaturePerM(int mode, double yM) {
    double sum = 0;
    for (int i = 0; i < nb; i++) {
      sum += vectors[mode][i] * bending.curvature(i, yM);
    }
    return sum;
  }

  /**
   * @param mode mode index from 0
   * @param yM span station from the root, in [0, L] (m)
   * @return twist rate theta' (rad/m per unit modal coordinate)
   */
  public double twistRatePerM(int mode, double yM) {
    double sum = 0;
    for (int j = 0; j < nt; j++) {
      double g = torsionWaveNumber(j);
      sum += vectors[mode][nb + j] * g * Math.cos(g * yM);
    }
    return sum;
  }

  /**
   * The Ritz model before modal reduction: coordinates {@code bending_1..} (amplitudes of the
   * clamped-free beam functions, m) and {@code torsion_1..} (amplitudes of the sine twist
   * functions, rad); no damping (damping is assigned per normal mode).
   *
   * @return the Ritz mass and stiffness matrices
   */
  public StructuralModel ritzModel() {
    return ritzModel;
  }

  /**
   * @param mode mode index from 0
   * @return the mode's Ritz coordinates (copy), scaled as in the class Javadoc
   */
  public double[] ritzVector(int mode) {
    return vectors[mode].clone();
  }

  /**
   * Station name of strip {@code index} (from 0): {@code strip_} and the 1-based number,
   * zero-padded to the width of the strip count but at least two digits.
   *
   * @param index strip index from 0 (root strip first)
   * @return the station name, e.g. {@code strip_01}
   */
  public String stationName(int index) {
    int strips = wing.strips();
    int width = Math.max(2, String.valueOf(strips).length());
    return String.format("strip_%0" + width + "d", index + 1);
  }

  /**
   * @param index strip index from 0 (root strip first)
   * @return the spanwise position of the strip midpoint (m from the root)
   */
  public double stationSpanM(int index) {
    return (index + 0.5) * wing.semiSpanM() / wing.strips();
  }

  /**
   * The normal modes as a mode table named {@code uniform_cantilever_wing}: modes
   * {@code mode_1, mode_2, ...} in ascending frequency, damping ratio of the wing, shapes at the
   * strip midpoints ({@link #stationName}) as (w, theta).
   *
   * @return the mode table
   */
  public ModeTable modeTable() {
    List<ElasticMode> modes = new ArrayList<>();
    for (int mode = 0; mode < count(); mode++) {
      Map<String, ShapeValue> shapes = new LinkedHashMap<>();
      for (int s = 0; s < wing.strips(); s++) {
        double y = stationSpanM(s);
        shapes.put(stationName(s), new ShapeValue(displacementM(mode, y), rotationRad(mode, y)));
      }
      modes.add(
          new ElasticMode(
              "mode_" + (mode + 1),
              omegaRadPerS[mode] / (2 * Math.PI),
              wing.dampingRatio(),
              generalizedMassKg[mode],
              shapes));
    }
    return new ModeTable("uniform_cantilever_wing", modes);
  }

  /**
   * Strip theory on {@code strips} equal strips: width L/strips, semichord c/2, elastic axis
   * {@code a = 2 elasticAxisChordFraction - 1} semichords aft of mid-chord, the wing's lift slope;
   * reference semichord c/2.
   *
   * @return the strip-theory specification
   * @throws InvalidInputException if the elastic axis lies at the leading or trailing edge
   */
  public StripTheorySpec stripTheory() {
    double a = 2 * wing.elasticAxisChordFraction() - 1;
    if (Math.abs(a) > 0.999) {
      throw new InvalidInputException(
          "elastic_axis_chord_fraction",
          "a value in [0.0005, 0.9995] for strip theory",
          String.valueOf(wing.elasticAxisChordFraction()));
    }
    double semichord = 0.5 * wing.chordM();
    double width = wing.semiSpanM() / wing.strips();
    List<Strip> strips = new ArrayList<>();
    for (int s = 0; s < wing.strips(); s++) {
      strips.add(new Strip(stationName(s), width, semichord, a, wing.liftSlopePerRad()));
    }
    return new StripTheorySpec(semichord, strips);
  }

  private double torsionWaveNumber(int j) {
    return (2 * j + 1) * Math.PI / (2 * wing.semiSpanM());
  }

  private double displacement(double[] v, double y) {
    double sum = 0;
    for (int i = 0; i < nb; i++) {
      sum += v[i] * bending.value(i, y);
    }
    return sum;
  }

  private double rotation(double[] v, double y) {
    double sum = 0;
    for (int j = 0; j < nt; j++) {
      sum += v[nb + j] * Math.sin(torsionWaveNumber(j) * y);
    }
    return sum;
  }

  private StructuralModel assemble() {
    double length = wing.semiSpanM();
    int panels = 2 * Math.max(nb, nt) + 4;
    int q = panels * NODES_PER_PANEL;
    double[] weight = new double[q];
    double[][] phi = new double[nb][q];
    double[][] phi2 = new double[nb][q];
    double[][] psi = new double[nt][q];
    double[][] psi1 = new double[nt][q];
    GaussIntegratorFactory factory = new GaussIntegratorFactory();
    int k = 0;
    for (int p = 0; p < panels; p++) {
      GaussIntegrator rule =
          factory.legendreHighPrecision(
              NODES_PER_PANEL, length * p / panels, length * (p + 1) / panels);
      for (int g = 0; g < NODES_PER_PANEL; g++, k++) {
        double y = rule.getPoint(g);
        weight[k] = rule.getWeight(g);
        for (int i = 0; i < nb; i++) {
          phi[i][k] = bending.value(i, y);
          phi2[i][k] = bending.curvature(i, y);
        }
        for (int j = 0; j < nt; j++) {
          double gj = torsionWaveNumber(j);
          psi[j][k] = Math.sin(gj * y);
          psi1[j][k] = gj * Math.cos(gj * y);
        }
      }
    }
    int n = nb + nt;
    double m = wing.massPerLengthKgPerM();
    double xcg = (wing.massAxisChordFraction() - wing.elasticAxisChordFraction()) * wing.chordM();
    double iea = wing.pitchInertiaAboutElasticAxisKgM();
    double ei = wing.bendingStiffnessNm2();
    double gjStiff = wing.torsionStiffnessNm2();
    double[][] mass = new double[n][n];
    double[][] stiff = new double[n][n];
    for (int i = 0; i < nb; i++) {
      for (int j = i; j < nb; j++) {
        mass[i][j] = m * integrate(weight, phi[i], phi[j]);
        mass[j][i] = mass[i][j];
        stiff[i][j] = ei * integrate(weight, phi2[i], phi2[j]);
        stiff[j][i] = stiff[i][j];
      }
      for (int j = 0; j < nt; j++) {
        double c = -m * xcg * integrate(weight, phi[i], psi[j]);
        mass[i][nb + j] = c;
        mass[nb + j][i] = c;
      }
    }
    for (int i = 0; i < nt; i++) {
      for (int j = i; j < nt; j++) {
        mass[nb + i][nb + j] = iea * integrate(weight, psi[i], psi[j]);
        mass[nb + j][nb + i] = mass[nb + i][nb + j];
        stiff[nb + i][nb + j] = gjStiff * integrate(weight, psi1[i], psi1[j]);
        stiff[nb + j][nb + i] = stiff[nb + i][nb + j];
      }
    }
    List<String> names = new ArrayList<>();
    for (int i = 0; i < nb; i++) {
      names.add("bending_" + (i + 1));
    }
    for (int j = 0; j < nt; j++) {
      names.add("torsion_" + (j + 1));
    }
    return new StructuralModel(names, mass, new double[n][n], stiff);
  }

  private static double integrate(double[] weight, double[] f, double[] g) {
    double sum = 0;
    for (int k = 0; k < weight.length; k++) {
      sum += weight[k] * f[k] * g[k];
    }
    return sum;
  }
}
