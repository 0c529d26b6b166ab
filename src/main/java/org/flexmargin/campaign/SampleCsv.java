package org.flexmargin.campaign;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.io.CsvLine;

/**
 * The per-sample result files: one line per sample ({@code samples.csv}) and one line per sample
 * and grid point ({@code margins.csv}). Numbers are written in Java's shortest round-trip form,
 * so a line read back gives the same doubles and the same bytes; "not found" is an empty field.
 */
public final class SampleCsv {
  private final CampaignPlan plan;

  /** @param plan the campaign (for the cell and parameter columns) */
  public SampleCsv(CampaignPlan plan) {
    this.plan = plan;
  }

  /** @return the header line of {@code samples.csv} (no line end) */
  public String sampleHeader() {
    StringBuilder sb = new StringBuilder("task,cell,sample,configuration,flight_condition,failure_state,gain_factor,"
        + "status,divergence_eas_mps,open_loop_flutter_eas_mps,closed_loop_onset_eas_mps,margin_onset_eas_mps,"
        + "critical_eas_mps");
    plan.spec().parameters().forEach(p -> sb.append(',').append(p.name()));
    return sb.append(",governing").toString();
  }

  /** Header line of {@code margins.csv} (no line end). */
  public static final String MARGIN_HEADER = "task,point,speed_eas_mps,gain_margin_db,phase_margin_deg";

  /** @return the sample's line of {@code samples.csv} (no line end) */
  public String sampleLine(SampleOutcome o) {
    Cell c = plan.cells().get(o.cell());
    StringBuilder sb = new StringBuilder();
    sb.append(o.task()).append(',').append(o.cell()).append(',').append(o.sample()).append(',')
        .append(quote(c.configuration())).append(',').append(quote(c.condition().name())).append(',')
        .append(quote(c.failure().name())).append(',').append(num(c.gainFactor())).append(',')
        .append(o.status().name()).append(',').append(num(o.divergenceEasMps())).append(',')
        .append(num(o.openLoopFlutterEasMps())).append(',').append(num(o.closedLoopOnsetEasMps())).append(',')
        .append(num(o.marginOnsetEasMps())).append(',').append(num(o.criticalEasMps()));
    for (double d : o.draws()) {
      sb.append(',').append(num(d));
    }
    return sb.append(',').append(quote(o.governing())).toString();
  }

  /** @return the sample's lines of {@code margins.csv} (each without line end) */
  public static List<String> marginLines(SampleOutcome o) {
    MarginCurve m = o.margins();
    double[] v = m.speedEasMps();
    double[] g = m.gainMarginDb();
    double[] p = m.phaseMarginDeg();
    List<String> out = new ArrayList<>(v.length);
    for (int i = 0; i < v.length; i++) {
      out.add(o.task() + "," + i + "," + num(v[i]) + "," + num(g[i]) + "," + num(p[i]));
    }
    return out;
  }

  /**
   * Reads a {@code samples.csv} line and the sample's margin lines back.
   *
   * @param line a line written by {@link #sampleLine}
   * @param margins the sample's margin lines, in point order
   * @return the outcome
   * @throws IllegalArgumentException if the line is not one this campaign writes
   */
  public SampleOutcome parse(String line, List<String> margins) {
    List<String> f = CsvLine.split(line, "samples.csv", 0);
    int np = plan.spec().parameters().size();
    if (f.size() != 14 + np) {
      throw new IllegalArgumentException("expected " + (14 + np) + " fields, found " + f.size());
    }
    double[] draws = new double[np];
    for (int i = 0; i < np; i++) {
      draws[i] = parseNum(f.get(13 + i));
    }
    int n = margins.size();
    double[] v = new double[n];
    double[] g = new double[n];
    double[] p = new double[n];
    for (int i = 0; i < n; i++) {
      String[] m = margins.get(i).split(",", -1);
      v[i] = parseNum(m[2]);
      g[i] = parseNum(m[3]);
      p[i] = parseNum(m[4]);
    }
    return new SampleOutcome(Integer.parseInt(f.get(0)), Integer.parseInt(f.get(1)), Integer.parseInt(f.get(2)),
        SampleStatus.valueOf(f.get(7)), parseNum(f.get(8)), parseNum(f.get(9)), parseNum(f.get(10)),
        parseNum(f.get(11)), parseNum(f.get(12)), f.get(13 + np), draws,
        n == 0 ? MarginCurve.EMPTY : new MarginCurve(v, g, p));
  }

  /** @return the task of a {@code samples.csv} or {@code margins.csv} line */
  public static int taskOf(String line) {
    int comma = line.indexOf(',');
    return Integer.parseInt(comma < 0 ? line : line.substring(0, comma));
  }

  static String num(double d) {
    return Double.isNaN(d) ? "" : Double.toString(d);
  }

  static double parseNum(String s) {
    return s.isEmpty() ? Double.NaN : Double.parseDouble(s);
  }

  static String quote(String s) {
    return "\"" + s.replace("\"", "\"\"") + "\"";
  }
}
