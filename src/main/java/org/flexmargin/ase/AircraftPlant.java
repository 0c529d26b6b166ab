package org.flexmargin.ase;

import java.util.ArrayList;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.ControlSurfaceForces;
import org.flexmargin.aero.LagRealisation;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.structure.StructuralModel;

/**
 * The flexible aircraft's pitch axis at one flight condition, from elevator (achieved deflection,
 * rad, trailing edge down) to the sensor signals.
 *
 * <p>Equations (small perturbations about level flight, stability axes, speed constant; Etkin
 * &amp; Reid ch. 4 for the rigid part; gravity in the short period neglected, as usual):
 *
 * <pre>
 *  alpha' = q - (qd S / (m V)) (CL_a alpha + CL_d delta + sum_i CL_eta_i eta_i)
 *  q'     = (qd S c / I) (Cm_a alpha + Cm_q (c/2V) q + Cm_adot (c/2V) alpha' + Cm_d delta
 *                         + sum_i Cm_eta_i eta_i)
 *  M eta'' + C eta' + K eta = qd (Q(ik) eta + Q_alpha alpha + Q_q (c/2V) q + Q_delta delta)
 * </pre>
 *
 * <p>with qd the dynamic pressure, Q(ik) the elastic generalized aerodynamic forces of the
 * configuration's source (exact in {@link #frequencyEvaluator}, rational approximation in
 * {@link #stateSpace}), and the per-mode quasi-steady coupling coefficients of {@link ModeCoupling}
 * (supplied, computed from placed strips, or zero; {@link #assumptions()} says which). Sensors:
 *
 * <ul>
 *   <li>pitch-rate gyro: q + sum_i rot_i eta_i' (rad/s);
 *   <li>normal accelerometer: (V (q - alpha') - x q' + sum_i disp_i eta_i'') / g0 (g, up), x the
 *       lever arm aft of the centre of mass;
 *   <li>angle-of-attack vane: alpha + sum_i (rot_i eta_i - disp_i eta_i' / V) (rad);
 * </ul>
 *
 * <p>where rot_i and disp_i are mode i's rotation and displacement at the sensor station. Sensor
 * dynamics belong to the control law. Instances are immutable; the frequency evaluator is a
 * per-thread workspace.
 */
public final class AircraftPlant {

  /** Standard gravity g0 (m/s^2), used to express normal acceleration in g. */
  public static final double STANDARD_GRAVITY_MPS2 = 9.80665;

  private final FlightCondition condition;
  private final RigidBody rigid;
  private final AeroSource aero;
  private final int m;
  private final double[][] mass;
  private final double[][] damping;
  private final double[][] stiffness;
  private final double[] liftPerEta;
  private final double[] momentPerEta;
  private final double[] forcePerAlpha;
  private final double[] forcePerElevator;
  private final double[] forcePerPitchRate;
  private final List<SensorSpec> sensors;
  private final double[][] sensorRotation;
  private final double[][] sensorDisplacement;
  private final List<String> modeNames;
  private final List<String> assumptions;

