package org.flexmargin.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.simulate.RandomResponse;
import org.flexmargin.simulate.SimulationResult;
import org.flexmargin.simulate.TimeHistory;

/**
 * Result files of {@code simulate}: time histories as CSV (SI, unit in every column name),
 * the gust peaks, the turbulence RMS table, a plain-text summary with the cautions, and the charts
 * (PNG).
 */
public final class SimulationFiles {
  private SimulationFiles() {}

  /**
   * Writes every file into a folder (the caller makes the folder atomic).
   *
   * @param folder existing, empty folder
   * @param r the results
   * @param summary the summary lines (as printed), cautions appended here
   * @param title words for chart titles (configuration and speed)
   * @throws IOException on failure
   */
  public static void write(Path folder, SimulationResult r, List<String> summary, String title) throws IOException {
    if (r.pilot() != null) {
      Files.writeString(folder.resolve("pilot-input.csv"), csv(r.pilot()));
      charts(folder, r.scenario().pilotInput().id(), title + ", " + r.scenario().pilotInput().id(), r.pilot(), r);
    }
    if (!r.gusts().isEmpty()) {
      StringBuilder sb = new StringBuilder(
          "gradient_length_m,peak_load_factor_g,peak_elevator_rate_rad_per_s,peak_elevator_rad,"
              + "peak_rigid_pitch_rate_rad_per_s,time_of_peak_load_s\n");
      for (SimulationResult.GustPeak g : r.gusts()) {
        sb.append(String.format(Locale.ROOT, "%.3f,%.6g,%.6g,%.6g,%.6g,%.4f%n", g.gradientLengthM(),
            g.peakLoadFactorG(), g.peakElevatorRateRadPerS(), g.peakElevatorRad(), g.peakPitchRateRadPerS(),
            g.timeOfPeakS()));
      }
      Files.writeString(folder.resolve("gust-peaks.csv"), sb.toString());
      Files.writeString(folder.resolve("worst-gust.csv"), csv(r.worstGust()));
      charts(folder, "worst-gust", title + ", worst 1-cosine gust", r.worstGust(), r);
    }
    if (r.turbulence() != null) {
      RandomResponse.Result t = r.turbulence();
      StringBuilder sb = new StringBuilder("output,exact_rms,simulated_rms,simulated_rms_95pct_half_width\n");
      for (int o = 0; o < t.names().size(); o++) {
        sb.append(String.format(Locale.ROOT, "%s,%.6g,%.6g,%.3g%n", t.names().get(o), t.exactRms()[o],
            t.simulatedRms()[o], t.rmsHalfWidth95(o)));
      }
      Files.writeString(folder.resolve("turbulence-rms.csv"), sb.toString());
      Files.writeString(folder.resolve("turbulence.csv"), csv(t.history()));
    }
    List<String> all = new ArrayList<>(summary);
    all.add("");
    all.addAll(Cautions.TEXT);
    Files.writeString(folder.resolve("summary.txt"), String.join("\n", all) + "\n");
  }

  private static void charts(Path folder, String stem, String title, TimeHistory h, SimulationResult r)
      throws IOException {
    Path dir = Files.createDirectories(folder.resolve("charts"));
    for (ReportChart c : SimulationCharts.of(ResultFiles.fileSafe(stem), title, h, r.scenario().limits())) {
      Files.write(dir.resolve(c.fileStem() + ".png"), c.png());
    }
  }

  /** @return the history as CSV: time_s then every channel */
  static String csv(TimeHistory h) {
    StringBuilder sb = new StringBuilder("time_s");
    for (String n : h.names()) {
      sb.append(',').append(n);
    }
    sb.append('\n');
    double[] t = h.timesS();
    double[][] v = h.values();
    for (int k = 0; k < t.length; k++) {
      sb.append(String.format(Locale.ROOT, "%.5f", t[k]));
      for (double[] channel : v) {
        sb.append(',').append(String.format(Locale.ROOT, "%.6g", channel[k]));
      }
      sb.append('\n');
    }
    return sb.toString();
  }
}
