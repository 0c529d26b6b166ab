package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.ActuatorSpec;
import org.flexmargin.model.AeroSpec;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.model.Altitudes;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.MachForceTable;
import org.flexmargin.model.MachGafTable;
import org.flexmargin.model.GainSchedule;
import org.flexmargin.model.InertiaAxis;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.InputWarning;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.CouplingOrigin;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.PlausibleRange;
import org.flexmargin.model.PointList;
import org.flexmargin.model.RigidBody;
import org.flexmargin.model.SensorKind;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripPlacement;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.StructureSpec;
import org.flexmargin.model.SweepPlan;
import org.flexmargin.model.SweepPoint;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.model.UniformCantileverWing;

/**
 * Reads and validates flexmargin input files, format 1: case files (JSON), mode tables (JSON or
 * CSV) and generalized aerodynamic force tables (JSON). The format is described key by key in
 * {@code docs/case-files.md}.
 *
 * <p>Rules common to every file: keys are lower_snake_case with the unit in the name; SI units,
 * except explicitly named knot and foot keys ({@code from_kt}, {@code altitude_ft}) converted here
 * (1 kt = 1852/3600 m/s, 1 ft = 0.3048 m, both exact by definition); every file carries
 * {@code "format": 1}; unknown keys are errors, never ignored; the section {@code requirements} is
 * reserved for a later format and rejected. Structural damping may be given
 * as a viscous ratio {@code damping_ratio} or as a structural damping coefficient
 * {@code structural_damping_g}, converted with g = 2 zeta (Fung, <i>An Introduction to the Theory
 * of Aeroelasticity</i>).
 *
 * <p>Optional closed-loop data (still format 1; files without them read as before): a
 * {@code rigid_body} object in each configuration ({@link RigidBody}, with per-mode
 * {@link ModeCoupling}) and a top-level {@code loop} object ({@link LoopSpec}: actuator, sensors,
 * feedback paths with filters and a dynamic-pressure gain schedule, computation delay, sample
 * period, Pade order). With a loop every configuration must be a mode table with rigid-body data,
 * and every sensor station must be a station of each configuration's mode table.
 *
 * <p>Every failure is an {@link InputFileException} naming file, line, field path, what was
 * expected and what was found. Paths inside a case file are relative to the case file's folder;
 * the provenance list of the case ({@link AnalysisCase#inputs()}) holds the SHA-256 of every file
 * read, the case file first, each referenced file once.
 *
 * <p>All methods are static and thread-safe.
 */
public final class CaseReader {
  private CaseReader() {}

  /** The format version this reader reads. */
  public static final int FORMAT = 1;

  /** One international knot in m/s (1852 m per hour, exact). */
  public static final double METRES_PER_SECOND_PER_KNOT = 1852.0 / 3600.0;
  /** One international foot in metres (exact). */
  public static final double METRES_PER_FOOT = 0.3048;

  private static final List<String> CASE_KEYS =
      List.of("format", "name", "description", "plausibility_overrides", "configurations", "sweep", "options",
          "envelope",
          "loop", "gusts", "rational_fit", "requirements");
  private static final List<String> CONFIG_KEYS =
      List.of("name", "mode_table", "uniform_wing", "typical_section", "aero", "rigid_body");
  private static final List<String> RIGID_BODY_KEYS = List.of("mass_kg", "pitch_inertia_kg_m2",
      "reference_area_m2", "reference_chord_m", "lift_slope_per_rad", "pitch_moment_slope_per_rad",
      "pitch_damping_cmq", "alpha_dot_damping_cm_alpha_dot", "lift_per_elevator_per_rad",
      "pitch_moment_per_elevator_per_rad", "mode_coupling");
  private static final List<String> COUPLING_KEYS = List.of("lift_coefficient_per_unit_coordinate",
      "pitch_moment_coefficient_per_unit_coordinate", "generalized_force_per_alpha_m2",
      "generalized_force_per_elevator_m2", "generalized_force_per_pitch_rate_m2");
  private static final List<String> LOOP_KEYS = List.of("actuator", "sensors", "paths",
      "computation_delay_s", "sample_period_s", "pade_order");
  private static final List<String> ACTUATOR_KEYS = List.of("order", "bandwidth_hz", "damping_ratio",
      "rate_limit_deg_s", "position_limit_deg");
  private static final List<String> SENSOR_KEYS =
      List.of("name", "kind", "station", "lever_arm_m", "bandwidth_hz");
  private static final List<String> PATH_KEYS = List.of("sensor", "proportional_gain",
      "integral_gain_per_s", "filters", "schedule");
  /** Default order of the Pade approximation of delays when {@code pade_order} is absent. */
  public static final int DEFAULT_PADE_ORDER = 2;
  private static final List<String> MODE_TABLE_KEYS = List.of("format", "name", "description", "modes");
  private static final List<String> MODE_KEYS = List.of(
      "name", "frequency_hz", "damping_ratio", "structural_damping_g", "generalized_mass_kg", "shapes");
  private static final List<String> SHAPE_KEYS = List.of("displacement_m", "rotation_rad");
  private static final List<String> FORCE_KEYS = List.of("format", "description", "reference_semichord_m",
      "mach", "mach_numbers", "modes", "reduced_frequencies", "real", "imag");
  private static final Pattern CASE_NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");

  /**
   * Reads a case file and every file it references.
   *
   * @param caseFile the case file (JSON)
   * @return the validated case, with provenance of every file read
   * @throws InputFileException on any unreadable, malformed or invalid input
   */
  public static AnalysisCase read(Path caseFile) {
    SourceFile src = SourceFile.read(caseFile, caseFile.toString());
    Context ctx = new Context(caseFile, src);
    JsonInput caseDoc = JsonInput.parse(src, ctx.log);
    ctx.log.validateLater(Schemas.Kind.CASE_FILE, caseDoc);
    JsonField root = caseDoc.root().object("a case file");
    root.allowOnly(CASE_KEYS);
    int format = readFormat(root);
    String name = root.required("name", "a case name").text();
    if (!CASE_NAME.matcher(name).matches()) {
      throw root.optional("name").fail(
          "a name usable as a folder name (letters, digits, '.', '_', '-'; not starting with '.')",
          "\"" + name + "\"");
    }
    String description = textOrEmpty(root, "description");
    readOverrides(root.optional("plausibility_overrides"), ctx.log);
    List<JsonField> configs = root.required("configurations", "a list of configurations")
        .list("a list of configurations");
    if (configs.isEmpty()) {
      throw root.optional("configurations").fail("at least one configuration", "an empty list");
    }
    List<Configuration> configurations = new ArrayList<>();
    for (JsonField c : configs) {
      configurations.add(readConfiguration(c, ctx));
    }
    SweepPlan sweep = readSweep(root.required("sweep", "a sweep section").object("a sweep section"));
    JsonField opts = root.optional("options");
    AnalysisOptions options = (opts == null ? AnalysisOptions.defaults() : readOptions(opts.object("options")))
        .withRationalFit(RationalFitSectionReader.read(root));
    JsonField loopField = root.optional("loop");
    LoopSpec loop = loopField == null ? null : readLoop(loopField.object("a loop section"), configs, configurations, ctx);
    GustSectionReader.read(root.optional("gusts"), ctx.log);
    JsonField rq = root.optional("requirements");
    ClearanceRequirements requirements = rq == null ? null : readRequirements(rq, ctx);
    List<InputFile> inputs = new ArrayList<>(ctx.inputs.values());
    ctx.log.validatePending();
    List<InputWarning> warnings = ctx.log.warnings();
    return root.build(() -> new AnalysisCase(format, name, description, configurations, sweep, options, inputs,
        loop, requirements, warnings));
  }

