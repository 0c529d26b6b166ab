package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;

/**
 * Time-axis labels: rounded to the microsecond, half away from zero, trailing zeros removed, as
 * worked out by hand below; every time chart uses them.
 */
class TimeAxisLabelsTest {
  @Test
  void labelsOfSampleTimes() {
    // 85 steps of 2 ms accumulated in floating point: 0.17000000000000004 -> 0.170000 -> "0.17"
    double t = 0;
    for (int i = 0; i < 85; i++) {
      t += 0.002;
    }
    assertEquals("0.17", ChartSeries.timeLabel(t));
    assertEquals("3.4", ChartSeries.timeLabel(3.4));
    assertEquals("12", ChartSeries.timeLabel(12.0000004), "4e-7 s rounds away");
    assertEquals("12.000001", ChartSeries.timeLabel(12.0000005), "half a microsecond rounds up");
    assertEquals("0.0025", ChartSeries.timeLabel(0.0025));
    assertEquals("0", ChartSeries.timeLabel(0.0));
    assertEquals("0", ChartSeries.timeLabel(-0.0), "no sign on zero");
    assertEquals("0", ChartSeries.timeLabel(-1e-7));
    assertEquals("-0.5", ChartSeries.timeLabel(-0.5));
    assertEquals("100000", ChartSeries.timeLabel(1e5), "plain notation");
    assertEquals("", ChartSeries.timeLabel(Double.NaN));
    assertEquals("", ChartSeries.timeLabel(null));
  }

  @Test
  void timeChartsFormatTheirAxisWithTheLabels() {
    XYChart chart = ChartSeries.timeChart("gust", "signal");
    assertEquals("time (s)", chart.getXAxisTitle());
    Function<Double, String> f = chart.getStyler().getxAxisTickLabelsFormattingFunction();
    assertNotNull(f);
    assertEquals("1.87", f.apply(1.8700000000000001));
    assertEquals("0", f.apply(-0.0), "a kept label is not reused for another value");
    assertEquals("1.87", f.apply(1.8700000000000001));
  }

  @Test
  void keptLabelsAreWrittenOncePerValue() {
    int[] written = {0};
    Function<Double, String> f = ChartSeries.keptLabels(v -> {
      written[0]++;
      return ChartSeries.timeLabel(v);
    });
    assertEquals("0.17", f.apply(0.17000000000000004));
    assertEquals("0.17", f.apply(0.17000000000000004));
    assertEquals(1, written[0], "the second request is answered from the kept label");
    assertEquals("0.34", f.apply(0.34));
    assertEquals("0.17", f.apply(0.17), "another value with the same label");
    assertEquals(3, written[0]);
  }
}
