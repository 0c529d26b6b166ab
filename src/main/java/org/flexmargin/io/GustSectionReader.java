package org.flexmargin.io;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.model.PlausibleRange;

/**
 * Reads the optional {@code gusts} section of a case file (docs/case-files.md, "Gusts"): gust
 * penetration ({@code wing_to_tail_m}, {@code downwash_gradient}, {@code elevator_effectiveness},
 * all three or none) and {@code lift_growth}. {@link CaseReader#read} reads it too, so a case with a
 * bad section is refused by every command.
 */
public final class GustSectionReader {
  private static final List<String> KEYS =
      List.of("wing_to_tail_m", "downwash_gradient", "elevator_effectiveness", "lift_growth");

  private GustSectionReader() {}

  /**
   * @param caseFile the case file (read in full by {@link CaseReader#read} as well)
   * @return the section, or {@link GustSection#NONE} without one
   * @throws InputFileException on an invalid section (file, line, field path, expected, found)
   */
  public static GustSection read(Path caseFile) {
    ReadLog log = new ReadLog();
    JsonField root = JsonInput.parse(SourceFile.read(caseFile, caseFile.toString()), log).root().object("a case file");
    CaseReader.readOverrides(root.optional("plausibility_overrides"), log);
    return read(root.optional("gusts"), log);
  }

  /**
   * @param f the section, or null
   * @param log where warnings go (and the case's overrides come from)
   * @return the section
   */
  static GustSection read(JsonField f, ReadLog log) {
    if (f == null) {
      return GustSection.NONE;
    }
    f.object("a gusts section");
    f.allowOnly(KEYS);
    double d = f.has("wing_to_tail_m") ? f.optional("wing_to_tail_m").quantity(PlausibleRange.GUST_WING_TO_TAIL)
        : Double.NaN;
    double e = f.has("downwash_gradient") ? f.optional("downwash_gradient").number() : Double.NaN;
    double t = f.has("elevator_effectiveness") ? f.optional("elevator_effectiveness").number() : Double.NaN;
    String growth = f.has("lift_growth") ? f.optional("lift_growth").choice(GustSection.LIFT_GROWTH_WORDS) : null;
    return f.build(() -> new GustSection(d, e, t, growth, log.warnings()));
  }
}