  /**
   * Reads a mode table on its own, JSON or CSV by file extension.
   *
   * @param file a {@code .json} or {@code .csv} mode table
   * @return the validated table
   * @throws InputFileException on any unreadable, malformed or invalid input
   */
  public static ModeTable readModeTable(Path file) {
    ReadLog log = new ReadLog();
    ModeTable t = parseModeTable(SourceFile.read(file, file.toString()), log);
    log.validatePending();
    return t;
  }

  /**
   * Reads a generalized aerodynamic force table on its own (its modes are not checked against a
   * mode table; {@link #read} does that).
   *
   * @param file a {@code .json} force table
   * @return the validated table: a {@link GafTable} at one Mach number, or a {@link MachGafTable}
   *     when the file lists {@code mach_numbers}
   * @throws InputFileException on any unreadable, malformed or invalid input
   */
  public static AeroSpec readForceTable(Path file) {
    ReadLog log = new ReadLog();
    AeroSpec t = parseForceTable(SourceFile.read(file, file.toString()), null, log);
    log.validatePending();
    return t;
  }

  // ----------------------------------------------------------------------------------------------
  // case file sections

  /** Files read for one case: provenance in order, and tables already read by path. */
  private static final class Context {
    final Path baseDir;
    final Map<Path, InputFile> inputs = new LinkedHashMap<>();
    final Map<Path, ModeTable> modeTables = new LinkedHashMap<>();
    final ReadLog log = new ReadLog();

    Context(Path caseFile, SourceFile src) {
      Path parent = caseFile.toAbsolutePath().normalize().getParent();
      this.baseDir = parent;
      inputs.put(caseFile.toAbsolutePath().normalize(), new InputFile(src.display(), src.sha256()));
    }

    /** Resolves a path written in the case file and its display name. */
    Path resolve(String relative) {
      return baseDir.resolve(relative).normalize();
    }

    /**
     * Reads and parses the JSON file named by the text value {@code from}, to be validated against
     * the schema of {@code kind}; returns its top level.
     */
    JsonField readReferenced(JsonField from, Schemas.Kind kind) {
      String rel = from.text();
      if (!rel.toLowerCase(Locale.ROOT).endsWith(".json")) {
        throw from.fail("a .json file (path relative to the case file) or the data in place", "\"" + rel + "\"");
      }
      JsonInput doc = JsonInput.parse(read(from, rel), log);
      log.validateLater(kind, doc);
      return doc.root();
    }

    SourceFile read(JsonField from, String relative) {
      Path p = resolve(relative);
      String display = displayName(relative);
      SourceFile f = SourceFile.readReferenced(p, display, from);
      inputs.putIfAbsent(p, new InputFile(relative, f.sha256()));
      return f;
    }

    String displayName(String relative) {
      Path cwd = Path.of("").toAbsolutePath();
      Path p = resolve(relative);
      return p.startsWith(cwd) ? cwd.relativize(p).toString() : p.toString();
    }
  }

  /**
   * Reads {@code plausibility_overrides}: the ids of plausible ranges ({@link PlausibleRange}) whose
   * bounds this case lifts; values beyond them are then read with a warning.
   */
  static void readOverrides(JsonField f, ReadLog log) {
    if (f == null) {
      return;
    }
    List<String> ids = new ArrayList<>();
    for (PlausibleRange r : PlausibleRange.values()) {
      if (r.overridable()) {
        ids.add(r.id());
      }
    }
    for (JsonField item : f.list("a list of plausible-range names")) {
      String id = item.text();
      PlausibleRange r = PlausibleRange.byId(id);
      if (r == null || !r.overridable()) {
        throw item.fail("the name of a plausible range that may be lifted (see docs/case-files.md, "
            + "\"Plausible ranges\")", "\"" + id + "\"" + (r != null ? " (a physical limit, which no override lifts)"
            : Suggest.hint(id, ids)));
      }
      log.override(r);
    }
  }

  /** The requirements section in place, or a file reference to a standalone requirements file. */
  private static ClearanceRequirements readRequirements(JsonField rq, Context ctx) {
    if (rq.node().isTextual()) {
      return RequirementsReader.readFile(ctx.readReferenced(rq, Schemas.Kind.REQUIREMENTS));
    }
    return RequirementsReader.readSection(rq);
  }

  private static int readFormat(JsonField obj) {
    JsonField f = obj.required("format", "\"format\": " + FORMAT);
    int v = f.integer();
    if (v != FORMAT) {
      throw f.fail("format " + FORMAT + " (the version this program reads)", String.valueOf(v));
    }
    return v;
  }

  private static String textOrEmpty(JsonField obj, String key) {
    JsonField f = obj.optional(key);
    return f == null ? "" : f.text();
  }

