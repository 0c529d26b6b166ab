package org.flexmargin.report;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.flexmargin.simulate.ActuatorLimits;
import org.flexmargin.simulate.AircraftSimulationModel;
import org.flexmargin.simulate.TimeHistory;
import org.knowm.xchart.XYChart;

/**
 * Time-history charts of a simulation: the sensors and rigid pitch rate, the elevator position and
 * rate against their limits, and the modal coordinates. Degrees for angles on the axes.
 */
public final class SimulationCharts {
  private static final BasicStroke SOLID = new BasicStroke(1.6f);
  private static final BasicStroke DASHED = new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
      new float[] {6f, 4f}, 0f);

  private SimulationCharts() {}

  /**
   * @param stem file stem prefix, e.g. "doublet"
   * @param title what was simulated, e.g. "1 deg doublet, full_payload, 100 m/s EAS"
   * @param h the history
   * @param limits the actuator limits (drawn where finite)
   * @return three charts
   */
  public static List<ReportChart> of(String stem, String title, TimeHistory h, ActuatorLimits limits) {
    List<ReportChart> out = new ArrayList<>();
    double[] t = h.timesS();
    XYChart sensors = ChartSeries.timeChart(title + ": sensors", "sensor signal (deg/s, g)");
    Set<String> used = new HashSet<>();
    int colour = 0;
    for (int i = 0; i < h.names().size(); i++) {
      String name = h.names().get(i);
      if (name.startsWith("sensor_") || name.equals(AircraftSimulationModel.PITCH_RATE)) {
        double[] v = h.values()[i];
        String label = name;
        if (name.endsWith("_rad_per_s")) {
          v = degrees(v);
          label = name.replace("_rad_per_s", " (deg/s)");
        } else if (name.endsWith("_rad")) {
          v = degrees(v);
          label = name.replace("_rad", " (deg)");
        } else if (name.endsWith("_g")) {
          label = name.substring(0, name.length() - 2) + " (g)";
        }
        ChartSeries.line(sensors, used, label, t, v, ReportStyle.seriesColor(colour++),
            SOLID);
      }
    }
    out.add(new ReportChart(stem + "-sensors", title + ": sensor signals and rigid pitch rate.", sensors, List.of()));
    XYChart elevator = ChartSeries.timeChart(title + ": elevator", "elevator (deg), rate (deg/s)");
    used = new HashSet<>();
    ChartSeries.line(elevator, used, "command (deg)", t, degrees(h.channel(AircraftSimulationModel.ELEVATOR_COMMAND)),
        ReportStyle.seriesColor(1), DASHED);
    ChartSeries.line(elevator, used, "position (deg)", t, degrees(h.channel(AircraftSimulationModel.ELEVATOR)),
        ReportStyle.seriesColor(0), SOLID);
    ChartSeries.line(elevator, used, "rate (deg/s)", t, degrees(h.channel(AircraftSimulationModel.ELEVATOR_RATE)),
        ReportStyle.seriesColor(2), SOLID);
    List<String> notes = new ArrayList<>();
    if (Double.isFinite(limits.rateLimitRadPerS())) {
      double r = Math.toDegrees(limits.rateLimitRadPerS());
      ChartSeries.line(elevator, used, "rate limit", new double[] {t[0], t[t.length - 1]}, new double[] {r, r},
          ReportStyle.LIMIT_LINE, DASHED);
      ChartSeries.line(elevator, used, "-rate limit", new double[] {t[0], t[t.length - 1]}, new double[] {-r, -r},
          ReportStyle.LIMIT_LINE, DASHED);
    } else {
      notes.add("no actuator rate limit given: the actuator is linear");
    }
    out.add(new ReportChart(stem + "-elevator", title + ": elevator command, position and rate.", elevator, notes));
    XYChart modes = ChartSeries.timeChart(title + ": modal coordinates", "modal coordinate");
    used = new HashSet<>();
    colour = 0;
    for (int i = 0; i < h.names().size(); i++) {
      String name = h.names().get(i);
      if (name.endsWith("_modal_coordinate")) {
        ChartSeries.line(modes, used, name.replace("_modal_coordinate", ""), t, h.values()[i],
            ReportStyle.seriesColor(colour++), SOLID);
      }
    }
    out.add(new ReportChart(stem + "-modes", title + ": elastic modal coordinates (unit of the mode table's "
        + "normalisation).", modes, List.of()));
    return out;
  }

  /** @return the values in degrees */
  static double[] degrees(double[] v) {
    double[] d = new double[v.length];
    for (int i = 0; i < v.length; i++) {
      d[i] = Math.toDegrees(v[i]);
    }
    return d;
  }
}
