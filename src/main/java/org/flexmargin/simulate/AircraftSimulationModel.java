package org.flexmargin.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.flexmargin.ase.AircraftPlant;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.loop.FirstOrderLag;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.SecondOrderActuator;
import org.flexmargin.loop.SeriesBlock;
import org.flexmargin.loop.StateSpace;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;

/**
 * The flexible aircraft and its pitch loop at one flight condition as one linear state space for
 * simulation, with the actuator kept apart so that its rate and position limits can be added.
 *
 * <p>States, in order: the aircraft of {@link AircraftPlant#stateSpace} (alpha, q, modal
 * coordinates and rates, aerodynamic lag states: one per mode and lag root in Roger's form, one
 * per lag root in the minimum-state form), the control law's paths, the hold and delay
 * ahead of the actuator (Padé, as in the sweep's closed-loop eigenvalues), and the actuator
 * (position, then rate for a second-order actuator). The actuator is realised here explicitly:
 * first order delta' = wa (u - delta); second order delta'' = wn^2 (u - delta) - 2 zeta wn
 * delta'.
 *
 * <p>Inputs: {@code pilot_command_rad} (added to the law's output at the elevator command, before
 * the hold), {@code gust_velocity_mps} (vertical gust at the wing, positive up, an angle-of-attack
 * change w_g / V: its forces are those of alpha in the quasi-steady coupling coefficients).
 * Without {@link GustPenetration} the whole aircraft meets the gust at once; with it, the
 * tailplane's share of those forces sees the gust delayed by d / V (Padé states after the
 * actuator's, output {@link #TAIL_GUST}).
 *
 * <p>Lift growth ({@link LiftGrowth}): quasi-steady by default. With {@link LiftGrowth#UNSTEADY}
 * every force the model takes per unit angle of attack (the alpha column of the aircraft: lift,
 * pitching moment, modal forces per alpha) acts on Wagner's effective angle of the angle of
 * attack, and every gust force on Küssner's effective angle of w/V (wing and tail each with its
 * own filter, {@link IndicialLift}); two states per filter follow the delay's. The elastic forces
 * Q(ik) eta keep their rational fit. An angle-of-attack vane reads the geometric angles.
 *
 * <p>Outputs: every sensor, alpha, rigid pitch rate, each modal coordinate, the elevator
 * position, rate and command (actuator input), the law's output, and both inputs. Immutable.
 */
public final class AircraftSimulationModel {
  /** Name of the pilot input. */
  public static final String PILOT_INPUT = "pilot_command_rad";
  /** Name of the gust input. */
  public static final String GUST_INPUT = "gust_velocity_mps";
  /** Output: achieved elevator (rad, trailing edge down). */
  public static final String ELEVATOR = "elevator_rad";
  /** Output: elevator rate (rad/s). */
  public static final String ELEVATOR_RATE = "elevator_rate_rad_per_s";
  /** Output: actuator input after the hold and the delay (rad). */
  public static final String ELEVATOR_COMMAND = "elevator_command_rad";
  /** Output: the control law's output (rad). */
  public static final String LAW_OUTPUT = "law_output_rad";
  /** Output: rigid-body pitch rate (rad/s). */
  public static final String PITCH_RATE = "rigid_pitch_rate_rad_per_s";
  /** Output: angle of attack (rad). */
  public static final String ALPHA = "rigid_alpha_rad";
  /** Output: gust velocity at the tailplane (m/s), with gust penetration only. */
  public static final String TAIL_GUST = "tail_gust_velocity_mps";

  private final StateSpace system;
  private final DMatrixRMaj noiseB;
  private final DMatrixRMaj noiseD;
  private final int actuatorPosition;
  private final int actuatorRate;
  private final double actuatorOmega;
  private final double actuatorDamping;
  private final int commandOutput;
  private final List<String> modeNames;
  private final List<String> sensorNames;
  private final double speedTasMps;

