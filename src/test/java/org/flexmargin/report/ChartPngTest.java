package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;

/** A chart's PNG decodes to exactly the pixels XChart draws for its own bitmap export. */
class ChartPngTest {
  @BeforeAll
  static void headless() {
    System.setProperty("java.awt.headless", "true");
  }

  @Test
  void pngHoldsTheDrawnPixels() throws Exception {
    XYChart chart = ChartSeries.chart("damping", "speed (m/s)", "g");
    chart.addSeries("mode", new double[] {35, 100, 170}, new double[] {-0.1, -0.02, 0.05});
    ReportChart rc = new ReportChart("sample", "", chart, List.of());
    byte[] png = rc.png();
    BufferedImage decoded = ImageIO.read(new ByteArrayInputStream(png));
    BufferedImage drawn = BitmapEncoder.getBufferedImage(chart);
    assertEquals(drawn.getWidth(), decoded.getWidth());
    assertEquals(drawn.getHeight(), decoded.getHeight());
    int w = drawn.getWidth();
    int h = drawn.getHeight();
    // PNG is lossless: every pixel comes back (ARGB)
    assertArrayEquals(drawn.getRGB(0, 0, w, h, null, 0, w), decoded.getRGB(0, 0, w, h, null, 0, w));
  }
}