  private static Configuration readConfiguration(JsonField c, Context ctx) {
    c.object("a configuration");
    c.allowOnly(CONFIG_KEYS);
    String name = c.required("name", "a configuration name").text();
    String kind = c.exactlyOne("the structure", "mode_table", "uniform_wing", "typical_section");
    JsonField s = c.optional(kind);
    StructureSpec structure;
    AeroSpec aero = null;
    switch (kind) {
      case "mode_table": {
        String rel = s.text();
        Path p = ctx.resolve(rel);
        ModeTable table = ctx.modeTables.get(p);
        if (table == null) {
          String lower = rel.toLowerCase(Locale.ROOT);
          if (!lower.endsWith(".json") && !lower.endsWith(".csv")) {
            throw s.fail("a .json or .csv mode table file", "\"" + rel + "\"");
          }
          table = parseModeTable(ctx.read(s, rel), ctx.log);
          ctx.modeTables.put(p, table);
        }
        structure = table;
        JsonField a = c.required("aero", "an aero section (strip_theory or force_table) for a mode table");
        aero = readAero(a.object("an aero section"), table, ctx);
        break;
      }
      case "uniform_wing":
        structure = readUniformWing(s.object("a uniform wing"));
        break;
      default:
        structure = readTypicalSection(s.object("a typical section"));
        break;
    }
    if (!(structure instanceof ModeTable) && c.has("aero")) {
      throw c.optional("aero").fail(
          "no aero section for a built-in " + kind + " (it carries its own strips)", "an aero section");
    }
    JsonField rb = c.optional("rigid_body");
    RigidBody rigidBody = rb == null ? null : readRigidBody(rb.object("rigid-body data"), structure, kind);
    StructureSpec st = structure;
    AeroSpec ae = aero;
    return c.build(() -> new Configuration(name, st, ae, rigidBody));
  }

  // ----------------------------------------------------------------------------------------------
  // rigid body and flight-control loop

  private static RigidBody readRigidBody(JsonField r, StructureSpec structure, String kind) {
    r.allowOnly(RIGID_BODY_KEYS);
    double mass = r.required("mass_kg", "the mass (kg; of the half for a half model)")
        .quantity(PlausibleRange.RIGID_MASS);
    double iyy = r.required("pitch_inertia_kg_m2", "the pitch moment of inertia I_yy (kg m^2)")
        .quantity(PlausibleRange.RIGID_PITCH_INERTIA);
    double area = r.required("reference_area_m2", "the reference wing area (m^2)")
        .quantity(PlausibleRange.REFERENCE_AREA);
    double chord = r.required("reference_chord_m", "the mean aerodynamic chord (m)")
        .quantity(PlausibleRange.REFERENCE_CHORD);
    double cla = r.required("lift_slope_per_rad", "C_L_alpha (1/rad)").quantity(PlausibleRange.RIGID_LIFT_SLOPE);
    double cma = r.required("pitch_moment_slope_per_rad", "C_m_alpha (1/rad)")
        .quantity(PlausibleRange.PITCH_MOMENT_SLOPE);
    double cmq = r.required("pitch_damping_cmq", "C_m_q (per unit q c / 2V)").quantity(PlausibleRange.PITCH_DAMPING);
    double cmad = r.required("alpha_dot_damping_cm_alpha_dot", "C_m_alphadot (per unit alphadot c / 2V)")
        .quantity(PlausibleRange.PITCH_DAMPING);
    double cld = r.required("lift_per_elevator_per_rad", "C_L_delta (1/rad)")
        .quantity(PlausibleRange.ELEVATOR_DERIVATIVE);
    double cmd = r.required("pitch_moment_per_elevator_per_rad", "C_m_delta (1/rad)")
        .quantity(PlausibleRange.ELEVATOR_DERIVATIVE);
    Map<String, ModeCoupling> coupling = new LinkedHashMap<>();
    JsonField mc = r.optional("mode_coupling");
    if (mc != null) {
      mc.object("the coupling of each mode by mode name");
      if (!(structure instanceof ModeTable table)) {
        throw mc.fail("no mode_coupling for a built-in " + kind
            + " (coupling needs the mode names of a mode table)", "a mode_coupling section");
      }
      for (Map.Entry<String, JsonField> e : mc.entries()) {
        if (!table.modeNames().contains(e.getKey())) {
          throw e.getValue().fail("a mode of mode table \"" + table.name() + "\" ("
              + String.join(", ", table.modeNames()) + ")", "\"" + e.getKey() + "\""
              + Suggest.hint(e.getKey(), table.modeNames()));
        }
        JsonField m = e.getValue().object("the coupling coefficients of a mode");
        m.allowOnly(COUPLING_KEYS);
        double lift = numberOr(m, "lift_coefficient_per_unit_coordinate", 0.0, PlausibleRange.COUPLING);
        double moment = numberOr(m, "pitch_moment_coefficient_per_unit_coordinate", 0.0, PlausibleRange.COUPLING);
        double fAlpha = numberOr(m, "generalized_force_per_alpha_m2", 0.0, PlausibleRange.COUPLING);
        double fElev = numberOr(m, "generalized_force_per_elevator_m2", 0.0, PlausibleRange.COUPLING);
        double fRate = numberOr(m, "generalized_force_per_pitch_rate_m2", 0.0, PlausibleRange.COUPLING);
        coupling.put(e.getKey(), m.build(
            () -> new ModeCoupling(lift, moment, fAlpha, fElev, fRate, CouplingOrigin.SUPPLIED)));
      }
    }
    return r.build(() -> new RigidBody(mass, iyy, area, chord, cla, cma, cmq, cmad, cld, cmd, coupling));
  }

  /**
   * Reads the loop section and checks each sensor station against every configuration's mode
   * table (the model checks the rest: rigid-body data present, sensor names, path sensors).
   *
   * @param configFields the configuration objects, in order, for error locations
   * @param configurations the configurations read from them
   */
  private static LoopSpec readLoop(JsonField l, List<JsonField> configFields, List<Configuration> configurations,
      Context ctx) {
    l.allowOnly(LOOP_KEYS);
    ActuatorSpec actuator = readActuator(l.required("actuator", "an actuator section").object("an actuator section"));
    List<JsonField> sensorItems = l.required("sensors", "a list of sensors").list("a list of sensors");
    List<SensorSpec> sensors = new ArrayList<>();
    for (JsonField s : sensorItems) {
      sensors.add(readSensor(s.object("a sensor")));
    }
    for (int i = 0; i < configurations.size(); i++) {
      StructureSpec st = configurations.get(i).structure();
      if (!(st instanceof ModeTable table)) {
        throw configFields.get(i).fail("a mode_table configuration (loop sensors need mode-table stations)",
            "a built-in structure in a case with a loop");
      }
      Set<String> stations = table.modes().get(0).shapes().keySet();
      for (int j = 0; j < sensors.size(); j++) {
        if (!stations.contains(sensors.get(j).station())) {
          throw sensorItems.get(j).optional("station").fail("a station of mode table \"" + table.name()
              + "\" of configuration \"" + configurations.get(i).name() + "\" ("
              + String.join(", ", new TreeSet<>(stations)) + ")", "\"" + sensors.get(j).station() + "\""
              + Suggest.hint(sensors.get(j).station(), stations));
        }
      }
    }
    List<JsonField> pathItems = l.required("paths", "a list of feedback paths").list("a list of feedback paths");
    List<FeedbackPath> paths = new ArrayList<>();
    for (int i = 0; i < pathItems.size(); i++) {
      paths.add(readPath(pathItems.get(i).object("a feedback path"), i, ctx));
    }
    double delay = numberOr(l, "computation_delay_s", 0.0, PlausibleRange.COMPUTATION_DELAY);
    double period = numberOr(l, "sample_period_s", 0.0, PlausibleRange.COMPUTATION_DELAY);
    int pade = l.has("pade_order") ? l.optional("pade_order").integer() : DEFAULT_PADE_ORDER;
    return l.build(() -> new LoopSpec(actuator, sensors, paths, delay, period, pade));
  }

