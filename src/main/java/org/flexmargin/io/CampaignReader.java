package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.CampaignCondition;
import org.flexmargin.model.CampaignSpec;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.Distribution;
import org.flexmargin.model.FailureState;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.UncertainParameter;
import org.flexmargin.model.UncertainQuantity;

/**
 * Reads a campaign file (docs/campaigns.md): the base case it names (read and validated in full)
 * and the matrix and Monte Carlo layers, each checked against that case so that every sample can
 * be built. Errors name the file, line and field path.
 */
public final class CampaignReader {
  /** The campaign-file format version this program reads. */
  public static final int FORMAT = 1;
  private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");
  private static final List<String> KEYS = List.of("format", "name", "description", "base_case", "sweep_points",
      "matrix", "monte_carlo", "worst_samples");
  private static final List<String> MATRIX_KEYS = List.of("configurations", "flight_conditions", "failure_states",
      "gain_factors");
  private static final List<String> MC_KEYS = List.of("samples", "seed", "parameters", "correlations");
  private static final List<String> PARAMETER_KEYS = List.of("name", "quantity", "modes", "distribution");
  /** Default number of worst samples written as case files. */
  public static final int DEFAULT_WORST_SAMPLES = 5;

  private CampaignReader() {}

  /**
   * @param file the campaign file (JSON)
   * @return the validated campaign with its base case
   * @throws InputFileException on any unreadable, malformed or invalid input (campaign or case)
   */
  public static CampaignSpec read(Path file) {
    SourceFile src = SourceFile.read(file, file.toString());
    ReadLog log = new ReadLog();
    JsonInput doc = JsonInput.parse(src, log);
    log.validateLater(Schemas.Kind.CAMPAIGN, doc);
    JsonField root = doc.root().object("a campaign file");
    root.allowOnly(KEYS);
    JsonField fmt = root.required("format", "\"format\": " + FORMAT);
    if (fmt.integer() != FORMAT) {
      throw fmt.fail("format " + FORMAT + " (the version this program reads)", fmt.describe());
    }
    JsonField nameField = root.required("name", "a campaign name");
    String name = nameField.text();
    if (!NAME.matcher(name).matches()) {
      throw nameField.fail("a name usable as a folder name (letters, digits, '.', '_', '-')", "\"" + name + "\"");
    }
    JsonField d = root.optional("description");
    String description = d == null ? "" : d.text();
    JsonField baseField = root.required("base_case", "the base case file (path relative to the campaign file)");
    String baseRel = baseField.text();
    Path basePath = file.toAbsolutePath().normalize().getParent().resolve(baseRel).normalize();
    AnalysisCase base = CaseReader.read(basePath);
    JsonField sp = root.optional("sweep_points");
    int sweepPoints = sp == null ? 0 : atLeast(sp, 2);
    JsonField matrix = root.required("matrix", "a matrix section").object("a matrix section");
    matrix.allowOnly(MATRIX_KEYS);
    List<String> configurations = configurations(matrix.optional("configurations"), base);
    List<CampaignCondition> conditions = conditions(matrix.optional("flight_conditions"), base);
    List<FailureState> failures = failures(matrix.optional("failure_states"), base);
    List<Double> gains = gains(matrix.optional("gain_factors"), base);
    JsonField mc = root.optional("monte_carlo");
    int samples = 1;
    long seed = 1;
    List<UncertainParameter> parameters = List.of();
    double[][] correlation = null;
    if (mc != null) {
      mc.object("a monte_carlo section");
      mc.allowOnly(MC_KEYS);
      samples = atLeast(mc.required("samples", "the number of samples per matrix cell"), 1);
      JsonField seedField = mc.required("seed", "a whole-number seed (the same seed gives the same samples)");
      seed = seedField.integer();
      JsonField ps = mc.optional("parameters");
      parameters = ps == null ? List.of() : parameters(ps, base, configurations);
      JsonField cs = mc.optional("correlations");
      correlation = cs == null ? null : correlations(cs, parameters);
    }
    JsonField ws = root.optional("worst_samples");
    int worst = ws == null ? DEFAULT_WORST_SAMPLES : atLeast(ws, 0);
    int fSamples = samples;
    long fSeed = seed;
    List<UncertainParameter> fParameters = parameters;
    double[][] fCorrelation = correlation;
    CampaignSpec spec = root.build(() -> new CampaignSpec(FORMAT, name, description, base, baseRel, configurations,
        conditions, failures, gains, sweepPoints, fSamples, fSeed, fParameters, fCorrelation, worst));
    log.validatePending();
    return spec;
  }

