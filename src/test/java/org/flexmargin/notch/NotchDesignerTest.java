package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.flexmargin.io.CaseReader;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/** How a design assembles its parts on the invented demo at its first sweep point. */
class NotchDesignerTest {
  private static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void designAssemblesPeaksCostsAndTheIndependentRerun() {
    NotchDesignSpec spec = NotchDesignSpec.defaults().withPoints(1, 35);
    NotchDesignResult r = new NotchDesigner().design(DEMO, spec);
    assertEquals(DEMO.name(), r.caseName());
    assertEquals(spec, r.spec());
    assertEquals(PathFilters.defaultNotchPaths(DEMO), r.notchPaths());
    // the designed loop is the case's loop with the designed notches in the carrying paths
    List<NotchFilter> notches = r.notches().stream().map(DesignedNotch::filter).toList();
    assertEquals(PathFilters.withNotches(DEMO.loop(), r.notchPaths(), ExistingNotches.REPLACE, notches),
        r.designedLoop());
    // one peak change per mode, before with the case's own filters
    LoopSamples original = CaseLoopSampler.sample(DEMO, DEMO.loop(), r.notchPaths(), spec);
    assertEquals(original.modeNames(), r.peaks().stream().map(ModePeakChange::mode).toList());
    List<ModePeak> before = NotchDesigner.worstPeaks(original, new NotchEvaluator(original).evaluate(List.of()));
    for (int m = 0; m < before.size(); m++) {
      assertEquals(before.get(m), r.peaks().get(m).before());
      assertEquals(before.get(m).mode(), r.peaks().get(m).after().mode());
    }
    // phase cost over all, then per configuration in case order; "all" is the worst of them
    assertEquals(1 + DEMO.configurations().size(), r.phaseCost().size());
    assertEquals("all", r.phaseCost().get(0).configuration());
    double worst = Double.NEGATIVE_INFINITY;
    for (int c = 0; c < DEMO.configurations().size(); c++) {
      PhaseCost pc = r.phaseCost().get(c + 1);
      assertEquals(DEMO.configurations().get(c).name(), pc.configuration());
      worst = Math.max(worst, pc.worstLossDeg());
    }
    assertEquals(worst, r.phaseCost().get(0).worstLossDeg());
    // the case's own 8.6 Hz notch, replaced, lags at the rigid-body crossovers (below its centre)
    PhaseCost own = r.originalPhaseCost();
    assertEquals("all", own.configuration());
    assertTrue(own.worstLossDeg() > 0, own.toString());
    // independent re-run: one margin pair per configuration at the one design point, one checked
    // peak per mode there
    assertEquals(DEMO.configurations().size(), r.margins().size());
    for (MarginComparison mc : r.margins()) {
      assertEquals(0, mc.before().gridPoint());
      assertEquals(35, mc.before().speedEasMps(), 1e-9);
      assertEquals(mc.before().configuration(), mc.after().configuration());
    }
    assertEquals(DEMO.configurations().size() * original.modeNames().size(), r.checkedPeaks().size());
    if (r.feasible()) {
      assertTrue(r.violations().isEmpty());
      for (CheckedPeak p : r.checkedPeaks()) {
        assertTrue(p.peakDb() <= spec.peakLimitDb() + NotchDesigner.INDEPENDENT_PEAK_TOLERANCE_DB, p.toString());
      }
      for (MarginComparison mc : r.margins()) {
        assertTrue(!mc.before().meetsRequirement() || mc.after().meetsRequirement(), mc.toString());
      }
    } else {
      assertFalse(r.reasons().isEmpty());
    }
  }

  @Test
  void keptNotchesCostNothingExtra() {
    NotchDesignSpec spec = NotchDesignSpec.defaults().withPoints(1, 35).withExistingNotches(ExistingNotches.KEEP)
        .withNotchPaths(List.of(0));
    NotchDesignResult r = new NotchDesigner().design(DEMO, spec);
    assertEquals(List.of(0), r.notchPaths());
    // the case's 8.6 Hz notch is kept, so there is no replaced notch whose lag to compare
    assertEquals(0.0, r.originalPhaseCost().worstLossDeg(), 0.0);
    // it stays in path 0 behind the designed notches; path 1 is untouched
    assertTrue(r.designedLoop().paths().get(0).filters().contains(
        new org.flexmargin.model.NotchFilterSpec(8.6, 0.05, 0.5)));
    assertEquals(DEMO.loop().paths().get(1), r.designedLoop().paths().get(1));
  }

  @Test
  void checkNeedsALoopAndATable() {
    AnalysisCase noTable = new AnalysisCase(1, "n", "", DEMO.configurations(), DEMO.sweep(), DEMO.options(),
        List.of(), DEMO.loop(), null);
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> new NotchDesigner().check(noTable, NotchDesignSpec.defaults()));
    assertEquals("requirements", e.fieldPath());
    AnalysisCase open = new AnalysisCase(1, "o", "", DEMO.configurations(), DEMO.sweep(), DEMO.options(), List.of());
    assertEquals("loop", assertThrows(InvalidInputException.class,
        () -> new NotchDesigner().check(open, NotchDesignSpec.defaults())).fieldPath());
    assertEquals("loop", assertThrows(InvalidInputException.class,
        () -> new NotchDesigner().design(open, NotchDesignSpec.defaults())).fieldPath());
    assertNull(open.loop());
  }
}
