package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The chart that measures its legend once per drawing draws exactly what XChart's own chart
 * draws, also when series are added between drawings, and keeps its legend size only until the
 * drawing ends.
 */
class ReportXYChartTest {
  @BeforeAll
  static void headless() {
    System.setProperty("java.awt.headless", "true");
  }

  private static XYChartBuilder builder() {
    return new XYChartBuilder().width(700).height(400).title("legend check").xAxisTitle("x (m)").yAxisTitle("y (s)");
  }

  /** Three lines and a marker series, the names of different lengths. */
  private static void fill(XYChart chart, Set<String> used) {
    ReportStyle.apply(chart);
    double[] x = {0, 1, 2, 3, 4};
    for (int k = 0; k < 3; k++) {
      double[] y = new double[x.length];
      for (int i = 0; i < x.length; i++) {
        y[i] = (k + 1) * Math.sin(x[i] + k);
      }
      ChartSeries.line(chart, used, "line " + "k".repeat(4 * k + 1), x, y, ReportStyle.seriesColor(k),
          ReportStyle.seriesStroke(k));
    }
    ChartSeries.markers(chart, used, "onsets", new double[] {1.5}, new double[] {0.5}, ReportStyle.ONSET,
        SeriesMarkers.DIAMOND);
  }

  private static int[] pixels(XYChart chart) {
    BufferedImage image = new BufferedImage(chart.getWidth(), chart.getHeight(), BufferedImage.TYPE_INT_RGB);
    Graphics2D g = image.createGraphics();
    chart.paint(g, chart.getWidth(), chart.getHeight());
    g.dispose();
    return ((DataBufferInt) image.getRaster().getDataBuffer()).getData().clone();
  }

  @Test
  void drawsWhatXChartsOwnChartDraws() {
    XYChart plain = builder().build();
    XYChart once = ReportXYChart.of(builder());
    fill(plain, new HashSet<>());
    fill(once, new HashSet<>());
    int[] expected = pixels(plain);
    assertArrayEquals(expected, pixels(once));
    assertArrayEquals(expected, pixels(once), "drawn twice, the same");
  }

  @Test
  void aSeriesAddedBetweenDrawingsWidensTheLegend() {
    XYChart plain = builder().build();
    ReportXYChart once = (ReportXYChart) ReportXYChart.of(builder());
    Set<String> usedPlain = new HashSet<>();
    Set<String> usedOnce = new HashSet<>();
    fill(plain, usedPlain);
    fill(once, usedOnce);
    ReportXYChart twin = (ReportXYChart) ReportXYChart.of(builder());
    fill(twin, new HashSet<>());
    double width = twin.measuredLegend().getBounds().getWidth();
    int[] before = pixels(once);
    String longName = "a much longer legend entry than any before it";
    ChartSeries.line(plain, usedPlain, longName, new double[] {0, 4}, new double[] {-1, 1}, Color.GRAY,
        ReportStyle.referenceStroke(1f, null));
    ChartSeries.line(once, usedOnce, longName, new double[] {0, 4}, new double[] {-1, 1}, Color.GRAY,
        ReportStyle.referenceStroke(1f, null));
    assertTrue(once.measuredLegend().getBounds().getWidth() > width, "measured afresh after a drawing");
    int[] after = pixels(once);
    assertArrayEquals(pixels(plain), after);
    assertNotEquals(java.util.Arrays.hashCode(before), java.util.Arrays.hashCode(after));
  }

  @Test
  void sizeKeptUntilForgottenAndHandedOutAsACopy() {
    ReportXYChart once = (ReportXYChart) ReportXYChart.of(builder());
    XYChart plain = builder().build();
    Set<String> used = new HashSet<>();
    Set<String> usedPlain = new HashSet<>();
    fill(once, used);
    fill(plain, usedPlain);
    ReportXYChart.LegendMeasuredOnce legend = once.measuredLegend();
    Rectangle2D first = legend.getBounds();
    first.setRect(0, 0, 1, 1);
    Rectangle2D kept = legend.getBounds();
    assertNotEquals(1.0, kept.getWidth(), "the caller's change does not reach the kept size");
    ChartSeries.line(once, used, "an entry far longer than the others in this legend", new double[] {0, 1},
        new double[] {0, 1}, Color.GRAY, ReportStyle.referenceStroke(1f, null));
    assertEquals(kept, legend.getBounds(), "kept until forgotten");
    ChartSeries.line(plain, usedPlain, "an entry far longer than the others in this legend", new double[] {0, 1},
        new double[] {0, 1}, Color.GRAY, ReportStyle.referenceStroke(1f, null));
    assertArrayEquals(pixels(plain), pixels(once), "a drawing starts from a fresh measure");
    legend.forget();
    assertTrue(legend.getBounds().getWidth() > kept.getWidth(), "measured afresh");
  }
}