  private static int atLeast(JsonField f, int min) {
    int v = f.integer();
    if (v < min) {
      throw f.fail("a whole number >= " + min, f.describe());
    }
    return v;
  }

  private static List<String> configurations(JsonField f, AnalysisCase base) {
    List<String> names = base.configurations().stream().map(Configuration::name).toList();
    if (f == null) {
      for (Configuration c : base.configurations()) {
        requireModeTable(null, c);
      }
      return names;
    }
    List<String> out = new ArrayList<>();
    for (JsonField item : f.list("a list of configuration names of the base case")) {
      String n = item.text();
      Configuration c = base.configurations().stream().filter(x -> x.name().equals(n)).findFirst()
          .orElseThrow(() -> item.fail("a configuration of the base case (" + String.join(", ", names) + ")",
              "\"" + n + "\"" + Suggest.hint(n, names)));
      requireModeTable(item, c);
      out.add(n);
    }
    if (out.isEmpty()) {
      throw f.fail("at least one configuration", "an empty list");
    }
    return out;
  }

  private static void requireModeTable(JsonField at, Configuration c) {
    if (!(c.structure() instanceof ModeTable)) {
      String msg = "configuration \"" + c.name() + "\" with a mode table (samples perturb mode tables)";
      if (at != null) {
        throw at.fail(msg, "a built-in structure");
      }
      throw new InputFileException("base case", 0, "configurations", msg, "a built-in structure");
    }
  }

  private static List<CampaignCondition> conditions(JsonField f, AnalysisCase base) {
    if (f == null) {
      return List.of(CampaignCondition.base());
    }
    List<CampaignCondition> out = new ArrayList<>();
    for (JsonField item : f.list("a list of flight-condition sets")) {
      item.object("a flight-condition set");
      item.allowOnly(List.of("name", "altitude_m", "mach"));
      String n = item.required("name", "a name").text();
      double alt = Double.NaN;
      double mach = Double.NaN;
      JsonField a = item.optional("altitude_m");
      if (a != null) {
        if (!(base.sweep() instanceof SpeedSweep)) {
          throw a.fail("no altitude (only a speed sweep of the base case is moved to another altitude)",
              a.describe());
        }
        alt = a.finite();
      }
      JsonField m = item.optional("mach");
      if (m != null) {
        if (!(base.sweep() instanceof MachSweep)) {
          throw m.fail("no Mach number (only a Mach sweep of the base case takes another Mach number)",
              m.describe());
        }
        mach = m.positive();
      }
      double fa = alt;
      double fm = mach;
      out.add(item.build(() -> new CampaignCondition(n, fa, fm)));
    }
    if (out.isEmpty()) {
      throw f.fail("at least one flight-condition set", "an empty list");
    }
    return out;
  }