  private AircraftSimulationModel(StateSpace system, DMatrixRMaj noiseB, DMatrixRMaj noiseD, int actuatorPosition,
      int actuatorRate, double actuatorOmega, double actuatorDamping, int commandOutput, List<String> modeNames,
      List<String> sensorNames, double speedTasMps) {
    this.system = system;
    this.noiseB = noiseB;
    this.noiseD = noiseD;
    this.speedTasMps = speedTasMps;
    this.actuatorPosition = actuatorPosition;
    this.actuatorRate = actuatorRate;
    this.actuatorOmega = actuatorOmega;
    this.actuatorDamping = actuatorDamping;
    this.commandOutput = commandOutput;
    this.modeNames = List.copyOf(modeNames);
    this.sensorNames = List.copyOf(sensorNames);
  }

  /** @return the linear system (inputs pilot and gust; outputs as described above) */
  public StateSpace system() {
    return system;
  }

  /** @return true airspeed of the flight condition (m/s) */
  public double speedTasMps() {
    return speedTasMps;
  }

  /** @return index of the actuator position state */
  public int actuatorPositionState() {
    return actuatorPosition;
  }

  /** @return index of the actuator rate state, or -1 for a first-order actuator */
  public int actuatorRateState() {
    return actuatorRate;
  }

  /** @return actuator bandwidth wa or natural frequency wn (rad/s) */
  public double actuatorOmegaRadPerS() {
    return actuatorOmega;
  }

  /** @return damping ratio of a second-order actuator (0 for first order) */
  public double actuatorDampingRatio() {
    return actuatorDamping;
  }

  /** @return index of the output {@link #ELEVATOR_COMMAND} */
  public int commandOutput() {
    return commandOutput;
  }

  /** @return names of the elastic modes, in the order of their outputs */
  public List<String> modeNames() {
    return modeNames;
  }

  /**
   * The model flying through continuous turbulence: the shaping filter feeds the gust input.
   * Inputs: {@link #PILOT_INPUT} and {@code white_noise} (unit intensity); states: the model's,
   * then the filter's; outputs as the model's (the gust output is the filter's output).
   *
   * @param turbulence the turbulence
   * @return the augmented system
   */
  public StateSpace withTurbulence(Turbulence turbulence) {
    return withRandomInputs(turbulence, null);
  }

