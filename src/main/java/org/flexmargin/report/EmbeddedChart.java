package org.flexmargin.report;

import java.util.Base64;

/**
 * A chart ready for the page: the chart with its words, and the PNG bytes that were also written
 * to the charts folder (so that the embedded and the separate copy are the same image).
 *
 * @param chart the chart
 * @param png its PNG encoding
 * @param fileNames names of the files written for it (relative to the report folder)
 */
public record EmbeddedChart(ReportChart chart, byte[] png, java.util.List<String> fileNames) {
  /** Copies. */
  public EmbeddedChart {
    png = png.clone();
    fileNames = java.util.List.copyOf(fileNames);
  }

  @Override
  public byte[] png() {
    return png.clone();
  }

  /** @return a {@code data:image/png;base64,...} URI of the image */
  public String dataUri() {
    return "data:image/png;base64," + Base64.getEncoder().encodeToString(png);
  }

  /**
   * Writes the figure: image, caption with file names, and every note.
   *
   * @param w the page
   */
  public void writeFigure(XhtmlWriter w) {
    w.open("figure");
    w.empty("img", "src", dataUri(), "alt", chart.chart().getTitle(),
        "width", Integer.toString(chart.chart().getWidth()), "height", Integer.toString(chart.chart().getHeight()));
    w.element("figcaption", chart.caption()
        + (fileNames.isEmpty() ? "" : " Files: " + String.join(", ", fileNames) + "."));
    if (!chart.notes().isEmpty()) {
      w.open("ul", "class", "notes");
      for (String n : chart.notes()) {
        w.element("li", n);
      }
      w.close("ul");
    }
    w.close("figure");
  }
}
