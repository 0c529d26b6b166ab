package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.FrequencyBand;
import org.flexmargin.model.MarginCell;
import org.flexmargin.model.PlausibleRange;
import org.flexmargin.model.RequirementPresets;
import org.flexmargin.model.SpeedRegime;

/**
 * Reads a clearance requirements table, format 1: either a standalone JSON file
 * ({@link #read(Path)}, with {@code "format": 1}) or the {@code requirements} section of a case
 * file ({@link #readSection}). The format is described key by key in {@code docs/requirements.md}.
 *
 * <p>Speeds are equivalent airspeeds in m/s ({@code _eas_mps}) or knots ({@code _eas_kt},
 * 1 kt = 1852/3600 m/s exact). {@code "preset"} is required and is either
 * {@code "recalled_military_and_transport"} ({@link RequirementPresets#recalledMilitaryAndTransport})
 * or {@code "none"}; with a preset, every other key overrides the preset's value, with none every
 * margin cell must be given. Unknown keys are errors. Every failure is an
 * {@link InputFileException} naming file, line, field path, expected and found.
 *
 * <p>All methods are static and thread-safe.
 */
public final class RequirementsReader {
  private RequirementsReader() {}

  /** Preset name of {@link RequirementPresets#recalledMilitaryAndTransport}. */
  public static final String PRESET_RECALLED = "recalled_military_and_transport";
  /** Preset name for a table given in full. */
  public static final String PRESET_NONE = "none";

  /** Keys of the section (without {@code format}). */
  static final List<String> SECTION_KEYS = List.of("description", "preset",
      "max_operating_speed_eas_mps", "max_operating_speed_eas_kt", "limit_speed_eas_mps",
      "limit_speed_eas_kt", "extended_speed_factor", "margins", "structural_peak_limit_db",
      "phase_stabilisation_margin_deg", "frequency_uncertainty", "flutter_speed_factor",
      "minimum_damping_g");
  private static final List<String> CELL_KEYS =
      List.of("band", "regime", "gain_margin_db", "phase_margin_deg");

  /**
   * Reads a standalone requirements file.
   *
   * @param file the JSON file, with {@code "format": 1}
   * @return the validated table
   * @throws InputFileException on any unreadable, malformed or invalid input
   */
  public static ClearanceRequirements read(Path file) {
    SourceFile src = SourceFile.read(file, file.toString());
    JsonInput doc = JsonInput.parse(src);
    ClearanceRequirements r = readFile(doc.root());
    Schemas.check(Schemas.Kind.REQUIREMENTS, doc);
    return r;
  }

  /**
   * Reads a parsed standalone requirements file (also the target of a case file's
   * {@code "requirements": "file.json"} reference).
   *
   * @param root the file's top-level value
   * @return the validated table
   */
  static ClearanceRequirements readFile(JsonField root) {
    root.object("a requirements file");
    List<String> keys = new ArrayList<>(SECTION_KEYS);
    keys.add(0, "format");
    root.allowOnly(keys);
    JsonField f = root.required("format", "\"format\": " + CaseReader.FORMAT);
    int v = f.integer();
    if (v != CaseReader.FORMAT) {
      throw f.fail("format " + CaseReader.FORMAT + " (the version this program reads)",
          String.valueOf(v));
    }
    return readBody(root);
  }

  /**
   * Reads the {@code requirements} section of a case file (no {@code format} key of its own: the
   * case file's format applies).
   *
   * @param section the section's value
   * @return the validated table
   * @throws InputFileException on invalid input, at the offending key
   */
  static ClearanceRequirements readSection(JsonField section) {
    section.object("a requirements section");
    section.allowOnly(SECTION_KEYS);
    return readBody(section);
  }

