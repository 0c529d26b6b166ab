package org.flexmargin.model;

import java.util.Locale;

/**
 * The plausible range of every physical input, in one table. Each quantity has
 *
 * <ul>
 *   <li>a <b>plausible</b> range: outside it the value cannot describe an aircraft (a strip 1 km
 *       wide, a gain of 1e308) and is refused at read time with file, line and key. Where a user
 *       may legitimately go beyond it ({@link #overridable()}), the case file's
 *       {@code plausibility_overrides} list names the quantity's {@link #id()}; the value is then
 *       read with a warning instead;
 *   <li>a <b>usual</b> range, inside the plausible one: outside it the value is read with a
 *       warning (printed by {@code check} and {@code sweep}) so that a slipped decimal point or
 *       unit does not pass unnoticed.
 * </ul>
 *
 * <p>Physical impossibility (a negative mass, a damping ratio of 1 or more, a NaN) is not in this
 * table: the model records refuse it and no override lifts it. The table is documented in
 * {@code docs/case-files.md} ("Plausible ranges") and mirrored in the JSON Schemas as
 * {@code minimum}/{@code maximum}; a test keeps the three in step.
 *
 * <p>Example: {@code STRIP_WIDTH} has plausible range (0, 500] m and usual range [0.001, 20] m;
 * {@code "width_m": 25} is read with a warning, {@code "width_m": 1e6} is refused unless the case
 * lists {@code "strip.width_m"} in {@code plausibility_overrides}.
 */
