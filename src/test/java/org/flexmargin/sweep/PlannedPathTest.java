package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.PointList;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.SweepPoint;
import org.junit.jupiter.api.Test;

/** Sweep paths: grid points and interpolation between them. */
class PlannedPathTest {

  @Test
  void speedSweepInEquivalentAirspeed() {
    PlannedPath p = new PlannedPath(new SpeedSweep(5000, AirspeedKind.EQUIVALENT, 100, 200, 11));
    assertEquals(11, p.gridPoints());
    assertEquals(100, p.at(0).speedEasMps(), 1e-9);
    assertEquals(200, p.at(10).speedEasMps(), 1e-9);
    assertEquals(155, p.at(5.5).speedEasMps(), 1e-9);
    // US Standard Atmosphere 1976 at 5 000 m: rho = 0.7364 kg/m^3 (Mechanical Engineers' Handbook vol. 4 Table 6; docs/validation.md §2.1);
    // TAS = EAS sqrt(rho0/rho) = 128.98 m/s for 100 m/s EAS; 4 digits in the table
    assertEquals(128.98, p.at(0).speedTasMps(), 0.02);
  }

  @Test
  void machSweepKeepsMachAndMovesAltitude() {
    PlannedPath p = new PlannedPath(new MachSweep(0.6, 10000, 0, 5));
    for (double t = 0; t <= 4; t += 0.5) {
      assertEquals(0.6, p.at(t).mach(), 1e-12);
    }
    assertEquals(10000, p.at(0).altitudeM(), 1e-9);
    assertEquals(5000, p.at(2).altitudeM(), 1e-9);
    // speed of sound at sea level 340.3 m/s (US Standard Atmosphere 1976; docs/validation.md §2.1)
    assertEquals(0.6 * 340.3, p.at(4).speedTasMps(), 0.6 * 0.05);
  }

  @Test
  void pointListInterpolatesAltitudeAndTrueAirspeed() {
    PlannedPath p = new PlannedPath(new PointList(List.of(
        new SweepPoint(0, 100, AirspeedKind.TRUE), new SweepPoint(2000, 200, AirspeedKind.TRUE),
        new SweepPoint(2000, 150, AirspeedKind.EQUIVALENT))));
    FlightCondition mid = p.at(0.5);
    assertEquals(1000, mid.altitudeM(), 1e-9);
    assertEquals(150, mid.speedTasMps(), 1e-9);
    assertEquals(150, p.at(2).speedEasMps(), 1e-9);
    assertThrows(IllegalArgumentException.class, () -> p.at(2.5));
  }
}