  /**
   * The model driven by continuous turbulence and/or sensor noise: each source is unit-intensity
   * white noise through its shaping filter, the sources independent. Inputs: {@link #PILOT_INPUT},
   * then {@code white_noise} (turbulence, if any), then {@code noise_SENSOR} per noisy sensor;
   * states: the model's, the turbulence filter's, one per noisy sensor. The sensor outputs are the
   * measured signals (noise included), as the law reads them.
   *
   * @param turbulence the turbulence, or null
   * @param noise sensor noise, or null
   * @return the augmented system
   * @throws IllegalArgumentException if the noise names a sensor the model does not have
   */
  public StateSpace withRandomInputs(Turbulence turbulence, SensorNoise noise) {
    List<StateSpace> filters = new ArrayList<>();
    List<DMatrixRMaj> intoB = new ArrayList<>();
    List<DMatrixRMaj> intoD = new ArrayList<>();
    List<String> inputs = new ArrayList<>(List.of(PILOT_INPUT));
    List<String> states = new ArrayList<>(system.stateNames());
    int n = system.stateCount();
    int p = system.outputCount();
    if (turbulence != null) {
      filters.add(turbulence.shapingFilter(speedTasMps));
      intoB.add(CommonOps_DDRM.extract(system.b(), 0, n, 1, 2));
      intoD.add(CommonOps_DDRM.extract(system.d(), 0, p, 1, 2));
      inputs.add("white_noise");
      for (int i = 0; i < filters.get(0).stateCount(); i++) {
        states.add("turbulence_x" + (i + 1));
      }
    }
    if (noise != null) {
      for (Map.Entry<String, Double> e : noise.rmsBySensor().entrySet()) {
        int s = sensorNames.indexOf(e.getKey());
        if (s < 0) {
          throw new IllegalArgumentException("sensor noise names " + e.getKey() + "; the sensors are " + sensorNames);
        }
        filters.add(noise.filter(e.getValue()));
        intoB.add(CommonOps_DDRM.extract(noiseB, 0, n, s, s + 1));
        intoD.add(CommonOps_DDRM.extract(noiseD, 0, p, s, s + 1));
        inputs.add("noise_" + e.getKey());
        states.add("noise_" + e.getKey());
      }
    }
    int total = n;
    for (StateSpace f : filters) {
      total += f.stateCount();
    }
    DMatrixRMaj a = new DMatrixRMaj(total, total);
    DMatrixRMaj b = new DMatrixRMaj(total, inputs.size());
    DMatrixRMaj c = new DMatrixRMaj(p, total);
    DMatrixRMaj d = new DMatrixRMaj(p, inputs.size());
    CommonOps_DDRM.insert(system.a(), a, 0, 0);
    CommonOps_DDRM.insert(CommonOps_DDRM.extract(system.b(), 0, n, 0, 1), b, 0, 0);
    CommonOps_DDRM.insert(system.c(), c, 0, 0);
    CommonOps_DDRM.insert(CommonOps_DDRM.extract(system.d(), 0, p, 0, 1), d, 0, 0);
    int off = n;
    for (int k = 0; k < filters.size(); k++) {
      StateSpace f = filters.get(k);
      int nf = f.stateCount();
      DMatrixRMaj bc = new DMatrixRMaj(n, nf);
      CommonOps_DDRM.mult(intoB.get(k), f.c(), bc);
      CommonOps_DDRM.insert(bc, a, 0, off);
      CommonOps_DDRM.insert(f.a(), a, off, off);
      CommonOps_DDRM.insert(f.b(), b, off, 1 + k);
      DMatrixRMaj dc = new DMatrixRMaj(p, nf);
      CommonOps_DDRM.mult(intoD.get(k), f.c(), dc);
      CommonOps_DDRM.insert(dc, c, 0, off);
      off += nf;
    }
    return new StateSpace(a, b, c, d, inputs, system.outputNames(), states);
  }

  /** @return the model with its actuator marked for rate and position limits */
  public LimitedActuatorSystem limited() {
    return new LimitedActuatorSystem(system, actuatorPosition, actuatorRate, actuatorOmega, actuatorDamping,
        commandOutput, system.outputNames().indexOf(ELEVATOR_RATE));
  }

  /** @return output name of a modal coordinate (unit: that of the mode table's normalisation) */
  public static String modalOutput(String mode) {
    return mode + "_modal_coordinate";
  }

  /** @return output name of a sensor, with its unit: {@code sensor_NAME_UNIT} */
  public static String sensorOutput(SensorSpec s) {
    return switch (s.kind()) {
      case PITCH_RATE_GYRO -> "sensor_" + s.name() + "_rad_per_s";
      case NORMAL_ACCELEROMETER -> "sensor_" + s.name() + "_g";
      case ANGLE_OF_ATTACK_VANE -> "sensor_" + s.name() + "_rad";
    };
  }

  /**
   * Assembles the model.
   *
   * @param servo the loop at the flight condition (plant and law)
   * @param rational the elastic aerodynamics in rational form
   * @param closure whether the law's output drives the actuator
   * @return the model
   * @throws IllegalArgumentException if the forward block does not end with a first- or
   *     second-order actuator
   */
  public static AircraftSimulationModel of(ServoLoop servo, RationalAerodynamics rational, LoopClosure closure) {
    return of(servo, rational, closure, null);
  }

  /**
   * Assembles the model with gust penetration.
   *
   * @param servo the loop at the flight condition (plant and law)
   * @param rational the elastic aerodynamics in rational form
   * @param closure whether the law's output drives the actuator
   * @param penetration wing-to-tail delay of the gust, or null for none
   * @return the model
   */
  public static AircraftSimulationModel of(ServoLoop servo, RationalAerodynamics rational, LoopClosure closure,
      GustPenetration penetration) {
    return of(servo, rational, closure, penetration, LiftGrowth.QUASI_STEADY, Double.NaN);
  }