public enum PlausibleRange {
  // mode tables
  MODE_FREQUENCY("mode.frequency_hz", "Hz", 0, 1e4, 0.05, 500, true,
      "structural modes of aircraft lie between a fraction of a hertz and a few hundred hertz"),
  MODE_DAMPING_RATIO("mode.damping_ratio", "", 0, 0.999, 0, 0.1, false,
      "measured structural damping ratios are a few per cent"),
  MODE_GENERALIZED_MASS("mode.generalized_mass_kg", "kg", 1e-6, 1e9, 1e-4, 1e7, true,
      "a generalized mass is of the order of the structure's mass times the squared shape"),
  MODE_SHAPE_DISPLACEMENT("mode.shape.displacement_m", "m", -1e4, 1e4, -1e4, 1e4, true,
      "shapes are normalised to order one or to unit generalized mass"),
  MODE_SHAPE_ROTATION("mode.shape.rotation_rad", "rad", -1e4, 1e4, -1e4, 1e4, true,
      "shapes are normalised to order one or to unit generalized mass"),
  // aerodynamics
  SEMICHORD("aero.semichord_m", "m", 0, 100, 0.005, 10, true,
      "semichords of aircraft wings and tails lie between a few millimetres and about ten metres"),
  STRIP_WIDTH("strip.width_m", "m", 0, 500, 0.001, 20, true,
      "a strip is a slice of one lifting surface"),
  STRIP_POSITION("strip.elastic_axis_aft_of_cg_m", "m", -500, 500, -100, 100, true,
      "a strip lies on the aircraft, within its length of the centre of mass"),
  SURFACE_CHORD("lifting_surface.chord_m", "m", 0, 60, 0.01, 30, true,
      "root and tip chords of aircraft lifting surfaces lie between centimetres and some tens of metres"),
  LIFT_SLOPE("aero.lift_slope_per_rad", "1/rad", 0, 20, 0.5, 8, true,
      "2 pi per radian is the thin-aerofoil value"),
  FORCE_TABLE_MACH("force_table.mach", "", 0, 5, 0, 0.95, false,
      "tabulated forces are usually computed for subsonic flow"),
  REDUCED_FREQUENCY("force_table.reduced_frequency", "", 0, 100, 0, 10, true,
      "flutter reduced frequencies are below about 2"),
  RATIONAL_FIT_REDUCED_FREQUENCY("rational_fit.reduced_frequency", "", 0, 100, 0, 10, true,
      "rational fits span the reduced frequencies of flutter and the elastic modes, below about 10"),
  // rigid body
  RIGID_MASS("rigid_body.mass_kg", "kg", 0, 1e7, 0.05, 1e6, true,
      "no aircraft has a mass above about 600 t"),
  RIGID_PITCH_INERTIA("rigid_body.pitch_inertia_kg_m2", "kg m^2", 0, 1e10, 1e-4, 1e8, true,
      "the largest aircraft have pitch inertias of the order of 1e7 to 1e8 kg m^2"),
  REFERENCE_AREA("rigid_body.reference_area_m2", "m^2", 0, 1e4, 0.01, 1000, true,
      "the largest wings have areas below 1000 m^2"),
  REFERENCE_CHORD("rigid_body.reference_chord_m", "m", 0, 100, 0.02, 20, true,
      "mean aerodynamic chords lie between centimetres and about 15 m"),
  RIGID_LIFT_SLOPE("rigid_body.lift_slope_per_rad", "1/rad", 0, 50, 1, 8, true,
      "aircraft lift-curve slopes are of the order of 3 to 6 per radian"),
  PITCH_MOMENT_SLOPE("rigid_body.pitch_moment_slope_per_rad", "1/rad", -50, 50, -5, 2, true,
      "C_m_alpha is of order one, negative for a statically stable airframe"),
  PITCH_DAMPING("rigid_body.pitch_damping", "", -1000, 1000, -100, 5, true,
      "C_m_q and C_m_alphadot are of order -1 to -50"),
  ELEVATOR_DERIVATIVE("rigid_body.elevator_derivative_per_rad", "1/rad", -50, 50, -5, 5, true,
      "control derivatives are of order one"),
  COUPLING("rigid_body.mode_coupling", "", -1e6, 1e6, -1e6, 1e6, true,
      "coupling coefficients scale with the mode-shape normalisation"),
  // loop
  ACTUATOR_BANDWIDTH("actuator.bandwidth_hz", "Hz", 0, 1000, 0.5, 100, true,
      "flight-control actuators have bandwidths of a few hertz to some tens of hertz"),
  ACTUATOR_DAMPING("actuator.damping_ratio", "", 0, 5, 0.2, 1.5, false,
      "second-order actuator models are damped between about 0.5 and 1"),
  ACTUATOR_RATE_LIMIT("actuator.rate_limit_deg_s", "deg/s", 0, 10000, 10, 500, true,
      "elevator rate limits lie between about 10 and 500 deg/s"),
  ACTUATOR_POSITION_LIMIT("actuator.position_limit_deg", "deg", 0, 90, 2, 45, false,
      "elevator deflection limits lie between a few degrees and about 45 deg"),
  GUST_WING_TO_TAIL("gusts.wing_to_tail_m", "m", 0, 500, 0, 40, true,
      "the tailplane sits within the aircraft's length behind the wing"),
  SENSOR_LEVER_ARM("sensor.lever_arm_m", "m", -500, 500, -50, 50, true,
      "a sensor sits on the aircraft, within its length of the reference station"),
  SENSOR_BANDWIDTH("sensor.bandwidth_hz", "Hz", 0, 1e4, 0, 1000, true,
      "sensor bandwidths lie between some tens and some hundreds of hertz"),
  PROPORTIONAL_GAIN("path.proportional_gain", "rad per sensor unit", -1e3, 1e3, -20, 20, true,
      "loop gains are of order 0.01 to 10 (rad of elevator per rad/s, rad or m/s^2)"),
  INTEGRAL_GAIN("path.integral_gain_per_s", "rad per sensor unit per s", -1e4, 1e4, -100, 100, true,
      "integral gains are of the order of the proportional gain times a few per second"),
  FILTER_FREQUENCY("filter.frequency_hz", "Hz", 0, 1e4, 0.1, 500, true,
      "structural filters act between a fraction of a hertz and a few hundred hertz"),
  SCHEDULE_DYNAMIC_PRESSURE("schedule.dynamic_pressure_pa", "Pa", 0, 1e7, 0, 2e5, true,
      "dynamic pressure at Mach 1.5 at sea level is about 160 kPa"),
  SCHEDULE_FACTOR("schedule.factor", "", -1e3, 1e3, 0, 10, true,
      "a schedule scales the nominal gains by factors of order one"),
  COMPUTATION_DELAY("loop.delay_s", "s", 0, 10, 0, 0.2, true,
      "computation delays and sample periods are milliseconds"),
  // sweep
  AIRSPEED("sweep.speed_mps", "m/s", 0, 3000, 0.5, 700, true,
      "the sweep's airspeeds; incompressible strip theory holds only well below Mach 1"),
  SWEEP_MACH("sweep.mach", "", 0, 5, 0, 3, false,
      "a Mach sweep's Mach number"),
  DENSITY("sweep.density_kg_per_m3", "kg/m^3", 0, 2, 0.01, 1.3, false,
      "sea-level standard density is 1.225 kg/m^3"),
  // built-in structures
  CHORD("structure.chord_m", "m", 0, 200, 0.01, 20, true,
      "chords of aircraft wings lie between centimetres and about 15 m"),
  SPAN("structure.span_m", "m", 0, 500, 0.05, 60, true,
      "the largest aircraft have half-spans below 60 m"),
  MASS_PER_LENGTH("structure.mass_per_length_kg_per_m", "kg/m", 0, 1e6, 0.01, 1e4, true,
      "wing mass per unit span is some kg/m to some hundreds of kg/m"),
  PITCH_INERTIA_PER_LENGTH("structure.pitch_inertia_kg_m", "kg m", 0, 1e6, 1e-6, 1e4, true,
      "pitch inertia per unit span of a wing section"),
  STIFFNESS("structure.stiffness_n_m2", "N m^2", 0, 1e12, 1, 1e10, true,
      "EI and GJ of wings lie between about 1e2 and 1e9 N m^2"),
  SECTION_FREQUENCY("structure.frequency_hz", "Hz", 0, 1e4, 0.05, 500, true,
      "structural modes of aircraft lie between a fraction of a hertz and a few hundred hertz"),
  SECTION_NONDIMENSIONAL("typical_section.nondimensional", "", -100, 100, -2, 2, true,
      "x_alpha and r_alpha^2 are in semichords (squared), of order 0.01 to 1");

