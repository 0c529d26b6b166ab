package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;

/**
 * A chart's PNG decodes to exactly the pixels XChart draws for its own bitmap export; the files
 * written for it are the PNG, and the SVG only when asked.
 */
class ChartPngTest {
  @BeforeAll
  static void headless() {
    System.setProperty("java.awt.headless", "true");
  }

  @Test
  void pngHoldsTheDrawnPixels() throws Exception {
    ReportChart rc = sample();
    XYChart chart = rc.chart();
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

  private static ReportChart sample() {
    XYChart chart = ChartSeries.chart("damping", "speed (m/s)", "g");
    chart.addSeries("mode", new double[] {35, 100, 170}, new double[] {-0.1, -0.02, 0.05});
    return new ReportChart("sample", "", chart, List.of());
  }

  @Test
  void theSvgCopyIsWrittenOnlyWhenAsked(@TempDir Path dir) throws Exception {
    ReportChart rc = sample();
    byte[] png = {1, 2, 3};
    Path pngOnly = Files.createDirectory(dir.resolve("png-only"));
    assertEquals(List.of(pngOnly.resolve("sample.png")), rc.writeTo(pngOnly, png, false));
    assertArrayEquals(png, Files.readAllBytes(pngOnly.resolve("sample.png")), "the given bytes, as they are");
    assertEquals(1, pngOnly.toFile().list().length, "no SVG");

    Path both = Files.createDirectory(dir.resolve("both"));
    assertEquals(List.of(both.resolve("sample.png"), both.resolve("sample.svg")), rc.writeTo(both, png, true));
    assertEquals(rc.svg(), Files.readString(both.resolve("sample.svg"), StandardCharsets.UTF_8));
    assertTrue(rc.svg().contains("<svg") && rc.svg().contains("<path d="), "the drawing, as paths");
  }

  @Test
  void fileStemAndChartAreChecked() {
    XYChart chart = sample().chart();
    assertThrows(IllegalArgumentException.class, () -> new ReportChart(null, "", chart, List.of()));
    assertThrows(IllegalArgumentException.class, () -> new ReportChart("a/b", "", chart, List.of()));
    assertThrows(IllegalArgumentException.class, () -> new ReportChart("ok", "", null, List.of()));
    assertEquals("", new ReportChart("ok", null, chart, List.of()).caption());
  }
}