  /**
   * Assembles the model with gust penetration and a choice of lift growth.
   *
   * @param servo the loop at the flight condition (plant and law)
   * @param rational the elastic aerodynamics in rational form
   * @param closure whether the law's output drives the actuator
   * @param penetration wing-to-tail delay of the gust, or null for none
   * @param growth quasi-steady or unsteady (Wagner and Küssner) rigid-body lift
   * @param semichordM b, half the reference chord (m), the length of the reduced time V t / b;
   *     used only with {@link LiftGrowth#UNSTEADY}
   * @return the model
   */
  public static AircraftSimulationModel of(ServoLoop servo, RationalAerodynamics rational, LoopClosure closure,
      GustPenetration penetration, LiftGrowth growth, double semichordM) {
    AircraftPlant plant = servo.plant();
    StateSpace aircraft = plant.stateSpace(rational);
    if (!"alpha".equals(aircraft.stateNames().get(0))) {
      throw new IllegalStateException("aircraft state 0 is " + aircraft.stateNames().get(0) + ", expected alpha");
    }
    List<LinearBlock> forward = servo.forward() instanceof SeriesBlock s ? s.blocks() : List.of(servo.forward());
    LinearBlock act = forward.get(forward.size() - 1);
    StateSpace pre = null;
    for (int i = 0; i + 1 < forward.size(); i++) {
      StateSpace block = forward.get(i).stateSpace();
      pre = pre == null ? block : pre.series(block);
    }
    if (pre == null) {
      pre = StateSpace.staticGain(1.0);
    }
    double wAct;
    double zAct;
    int nq;
    if (act instanceof SecondOrderActuator a2) {
      wAct = 2 * Math.PI * a2.naturalFrequencyHz();
      zAct = a2.dampingRatio();
      nq = 2;
    } else if (act instanceof FirstOrderLag a1) {
      wAct = 1 / a1.timeConstantS();
      zAct = 0;
      nq = 1;
    } else {
      throw new IllegalArgumentException("the forward path must end with a first- or second-order actuator, found "
          + act.getClass().getSimpleName());
    }
    List<StateSpace> paths = new ArrayList<>();
    for (LinearBlock p : servo.law().paths()) {
      paths.add(p.stateSpace());
    }
    int[] sensorOf = servo.law().pathSensorIndex();
    StateSpace delay = null;
    if (penetration != null && penetration.wingToTailM() > 0) {
      delay = penetration.delay(plant.condition().speedTasMps(), maxOmega(aircraft));
    }
    double share = penetration == null ? 0 : penetration.tailShareOfElevator();
    Lift lift = growth == LiftGrowth.UNSTEADY
        ? new Lift(IndicialLift.WAGNER.filter(plant.condition().speedTasMps(), semichordM),
            IndicialLift.KUSSNER.filter(plant.condition().speedTasMps(), semichordM))
        : null;
    return new Assembly(plant, aircraft, paths, sensorOf, pre, wAct, zAct, nq, closure, delay, share, lift).build();
  }

  /** @return 1.5 times the highest frequency among the aircraft's eigenvalues, at least 2 pi 10 rad/s */
  static double maxOmega(StateSpace aircraft) {
    double[] im = aircraft.eigenvalues().imag();
    double max = 2 * Math.PI * 10 / 1.5;
    for (double v : im) {
      max = Math.max(max, Math.abs(v));
    }
    return 1.5 * max;
  }

  /** Wagner's filter for the angle of attack and Küssner's for the gust angle. */
  private record Lift(StateSpace wagner, StateSpace kussner) {}

