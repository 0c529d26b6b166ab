package org.flexmargin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;

/**
 * The look of every flexmargin chart: our own palette, fonts and strokes, chosen for legibility in
 * print and on screen. Mode curves take {@link #seriesColor(int)} in mode order; findings and
 * reference lines have fixed colours so that they read the same on every chart.
 */
public final class ReportStyle {
  private ReportStyle() {}

  /** Ten mode colours, distinguishable and dark enough for thin lines on a pale background. */
  private static final Color[] MODE_COLORS = {
    new Color(0x1F5F8B), // steel blue
    new Color(0xD0632A), // copper
    new Color(0x3C8D3F), // leaf green
    new Color(0x8A3C8F), // plum
    new Color(0xB5941F), // ochre
    new Color(0x2A9D9A), // teal
    new Color(0xC23B5A), // raspberry
    new Color(0x5B5B9E), // slate violet
    new Color(0x7A5230), // walnut
    new Color(0x6E8B1A), // olive
  };

  /** Dash patterns cycled after the colours run out, so that modes 11.. still differ. */
  private static final float[][] DASHES = {null, {9f, 4f}, {3f, 3f}, {12f, 4f, 3f, 4f}};

  /** Flutter onset marker colour. */
  public static final Color ONSET = new Color(0xB0121B);
  /** Flutter recovery marker colour. */
  public static final Color RECOVERY = new Color(0x0B6E4F);
  /** Damping-limit crossing (damping falls below the limit) marker colour. */
  public static final Color BELOW_LIMIT = new Color(0xE08A00);
  /** Damping back above the limit marker colour. */
  public static final Color ABOVE_LIMIT = new Color(0x4F5D6B);
  /** The g = 0 stability boundary. */
  public static final Color ZERO_LINE = new Color(0x202428);
  /** The damping-limit line. */
  public static final Color LIMIT_LINE = new Color(0x5A5F66);
  /** The divergence speed line. */
  public static final Color DIVERGENCE_LINE = new Color(0x000000);

  /** Speed-regime lines (V0max, V_L, factor x V_L). */
  public static final Color REGIME_LINE = new Color(0x4A5A6A);
  /** Closed-loop roots other than the structural modes' (thin, grey, drawn under the mode lines). */
  public static final Color LOOP_ROOT = new Color(0xA3A9B0);
  /** Requirement lines (required margins, structural peak limit). */
  public static final Color REQUIREMENT = new Color(0xB0121B);
  /** Margin-onset markers (a requirement first violated). */
  public static final Color MARGIN_ONSET = new Color(0x6A0DAD);
  /** Frequency bands of the structural modes (translucent fill). */
  public static final Color MODE_BAND = new Color(0x1F, 0x5F, 0x8B, 38);

  /** Anchor colours of the airspeed ramp, low speed first: pale gold, orange, crimson, deep violet. */
  private static final Color[] SPEED_RAMP = {
    new Color(0xE3C14B), new Color(0xE07B2A), new Color(0xB8283F), new Color(0x5A1E6E), new Color(0x1B1340)
  };

  /** Chart width (px), sized for a report column about 1000 px wide. */
  public static final int CHART_WIDTH_PX = 1100;
  /** Chart height (px). */
  public static final int CHART_HEIGHT_PX = 620;

  /**
   * A colour on our airspeed ramp (pale gold at the lowest speed through orange and crimson to
   * deep violet at the highest), linear in sRGB between the anchors.
   *
   * @param fraction position on the ramp, 0 (lowest speed) to 1 (highest); clamped
   * @return the colour
   */
  public static Color speedRamp(double fraction) {
    double f = Math.min(Math.max(Double.isFinite(fraction) ? fraction : 0, 0), 1) * (SPEED_RAMP.length - 1);
    int i = Math.min((int) Math.floor(f), SPEED_RAMP.length - 2);
    double w = f - i;
    Color a = SPEED_RAMP[i];
    Color b = SPEED_RAMP[i + 1];
    return new Color((int) Math.round(a.getRed() + w * (b.getRed() - a.getRed())),
        (int) Math.round(a.getGreen() + w * (b.getGreen() - a.getGreen())),
        (int) Math.round(a.getBlue() + w * (b.getBlue() - a.getBlue())));
  }

  /**
   * @param index mode index (0-based)
   * @return the mode's colour
   */
  public static Color seriesColor(int index) {
    return MODE_COLORS[index % MODE_COLORS.length];
  }

  /**
   * @param index mode index (0-based)
   * @return the mode's line stroke: solid for the first ten modes, then dashed patterns
   */
  public static BasicStroke seriesStroke(int index) {
    float[] dash = DASHES[(index / MODE_COLORS.length) % DASHES.length];
    return dash == null
        ? new BasicStroke(2.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
        : new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
  }

  /**
   * @param width line width (px)
   * @param dash dash pattern, or null for a solid line
   * @return a reference-line stroke
   */
  public static BasicStroke referenceStroke(float width, float[] dash) {
    return dash == null
        ? new BasicStroke(width)
        : new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, dash, 0f);
  }

  /**
   * Applies the house style to a chart: white page, pale plot area, light grid, legend outside to
   * the right, no tool tips or interactive parts.
   *
   * @param chart the chart to style
   */
  public static void apply(XYChart chart) {
    XYStyler s = chart.getStyler();
    s.setChartBackgroundColor(Color.WHITE);
    s.setPlotBackgroundColor(new Color(0xFAFAF7));
    s.setPlotBorderColor(new Color(0x9AA0A6));
    s.setPlotBorderVisible(true);
    s.setPlotGridLinesVisible(true);
    s.setPlotGridLinesColor(new Color(0xE2E3DE));
    s.setPlotGridLinesStroke(new BasicStroke(1f));
    s.setChartFontColor(new Color(0x202428));
    s.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 17));
    s.setChartTitleBoxVisible(false);
    s.setChartTitlePadding(10);
    s.setAxisTitleFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
    s.setAxisTickLabelsFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
    s.setAxisTickLabelsColor(new Color(0x30343A));
    s.setAxisTickMarksColor(new Color(0x9AA0A6));
    s.setLegendFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
    s.setLegendBackgroundColor(Color.WHITE);
    s.setLegendBorderColor(new Color(0xC8CCD0));
    s.setLegendPosition(Styler.LegendPosition.OutsideE);
    s.setLegendLayout(Styler.LegendLayout.Vertical);
    s.setLegendSeriesLineLength(28);
    s.setLegendPadding(8);
    s.setChartPadding(12);
    s.setPlotContentSize(1.0);
    s.setPlotMargin(0);
    s.setMarkerSize(11);
    s.setToolTipsEnabled(false);
    s.setAntiAlias(true);
    s.setSeriesColors(MODE_COLORS);
  }
}
