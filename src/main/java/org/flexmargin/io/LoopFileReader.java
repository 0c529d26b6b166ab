package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.Coefficients;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;
import org.flexmargin.model.PlausibleRange;

/**
 * Reads a loop file, format 1 (docs/loop-files.md): a broken loop given as a transfer function,
 * zeros/poles/gain, a state-space model or a measured frequency response (in place or a CSV/JSON
 * file beside the loop file), with delay, sample period, frequency range, structural modes, and
 * an optional requirements table (in place or a file). Unknown keys are errors; every failure is
 * an {@link InputFileException} naming file, line, field path, expected and found; the file is
 * validated against {@code schema/loop-file.schema.json} once read. Stateless.
 */
public final class LoopFileReader {
  private LoopFileReader() {}

  /** Low end of the default frequency range, Hz. */
  public static final double DEFAULT_MIN_FREQUENCY_HZ = 0.01;
  /** High end of the default frequency range (below the Nyquist frequency of a sampled loop), Hz. */
  public static final double DEFAULT_MAX_FREQUENCY_HZ = 100.0;

  private static final List<String> KEYS = List.of("format", "name", "description", "transfer_function",
      "zeros_poles_gain", "state_space", "measured_response", "delay_s", "sample_period_s", "frequency_range_hz",
      "structural_modes", "first_aeroelastic_frequency_hz", "speed_eas_mps", "requirements");
  private static final String[] FORMS = {"transfer_function", "zeros_poles_gain", "state_space", "measured_response"};
  private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");

  /**
   * @param file the loop file (JSON)
   * @return the validated loop file with the provenance of every file read
   */
  public static LoopFile read(Path file) {
    SourceFile src = SourceFile.read(file, file.toString());
    ReadLog log = new ReadLog();
    JsonInput doc = JsonInput.parse(src, log);
    log.validateLater(Schemas.Kind.LOOP_FILE, doc);
    Path base = file.toAbsolutePath().normalize().getParent();
    Map<Path, InputFile> inputs = new LinkedHashMap<>();
    inputs.put(file.toAbsolutePath().normalize(), new InputFile(src.display(), src.sha256()));

    JsonField root = doc.root().object("a loop file");
    root.allowOnly(KEYS);
    JsonField format = root.required("format", "\"format\": " + CaseReader.FORMAT);
    if (format.integer() != CaseReader.FORMAT) {
      throw format.fail("format " + CaseReader.FORMAT + " (the version this program reads)", format.describe());
    }
    String name = root.required("name", "a loop name").text();
    if (!NAME.matcher(name).matches()) {
      throw root.optional("name").fail(
          "a name usable as a folder name (letters, digits, '.', '_', '-'; not starting with '.')", "\"" + name + "\"");
    }
    JsonField descField = root.optional("description");
    String description = descField == null ? "" : descField.text();
    String form = root.exactlyOne("the loop", FORMS);
    JsonField data = root.optional(form);
    OpenLoopData loop = switch (form) {
      case "transfer_function" -> transferFunction(data);
      case "zeros_poles_gain" -> zerosPolesGain(data);
      case "state_space" -> stateSpace(data);
      default -> new OpenLoopData.Measured(measured(data, base, inputs));
    };
    double delay = number(root, "delay_s", 0.0, PlausibleRange.COMPUTATION_DELAY);
    double period = number(root, "sample_period_s", 0.0, PlausibleRange.COMPUTATION_DELAY);
    double[] range = range(root.optional("frequency_range_hz"), loop, period);
    List<LoopFile.Mode> modes = new ArrayList<>();
    JsonField ml = root.optional("structural_modes");
    if (ml != null) {
      for (JsonField m : ml.list("a list of structural modes")) {
        m.object("a structural mode: {\"name\": ..., \"frequency_hz\": ...}");
        m.allowOnly(List.of("name", "frequency_hz"));
        String mn = m.required("name", "the mode's name").text();
        double f = m.required("frequency_hz", "the mode's frequency (Hz)").quantity(PlausibleRange.MODE_FREQUENCY);
        modes.add(m.build(() -> new LoopFile.Mode(mn, f)));
      }
    }
    JsonField edge = root.optional("first_aeroelastic_frequency_hz");
    double edgeHz = edge == null ? Double.NaN : edge.quantity(PlausibleRange.MODE_FREQUENCY);
    JsonField sp = root.optional("speed_eas_mps");
    double speed = sp == null ? 0.0 : sp.finite();
    JsonField rq = root.optional("requirements");
    ClearanceRequirements requirements = null;
    if (rq != null) {
      if (rq.node().isTextual()) {
        String rel = rq.text();
        if (!rel.toLowerCase(Locale.ROOT).endsWith(".json")) {
          throw rq.fail("a .json requirements file (path relative to the loop file) or the table in place",
              "\"" + rel + "\"");
        }
        SourceFile rf = referenced(rq, base, inputs);
        JsonInput rdoc = JsonInput.parse(rf, log);
        log.validateLater(Schemas.Kind.REQUIREMENTS, rdoc);
        requirements = RequirementsReader.readFile(rdoc.root());
      } else {
        requirements = RequirementsReader.readSection(rq);
      }
    }
    log.validatePending();
    ClearanceRequirements req = requirements;
    return root.build(() -> new LoopFile(name, description, loop, delay, period, range[0], range[1], modes, edgeHz,
        speed, req, new ArrayList<>(inputs.values()), log.warnings()));
  }