  private static ActuatorSpec readActuator(JsonField a) {
    a.allowOnly(ACTUATOR_KEYS);
    JsonField o = a.required("order", "\"first\" or \"second\"");
    ActuatorOrder order = o.choice(List.of("first", "second")).equals("first")
        ? ActuatorOrder.FIRST : ActuatorOrder.SECOND;
    double bandwidth = a.required("bandwidth_hz",
        "the bandwidth (Hz): corner of a first-order or natural frequency of a second-order actuator")
        .quantity(PlausibleRange.ACTUATOR_BANDWIDTH);
    double zeta;
    if (order == ActuatorOrder.SECOND) {
      zeta = a.required("damping_ratio", "the damping ratio of the second-order actuator")
          .quantity(PlausibleRange.ACTUATOR_DAMPING);
    } else {
      if (a.has("damping_ratio")) {
        throw a.optional("damping_ratio").fail("no damping_ratio for a first-order actuator",
            "a damping ratio, which a first-order model has no use for");
      }
      zeta = 0.0;
    }
    double rate = a.has("rate_limit_deg_s")
        ? Math.toRadians(a.optional("rate_limit_deg_s").quantity(PlausibleRange.ACTUATOR_RATE_LIMIT))
        : Double.POSITIVE_INFINITY;
    double position = a.has("position_limit_deg")
        ? Math.toRadians(a.optional("position_limit_deg").quantity(PlausibleRange.ACTUATOR_POSITION_LIMIT))
        : Double.POSITIVE_INFINITY;
    return a.build(() -> new ActuatorSpec(order, bandwidth, zeta, rate, position));
  }

  private static SensorSpec readSensor(JsonField s) {
    s.allowOnly(SENSOR_KEYS);
    String name = s.required("name", "a sensor name").text();
    JsonField k = s.required("kind", "\"pitch_rate_gyro\", \"normal_accelerometer\" or \"angle_of_attack_vane\"");
    SensorKind kind = switch (k.choice(List.of("pitch_rate_gyro", "normal_accelerometer", "angle_of_attack_vane"))) {
      case "pitch_rate_gyro" -> SensorKind.PITCH_RATE_GYRO;
      case "normal_accelerometer" -> SensorKind.NORMAL_ACCELEROMETER;
      default -> SensorKind.ANGLE_OF_ATTACK_VANE;
    };
    String station = s.required("station", "the mode-table station of the sensor").text();
    double lever = numberOr(s, "lever_arm_m", 0.0, PlausibleRange.SENSOR_LEVER_ARM);
    double bandwidth = numberOr(s, "bandwidth_hz", 0.0, PlausibleRange.SENSOR_BANDWIDTH);
    return s.build(() -> new SensorSpec(name, kind, station, lever, bandwidth));
  }

  private static FeedbackPath readPath(JsonField p, int index, Context ctx) {
    p.allowOnly(PATH_KEYS);
    String sensor = p.required("sensor", "the name of one of the loop's sensors").text();
    double kp = p.required("proportional_gain", "Kp (rad of elevator per sensor unit)")
        .quantity(PlausibleRange.PROPORTIONAL_GAIN);
    double ki = numberOr(p, "integral_gain_per_s", 0.0, PlausibleRange.INTEGRAL_GAIN);
    List<FilterSpec> filters = new ArrayList<>();
    JsonField fl = p.optional("filters");
    if (fl != null) {
      for (JsonField f : FilterFiles.filterList(fl, index, sensor, f -> ctx.readReferenced(f, Schemas.Kind.FILTERS))) {
        filters.add(readFilter(f.object("a filter: {\"notch\": {...}}, {\"low_pass\": {...}}, {\"lead_lag\": {...}}, ...")));
      }
    }
    JsonField sc = p.optional("schedule");
    GainSchedule schedule = sc == null ? null : readSchedule(sc.object("a gain schedule"));
    return p.build(() -> new FeedbackPath(sensor, kp, ki, filters, schedule));
  }

  private static final List<String> FILTER_KINDS = List.of("notch", "low_pass", "lead_lag", "washout",
      "second_order", "transfer_function", "discrete");

  private static FilterSpec readFilter(JsonField f) {
    f.allowOnly(FILTER_KINDS);
    String kind = f.exactlyOne("the filter type", FILTER_KINDS.toArray(new String[0]));
    JsonField d = f.optional(kind).object("the filter data");
    switch (kind) {
      case "notch" -> {
        d.allowOnly(List.of("centre_hz", "numerator_damping_ratio", "denominator_damping_ratio"));
        double centre = d.required("centre_hz", "the centre frequency (Hz)").quantity(PlausibleRange.FILTER_FREQUENCY);
        double zz = d.required("numerator_damping_ratio", "zeta_z, the numerator damping ratio").number();
        double zp = d.required("denominator_damping_ratio", "zeta_p, the denominator damping ratio").number();
        return d.build(() -> new NotchFilterSpec(centre, zz, zp));
      }
      case "low_pass" -> {
        d.allowOnly(List.of("corner_hz", "damping_ratio"));
        double corner = d.required("corner_hz", "the corner frequency (Hz)").quantity(PlausibleRange.FILTER_FREQUENCY);
        double zeta = d.required("damping_ratio", "the damping ratio (0.7071 = Butterworth)").number();
        return d.build(() -> new LowPassFilterSpec(corner, zeta));
      }
      case "lead_lag" -> {
        d.allowOnly(List.of("zero_hz", "pole_hz"));
        double z = d.required("zero_hz", "the zero frequency (Hz)").quantity(PlausibleRange.FILTER_FREQUENCY);
        double p = d.required("pole_hz", "the pole frequency (Hz)").quantity(PlausibleRange.FILTER_FREQUENCY);
        return d.build(() -> new FilterSpec.LeadLag(z, p));
      }
      case "washout" -> {
        d.allowOnly(List.of("time_constant_s"));
        double tau = d.required("time_constant_s", "the time constant (s)").number();
        return d.build(() -> new FilterSpec.Washout(tau));
      }
      case "second_order" -> {
        d.allowOnly(List.of("numerator_frequency_hz", "numerator_damping_ratio", "denominator_frequency_hz",
            "denominator_damping_ratio"));
        double fn = d.required("numerator_frequency_hz", "f_n (Hz)").quantity(PlausibleRange.FILTER_FREQUENCY);
        double zn = d.required("numerator_damping_ratio", "zeta_n").number();
        double fd = d.required("denominator_frequency_hz", "f_d (Hz)").quantity(PlausibleRange.FILTER_FREQUENCY);
        double zd = d.required("denominator_damping_ratio", "zeta_d").number();
        return d.build(() -> new FilterSpec.SecondOrder(fn, zn, fd, zd));
      }
      default -> {
        d.allowOnly(List.of("numerator", "denominator"));
        String order = kind.equals("discrete") ? "b0, b1, ... (powers of z^-1)" : "highest power of s first";
        double[] num = d.required("numerator", "coefficients, " + order).numbers("a list of numbers");
        double[] den = d.required("denominator", "coefficients, " + order).numbers("a list of numbers");
        return d.build(() -> kind.equals("discrete") ? new FilterSpec.Discrete(new Coefficients(num, den))
            : new FilterSpec.TransferFunction(new Coefficients(num, den)));
      }
    }
  }

