package org.flexmargin.io;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.flexmargin.model.EnvelopeSpec;

/**
 * Reads the {@code envelope} section of a case file (docs/lifting-surfaces.md, "Matched-point
 * envelopes"): the altitudes and Mach numbers of the matched-point lines, the speed range of the
 * constant-altitude lines and the design dive speed drawn with the boundary.
 */
public final class EnvelopeReader {
  private EnvelopeReader() {}

  /**
   * @param caseFile the case file (read in full by {@link CaseReader#read} as well)
   * @return the envelope section
   * @throws InputFileException when the file has no valid {@code envelope} section
   */
  public static EnvelopeSpec read(Path caseFile) {
    JsonField root = root(caseFile);
    JsonField e = root.optional("envelope");
    if (e == null) {
      throw root.fail("an envelope section (altitudes_m, from_tas_mps, to_tas_mps, dive_speed_eas_mps; "
          + "see docs/lifting-surfaces.md)", "none");
    }
    return section(e);
  }

  /**
   * @param caseFile the case file (read in full by {@link CaseReader#read} as well)
   * @return the envelope section, empty when the file has none
   * @throws InputFileException when the file's {@code envelope} section is invalid
   */
  public static Optional<EnvelopeSpec> readIfPresent(Path caseFile) {
    JsonField e = root(caseFile).optional("envelope");
    return e == null ? Optional.empty() : Optional.of(section(e));
  }

  private static JsonField root(Path caseFile) {
    return JsonInput.parse(SourceFile.read(caseFile, caseFile.toString())).root().object("a case file");
  }

  private static EnvelopeSpec section(JsonField e) {
    e.object("an envelope section");
    e.allowOnly(List.of("altitudes_m", "mach_numbers", "from_tas_mps", "to_tas_mps", "points",
        "dive_speed_eas_mps", "dive_mach"));
    double[] alts = e.required("altitudes_m", "a list of altitudes (m), increasing").numbers("a list of altitudes (m)");
    double[] machs = e.has("mach_numbers")
        ? e.optional("mach_numbers").numbers("a list of Mach numbers, increasing") : new double[0];
    double from = e.required("from_tas_mps", "the lowest true airspeed of the constant-altitude lines (m/s)").finite();
    double to = e.required("to_tas_mps", "the highest true airspeed of the constant-altitude lines (m/s)").finite();
    int points = e.has("points") ? e.optional("points").integer() : 41;
    double vd = e.required("dive_speed_eas_mps", "the design dive speed V_D as EAS (m/s)").finite();
    double md = e.has("dive_mach") ? e.optional("dive_mach").finite() : Double.NaN;
    return e.build(() -> new EnvelopeSpec(alts, machs, from, to, points, vd, md));
  }
}