  private static List<FailureState> failures(JsonField f, AnalysisCase base) {
    if (f == null) {
      return List.of(FailureState.NOMINAL);
    }
    List<FailureState> out = new ArrayList<>();
    for (JsonField item : f.list("a list of failure states")) {
      item.object("a failure state");
      item.allowOnly(List.of("name", "path_lost", "actuator_bandwidth_factor", "added_delay_s"));
      String n = item.required("name", "a name").text();
      if (base.loop() == null && (item.has("path_lost") || item.has("actuator_bandwidth_factor")
          || item.has("added_delay_s"))) {
        throw item.fail("no loop change (the base case has no loop)", "a failure of the loop");
      }
      String lost = null;
      JsonField pl = item.optional("path_lost");
      if (pl != null) {
        lost = pl.text();
        List<String> sensors = base.loop().paths().stream().map(FeedbackPath::sensor).toList();
        if (!sensors.contains(lost)) {
          throw pl.fail("the sensor of a feedback path (" + String.join(", ", sensors) + ")",
              "\"" + lost + "\"" + Suggest.hint(lost, sensors));
        }
        if (sensors.stream().filter(s -> !s.equals(pl.text())).count() == 0) {
          throw pl.fail("a path other than the only one (a loop needs at least one path)", "\"" + lost + "\"");
        }
      }
      JsonField bw = item.optional("actuator_bandwidth_factor");
      double factor = bw == null ? 1.0 : bw.positive();
      JsonField dl = item.optional("added_delay_s");
      double delay = dl == null ? 0.0 : dl.finite();
      String fl = lost;
      out.add(item.build(() -> new FailureState(n, fl, factor, delay)));
    }
    if (out.isEmpty()) {
      throw f.fail("at least one failure state", "an empty list");
    }
    return out;
  }

  private static List<Double> gains(JsonField f, AnalysisCase base) {
    if (f == null) {
      return List.of(1.0);
    }
    List<Double> out = new ArrayList<>();
    for (JsonField item : f.list("a list of gain factors")) {
      double g = item.positive();
      if (g != 1.0 && base.loop() == null) {
        throw item.fail("1 (the base case has no loop)", item.describe());
      }
      out.add(g);
    }
    if (out.isEmpty()) {
      throw f.fail("at least one gain factor", "an empty list");
    }
    return out;
  }

  private static List<UncertainParameter> parameters(JsonField f, AnalysisCase base, List<String> configurations) {
    List<String> keys = new ArrayList<>();
    for (UncertainQuantity q : UncertainQuantity.values()) {
      keys.add(q.key());
    }
    List<UncertainParameter> out = new ArrayList<>();
    for (JsonField item : f.list("a list of uncertain parameters")) {
      item.object("an uncertain parameter");
      item.allowOnly(PARAMETER_KEYS);
      String n = item.required("name", "a parameter name").text();
      JsonField qf = item.required("quantity", "one of " + String.join(", ", keys));
      UncertainQuantity q = UncertainQuantity.values()[keys.indexOf(qf.choice(keys))];
      List<String> modes = new ArrayList<>();
      JsonField mf = item.optional("modes");
      if (mf != null) {
        if (!q.perMode()) {
          throw mf.fail("no mode list (" + q.key() + " applies to the whole configuration)", mf.describe());
        }
        for (JsonField m : mf.list("a list of mode names")) {
          String mode = m.text();
          for (String cn : configurations) {
            ModeTable mt = (ModeTable) configuration(base, cn).structure();
            if (!mt.modeNames().contains(mode)) {
              throw m.fail("a mode of configuration \"" + cn + "\"", "\"" + mode + "\""
                  + Suggest.hint(mode, mt.modeNames()));
            }
          }
          modes.add(mode);
        }
      }
      checkApplies(qf, q, base, configurations);
      Distribution dist = distribution(item.required("distribution", "a distribution").object("a distribution"));
      out.add(item.build(() -> new UncertainParameter(n, q, modes, dist)));
    }
    return out;
  }

  private static Configuration configuration(AnalysisCase base, String name) {
    return base.configurations().stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow();
  }

  private static void checkApplies(JsonField at, UncertainQuantity q, AnalysisCase base, List<String> configurations) {
    switch (q) {
      case AERO_SCALE -> {
        for (String cn : configurations) {
          if (!(configuration(base, cn).aero() instanceof StripTheorySpec)) {
            throw at.fail("a quantity that applies to configuration \"" + cn + "\" (aero_scale scales strip theory only)",
                "aero_scale");
          }
        }
      }
      case ACTUATOR_BANDWIDTH, ADDED_DELAY_S, SENSOR_SHAPE -> {
        if (base.loop() == null) {
          throw at.fail("a quantity that applies without a loop (the base case has none)", q.key());
        }
      }
      default -> { }
    }
  }