  private static GainSchedule readSchedule(JsonField s) {
    s.allowOnly(List.of("dynamic_pressure_pa", "factor"));
    JsonField qf = s.required("dynamic_pressure_pa", "the list of dynamic-pressure breakpoints (Pa)");
    JsonField ff = s.required("factor", "the list of gain factors, one per breakpoint");
    double[] q = qf.quantities("a list of dynamic pressures (Pa)", PlausibleRange.SCHEDULE_DYNAMIC_PRESSURE);
    double[] k = ff.quantities("a list of gain factors", PlausibleRange.SCHEDULE_FACTOR);
    if (q.length == 0) {
      throw qf.fail("at least one breakpoint", "an empty list");
    }
    if (k.length != q.length) {
      throw ff.fail("one factor per dynamic pressure (" + q.length + ")", k.length + " factors");
    }
    return s.build(() -> new GainSchedule(q, k));
  }

  private static AeroSpec readAero(JsonField a, ModeTable table, Context ctx) {
    a.allowOnly(List.of("strip_theory", "force_table", "lifting_surfaces"));
    String kind = a.exactlyOne("the aerodynamic data", "strip_theory", "force_table", "lifting_surfaces");
    JsonField f = a.optional(kind);
    if (kind.equals("lifting_surfaces")) {
      return LatticeReader.read(f, table, ctx::resolve);
    }
    if (kind.equals("force_table")) {
      String rel = f.text();
      if (!rel.toLowerCase(Locale.ROOT).endsWith(".json")) {
        throw f.fail("a .json force table file", "\"" + rel + "\"");
      }
      return parseForceTable(ctx.read(f, rel), table, ctx.log);
    }
    f.object("strip-theory data");
    f.allowOnly(List.of("reference_semichord_m", "strips"));
    double bRef = f.required("reference_semichord_m", "the reference semichord (m)").quantity(PlausibleRange.SEMICHORD);
    List<JsonField> items = f.required("strips", "a list of strips").list("a list of strips");
    if (items.isEmpty()) {
      throw f.optional("strips").fail("at least one strip", "an empty list");
    }
    Set<String> stations = table.modes().get(0).shapes().keySet();
    Set<String> used = new HashSet<>();
    List<Strip> strips = new ArrayList<>();
    for (JsonField s : items) {
      s.object("a strip");
      s.allowOnly(List.of("station", "width_m", "semichord_m", "elastic_axis_a", "lift_slope_per_rad",
          "elastic_axis_aft_of_cg_m", "elevator_chord_fraction", "downwash_gradient"));
      JsonField st = s.required("station", "the station name of the strip in the mode table");
      String station = st.text();
      if (!stations.contains(station)) {
        throw st.fail("a station of mode table \"" + table.name() + "\" (" + String.join(", ",
            new TreeSet<>(stations)) + ")", "\"" + station + "\"" + Suggest.hint(station, stations));
      }
      if (!used.add(station)) {
        throw st.fail("a station not used by another strip", "\"" + station + "\" a second time");
      }
      double w = s.required("width_m", "the strip width (m)").quantity(PlausibleRange.STRIP_WIDTH);
      double b = s.required("semichord_m", "the local semichord (m)").quantity(PlausibleRange.SEMICHORD);
      double ea = s.required("elastic_axis_a", "the elastic axis aft of mid-chord (semichords)").number();
      double cla = s.required("lift_slope_per_rad", "the lift-curve slope (1/rad)").quantity(PlausibleRange.LIFT_SLOPE);
      StripPlacement placement = readPlacement(s);
      strips.add(s.build(() -> new Strip(station, w, b, ea, cla, placement)));
    }
    return f.build(() -> new StripTheorySpec(bRef, strips));
  }

  /** The strip's optional placement: its position is required once an elevator or downwash is given. */
  private static StripPlacement readPlacement(JsonField s) {
    JsonField x = s.optional("elastic_axis_aft_of_cg_m");
    if (x == null) {
      for (String k : List.of("elevator_chord_fraction", "downwash_gradient")) {
        if (s.optional(k) != null) {
          throw s.optional(k).fail("elastic_axis_aft_of_cg_m beside " + k + " (the strip's position behind the "
              + "centre of mass, m)", k + " without a position");
        }
      }
      return null;
    }
    double pos = x.quantity(PlausibleRange.STRIP_POSITION);
    double e = numberOr(s, "elevator_chord_fraction", 0.0);
    double dw = numberOr(s, "downwash_gradient", 0.0);
    return s.build(() -> new StripPlacement(pos, e, dw));
  }