  private final String id;
  private final String unit;
  private final double plausibleMin;
  private final double plausibleMax;
  private final double usualMin;
  private final double usualMax;
  private final boolean overridable;
  private final String note;

  PlausibleRange(String id, String unit, double plausibleMin, double plausibleMax, double usualMin,
      double usualMax, boolean overridable, String note) {
    this.id = id;
    this.unit = unit;
    this.plausibleMin = plausibleMin;
    this.plausibleMax = plausibleMax;
    this.usualMin = usualMin;
    this.usualMax = usualMax;
    this.overridable = overridable;
    this.note = note;
  }

  /** How a value compares with a range. */
  public enum Fit {
    /** Inside the usual range. */
    USUAL,
    /** Plausible but outside the usual range: read with a warning. */
    UNUSUAL,
    /** Outside the plausible range: refused unless overridden. */
    IMPLAUSIBLE
  }

  /** @return the name used in {@code plausibility_overrides} and in messages, e.g. {@code strip.width_m} */
  public String id() {
    return id;
  }

  /** @return the unit of the bounds (SI), empty for dimensionless quantities */
  public String unit() {
    return unit;
  }

  /** @return lower plausible bound (in {@link #unit()}); a value equal to it is accepted */
  public double plausibleMin() {
    return plausibleMin;
  }

  /** @return upper plausible bound (in {@link #unit()}); a value equal to it is accepted */
  public double plausibleMax() {
    return plausibleMax;
  }

  /** @return lower bound of the usual range (in {@link #unit()}) */
  public double usualMin() {
    return usualMin;
  }

  /** @return upper bound of the usual range (in {@link #unit()}) */
  public double usualMax() {
    return usualMax;
  }

  /** @return whether {@code plausibility_overrides} may lift the plausible bounds */
  public boolean overridable() {
    return overridable;
  }

  /** @return why the ranges are what they are, in a few words */
  public String note() {
    return note;
  }

  /**
   * @param value a finite value in {@link #unit()}
   * @return where the value lies
   */
  public Fit fit(double value) {
    if (!(value >= plausibleMin && value <= plausibleMax)) {
      return Fit.IMPLAUSIBLE;
    }
    return value >= usualMin && value <= usualMax ? Fit.USUAL : Fit.UNUSUAL;
  }

  /** @return the plausible range in words, e.g. {@code [0, 500] m} */
  public String plausibleText() {
    return interval(plausibleMin, plausibleMax);
  }

  /** @return the usual range in words */
  public String usualText() {
    return interval(usualMin, usualMax);
  }

  private String interval(double lo, double hi) {
    return "[" + num(lo) + ", " + num(hi) + "]" + (unit.isEmpty() ? "" : " " + unit);
  }

  /** @return a compact rendering of a bound: 500, 0.001, 1e+10 */
  public static String num(double v) {
    if (v == Math.rint(v) && Math.abs(v) < 1e6) {
      return String.valueOf((long) v);
    }
    if (Math.abs(v) >= 1e-3 && Math.abs(v) < 1e6) {
      return String.format(Locale.ROOT, "%s", stripZeros(String.format(Locale.ROOT, "%.6f", v)));
    }
    return String.format(Locale.ROOT, "%.0e", v);
  }

  private static String stripZeros(String s) {
    return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
  }

  /**
   * @param id a range id as written in a case file
   * @return the range, or {@code null} if none has that id
   */
  public static PlausibleRange byId(String id) {
    for (PlausibleRange r : values()) {
      if (r.id.equals(id)) {
        return r;
      }
    }
    return null;
  }
}
