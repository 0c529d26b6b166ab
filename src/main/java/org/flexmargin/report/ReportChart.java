package org.flexmargin.report;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.knowm.xchart.XYChart;

/**
 * One chart of a report with the words that go with it.
 *
 * @param fileStem file name without extension, safe for a file system, e.g. "vg-full_payload"
 * @param caption one sentence describing the chart, for the report
 * @param chart the chart (XChart, drawn headless)
 * @param notes what the reader must know to read it correctly (clipped values, gaps, lines outside
 *     the range); never empty-but-hidden: the report prints every note under the chart
 */
public record ReportChart(String fileStem, String caption, XYChart chart, List<String> notes) {
  /** Validates and copies. */
  public ReportChart {
    if (fileStem == null || !fileStem.matches("[A-Za-z0-9._-]+")) {
      throw new IllegalArgumentException("file stem must be letters, digits, dot, dash, underscore: " + fileStem);
    }
    if (chart == null) {
      throw new IllegalArgumentException("chart is required");
    }
    caption = caption == null ? "" : caption;
    notes = List.copyOf(notes);
  }

  /**
   * Draws the chart on an opaque RGB image (as XChart's own bitmap export does) and encodes it
   * with {@link PngEncoder}.
   *
   * @return the chart as PNG bytes, at its own pixel size
   */
  public byte[] png() {
    return PngEncoder.encode(image());
  }

  /** @return the chart drawn on an opaque RGB image at its own pixel size */
  BufferedImage image() {
    BufferedImage image = new BufferedImage(chart.getWidth(), chart.getHeight(), BufferedImage.TYPE_INT_RGB);
    Graphics2D g = image.createGraphics();
    try {
      chart.paint(g, chart.getWidth(), chart.getHeight());
    } finally {
      g.dispose();
    }
    return image;
  }

  /**
   * Writes the chart as SVG (UTF-8), drawn by XChart on our {@link SvgCanvas}.
   *
   * @param out stream to write to (not closed)
   * @throws IOException on failure
   */
  public void writeSvg(OutputStream out) throws IOException {
    out.write(svg().getBytes(StandardCharsets.UTF_8));
  }

  /** @return the chart as an SVG document, at its own pixel size */
  public String svg() {
    SvgCanvas canvas = new SvgCanvas(chart.getWidth(), chart.getHeight());
    chart.paint(canvas, chart.getWidth(), chart.getHeight());
    canvas.dispose();
    return canvas.svg();
  }

  /**
   * Writes {@code fileStem.png} and, if asked, {@code fileStem.svg} into a folder.
   *
   * @param folder existing folder
   * @param png the PNG bytes (from {@link #png()}, so that the file and the embedded copy agree)
   * @param svg whether to write the SVG too
   * @return the written files, PNG first
   * @throws IOException on failure
   */
  public List<Path> writeTo(Path folder, byte[] png, boolean svg) throws IOException {
    Path pngFile = folder.resolve(fileStem + ".png");
    Files.write(pngFile, png);
    if (!svg) {
      return List.of(pngFile);
    }
    ByteArrayOutputStream buf = new ByteArrayOutputStream();
    writeSvg(buf);
    Path svgFile = folder.resolve(fileStem + ".svg");
    Files.write(svgFile, buf.toByteArray());
    return List.of(pngFile, svgFile);
  }
}