  /**
   * @param modes the mode table (for shapes at the sensor stations and mode names)
   * @param structure structural matrices in the same modal coordinates
   * @param aero elastic generalized aerodynamic forces in the same coordinates
   * @param rigid rigid-body data and mode coupling
   * @param sensors sensors, stations in the mode table
   * @param condition flight condition
   */
  public AircraftPlant(ModeTable modes, StructuralModel structure, AeroSource aero, RigidBody rigid,
      List<SensorSpec> sensors, FlightCondition condition) {
    this.condition = condition;
    this.rigid = rigid;
    this.aero = aero;
    this.m = structure.size();
    this.mass = structure.massKg();
    this.damping = structure.dampingNsPerM();
    this.stiffness = structure.stiffnessNPerM();
    this.modeNames = modes.modeNames();
    this.liftPerEta = new double[m];
    this.momentPerEta = new double[m];
    this.forcePerAlpha = new double[m];
    this.forcePerElevator = new double[m];
    this.forcePerPitchRate = new double[m];
    List<String> supplied = new ArrayList<>();
    List<String> computed = new ArrayList<>();
    List<String> uncoupled = new ArrayList<>();
    for (int i = 0; i < m; i++) {
      String name = modeNames.get(i);
      ModeCoupling c = rigid.couplingOf(name);
      switch (c.origin()) {
        case SUPPLIED -> supplied.add(name);
        case STRIPS -> computed.add(name);
        default -> uncoupled.add(name);
      }
      liftPerEta[i] = c.liftCoefficientPerUnitCoordinate();
      momentPerEta[i] = c.pitchMomentCoefficientPerUnitCoordinate();
      forcePerAlpha[i] = c.generalizedForcePerAlphaM2();
      forcePerElevator[i] = c.generalizedForcePerElevatorM2();
      forcePerPitchRate[i] = c.generalizedForcePerPitchRateM2();
    }
    List<String> notes = new ArrayList<>();
    if (aero instanceof ControlSurfaceForces cs && cs.elevatorForcesM2PerRad().isPresent()) {
      System.arraycopy(cs.elevatorForcesM2PerRad().get(), 0, forcePerElevator, 0, m);
      notes.add("elevator generalized forces from the lifting surfaces' control surface \"" + cs.elevatorName()
          + "\" (steady), in place of the mode_coupling values");
    }
    this.sensors = List.copyOf(sensors);
    this.sensorRotation = new double[sensors.size()][m];
    this.sensorDisplacement = new double[sensors.size()][m];
    for (int s = 0; s < sensors.size(); s++) {
      for (int i = 0; i < m; i++) {
        ShapeValue v = modes.modes().get(i).shapes().get(sensors.get(s).station());
        sensorRotation[s][i] = v == null ? 0.0 : v.rotationRad();
        sensorDisplacement[s][i] = v == null ? 0.0 : v.displacementM();
      }
    }
    notes.add("short period at constant speed, gravity neglected; elastic modes coupled to it only through "
        + "quasi-steady coefficients");
    if (!supplied.isEmpty()) {
      notes.add("rigid-body and elevator coupling supplied for modes " + supplied);
    }
    if (!computed.isEmpty()) {
      notes.add("rigid-body and elevator coupling computed from the strips (quasi-steady) for modes " + computed);
    }
    if (!uncoupled.isEmpty()) {
      notes.add("no rigid-body or elevator coupling given for modes " + uncoupled + ": taken as zero");
    }
    this.assumptions = List.copyOf(notes);
  }

  /** @return the flight condition */
  public FlightCondition condition() {
    return condition;
  }

  /** @return number of elastic modes */
  public int modeCount() {
    return m;
  }

  /** @return the sensors, in output order */
  public List<SensorSpec> sensors() {
    return sensors;
  }

  /** @return modelling assumptions in words, for the results */
  public List<String> assumptions() {
    return assumptions;
  }

  private double liftFactor() {
    return condition.dynamicPressurePa() * rigid.referenceAreaM2() / (rigid.massKg() * condition.speedTasMps());
  }

  private double momentFactor() {
    return condition.dynamicPressurePa() * rigid.referenceAreaM2() * rigid.referenceChordM()
        / rigid.pitchInertiaKgM2();
  }

  private double rateFactor() {
    return rigid.referenceChordM() / (2 * condition.speedTasMps());
  }

