package org.flexmargin.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.ForkJoinPool;
import org.flexmargin.flutter.BranchCurve;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.SolverDiagnostics;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FlutterMethodKind;
import org.junit.jupiter.api.Test;

/**
 * The small parts of the loop drivers on hand-made inputs: how far open-loop tracking is trusted,
 * the record of an exact-loop refinement, the parallel map and the stage count of the progress.
 */
class LoopDriverHelpersUnitTest {

  private static BranchCurve branch(double... easMps) {
    int n = easMps.length;
    boolean[] ok = new boolean[n];
    java.util.Arrays.fill(ok, true);
    return new BranchCurve("a", new double[n], easMps, easMps, new double[n], new double[n], new double[n],
        new double[n], ok);
  }

  private static FlutterSolution solution(double firstTrouble, BranchCurve... b) {
    return new FlutterSolution(FlutterMethodKind.PK, List.of(b), List.of(),
        new SolverDiagnostics(0, 0, 0, 0, 0, 1, 0, firstTrouble), List.of());
  }

  @Test
  void trackingIsTrustedUpToTheGridPointBeforeTheFirstTrouble() {
    BranchCurve b = branch(40, 50, 60, 70, 80);
    // clean tracking: nothing to say, and nothing is unreliable
    assertTrue(TrackingTrust.trustedUpToEasMps(solution(Double.NaN, b)).isEmpty());
    assertFalse(TrackingTrust.unreliableAt(solution(Double.NaN, b), 1e6));
    // trouble first at grid point 3 (70 m/s): trusted up to point 2 (60 m/s)
    assertEquals(OptionalDouble.of(60), TrackingTrust.trustedUpToEasMps(solution(3, b)));
    // a parameter a rounding below the grid point is that grid point (the 1e-9 guard)
    assertEquals(OptionalDouble.of(60), TrackingTrust.trustedUpToEasMps(solution(3 - 1e-12, b)));
    // trouble between points 3 and 4: still the point before the interval's start
    assertEquals(OptionalDouble.of(60), TrackingTrust.trustedUpToEasMps(solution(3.6, b)));
    // trouble at the first point: the first point; beyond the branch: its last point
    assertEquals(OptionalDouble.of(40), TrackingTrust.trustedUpToEasMps(solution(0, b)));
    assertEquals(OptionalDouble.of(40), TrackingTrust.trustedUpToEasMps(solution(1, b)));
    assertEquals(OptionalDouble.of(80), TrackingTrust.trustedUpToEasMps(solution(9, b)));
    // no branch: nothing known
    assertTrue(TrackingTrust.trustedUpToEasMps(solution(3)).isEmpty());
    // a finding strictly above the trusted speed is unreliable; at it, not
    assertTrue(TrackingTrust.unreliableAt(solution(3, b), 60.001));
    assertFalse(TrackingTrust.unreliableAt(solution(3, b), 60));
    assertFalse(TrackingTrust.unreliableAt(solution(3, b), 45));
  }


  @Test
  void theParallelMapKeepsItemOrderForAnyNumberOfThreads() throws Exception {
    // item i is i^2 (closed form), whichever worker computes it
    List<Long> common = SweepParallel.map(200, i -> (long) i * i);
    ForkJoinPool one = new ForkJoinPool(1);
    ForkJoinPool three = new ForkJoinPool(3);
    try {
      List<Long> single = one.submit(() -> SweepParallel.map(200, i -> (long) i * i)).get();
      List<Long> several = three.submit(() -> SweepParallel.map(200, i -> (long) i * i)).get();
      List<Long> expected = new ArrayList<>();
      for (long i = 0; i < 200; i++) {
        expected.add(i * i);
      }
      assertEquals(expected, common);
      assertEquals(expected, single);
      assertEquals(expected, several);
    } finally {
      one.shutdown();
      three.shutdown();
    }
    assertTrue(SweepParallel.map(0, i -> i).isEmpty());
  }

  @Test
  void aConfigurationGoesThroughOneStagePlusTwoWithALoopPlusOneWithRequirements() {
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    assertEquals(4, SweepProgress.stagesPerConfiguration(demo));
    AnalysisCase loopOnly = new AnalysisCase(1, "d", "", demo.configurations(), demo.sweep(), demo.options(),
        List.of(), demo.loop());
    assertEquals(3, SweepProgress.stagesPerConfiguration(loopOnly));
    AnalysisCase requirementsOnly = new AnalysisCase(1, "d", "", demo.configurations(), demo.sweep(), demo.options(),
        List.of(), null, demo.requirements());
    assertEquals(2, SweepProgress.stagesPerConfiguration(requirementsOnly));
    AnalysisCase neither = new AnalysisCase(1, "d", "", demo.configurations(), demo.sweep(), demo.options(),
        List.of());
    assertEquals(1, SweepProgress.stagesPerConfiguration(neither));
    SweepProgress.NONE.stageDone("c", "flutter");
  }
}
