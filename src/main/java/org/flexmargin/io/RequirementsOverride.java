package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.InputFile;

/**
 * A case judged against a standalone requirements file instead of its own {@code requirements}
 * section (the command line's {@code sweep --requirements FILE}).
 */
public final class RequirementsOverride {
  private RequirementsOverride() {}

  /**
   * @param analysisCase a validated case
   * @param file a standalone requirements file ({@link RequirementsReader#read})
   * @return the same case with that table; the file is added to the case's inputs with its SHA-256
   * @throws InputFileException on any unreadable, malformed or invalid requirements file
   */
  public static AnalysisCase apply(AnalysisCase analysisCase, Path file) {
    ClearanceRequirements requirements = RequirementsReader.read(file);
    SourceFile src = SourceFile.read(file, file.toString());
    List<InputFile> inputs = new ArrayList<>(analysisCase.inputs());
    inputs.add(new InputFile(src.display(), src.sha256()));
    return new AnalysisCase(analysisCase.format(), analysisCase.name(), analysisCase.description(),
        analysisCase.configurations(), analysisCase.sweep(), analysisCase.options(), inputs, analysisCase.loop(),
        requirements);
  }
}