  /**
   * Roots of the rigid short period alone (elastic coupling ignored): the two eigenvalues of the
   * alpha-q equations, as {re0, im0, re1, im1}.
   *
   * @return the roots (1/s, rad/s)
   */
  public double[] shortPeriodRoots() {
    double lf = liftFactor();
    double mf = momentFactor();
    double rf = rateFactor();
    double a11 = -lf * rigid.liftSlopePerRad();
    double mad = mf * rigid.alphaDotDampingCmAlphaDot() * rf;
    double a21 = mf * rigid.pitchMomentSlopePerRad() + mad * a11;
    double a22 = mf * rigid.pitchDampingCmq() * rf + mad;
    double tr = a11 + a22;
    double det = a11 * a22 - a21;
    double disc = tr * tr / 4 - det;
    if (disc >= 0) {
      double r = Math.sqrt(disc);
      return new double[] {tr / 2 + r, 0, tr / 2 - r, 0};
    }
    double im = Math.sqrt(-disc);
    return new double[] {tr / 2, im, tr / 2, -im};
  }

  /** @return a new frequency-response workspace (not thread-safe: one per thread) */
  public FrequencyEvaluator frequencyEvaluator() {
    return new FrequencyEvaluator();
  }

  /**
   * Exact frequency response from elevator to the sensors: at each frequency the (2 + m) complex
   * equations are solved with Q(ik), k = omega b / V, from the configuration's aerodynamic source.
   * The frequency-independent entries are assembled once; each frequency copies them, adds the
   * frequency-dependent ones and solves by complex Gaussian elimination with partial pivoting in a
   * reused workspace. A workspace: not thread-safe.
   */
  public final class FrequencyEvaluator {
    private final int n = 2 + m;
    private final ZMatrixRMaj q = new ZMatrixRMaj(m, m);
    private final ComplexSystemSolver solver = new ComplexSystemSolver(n);
    /** The frequency-independent part of the system matrix, re/im interleaved (mixed units). */
    private final double[] fixedMatrix = new double[2 * n * n];
    /** The right-hand side per unit elevator, re/im interleaved (mixed units). */
    private final double[] fixedRhs = new double[2 * n];
    /** Coefficient of omega in the imaginary part of the q row's alpha entry (s). */
    private final double alphaDotInPitchRow;

    private FrequencyEvaluator() {
      double qd = condition.dynamicPressurePa();
      double lf = liftFactor();
      double mf = momentFactor();
      double rf = rateFactor();
      // alpha row: (s + lf CLa) alpha - q + lf CLeta eta = -lf CLd delta
      setFixed(0, 0, lf * rigid.liftSlopePerRad());
      setFixed(0, 1, -1);
      for (int i = 0; i < m; i++) {
        setFixed(0, 2 + i, lf * liftPerEta[i]);
      }
      fixedRhs[0] = -lf * rigid.liftPerElevatorPerRad();
      // q row: -mf (Cma + Cmad rf s) alpha + (s - mf Cmq rf) q - mf Cmeta eta = mf Cmd delta
      setFixed(1, 0, -mf * rigid.pitchMomentSlopePerRad());
      alphaDotInPitchRow = -mf * rigid.alphaDotDampingCmAlphaDot() * rf;
      setFixed(1, 1, -mf * rigid.pitchDampingCmq() * rf);
      for (int i = 0; i < m; i++) {
        setFixed(1, 2 + i, -mf * momentPerEta[i]);
      }
      fixedRhs[2] = mf * rigid.pitchMomentPerElevatorPerRad();
      // elastic rows: -qd Qa alpha - qd Qq rf q + (-w^2 M + i w C + K - qd Q) eta = qd Qd delta
      for (int i = 0; i < m; i++) {
        setFixed(2 + i, 0, -qd * forcePerAlpha[i]);
        setFixed(2 + i, 1, -qd * forcePerPitchRate[i] * rf);
        for (int j = 0; j < m; j++) {
          setFixed(2 + i, 2 + j, stiffness[i][j]);
        }
        fixedRhs[2 * (2 + i)] = qd * forcePerElevator[i];
      }
    }

    private void setFixed(int row, int col, double real) {
      fixedMatrix[2 * (row * n + col)] = real;
    }

