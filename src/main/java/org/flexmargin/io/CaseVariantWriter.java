package org.flexmargin.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Map;
import java.util.TreeMap;
import org.flexmargin.model.CaseVariant;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;

/**
 * Writes one campaign sample as a plain case file and its mode table (JSON) beside it: the base
 * case with one configuration, the sample's flight conditions, loop changes and perturbed modes.
 * Numbers are written in the shortest form that reads back to the same double, so {@code sweep}
 * on the written file analyses exactly the sample's case. Relative references to other files are
 * rewritten for the new folder.
 */
public final class CaseVariantWriter {
  private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
  private final Path baseCaseFile;
  private final JsonNode base;

  /**
   * @param baseCaseFile a case file that reads without error
   * @throws InputFileException if it cannot be read
   */
  public CaseVariantWriter(Path baseCaseFile) {
    this.baseCaseFile = baseCaseFile.toAbsolutePath().normalize();
    SourceFile src = SourceFile.read(baseCaseFile, baseCaseFile.toString());
    try {
      this.base = MAPPER.readTree(src.bytes());
    } catch (IOException e) {
      throw new UncheckedIOException("could not read " + baseCaseFile + ": " + e.getMessage(), e);
    }
  }

  /**
   * Writes {@code FOLDER/NAME.json} (the case) and {@code FOLDER/NAME-modes.json} (its mode table).
   *
   * @param variant the sample
   * @param folder an existing folder
   * @return the case file written
   */
  public Path write(CaseVariant variant, Path folder) {
    Path caseFile = folder.resolve(variant.name() + ".json");
    String modesName = variant.name() + "-modes.json";
    try {
      Files.writeString(folder.resolve(modesName), modeTableText(variant.modeTable(), variant.description()),
          StandardCharsets.UTF_8);
      Files.writeString(caseFile, caseText(variant, folder, modesName), StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new UncheckedIOException("could not write " + caseFile + ": " + e.getMessage(), e);
    }
    return caseFile;
  }

  /** @return the case text of {@code variant} for a file in {@code folder} naming {@code modesFile} */
  String caseText(CaseVariant v, Path folder, String modesFile) throws IOException {
    ObjectNode root = base.deepCopy();
    Path from = baseCaseFile.getParent();
    Path to = folder.toAbsolutePath().normalize();
    if (!from.equals(to)) {
      CaseFileUpdate.rebase(root, from, to);
    }
    root.put("name", v.name());
    root.put("description", v.description());
    ArrayNode configs = (ArrayNode) root.path("configurations");
    ObjectNode kept = null;
    for (JsonNode c : configs) {
      if (c.path("name").asText().equals(v.configuration())) {
        kept = (ObjectNode) c;
      }
    }
    if (kept == null) {
      throw new IllegalArgumentException("the base case has no configuration " + v.configuration());
    }
    kept.put("mode_table", modesFile);
    if (v.aeroScale() != 1.0) {
      for (JsonNode s : kept.path("aero").path("strip_theory").path("strips")) {
        ((ObjectNode) s).put("lift_slope_per_rad", s.path("lift_slope_per_rad").asDouble() * v.aeroScale());
      }
    }
    configs.removeAll();
    configs.add(kept);
    ObjectNode sweep = (ObjectNode) root.path("sweep");
    if (!Double.isNaN(v.altitudeM())) {
      sweep.remove("altitude_ft");
      sweep.remove("density_kg_per_m3");
      sweep.put("altitude_m", v.altitudeM());
    }
    if (!Double.isNaN(v.machNumber())) {
      sweep.put("mach", v.machNumber());
    }
    if (v.sweepPoints() > 0) {
      sweep.put("points", v.sweepPoints());
    }
    if (root.path("loop") instanceof ObjectNode loop) {
      editLoop(loop, v);
    }
    return MAPPER.writeValueAsString(root) + "\n";
  }

  private static void editLoop(ObjectNode loop, CaseVariant v) {
    if (v.actuatorBandwidthFactor() != 1.0) {
      ObjectNode a = (ObjectNode) loop.path("actuator");
      a.put("bandwidth_hz", a.path("bandwidth_hz").asDouble() * v.actuatorBandwidthFactor());
    }
    if (v.addedDelayS() != 0.0) {
      loop.put("computation_delay_s", loop.path("computation_delay_s").asDouble(0.0) + v.addedDelayS());
    }
    ArrayNode paths = (ArrayNode) loop.path("paths");
    for (Iterator<JsonNode> it = paths.elements(); it.hasNext(); ) {
      ObjectNode p = (ObjectNode) it.next();
      if (p.path("sensor").asText().equals(v.pathLost())) {
        it.remove();
        continue;
      }
      if (v.gainFactor() != 1.0) {
        p.put("proportional_gain", p.path("proportional_gain").asDouble() * v.gainFactor());
        if (p.has("integral_gain_per_s")) {
          p.put("integral_gain_per_s", p.path("integral_gain_per_s").asDouble() * v.gainFactor());
        }
      }
    }
  }

  /** @return a JSON mode table (format 1) holding {@code table} exactly */
  static String modeTableText(ModeTable table, String description) throws IOException {
    ObjectNode root = MAPPER.createObjectNode();
    root.put("format", 1);
    root.put("name", table.name());
    root.put("description", description);
    ArrayNode modes = root.putArray("modes");
    for (ElasticMode m : table.modes()) {
      ObjectNode o = modes.addObject();
      o.put("name", m.name());
      o.put("frequency_hz", m.frequencyHz());
      o.put("damping_ratio", m.dampingRatio());
      o.put("generalized_mass_kg", m.generalizedMassKg());
      ObjectNode shapes = o.putObject("shapes");
      for (Map.Entry<String, ShapeValue> e : new TreeMap<>(m.shapes()).entrySet()) {
        ObjectNode sv = shapes.putObject(e.getKey());
        sv.put("displacement_m", e.getValue().displacementM());
        sv.put("rotation_rad", e.getValue().rotationRad());
      }
    }
    return MAPPER.writeValueAsString(root) + "\n";
  }
}