  /** Builds the matrices: every signal as a row over [x; pilot; gust; noise of each sensor]. */
  private static final class Assembly {
    private final AircraftPlant plant;
    private final StateSpace aircraft;
    private final List<StateSpace> paths;
    private final int[] sensorOf;
    private final StateSpace pre;
    private final double w;
    private final double zeta;
    private final int nq;
    private final LoopClosure closure;
    private final StateSpace delay;
    private final double tailShare;
    private final int delayOffset;
    private final Lift lift;
    private final int liftOffset;
    private final int na;
    private final int[] pathOffset;
    private final int preOffset;
    private final int actOffset;
    private final int n;
    private final DMatrixRMaj dyn;
    private final int width;

    Assembly(AircraftPlant plant, StateSpace aircraft, List<StateSpace> paths, int[] sensorOf, StateSpace pre,
        double w, double zeta, int nq, LoopClosure closure, StateSpace delay, double tailShare, Lift lift) {
      this.plant = plant;
      this.aircraft = aircraft;
      this.paths = paths;
      this.sensorOf = sensorOf;
      this.pre = pre;
      this.w = w;
      this.zeta = zeta;
      this.nq = nq;
      this.closure = closure;
      this.delay = delay;
      this.tailShare = delay == null ? 0 : tailShare;
      this.na = aircraft.stateCount();
      this.pathOffset = new int[paths.size()];
      int off = na;
      for (int p = 0; p < paths.size(); p++) {
        pathOffset[p] = off;
        off += paths.get(p).stateCount();
      }
      this.preOffset = off;
      this.actOffset = off + pre.stateCount();
      this.delayOffset = actOffset + nq;
      this.liftOffset = delayOffset + (delay == null ? 0 : delay.stateCount());
      this.lift = lift;
      // unsteady lift: Wagner on alpha, Kuessner on the gust at the wing and (with a delay) at the tail
      this.n = liftOffset + (lift == null ? 0 : 2 * 2 + (delay == null ? 0 : 2));
      this.width = n + 2 + aircraft.outputCount();
      this.dyn = new DMatrixRMaj(n, width);
    }

    private DMatrixRMaj row() {
      return new DMatrixRMaj(1, width);
    }

    /** target[row, :] += k * map. */
    private static void addRow(DMatrixRMaj target, int row, double k, DMatrixRMaj map) {
      for (int j = 0; j < map.numCols; j++) {
        target.add(row, j, k * map.get(0, j));
      }
    }

    /**
     * Adds a filter driven by {@code input}: its states from {@code offset} on.
     *
     * @return the filter's output as a row
     */
    private DMatrixRMaj filtered(StateSpace filter, int offset, DMatrixRMaj input) {
      DMatrixRMaj out = row();
      int k = filter.stateCount();
      for (int i = 0; i < k; i++) {
        for (int j = 0; j < k; j++) {
          dyn.set(offset + i, offset + j, filter.a().get(i, j));
        }
        addRow(dyn, offset + i, filter.b().get(i, 0), input);
        out.set(0, offset + i, filter.c().get(0, i));
      }
      addRow(out, 0, filter.d().get(0, 0), input);
      return out;
    }

    /**
     * Adds the angle-of-attack and gust forces of one row: {@code perAlpha} times the angle of
     * attack plus the gust angle, the tailplane's share of the gust taken at the tail.
     *
     * @param angles alpha, gust angle at the wing and at the tail, as rows
     */
    private void addAngleForces(DMatrixRMaj target, int r, double perAlpha, double perElevator, DMatrixRMaj[] angles) {
      addRow(target, r, perAlpha, angles[0]);
      addRow(target, r, perAlpha - tailShare * perElevator, angles[1]);
      addRow(target, r, tailShare * perElevator, angles[2]);
    }

