package org.flexmargin.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.report.Cautions;
import org.flexmargin.sweep.Finding;

/** Text tables for the terminal. */
final class Tables {
  private Tables() {}

  static String condition(FlightCondition fc) {
    return String.format(Locale.ROOT, "altitude %.0f m, %.1f m/s EAS (%.1f kt), %.1f m/s TAS, Mach %.3f, q %.0f Pa",
        fc.altitudeM(), fc.speedEasMps(), fc.speedEasMps() * Finding.KNOTS_PER_MPS, fc.speedTasMps(), fc.mach(),
        fc.dynamicPressurePa());
  }

  static void findings(PrintWriter out, List<Finding> findings, boolean colour) {
    String header = String.format(Locale.ROOT, "%-14s %-33s %-22s %9s %8s %9s %6s %8s %8s",
        "configuration", "finding", "mode", "EAS m/s", "EAS kt", "TAS m/s", "Mach", "alt m", "freq Hz");
    out.println(header);
    out.println("-".repeat(header.length()));
    for (Finding f : findings) {
      String line = String.format(Locale.ROOT, "%-14s %-33s %-22s %9s %8s %9s %6s %8.0f %8s",
          clip(f.configuration(), 14), f.what(), clip(f.mode(), 22), num(f.speedEasMps(), "%.2f"),
          num(f.speedEasKnots(), "%.1f"), num(f.speedTasMps(), "%.2f"), num(f.mach(), "%.3f"),
          f.altitudeM(), f.frequencyHz() > 0 ? num(f.frequencyHz(), "%.3f") : "-");
      if (colour && (f.what().startsWith("flutter onset") || f.what().equals("divergence"))) {
        line = "\u001b[1;31m" + line + "\u001b[0m";
      }
      out.println(line);
    }
  }

  static void cautions(PrintWriter out) {
    out.println();
    out.println("Cautions:");
    for (String c : Cautions.TEXT) {
      out.println("  * " + c);
    }
  }

  private static String num(double v, String fmt) {
    return Double.isFinite(v) ? String.format(Locale.ROOT, fmt, v) : "-";
  }

  private static String clip(String s, int n) {
    return s.length() <= n ? s : s.substring(0, n - 1) + "~";
  }
}
