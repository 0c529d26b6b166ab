package org.flexmargin.sweep;

import static org.flexmargin.sweep.InstabilityFindingsTest.point;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.List;
import org.flexmargin.model.FlutterMethodKind;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/**
 * A closed-loop result has its roots at the sweep start at least: the findings read the start's
 * roots from it, so a result without points is refused where it is made, naming the field.
 */
class ClosedLoopResultTest {

  @Test
  void aResultWithoutSweepPointsIsRefusedNamingTheField() {
    for (List<ClosedLoopPoint> none : Arrays.asList(List.<ClosedLoopPoint>of(), null)) {
      InvalidInputException e = assertThrows(InvalidInputException.class,
          () -> new ClosedLoopResult(none, List.of(), "fit", 0, List.of(), List.of()));
      assertEquals("closed_loop.points", e.fieldPath());
      assertEquals("closed_loop.points: expected at least one sweep point (the sweep start), found none",
          e.getMessage());
    }
  }

  @Test
  void theStartIsTheFirstPointOfThePath() {
    ClosedLoopPoint first = point(50, new ClosedLoopRoot(-1, 20, "bending"));
    ClosedLoopPoint second = point(100, new ClosedLoopRoot(0.5, 20, "bending"));
    ClosedLoopResult r = new ClosedLoopResult(List.of(first, second), List.of(), "fit", 2, List.of(), List.of());
    assertSame(first, r.start());
    assertEquals(List.of(first, second), r.points());
  }

  @Test
  void onlyARootUnstableAtTheFirstPointIsAFindingAtTheStart() {
    // stable at 50 m/s, unstable from 100 m/s (no refined crossing given): nothing at the start
    ServoResult s = InstabilityFindingsTest.servo(List.of(point(50, new ClosedLoopRoot(-1, 20, "bending")),
        point(100, new ClosedLoopRoot(0.5, 20, "bending"))), List.of());
    ConfigurationResult c = InstabilityFindingsTest.result(InstabilityFindingsTest.NO_DIVERGENCE,
        InstabilityFindingsTest.solution(FlutterMethodKind.K, List.of(), List.of(), Double.NaN),
        s);
    List<Finding> all = Findings.of(InstabilityFindingsTest.sweep(c), InstabilityFindingsTest.seaLevel(50));
    assertEquals(List.of("no divergence"), all.stream().map(Finding::what).toList());
  }

  @Test
  void aLoopResultNeedsItsMarginsAndItsClosedLoop() {
    ClosedLoopResult cl = new ClosedLoopResult(List.of(point(50, new ClosedLoopRoot(-1, 20, "bending"))), List.of(),
        "fit", 1, List.of(), List.of());
    InvalidInputException noClosedLoop = assertThrows(InvalidInputException.class,
        () -> new ServoResult(List.of(), null));
    assertEquals("servo.closed_loop", noClosedLoop.fieldPath());
    InvalidInputException noPoints = assertThrows(InvalidInputException.class, () -> new ServoResult(null, cl));
    assertEquals("servo.points", noPoints.fieldPath());
    assertSame(cl, new ServoResult(List.of(), cl).closedLoop());
  }
}