  private static UniformCantileverWing readUniformWing(JsonField w) {
    w.allowOnly(List.of("semi_span_m", "chord_m", "elastic_axis_chord_fraction",
        "mass_axis_chord_fraction", "mass_per_length_kg_per_m", "pitch_inertia_kg_m", "inertia_axis",
        "bending_stiffness_n_m2", "torsion_stiffness_n_m2", "lift_slope_per_rad", "bending_modes",
        "torsion_modes", "strips", "damping_ratio", "structural_damping_g"));
    double span = w.required("semi_span_m", "the semi-span (m)").quantity(PlausibleRange.SPAN);
    double chord = w.required("chord_m", "the chord (m)").quantity(PlausibleRange.CHORD);
    double ea = w.required("elastic_axis_chord_fraction", "the elastic axis (fraction of chord)").number();
    double cg = w.required("mass_axis_chord_fraction", "the centre of mass (fraction of chord)").number();
    double m = w.required("mass_per_length_kg_per_m", "the mass per length (kg/m)")
        .quantity(PlausibleRange.MASS_PER_LENGTH);
    double inertia = w.required("pitch_inertia_kg_m", "the pitch inertia per length (kg m)")
        .quantity(PlausibleRange.PITCH_INERTIA_PER_LENGTH);
    JsonField axisField = w.required("inertia_axis", "\"elastic_axis\" or \"centre_of_mass\"");
    InertiaAxis axis = axisField.choice(List.of("elastic_axis", "centre_of_mass")).equals("elastic_axis")
        ? InertiaAxis.ELASTIC_AXIS : InertiaAxis.CENTRE_OF_MASS;
    double ei = w.required("bending_stiffness_n_m2", "EI (N m^2)").quantity(PlausibleRange.STIFFNESS);
    double gj = w.required("torsion_stiffness_n_m2", "GJ (N m^2)").quantity(PlausibleRange.STIFFNESS);
    double cla = w.required("lift_slope_per_rad", "the lift-curve slope (1/rad)").quantity(PlausibleRange.LIFT_SLOPE);
    int nb = w.required("bending_modes", "the number of bending functions").integer();
    int nt = w.required("torsion_modes", "the number of torsion functions").integer();
    int ns = w.required("strips", "the number of strips").integer();
    double zeta = readDamping(w);
    return w.build(() -> new UniformCantileverWing(
        span, chord, ea, cg, m, inertia, axis, ei, gj, cla, nb, nt, ns, zeta));
  }

  private static TypicalSection readTypicalSection(JsonField t) {
    t.allowOnly(List.of("semichord_m", "mass_per_span_kg_per_m", "elastic_axis_a",
        "mass_offset_x_alpha", "radius_of_gyration_squared", "heave_frequency_hz",
        "pitch_frequency_hz", "lift_slope_per_rad", "span_m", "damping_ratio", "structural_damping_g"));
    double b = t.required("semichord_m", "the semichord b (m)").quantity(PlausibleRange.SEMICHORD);
    double m = t.required("mass_per_span_kg_per_m", "the mass per span (kg/m)").quantity(PlausibleRange.MASS_PER_LENGTH);
    double a = t.required("elastic_axis_a", "a, elastic axis aft of mid-chord (semichords)").number();
    double xa = t.required("mass_offset_x_alpha", "x_alpha (semichords)").quantity(PlausibleRange.SECTION_NONDIMENSIONAL);
    double r2 = t.required("radius_of_gyration_squared", "r_alpha^2 (semichords^2)")
        .quantity(PlausibleRange.SECTION_NONDIMENSIONAL);
    double fh = t.required("heave_frequency_hz", "the heave frequency (Hz)").quantity(PlausibleRange.SECTION_FREQUENCY);
    double fa = t.required("pitch_frequency_hz", "the pitch frequency (Hz)").quantity(PlausibleRange.SECTION_FREQUENCY);
    double cla = t.required("lift_slope_per_rad", "the lift-curve slope (1/rad)").quantity(PlausibleRange.LIFT_SLOPE);
    double span = t.required("span_m", "the span (m)").quantity(PlausibleRange.SPAN);
    double zeta = readDamping(t);
    return t.build(() -> new TypicalSection(b, m, a, xa, r2, fh, fa, cla, span, zeta));
  }

  /** Reads exactly one of damping_ratio / structural_damping_g; returns zeta. */
  private static double readDamping(JsonField obj) {
    String key = obj.exactlyOne("the structural damping", "damping_ratio", "structural_damping_g");
    JsonField f = obj.optional(key);
    double v = f.number();
    if (key.equals("damping_ratio")) {
      if (!(v >= 0 && v < 1)) {
        throw f.fail("a damping ratio in [0, 1)", f.describe());
      }
      return f.quantity(PlausibleRange.MODE_DAMPING_RATIO);
    }
    if (!(v >= 0 && v < 2)) {
      throw f.fail("a structural damping g in [0, 2) (g = 2 zeta)", f.describe());
    }
    return f.quantity(PlausibleRange.MODE_DAMPING_RATIO, 0.5, "(g, that is a damping ratio of " + v / 2 + ")");
  }

  private static SweepPlan readSweep(JsonField s) {
    JsonField kindField = s.required("kind", "\"speed\", \"mach\" or \"points\"");
    String kind = kindField.choice(List.of("speed", "mach", "points"));
    switch (kind) {
      case "speed": {
        s.allowOnly(List.of("kind", "altitude_m", "altitude_ft", "density_kg_per_m3", "speed_kind", "from_mps",
            "from_kt", "to_mps", "to_kt", "points"));
        double alt = readAltitude(s, "altitude");
        AirspeedKind sk = readSpeedKind(s);
        double from = readSpeed(s, "from");
        double to = readSpeed(s, "to");
        if (!(to > from)) {
          String key = s.has("to_mps") ? "to_mps" : "to_kt";
          throw s.optional(key).fail("a speed above the sweep's first speed " + from + " m/s",
              to + " m/s (an empty or inverted range)");
        }
        int n = s.required("points", "the number of points (>= 2)").integer();
        return s.build(() -> new SpeedSweep(alt, sk, from, to, n));
      }
      case "mach": {
        s.allowOnly(List.of("kind", "mach", "from_altitude_m", "from_altitude_ft", "to_altitude_m",
            "to_altitude_ft", "points"));
        double mach = s.required("mach", "the Mach number").quantity(PlausibleRange.SWEEP_MACH);
        double from = readAltitude(s, "from_altitude");
        double to = readAltitude(s, "to_altitude");
        if (from == to) {
          String key = s.has("to_altitude_m") ? "to_altitude_m" : "to_altitude_ft";
          throw s.optional(key).fail("an altitude different from the first", to + " m (an empty range)");
        }
        int n = s.required("points", "the number of points (>= 2)").integer();
        return s.build(() -> new MachSweep(mach, from, to, n));
      }
      case "points": {
        s.allowOnly(List.of("kind", "points"));
        List<JsonField> items = s.required("points", "a list of flight points").list("a list of flight points");
        if (items.size() < 2) {
          throw s.optional("points").fail("at least two flight points", items.size() + "");
        }
        List<SweepPoint> points = new ArrayList<>();
        for (JsonField p : items) {
          p.object("a flight point");
          p.allowOnly(List.of("altitude_m", "altitude_ft", "density_kg_per_m3", "speed_kind", "speed_mps",
              "speed_kt"));
          double alt = readAltitude(p, "altitude");
          AirspeedKind sk = readSpeedKind(p);
          double v = readSpeed(p, "speed");
          points.add(p.build(() -> new SweepPoint(alt, v, sk)));
        }
        return s.build(() -> new PointList(points));
      }
      default:
        throw new IllegalStateException(kind);
    }
  }

