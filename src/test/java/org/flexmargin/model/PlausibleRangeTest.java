package org.flexmargin.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The table of plausible ranges is consistent with itself and with its documentation. */
class PlausibleRangeTest {

  @Test
  void usualRangesLieInsidePlausibleOnesAndNamesAreUnique() {
    Set<String> ids = new HashSet<>();
    for (PlausibleRange r : PlausibleRange.values()) {
      assertTrue(ids.add(r.id()), "duplicate id " + r.id());
      assertTrue(r.plausibleMin() < r.plausibleMax(), r.id());
      assertTrue(r.usualMin() >= r.plausibleMin() && r.usualMax() <= r.plausibleMax(), r.id());
      assertTrue(r.usualMin() <= r.usualMax(), r.id());
      assertTrue(r.id().matches("[a-z_]+(\\.[a-z0-9_]+)+"), r.id());
      assertEquals(r, PlausibleRange.byId(r.id()));
    }
  }

  @Test
  void fitSeparatesUsualUnusualAndImplausible() {
    PlausibleRange w = PlausibleRange.STRIP_WIDTH;
    assertEquals(PlausibleRange.Fit.USUAL, w.fit(1.0));
    assertEquals(PlausibleRange.Fit.UNUSUAL, w.fit(25.0));
    assertEquals(PlausibleRange.Fit.IMPLAUSIBLE, w.fit(1e6));
    assertEquals(PlausibleRange.Fit.USUAL, w.fit(w.usualMax()), "bounds are inclusive");
    assertEquals(PlausibleRange.Fit.UNUSUAL, w.fit(w.plausibleMax()), "bounds are inclusive");
    assertEquals(PlausibleRange.Fit.IMPLAUSIBLE, w.fit(Double.NaN));
  }

  @Test
  void everyRangeIsDocumentedWithItsBounds() throws IOException {
    String doc = Files.readString(Path.of("docs/case-files.md"));
    for (PlausibleRange r : PlausibleRange.values()) {
      String bounds = "| [" + PlausibleRange.num(r.plausibleMin()) + ", " + PlausibleRange.num(r.plausibleMax())
          + "] | [" + PlausibleRange.num(r.usualMin()) + ", " + PlausibleRange.num(r.usualMax()) + "] | "
          + (r.overridable() ? "yes" : "no") + " |";
      int row = doc.indexOf("| `" + r.id() + "` |");
      assertTrue(row >= 0, "docs/case-files.md lacks a row for " + r.id());
      String line = doc.substring(row, doc.indexOf('\n', row));
      assertTrue(line.endsWith(bounds), "docs/case-files.md row of " + r.id() + " is <" + line + ">, expected bounds "
          + bounds);
    }
  }
}
