package org.flexmargin.sweep;

import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.flutter.FlightPath;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.PointList;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.SweepPlan;
import org.flexmargin.model.SweepPoint;

/**
 * The flight path of a {@link SweepPlan}, continuous in its parameter t:
 *
 * <ul>
 *   <li>speed sweep: altitude fixed, speed (EAS or TAS as planned) linear in t;
 *   <li>Mach sweep: Mach fixed, altitude linear in t, true airspeed M a(h);
 *   <li>point list: altitude and true airspeed linear in t between consecutive points.
 * </ul>
 *
 * <p>Immutable and thread-safe.
 */
public final class PlannedPath implements FlightPath {
  private final SweepPlan plan;
  private final double[] pointAltitudeM;
  private final double[] pointTasMps;
  private final int subdivisions;

  /** @param plan the sweep plan */
  public PlannedPath(SweepPlan plan) {
    this(plan, 1);
  }

  private PlannedPath(SweepPlan plan, int subdivisions) {
    this.plan = plan;
    this.subdivisions = subdivisions;
    if (plan instanceof PointList list) {
      List<SweepPoint> pts = list.points();
      pointAltitudeM = new double[pts.size()];
      pointTasMps = new double[pts.size()];
      for (int i = 0; i < pts.size(); i++) {
        SweepPoint sp = pts.get(i);
        pointAltitudeM[i] = sp.altitudeM();
        pointTasMps[i] = StandardAtmosphere.of(sp.altitudeM(), sp.speedMps(), sp.kind()).speedTasMps();
      }
    } else {
      pointAltitudeM = null;
      pointTasMps = null;
    }
  }

  /**
   * The same path with every planned grid interval split into {@code factor} equal steps of the
   * path parameter (planned grid point i becomes grid point i x factor).
   *
   * @param factor subdivisions per planned interval (&gt;= 1)
   * @return the finer path
   */
  public PlannedPath refined(int factor) {
    if (factor < 1) {
      throw new IllegalArgumentException("refinement factor " + factor + " < 1");
    }
    return new PlannedPath(plan, subdivisions * factor);
  }

  /** @return planned grid intervals are split into this many steps (1 = as planned) */
  public int subdivisions() {
    return subdivisions;
  }

  @Override
  public int gridPoints() {
    return (plan.pointCount() - 1) * subdivisions + 1;
  }

  @Override
  public FlightCondition at(double tRefined) {
    double t = tRefined / subdivisions;
    int n = plan.pointCount();
    if (!(t >= -1e-9 && t <= n - 1 + 1e-9)) {
      throw new IllegalArgumentException("path parameter " + t + " outside [0, " + (n - 1) + "]");
    }
    double u = Math.min(Math.max(t / (n - 1), 0.0), 1.0);
    if (plan instanceof SpeedSweep s) {
      double v = s.fromMps() + u * (s.toMps() - s.fromMps());
      return StandardAtmosphere.of(s.altitudeM(), v, s.kind());
    }
    if (plan instanceof MachSweep m) {
      double h = m.fromAltitudeM() + u * (m.toAltitudeM() - m.fromAltitudeM());
      return StandardAtmosphere.atMach(h, m.machNumber());
    }
    int i = (int) Math.min(Math.floor(t), n - 2);
    i = Math.max(i, 0);
    double w = Math.min(Math.max(t - i, 0.0), 1.0);
    double h = pointAltitudeM[i] + w * (pointAltitudeM[i + 1] - pointAltitudeM[i]);
    double v = pointTasMps[i] + w * (pointTasMps[i + 1] - pointTasMps[i]);
    return StandardAtmosphere.of(h, v, AirspeedKind.TRUE);
  }

  /** @return a one-line description for reports */
  public String describe() {
    return subdivisions == 1 ? describePlan()
        : describePlan() + String.format(java.util.Locale.ROOT, ", re-solved with every interval split in %d",
            subdivisions);
  }

  private String describePlan() {
    if (plan instanceof SpeedSweep s) {
      return String.format(java.util.Locale.ROOT, "speed sweep at %.0f m, %s %.1f to %.1f m/s, %d points",
          s.altitudeM(), s.kind() == AirspeedKind.EQUIVALENT ? "EAS" : "TAS", s.fromMps(), s.toMps(), s.points());
    }
    if (plan instanceof MachSweep m) {
      return String.format(java.util.Locale.ROOT, "Mach %.3f from %.0f m to %.0f m, %d points",
          m.machNumber(), m.fromAltitudeM(), m.toAltitudeM(), m.points());
    }
    return plan.pointCount() + " listed flight points";
  }
}