  private static Distribution distribution(JsonField d) {
    String kind = d.exactlyOne("the distribution", "normal", "uniform", "truncated_normal", "log_normal");
    JsonField p = d.optional(kind).object("the parameters of a " + kind + " distribution");
    switch (kind) {
      case "normal" -> {
        p.allowOnly(List.of("mean", "standard_deviation"));
        double m = p.required("mean", "the mean").finite();
        double s = p.required("standard_deviation", "the standard deviation (> 0)").finite();
        return p.build(() -> new Distribution.Normal(m, s));
      }
      case "uniform" -> {
        p.allowOnly(List.of("low", "high"));
        double lo = p.required("low", "the lower bound").finite();
        double hi = p.required("high", "the upper bound").finite();
        return p.build(() -> new Distribution.Uniform(lo, hi));
      }
      case "truncated_normal" -> {
        p.allowOnly(List.of("mean", "standard_deviation", "low", "high"));
        double m = p.required("mean", "the mean of the parent normal").finite();
        double s = p.required("standard_deviation", "the standard deviation of the parent normal (> 0)").finite();
        double lo = p.required("low", "the lower bound").finite();
        double hi = p.required("high", "the upper bound").finite();
        return p.build(() -> new Distribution.TruncatedNormal(m, s, lo, hi));
      }
      default -> {
        p.allowOnly(List.of("median", "log_standard_deviation"));
        double m = p.required("median", "the median (> 0)").finite();
        double s = p.required("log_standard_deviation", "the standard deviation of ln x (> 0)").finite();
        return p.build(() -> new Distribution.LogNormal(m, s));
      }
    }
  }

  private static double[][] correlations(JsonField f, List<UncertainParameter> parameters) {
    int n = parameters.size();
    Map<String, Integer> index = new HashMap<>();
    for (int i = 0; i < n; i++) {
      index.put(parameters.get(i).name(), i);
    }
    double[][] c = new double[n][n];
    for (int i = 0; i < n; i++) {
      c[i][i] = 1.0;
    }
    for (JsonField item : f.list("a list of correlations")) {
      item.object("a correlation");
      item.allowOnly(List.of("between", "coefficient"));
      JsonField bf = item.required("between", "two parameter names");
      List<JsonField> pair = bf.list("two parameter names");
      if (pair.size() != 2) {
        throw bf.fail("two parameter names", pair.size() + " names");
      }
      int[] ij = new int[2];
      for (int k = 0; k < 2; k++) {
        String pn = pair.get(k).text();
        Integer at = index.get(pn);
        if (at == null) {
          throw pair.get(k).fail("a parameter name", "\"" + pn + "\"" + Suggest.hint(pn, index.keySet()));
        }
        ij[k] = at;
      }
      if (ij[0] == ij[1]) {
        throw bf.fail("two different parameters", "the same twice");
      }
      JsonField cf = item.required("coefficient", "a correlation coefficient in (-1, 1)");
      double r = cf.finite();
      if (!(Math.abs(r) < 1.0)) {
        throw cf.fail("a correlation coefficient in (-1, 1)", cf.describe());
      }
      c[ij[0]][ij[1]] = r;
      c[ij[1]][ij[0]] = r;
    }
    if (!positiveDefinite(c)) {
      throw f.fail("correlations that form a positive-definite matrix", "a matrix that is not positive definite");
    }
    return c;
  }

  /** @return whether a Cholesky factorisation of {@code c} succeeds (EJML) */
  static boolean positiveDefinite(double[][] c) {
    return org.ejml.dense.row.factory.DecompositionFactory_DDRM.chol(c.length, true)
        .decompose(new org.ejml.data.DMatrixRMaj(c));
  }
}