    /**
     * @param omegaRadPerS frequency (rad/s), &gt;= 0
     * @param out sensor responses per unit elevator, interleaved re/im, length 2 x sensors.
     *     Modified.
     */
    public void response(double omegaRadPerS, double[] out) {
      double w = omegaRadPerS;
      double qd = condition.dynamicPressurePa();
      double v = condition.speedTasMps();
      double k = w * aero.referenceSemichordM() / v;
      aero.forces(k, q);
      double[] sys = solver.matrix();
      double[] x = solver.rhs();
      System.arraycopy(fixedMatrix, 0, sys, 0, sys.length);
      System.arraycopy(fixedRhs, 0, x, 0, x.length);
      sys[1] = w;
      sys[2 * n + 1] = alphaDotInPitchRow * w;
      sys[2 * (n + 1) + 1] = w;
      double[] qData = q.data;
      double w2 = -w * w;
      for (int i = 0; i < m; i++) {
        double[] massRow = mass[i];
        double[] dampingRow = damping[i];
        int base = 2 * ((2 + i) * n + 2);
        int qBase = 2 * i * m;
        for (int j = 0; j < m; j++) {
          int e = base + 2 * j;
          sys[e] = sys[e] + w2 * massRow[j] - qd * qData[qBase + 2 * j];
          sys[e + 1] = w * dampingRow[j] - qd * qData[qBase + 2 * j + 1];
        }
      }
      if (!solver.solve()) {
        throw new ArithmeticException("aircraft frequency response: singular system at " + w + " rad/s");
      }
      double ar = x[0];
      double ai = x[1];
      double qr = x[2];
      double qi = x[3];
      for (int s = 0; s < sensors.size(); s++) {
        SensorSpec sensor = sensors.get(s);
        double yr;
        double yi;
        switch (sensor.kind()) {
          case PITCH_RATE_GYRO -> {
            // q + sum rot (i w) eta
            yr = qr;
            yi = qi;
            for (int i = 0; i < m; i++) {
              yr += -w * sensorRotation[s][i] * x[2 * (2 + i) + 1];
              yi += w * sensorRotation[s][i] * x[2 * (2 + i)];
            }
          }
          case NORMAL_ACCELEROMETER -> {
            // (V (q - i w alpha) - x i w q - w^2 sum disp eta) / g0
            double lever = sensor.leverArmM();
            yr = v * (qr + w * ai) + lever * w * qi;
            yi = v * (qi - w * ar) - lever * w * qr;
            for (int i = 0; i < m; i++) {
              yr += -w * w * sensorDisplacement[s][i] * x[2 * (2 + i)];
              yi += -w * w * sensorDisplacement[s][i] * x[2 * (2 + i) + 1];
            }
            yr /= STANDARD_GRAVITY_MPS2;
            yi /= STANDARD_GRAVITY_MPS2;
          }
          case ANGLE_OF_ATTACK_VANE -> {
            // alpha + sum (rot - disp i w / V) eta
            yr = ar;
            yi = ai;
            for (int i = 0; i < m; i++) {
              double er = x[2 * (2 + i)];
              double ei = x[2 * (2 + i) + 1];
              double cr = sensorRotation[s][i];
              double ci = -sensorDisplacement[s][i] * w / v;
              yr += cr * er - ci * ei;
              yi += cr * ei + ci * er;
            }
          }
          default -> throw new IllegalStateException("unknown sensor kind " + sensor.kind());
        }
        out[2 * s] = yr;
        out[2 * s + 1] = yi;
      }
    }
  }