    AircraftSimulationModel build() {
      double v = plant.condition().speedTasMps();
      DMatrixRMaj aA = aircraft.a();
      DMatrixRMaj bA = aircraft.b();
      DMatrixRMaj cA = aircraft.c();
      DMatrixRMaj dA = aircraft.d();
      DMatrixRMaj delta = row();
      delta.set(0, actOffset, 1);
      // gust at the tailplane: the delay's output (zero row without penetration)
      DMatrixRMaj tail = row();
      if (delay != null) {
        for (int i = 0; i < delay.stateCount(); i++) {
          for (int j = 0; j < delay.stateCount(); j++) {
            dyn.set(delayOffset + i, delayOffset + j, delay.a().get(i, j));
          }
          dyn.set(delayOffset + i, n + 1, delay.b().get(i, 0));
          tail.set(0, delayOffset + i, delay.c().get(0, i));
        }
        tail.set(0, n + 1, delay.d().get(0, 0));
      }
      // angles as seen by the geometry (a vane) and as they act on the forces
      DMatrixRMaj[] geometric = {unit(0), unit(n + 1), tail.copy()};
      CommonOps_DDRM.scale(1 / v, geometric[1]);
      CommonOps_DDRM.scale(1 / v, geometric[2]);
      DMatrixRMaj[] forcing = geometric;
      if (lift != null) {
        forcing = new DMatrixRMaj[] {filtered(lift.wagner(), liftOffset, geometric[0]),
            filtered(lift.kussner(), liftOffset + 2, geometric[1]),
            delay == null ? row() : filtered(lift.kussner(), liftOffset + 4, geometric[2])};
      }
      // sensors: C x + D delta + C[:, alpha] (alpha + w_g / V); a vane reads the geometric angles,
      // an accelerometer the forces
      int ns = cA.numRows;
      DMatrixRMaj[] sensors = new DMatrixRMaj[ns];
      for (int s = 0; s < ns; s++) {
        sensors[s] = row();
        for (int j = 1; j < na; j++) {
          sensors[s].set(0, j, cA.get(s, j));
        }
        addRow(sensors[s], 0, dA.get(s, 0), delta);
        sensors[s].set(0, n + 2 + s, 1);
        boolean vane = plant.sensors().get(s).kind() == SensorKind.ANGLE_OF_ATTACK_VANE;
        addAngleForces(sensors[s], 0, cA.get(s, 0), dA.get(s, 0), vane ? geometric : forcing);
      }
      // aircraft dynamics
      for (int i = 0; i < na; i++) {
        for (int j = 1; j < na; j++) {
          dyn.set(i, j, aA.get(i, j));
        }
        addRow(dyn, i, bA.get(i, 0), delta);
        addAngleForces(dyn, i, aA.get(i, 0), bA.get(i, 0), forcing);
      }
      // law paths
      DMatrixRMaj law = row();
      for (int p = 0; p < paths.size(); p++) {
        StateSpace path = paths.get(p);
        int o = pathOffset[p];
        DMatrixRMaj in = sensors[sensorOf[p]];
        for (int i = 0; i < path.stateCount(); i++) {
          for (int j = 0; j < path.stateCount(); j++) {
            dyn.set(o + i, o + j, path.a().get(i, j));
          }
          addRow(dyn, o + i, path.b().get(i, 0), in);
        }
        for (int j = 0; j < path.stateCount(); j++) {
          law.add(0, o + j, path.c().get(0, j));
        }
        addRow(law, 0, path.d().get(0, 0), in);
      }
      DMatrixRMaj command = row();
      if (closure == LoopClosure.CLOSED) {
        addRow(command, 0, 1, law);
      }
      command.add(0, n, 1);
      // hold and delay ahead of the actuator
      for (int i = 0; i < pre.stateCount(); i++) {
        for (int j = 0; j < pre.stateCount(); j++) {
          dyn.set(preOffset + i, preOffset + j, pre.a().get(i, j));
        }
        addRow(dyn, preOffset + i, pre.b().get(i, 0), command);
      }
      DMatrixRMaj actuatorInput = row();
      for (int j = 0; j < pre.stateCount(); j++) {
        actuatorInput.set(0, preOffset + j, pre.c().get(0, j));
      }
      addRow(actuatorInput, 0, pre.d().get(0, 0), command);
      // actuator
      DMatrixRMaj rate = row();
      if (nq == 1) {
        addRow(rate, 0, w, actuatorInput);
        rate.add(0, actOffset, -w);
        addRow(dyn, actOffset, 1, rate);
      } else {
        rate.set(0, actOffset + 1, 1);
        dyn.set(actOffset, actOffset + 1, 1);
        addRow(dyn, actOffset + 1, w * w, actuatorInput);
        dyn.add(actOffset + 1, actOffset, -w * w);
        dyn.add(actOffset + 1, actOffset + 1, -2 * zeta * w);
      }
      // outputs
      List<DMatrixRMaj> rows = new ArrayList<>();
      List<String> names = new ArrayList<>();
      for (int s = 0; s < ns; s++) {
        rows.add(sensors[s]);
        names.add(sensorOutput(plant.sensors().get(s)));
      }
      rows.add(unit(0));
      names.add(ALPHA);
      rows.add(unit(1));
      names.add(PITCH_RATE);
      List<String> modes = aircraft.stateNames().subList(2, 2 + plant.modeCount());
      for (int i = 0; i < plant.modeCount(); i++) {
        rows.add(unit(2 + i));
        names.add(modalOutput(modes.get(i)));
      }
      rows.add(delta);
      names.add(ELEVATOR);
      rows.add(rate);
      names.add(ELEVATOR_RATE);
      int commandIndex = rows.size();
      rows.add(actuatorInput);
      names.add(ELEVATOR_COMMAND);
      rows.add(law);
      names.add(LAW_OUTPUT);
      rows.add(unit(n));
      names.add(PILOT_INPUT);
      rows.add(unit(n + 1));
      names.add(GUST_INPUT);
      if (delay != null) {
        rows.add(tail);
        names.add(TAIL_GUST);
      }
      DMatrixRMaj out = new DMatrixRMaj(rows.size(), width);
      for (int r = 0; r < rows.size(); r++) {
        CommonOps_DDRM.insert(rows.get(r), out, r, 0);
      }
      List<String> states = new ArrayList<>(aircraft.stateNames());
      for (int p = 0; p < paths.size(); p++) {
        for (int i = 0; i < paths.get(p).stateCount(); i++) {
          states.add("law_path" + (p + 1) + "_x" + (i + 1));
        }
      }
      for (int i = 0; i < pre.stateCount(); i++) {
        states.add("hold_delay_x" + (i + 1));
      }
      states.add("actuator_position");
      if (nq == 2) {
        states.add("actuator_rate");
      }
      for (int i = 0; delay != null && i < delay.stateCount(); i++) {
        states.add("gust_delay_x" + (i + 1));
      }
      if (lift != null) {
        states.addAll(List.of("wagner_lag1", "wagner_lag2", "kuessner_wing_lag1", "kuessner_wing_lag2"));
        if (delay != null) {
          states.addAll(List.of("kuessner_tail_lag1", "kuessner_tail_lag2"));
        }
      }
      StateSpace sys = new StateSpace(CommonOps_DDRM.extract(dyn, 0, n, 0, n), CommonOps_DDRM.extract(dyn, 0, n, n, n + 2),
          CommonOps_DDRM.extract(out, 0, out.numRows, 0, n), CommonOps_DDRM.extract(out, 0, out.numRows, n, n + 2),
          List.of(PILOT_INPUT, GUST_INPUT), names, states);
      return new AircraftSimulationModel(sys, CommonOps_DDRM.extract(dyn, 0, n, n + 2, width),
          CommonOps_DDRM.extract(out, 0, out.numRows, n + 2, width), actOffset, nq == 2 ? actOffset + 1 : -1, w, zeta,
          commandIndex, modes, plant.sensors().stream().map(SensorSpec::name).toList(), v);
    }

    private DMatrixRMaj unit(int column) {
      DMatrixRMaj r = row();
      r.set(0, column, 1);
      return r;
    }
  }
}