  /**
   * Reads {@code <stem>_m} or {@code <stem>_ft} and checks the atmosphere range; where
   * {@code stem} is {@code altitude}, {@code density_kg_per_m3} may stand instead (the air density
   * of a published example), read as the altitude of the US Standard Atmosphere 1976 with that
   * density. Returns metres.
   */
  private static double readAltitude(JsonField obj, String stem) {
    String key = stem.equals("altitude")
        ? obj.exactlyOne("the altitude or the air density", stem + "_m", stem + "_ft", "density_kg_per_m3")
        : obj.exactlyOne("the altitude", stem + "_m", stem + "_ft");
    if (key.equals("density_kg_per_m3")) {
      return altitudeAtDensity(obj.optional(key));
    }
    JsonField f = obj.optional(key);
    double v = f.number();
    double m = key.endsWith("_ft") ? v * METRES_PER_FOOT : v;
    if (!(m >= Altitudes.MIN_M && m <= Altitudes.MAX_M)) {
      throw f.fail("a geometric altitude in [" + Altitudes.MIN_M + ", " + Altitudes.MAX_M
          + "] m (the standard atmosphere range)", f.describe() + (key.endsWith("_ft") ? " ft" : " m"));
    }
    return m;
  }

  /**
   * @return the geometric altitude (m) at which the US Standard Atmosphere 1976 has the given
   *     density, by bisection (density falls monotonically with altitude over the model's range)
   */
  private static double altitudeAtDensity(JsonField f) {
    double rho = f.quantity(PlausibleRange.DENSITY);
    double hi = StandardAtmosphere.densityKgPerM3(Altitudes.MIN_M);
    double lo = StandardAtmosphere.densityKgPerM3(Altitudes.MAX_M);
    if (!(rho >= lo && rho <= hi)) {
      throw f.fail(String.format(Locale.ROOT, "an air density in [%.4g, %.4g] kg/m^3 (the standard atmosphere"
          + " from %.0f to %.0f m)", lo, hi, Altitudes.MIN_M, Altitudes.MAX_M), f.describe() + " kg/m^3");
    }
    double a = Altitudes.MIN_M;
    double b = Altitudes.MAX_M;
    for (int i = 0; i < 200 && b - a > 1e-9; i++) {
      double mid = 0.5 * (a + b);
      if (StandardAtmosphere.densityKgPerM3(mid) > rho) {
        a = mid;
      } else {
        b = mid;
      }
    }
    // to the micrometre (density changes by about 1e-10 kg/m^3), and sea level as 0 rather than -0
    return Math.rint(0.5 * (a + b) * 1e6) / 1e6 + 0.0;
  }

  /** Reads {@code <stem>_mps} or {@code <stem>_kt} (&gt; 0); returns m/s. */
  private static double readSpeed(JsonField obj, String stem) {
    String key = obj.exactlyOne("the airspeed", stem + "_mps", stem + "_kt");
    JsonField f = obj.optional(key);
    double v = f.positive();
    return key.endsWith("_kt")
        ? f.quantity(PlausibleRange.AIRSPEED, METRES_PER_SECOND_PER_KNOT, "kt")
        : f.quantity(PlausibleRange.AIRSPEED);
  }

  private static AirspeedKind readSpeedKind(JsonField obj) {
    JsonField f = obj.required("speed_kind", "\"eas\" or \"tas\"");
    return f.choice(List.of("eas", "tas")).equals("eas") ? AirspeedKind.EQUIVALENT : AirspeedKind.TRUE;
  }

  private static AnalysisOptions readOptions(JsonField o) {
    o.allowOnly(List.of("method", "damping_limit_g", "convergence_tolerance", "max_iterations",
        "onset_speed_tolerance_mps", "k_method_min_reduced_frequency",
        "k_method_max_reduced_frequency", "k_method_points"));
    AnalysisOptions d = AnalysisOptions.defaults();
    FlutterMethodKind method = d.method();
    JsonField m = o.optional("method");
    if (m != null) {
      method = switch (m.choice(List.of("pk", "k", "state_space"))) {
        case "pk" -> FlutterMethodKind.PK;
        case "k" -> FlutterMethodKind.K;
        default -> FlutterMethodKind.STATE_SPACE;
      };
    }
    FlutterMethodKind meth = method;
    double g = numberOr(o, "damping_limit_g", d.dampingLimitG());
    double tol = numberOr(o, "convergence_tolerance", d.convergenceTolerance());
    int iters = o.has("max_iterations") ? o.optional("max_iterations").integer() : d.maxIterations();
    double onset = numberOr(o, "onset_speed_tolerance_mps", d.onsetSpeedToleranceMps());
    double kMin = numberOr(o, "k_method_min_reduced_frequency", d.kMethodMinReducedFrequency());
    double kMax = numberOr(o, "k_method_max_reduced_frequency", d.kMethodMaxReducedFrequency());
    int kPts = o.has("k_method_points") ? o.optional("k_method_points").integer() : d.kMethodPoints();
    return o.build(() -> new AnalysisOptions(meth, g, tol, iters, onset, kMin, kMax, kPts));
  }

  private static double numberOr(JsonField obj, String key, double dflt) {
    JsonField f = obj.optional(key);
    return f == null ? dflt : f.number();
  }

  private static double numberOr(JsonField obj, String key, double dflt, PlausibleRange range) {
    JsonField f = obj.optional(key);
    return f == null ? dflt : f.quantity(range);
  }

  // ----------------------------------------------------------------------------------------------
  // mode tables and force tables