  private static double number(JsonField o, String key, double absent, PlausibleRange r) {
    JsonField f = o.optional(key);
    return f == null ? absent : f.quantity(r);
  }

  private static double[] range(JsonField f, OpenLoopData loop, double period) {
    if (f != null) {
      double[] r = f.numbers("[low, high] in Hz");
      if (r.length != 2) {
        throw f.fail("two frequencies [low, high] in Hz", r.length + " values");
      }
      if (period > 0 && r[1] > 0.5 / period * (1 + 1e-12)) {
        throw f.fail(String.format(Locale.ROOT, "a high end at or below the Nyquist frequency 1/(2 T) = %.6g Hz of "
            + "the sampled loop", 0.5 / period), r[1] + " Hz");
      }
      return r;
    }
    if (loop instanceof OpenLoopData.Measured m) {
      double[] fr = m.table().frequencyHz();
      return new double[] {fr[0], fr[fr.length - 1]};
    }
    double hi = period > 0 ? Math.min(DEFAULT_MAX_FREQUENCY_HZ, 0.5 / period) : DEFAULT_MAX_FREQUENCY_HZ;
    return new double[] {DEFAULT_MIN_FREQUENCY_HZ, hi};
  }

  private static OpenLoopData transferFunction(JsonField d) {
    d.object("{\"numerator\": [...], \"denominator\": [...]}");
    d.allowOnly(List.of("numerator", "denominator"));
    double[] num = d.required("numerator", "coefficients, highest power of s first").numbers("a list of numbers");
    double[] den = d.required("denominator", "coefficients, highest power of s first").numbers("a list of numbers");
    return d.build(() -> new OpenLoopData.TransferFunction(new Coefficients(num, den)));
  }

  private static OpenLoopData zerosPolesGain(JsonField d) {
    d.object("{\"zeros\": [...], \"poles\": [...], \"gain\": k}");
    d.allowOnly(List.of("zeros", "poles", "gain"));
    JsonField zf = d.optional("zeros");
    double[][] z = zf == null ? new double[2][0] : roots(zf);
    double[][] p = roots(d.required("poles", "a list of poles (rad/s)"));
    double k = d.required("gain", "the gain k").finite();
    return d.build(() -> new OpenLoopData.ZerosPolesGain(z[0], z[1], p[0], p[1], k));
  }

  /** Roots as numbers (real) or [re, im] pairs (a conjugate pair given once). */
  private static double[][] roots(JsonField f) {
    List<JsonField> items = f.list("a list of roots: numbers (real) or [re, im] (the pair re +- j im)");
    double[][] out = new double[2][items.size()];
    for (int i = 0; i < items.size(); i++) {
      JsonField r = items.get(i);
      if (r.node().isArray()) {
        double[] v = r.numbers("[re, im]");
        if (v.length != 2) {
          throw r.fail("[re, im], two numbers", v.length + " numbers");
        }
        out[0][i] = v[0];
        out[1][i] = v[1];
      } else {
        out[0][i] = r.finite();
      }
    }
    return out;
  }

  private static OpenLoopData stateSpace(JsonField d) {
    d.object("{\"a\": [[...]], \"b\": [...], \"c\": [...], \"d\": number}");
    d.allowOnly(List.of("a", "b", "c", "d"));
    List<JsonField> rows = d.required("a", "the state matrix, a list of rows").list("a list of rows");
    double[][] a = new double[rows.size()][];
    for (int i = 0; i < a.length; i++) {
      a[i] = rows.get(i).numbers("a row of numbers");
    }
    double[] b = d.required("b", "the input column, one number per state").numbers("a list of numbers");
    double[] c = d.required("c", "the output row, one number per state").numbers("a list of numbers");
    JsonField df = d.optional("d");
    double dd = df == null ? 0.0 : df.finite();
    return d.build(() -> new OpenLoopData.StateSpaceModel(a, b, c, dd));
  }

  private static MeasuredTable measured(JsonField f, Path base, Map<Path, InputFile> inputs) {
    if (f.node().isTextual()) {
      return MeasuredTableReader.read(referenced(f, base, inputs), f);
    }
    f.object("a measured table {\"frequency_hz\": [...], \"gain_db\": [...], \"phase_deg\": [...]} or a file name");
    f.allowOnly(List.of("description", "frequency_hz", "gain_db", "phase_deg"));
    return MeasuredTableReader.inPlace(f, f.source().display());
  }

  private static SourceFile referenced(JsonField from, Path base, Map<Path, InputFile> inputs) {
    String rel = from.text();
    Path p = base.resolve(rel).normalize();
    Path cwd = Path.of("").toAbsolutePath();
    String display = p.startsWith(cwd) ? cwd.relativize(p).toString() : p.toString();
    SourceFile s = SourceFile.readReferenced(p, display, from);
    inputs.putIfAbsent(p, new InputFile(rel, s.sha256()));
    return s;
  }
}