  private static ClearanceRequirements readBody(JsonField r) {
    JsonField presetField = r.required("preset",
        "\"" + PRESET_RECALLED + "\" or \"" + PRESET_NONE + "\"");
    String preset = presetField.choice(List.of(PRESET_RECALLED, PRESET_NONE));
    boolean recalled = preset.equals(PRESET_RECALLED);
    String description = r.has("description") ? r.optional("description").text() : "";

    JsonField v0Field = r.optional(r.exactlyOne("the top of the normal envelope V0max (EAS)",
        "max_operating_speed_eas_mps", "max_operating_speed_eas_kt"));
    double v0 = speed(v0Field);
    JsonField vlField = r.optional(r.exactlyOne("the limit speed V_L (EAS)",
        "limit_speed_eas_mps", "limit_speed_eas_kt"));
    double vl = speed(vlField);
    if (vl < v0) {
      throw vlField.fail("a limit speed >= the top of the normal envelope (" + v0 + " m/s EAS)",
          vl + " m/s EAS");
    }

    Map<FrequencyBand, Map<SpeedRegime, MarginCell>> cells = new EnumMap<>(FrequencyBand.class);
    List<String> overridden = new ArrayList<>();
    if (recalled) {
      for (MarginCell c : RequirementPresets.recalledMilitaryAndTransport(v0, vl).margins()) {
        cells.computeIfAbsent(c.band(), b -> new EnumMap<>(SpeedRegime.class)).put(c.regime(), c);
      }
    }
    JsonField marginsField = r.optional("margins");
    if (marginsField != null) {
      Map<FrequencyBand, Map<SpeedRegime, Boolean>> given = new EnumMap<>(FrequencyBand.class);
      for (JsonField e : marginsField.list("a list of margin cells")) {
        e.object("a margin cell with band, regime, gain_margin_db and phase_margin_deg");
        e.allowOnly(CELL_KEYS);
        FrequencyBand band = band(e.required("band", bandWords()));
        SpeedRegime regime = regime(e.required("regime", regimeWords()));
        double gm = e.required("gain_margin_db", "the required gain margin (dB)").number();
        double pm = e.required("phase_margin_deg", "the required phase margin (deg)").number();
        if (given.computeIfAbsent(band, b -> new EnumMap<>(SpeedRegime.class))
            .put(regime, Boolean.TRUE) != null) {
          throw e.fail("each band and regime at most once",
              "a second cell for band " + band.key() + " and regime " + regime.key());
        }
        MarginCell cell = e.build(() -> new MarginCell(band, regime, gm, pm));
        cells.computeIfAbsent(band, b -> new EnumMap<>(SpeedRegime.class)).put(regime, cell);
        overridden.add(band.key() + "/" + regime.key());
      }
    }
    List<MarginCell> all = new ArrayList<>();
    for (FrequencyBand b : FrequencyBand.values()) {
      for (SpeedRegime s : SpeedRegime.values()) {
        if (s == SpeedRegime.BEYOND) {
          continue;
        }
        MarginCell c = cells.getOrDefault(b, Map.of()).get(s);
        if (c == null) {
          JsonField at = marginsField != null ? marginsField : presetField;
          throw at.fail("a margin cell for every band and regime (preset \"" + PRESET_NONE
              + "\" gives none)", "no cell for band " + b.key() + " and regime " + s.key());
        }
        all.add(c);
      }
    }

    double factor = scalar(r, "extended_speed_factor",
        ClearanceRequirements.DEFAULT_EXTENDED_SPEED_FACTOR, overridden);
    double peak = scalar(r, "structural_peak_limit_db",
        ClearanceRequirements.DEFAULT_STRUCTURAL_PEAK_LIMIT_DB, overridden);
    double phase = scalar(r, "phase_stabilisation_margin_deg",
        ClearanceRequirements.DEFAULT_PHASE_STABILISATION_MARGIN_DEG, overridden);
    double unc = scalar(r, "frequency_uncertainty",
        ClearanceRequirements.DEFAULT_FREQUENCY_UNCERTAINTY, overridden);
    double flutter = scalar(r, "flutter_speed_factor",
        ClearanceRequirements.DEFAULT_FLUTTER_SPEED_FACTOR, overridden);
    double g = scalar(r, "minimum_damping_g", ClearanceRequirements.DEFAULT_MINIMUM_DAMPING_G,
        overridden);

    String file = r.source().display();
    StringBuilder source = new StringBuilder();
    if (recalled) {
      source.append(RequirementPresets.RECALLED_MILITARY_AND_TRANSPORT_SOURCE);
      if (!overridden.isEmpty()) {
        source.append(" Overridden by ").append(file).append(": ")
            .append(String.join(", ", overridden)).append('.');
      }
    } else {
      source.append("Requirements table given in full in ").append(file)
          .append(" (defaults of common practice for the values it does not give).");
    }
    if (!description.isBlank()) {
      source.append(" ").append(description);
    }
    String text = source.toString();
    return r.build(() -> new ClearanceRequirements(v0, vl, factor, all, peak, phase, unc, flutter,
        g, text, recalled));
  }

  private static double speed(JsonField f) {
    f.positive();
    return f.path().endsWith("_kt")
        ? f.quantity(PlausibleRange.AIRSPEED, CaseReader.METRES_PER_SECOND_PER_KNOT, "kt")
        : f.quantity(PlausibleRange.AIRSPEED);
  }

  private static double scalar(JsonField r, String key, double dflt, List<String> overridden) {
    JsonField f = r.optional(key);
    if (f == null) {
      return dflt;
    }
    overridden.add(key);
    return f.finite();
  }

  private static String bandWords() {
    StringBuilder sb = new StringBuilder();
    for (FrequencyBand b : FrequencyBand.values()) {
      sb.append(sb.length() == 0 ? "" : ", ").append('"').append(b.key()).append('"');
    }
    return "one of " + sb;
  }

  private static String regimeWords() {
    StringBuilder sb = new StringBuilder();
    for (SpeedRegime s : SpeedRegime.values()) {
      if (s != SpeedRegime.BEYOND) {
        sb.append(sb.length() == 0 ? "" : ", ").append('"').append(s.key()).append('"');
      }
    }
    return "one of " + sb;
  }

  private static FrequencyBand band(JsonField f) {
    List<String> keys = new ArrayList<>();
    for (FrequencyBand b : FrequencyBand.values()) {
      keys.add(b.key());
    }
    String t = f.choice(keys);
    for (FrequencyBand b : FrequencyBand.values()) {
      if (b.key().equals(t)) {
        return b;
      }
    }
    throw new IllegalStateException(t);
  }

  private static SpeedRegime regime(JsonField f) {
    List<String> keys = new ArrayList<>();
    for (SpeedRegime s : SpeedRegime.values()) {
      if (s != SpeedRegime.BEYOND) {
        keys.add(s.key());
      }
    }
    String t = f.choice(keys);
    for (SpeedRegime s : SpeedRegime.values()) {
      if (s.key().equals(t)) {
        return s;
      }
    }
    throw new IllegalStateException(t);
  }
}