  private static ModeTable parseModeTable(SourceFile src, ReadLog log) {
    String lower = src.display().toLowerCase(Locale.ROOT);
    if (lower.endsWith(".csv")) {
      return ModeTableCsv.parse(src, log);
    }
    if (!lower.endsWith(".json")) {
      throw new InputFileException(src.display(), 0, "", "a .json or .csv mode table", "another file type");
    }
    JsonInput doc = JsonInput.parse(src, log);
    log.validateLater(Schemas.Kind.MODE_TABLE, doc);
    JsonField root = doc.root().object("a mode table");
    root.allowOnly(MODE_TABLE_KEYS);
    readFormat(root);
    JsonField nameField = root.optional("name");
    String name = nameField == null ? stem(src) : nameField.text();
    textOrEmpty(root, "description");
    List<JsonField> items = root.required("modes", "a list of modes").list("a list of modes");
    if (items.isEmpty()) {
      throw root.optional("modes").fail("at least one mode", "an empty list");
    }
    List<ElasticMode> modes = new ArrayList<>();
    for (JsonField m : items) {
      m.object("a mode");
      m.allowOnly(MODE_KEYS);
      String modeName = m.required("name", "a mode name").text();
      double f = m.required("frequency_hz", "the natural frequency (Hz)").quantity(PlausibleRange.MODE_FREQUENCY);
      double zeta = readDamping(m);
      double mass = m.required("generalized_mass_kg", "the generalized mass (kg)")
          .quantity(PlausibleRange.MODE_GENERALIZED_MASS);
      JsonField shapesField = m.required("shapes", "the mode shape by station").object("the mode shape by station");
      Map<String, ShapeValue> shapes = new LinkedHashMap<>();
      for (Map.Entry<String, JsonField> e : shapesField.entries()) {
        JsonField v = e.getValue().object("a shape value with displacement_m and rotation_rad");
        v.allowOnly(SHAPE_KEYS);
        double d = v.required("displacement_m", "the displacement (m per unit coordinate)")
            .quantity(PlausibleRange.MODE_SHAPE_DISPLACEMENT);
        double r = v.required("rotation_rad", "the rotation (rad per unit coordinate)")
            .quantity(PlausibleRange.MODE_SHAPE_ROTATION);
        shapes.put(e.getKey(), v.build(() -> new ShapeValue(d, r)));
      }
      if (shapes.isEmpty()) {
        throw shapesField.fail("values at one station or more", "no stations");
      }
      String mismatch = modes.isEmpty() ? null : stationMismatch(modes.get(0).shapes().keySet(), shapes.keySet());
      if (mismatch != null) {
        throw shapesField.fail("the same stations as modes[0] (\"" + modes.get(0).name() + "\")", mismatch);
      }
      modes.add(m.build(() -> new ElasticMode(modeName, f, zeta, mass, shapes)));
    }
    return root.build(() -> new ModeTable(name, modes));
  }

  /**
   * @return {@code null} if both station sets are equal, else a description of the difference
   */
  static String stationMismatch(Set<String> reference, Set<String> actual) {
    Set<String> missing = new TreeSet<>(reference);
    missing.removeAll(actual);
    Set<String> extra = new TreeSet<>(actual);
    extra.removeAll(reference);
    if (missing.isEmpty() && extra.isEmpty()) {
      return null;
    }
    StringBuilder sb = new StringBuilder();
    if (!missing.isEmpty()) {
      sb.append("missing ").append(String.join(", ", missing));
    }
    if (!extra.isEmpty()) {
      sb.append(sb.length() > 0 ? "; " : "").append("extra ").append(String.join(", ", extra));
    }
    return sb.toString();
  }

  static String stem(SourceFile src) {
    String f = src.path().getFileName().toString();
    int dot = f.lastIndexOf('.');
    return dot > 0 ? f.substring(0, dot) : f;
  }

  private static AeroSpec parseForceTable(SourceFile src, ModeTable table, ReadLog log) {
    JsonInput doc = JsonInput.parse(src, log);
    log.validateLater(Schemas.Kind.FORCE_TABLE, doc);
    JsonField root = doc.root().object("a force table");
    root.allowOnly(FORCE_KEYS);
    readFormat(root);
    textOrEmpty(root, "description");
    double bRef = root.required("reference_semichord_m", "the reference semichord (m)")
        .quantity(PlausibleRange.SEMICHORD);
    double mach = root.required("mach", "the Mach number of the table").quantity(PlausibleRange.FORCE_TABLE_MACH);
    JsonField modesField = root.required("modes", "the list of mode names (rows and columns)");
    List<String> names = new ArrayList<>();
    for (JsonField f : modesField.list("a list of mode names")) {
      names.add(f.text());
    }
    if (new LinkedHashSet<>(names).size() != names.size()) {
      throw modesField.fail("unique mode names", names.toString());
    }
    if (table != null && !names.equals(table.modeNames())) {
      throw modesField.fail("the modes of mode table \"" + table.name() + "\" in order "
          + table.modeNames(), names.toString());
    }
    double[] k = root.required("reduced_frequencies", "the list of reduced frequencies")
        .quantities("a list of reduced frequencies", PlausibleRange.REDUCED_FREQUENCY);
    JsonField machList = root.optional("mach_numbers");
    if (machList != null) {
      double[] machs = machList.quantities("a list of Mach numbers", PlausibleRange.FORCE_TABLE_MACH);
      double[][][][] re = hypercube(root.required("real", "the real parts as [mach][k][row][column]"));
      double[][][][] im = hypercube(root.required("imag", "the imaginary parts as [mach][k][row][column]"));
      return root.build(() -> new MachGafTable(mach, new MachForceTable(bRef, machs, k, names, names, re, im)));
    }
    double[][][] re = cube(root.required("real", "the real parts as [k][row][column]"));
    double[][][] im = cube(root.required("imag", "the imaginary parts as [k][row][column]"));
    return root.build(() -> new GafTable(bRef, mach, names, k, re, im));
  }

  /** Real or imaginary parts of tables at several Mach numbers: one [k][row][column] cube per Mach number. */
  private static double[][][][] hypercube(JsonField f) {
    List<JsonField> ms = f.list("a list with one [k][row][column] table per Mach number");
    double[][][][] out = new double[ms.size()][][][];
    for (int i = 0; i < out.length; i++) {
      out[i] = cube(ms.get(i));
    }
    return out;
  }

  private static double[][][] cube(JsonField f) {
    List<JsonField> ks = f.list("a list with one matrix per reduced frequency");
    double[][][] out = new double[ks.size()][][];
    for (int i = 0; i < out.length; i++) {
      List<JsonField> rows = ks.get(i).list("a matrix as a list of rows");
      out[i] = new double[rows.size()][];
      for (int r = 0; r < rows.size(); r++) {
        out[i][r] = rows.get(r).numbers("a row as a list of numbers");
      }
    }
    return out;
  }
}