  /**
   * State-space model with the elastic aerodynamics in rational form. States: alpha (rad), q
   * (rad/s), eta (m modal), eta' , then the lag states of the aerodynamics' {@link
   * RationalAerodynamics#lagRealisation() realisation}, z<sub>l</sub>' = E<sub>l</sub> eta' - (V/b)
   * beta<sub>l</sub> z<sub>l</sub> (m per lag root in Roger's form, named mode_lagL; one per lag
   * root in the minimum-state form, named aero_lagL): 2 + 2 m + n<sub>lag states</sub> in all.
   * Input: elevator (rad). Outputs: the sensors in order.
   *
   * @param rational rational approximation of this configuration's elastic forces
   * @return the aircraft state space
   */
  public StateSpace stateSpace(RationalAerodynamics rational) {
    if (rational.size() != m) {
      throw new IllegalArgumentException("rational aerodynamics has " + rational.size() + " coordinates, plant " + m);
    }
    LagRealisation lags = rational.lagRealisation();
    if (lags.size() != m) {
      throw new IllegalArgumentException("lag realisation has " + lags.size() + " coordinates, plant " + m);
    }
    int n = 2 + 2 * m + lags.stateCount();
    DMatrixRMaj a = new DMatrixRMaj(n, n);
    DMatrixRMaj bIn = new DMatrixRMaj(n, 1);
    setRigidRows(a, bIn);
    setElasticAndLagRows(a, bIn, rational, lags);
    DMatrixRMaj c = new DMatrixRMaj(sensors.size(), n);
    DMatrixRMaj d = new DMatrixRMaj(sensors.size(), 1);
    setSensorRows(a, bIn, c, d);
    List<String> outputs = sensors.stream().map(SensorSpec::name).toList();
    return new StateSpace(a, bIn, c, d, List.of("elevator"), outputs, stateNames(lags));
  }

  /** The rows of alpha' and q' (states 0 and 1) of the state-space model and their elevator input. */
  private void setRigidRows(DMatrixRMaj a, DMatrixRMaj bIn) {
    int n = a.numCols;
    double lf = liftFactor();
    double mf = momentFactor();
    double rf = rateFactor();
    // alpha'
    a.set(0, 0, -lf * rigid.liftSlopePerRad());
    a.set(0, 1, 1);
    for (int i = 0; i < m; i++) {
      a.set(0, 2 + i, -lf * liftPerEta[i]);
    }
    bIn.set(0, 0, -lf * rigid.liftPerElevatorPerRad());
    // q' = mf (Cma alpha + Cmq rf q + Cmd delta + Cmeta eta) + mf Cmad rf alpha'
    double cad = mf * rigid.alphaDotDampingCmAlphaDot() * rf;
    for (int j = 0; j < n; j++) {
      a.set(1, j, cad * a.get(0, j));
    }
    a.add(1, 0, mf * rigid.pitchMomentSlopePerRad());
    a.add(1, 1, mf * rigid.pitchDampingCmq() * rf);
    for (int i = 0; i < m; i++) {
      a.add(1, 2 + i, mf * momentPerEta[i]);
    }
    bIn.set(1, 0, cad * bIn.get(0, 0) + mf * rigid.pitchMomentPerElevatorPerRad());
  }

  /**
   * The rows of the elastic coordinates, their rates and the aerodynamic lag states, and their
   * elevator input (they do not depend on the rigid rows).
   */
  private void setElasticAndLagRows(DMatrixRMaj a, DMatrixRMaj bIn, RationalAerodynamics rational,
      LagRealisation lags) {
    int n = a.numCols;
    double qd = condition.dynamicPressurePa();
    double v = condition.speedTasMps();
    double b = rational.referenceSemichordM();
    double rf = rateFactor();
    // elastic: Mbar eta'' = -Cbar eta' - Kbar eta + qd sum D_l z_l + qd Qa alpha + qd Qq rf q + qd Qd delta
    DMatrixRMaj a0 = rational.coefficient(0);
    DMatrixRMaj a1 = rational.coefficient(1);
    DMatrixRMaj a2 = rational.coefficient(2);
    DMatrixRMaj mbar = new DMatrixRMaj(m, m);
    DMatrixRMaj rhs = new DMatrixRMaj(m, n);
    DMatrixRMaj rhsB = new DMatrixRMaj(m, 1);
    double bv = b / v;
    for (int i = 0; i < m; i++) {
      for (int j = 0; j < m; j++) {
        mbar.set(i, j, mass[i][j] - qd * bv * bv * a2.get(i, j));
        rhs.set(i, 2 + j, -(stiffness[i][j] - qd * a0.get(i, j)));
        rhs.set(i, 2 + m + j, -(damping[i][j] - qd * bv * a1.get(i, j)));
      }
      rhs.set(i, 0, qd * forcePerAlpha[i]);
      rhs.set(i, 1, qd * forcePerPitchRate[i] * rf);
      rhsB.set(i, 0, qd * forcePerElevator[i]);
    }
    lags.setForceColumns(rhs, 0, 2 + 2 * m, qd);
    DMatrixRMaj etaDd = new DMatrixRMaj(m, n);
    DMatrixRMaj etaDdB = new DMatrixRMaj(m, 1);
    if (!CommonOps_DDRM.solve(mbar, rhs, etaDd) || !CommonOps_DDRM.solve(mbar, rhsB, etaDdB)) {
      throw new ArithmeticException("apparent mass matrix M - q (b/V)^2 A2 is singular");
    }
    for (int i = 0; i < m; i++) {
      a.set(2 + i, 2 + m + i, 1);
      for (int j = 0; j < n; j++) {
        a.set(2 + m + i, j, etaDd.get(i, j));
      }
      bIn.set(2 + m + i, 0, etaDdB.get(i, 0));
    }
    // lag states: z_l' = E_l eta' - (V/b) beta_l z_l
    lags.setLagRows(a, 2 + 2 * m, 2 + m, beta -> -beta / bv);
  }

  /** The sensor rows C, D of the state-space model from its complete A and B. */
  private void setSensorRows(DMatrixRMaj a, DMatrixRMaj bIn, DMatrixRMaj c, DMatrixRMaj d) {
    int n = a.numCols;
    double v = condition.speedTasMps();
    int ns = sensors.size();
    for (int s = 0; s < ns; s++) {
      SensorSpec sensor = sensors.get(s);
      if (sensor.kind() == SensorKind.PITCH_RATE_GYRO) {
        c.set(s, 1, 1);
        for (int i = 0; i < m; i++) {
          c.add(s, 2 + m + i, sensorRotation[s][i]);
        }
      } else if (sensor.kind() == SensorKind.NORMAL_ACCELEROMETER) {
        double g = STANDARD_GRAVITY_MPS2;
        double lever = sensor.leverArmM();
        // (V (q - alpha') - x q' + sum disp eta'') / g0
        c.add(s, 1, v / g);
        for (int j = 0; j < n; j++) {
          double val = -v * a.get(0, j) - lever * a.get(1, j);
          for (int i = 0; i < m; i++) {
            val += sensorDisplacement[s][i] * a.get(2 + m + i, j);
          }
          c.add(s, j, val / g);
        }
        double dv = -v * bIn.get(0, 0) - lever * bIn.get(1, 0);
        for (int i = 0; i < m; i++) {
          dv += sensorDisplacement[s][i] * bIn.get(2 + m + i, 0);
        }
        d.set(s, 0, dv / g);
      } else {
        c.set(s, 0, 1);
        for (int i = 0; i < m; i++) {
          c.add(s, 2 + i, sensorRotation[s][i]);
          c.add(s, 2 + m + i, -sensorDisplacement[s][i] / v);
        }
      }
    }
  }

  /** @return the names of the state-space model's states, in order */
  private List<String> stateNames(LagRealisation lags) {
    List<String> states = new ArrayList<>();
    states.add("alpha");
    states.add("q");
    for (String name : modeNames) {
      states.add(name);
    }
    for (String name : modeNames) {
      states.add(name + "_rate");
    }
    boolean perMode = lags.perCoordinate();
    for (int l = 0; l < lags.lagCount(); l++) {
      for (int k = 0; k < lags.states(l); k++) {
        states.add(perMode ? modeNames.get(k) + "_lag" + (l + 1)
            : "aero_lag" + (l + 1) + (lags.states(l) > 1 ? "_" + (k + 1) : ""));
      }
    }
    return states;
  }
}
