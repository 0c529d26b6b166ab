package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The SVG text written while drawing: geometry, colours, strokes, transforms and clips of single
 * shapes with values worked out by hand, and whole charts that parse as XML and come out the same
 * when drawn on several threads at once.
 */
class SvgCanvasTest {
  @BeforeAll
  static void headless() {
    System.setProperty("java.awt.headless", "true");
  }

  private static Document parse(String svg) throws Exception {
    DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
    f.setNamespaceAware(true);
    return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
  }

  private static List<Element> paths(Document doc) {
    NodeList nodes = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "path");
    List<Element> out = new ArrayList<>();
    for (int i = 0; i < nodes.getLength(); i++) {
      Element e = (Element) nodes.item(i);
      if (!"clipPath".equals(e.getParentNode().getLocalName())) {
        out.add(e);
      }
    }
    return out;
  }

  @Test
  void pageSizeAndEmptyPage() throws Exception {
    Document doc = parse(new SvgCanvas(300, 200).svg());
    Element root = doc.getDocumentElement();
    assertEquals("svg", root.getLocalName());
    assertEquals("300px", root.getAttribute("width"));
    assertEquals("200px", root.getAttribute("height"));
    assertEquals("0 0 300 200", root.getAttribute("viewBox"));
    assertTrue(paths(doc).isEmpty());
    assertThrows(IllegalArgumentException.class, () -> new SvgCanvas(0, 10));
    assertThrows(IllegalArgumentException.class, () -> new SvgCanvas(10, -1));
  }

  @Test
  void strokedLineWithColourWidthCapAndDashes() throws Exception {
    SvgCanvas g = new SvgCanvas(200, 100);
    g.setColor(new Color(10, 20, 30));
    g.setStroke(new BasicStroke(2.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_BEVEL, 10f, new float[] {9f, 4f}, 1.5f));
    // 50.0625 * 1000 = 50062.5 exactly: the tie goes away from zero, to 50.063
    g.draw(new Line2D.Double(1.25, 2.5, 100, 50.0625));
    Element p = paths(parse(g.svg())).get(0);
    assertEquals("M1.25,2.5 L100,50.063", p.getAttribute("d"));
    assertEquals("fill:none;stroke:rgb(10,20,30);stroke-width:2.5;stroke-miterlimit:10;stroke-linecap:round;"
        + "stroke-linejoin:bevel;stroke-dasharray:9,4;stroke-dashoffset:1.5;", p.getAttribute("style"));
    assertFalse(p.hasAttribute("transform"), "no transform at identity");
  }

  @Test
  void defaultStrokeKeepsSvgDefaultsOfButtAndMiterOut() throws Exception {
    SvgCanvas g = new SvgCanvas(50, 50);
    g.setColor(Color.BLACK);
    g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 4f));
    g.drawLine(0, 0, 10, 0);
    Element p = paths(parse(g.svg())).get(0);
    assertEquals("M0,0 L10,0", p.getAttribute("d"));
    assertEquals("fill:none;stroke:rgb(0,0,0);stroke-miterlimit:4;", p.getAttribute("style"));
  }

  @Test
  void translucentFilledRectangle() throws Exception {
    SvgCanvas g = new SvgCanvas(100, 100);
    g.setColor(new Color(0x1F, 0x5F, 0x8B, 38));
    g.fill(new Rectangle2D.Double(10, 20, 30, 40));
    Element p = paths(parse(g.svg())).get(0);
    // a rectangle's outline: four corners, back to the first, closed
    assertEquals("M10,20 L40,20 L40,60 L10,60 L10,20 Z", p.getAttribute("d"));
    // opacity 38/255 = 0.14901... -> 0.149
    assertEquals("fill:rgb(31,95,139);fill-opacity:0.149;stroke:none;", p.getAttribute("style"));
  }

  @Test
  void transformWrittenAsMatrix() throws Exception {
    SvgCanvas g = new SvgCanvas(100, 100);
    g.translate(5, 7);
    g.rotate(Math.PI / 2);
    g.fillRect(0, 0, 2, 3);
    Element p = paths(parse(g.svg())).get(0);
    assertEquals("M0,0 L2,0 L2,3 L0,3 L0,0 Z", p.getAttribute("d"), "shape in user space");
    // rotation by +90 deg: [cos -sin; sin cos] = [0 -1; 1 0], SVG order a b c d e f = m00 m10 m01 m11 tx ty
    assertEquals("matrix(0 1 -1 0 5 7)", p.getAttribute("transform"));
  }

  @Test
  void clipGroupsInDeviceSpaceSharedDefinition() throws Exception {
    SvgCanvas g = new SvgCanvas(100, 100);
    g.setColor(Color.RED);
    g.fillRect(0, 0, 1, 1); // unclipped
    g.translate(10, 0);
    g.setClip(new Rectangle2D.Double(0, 0, 20, 20)); // device (10,0)-(30,20)
    g.fillRect(1, 1, 1, 1);
    g.translate(-10, 0);
    g.setClip(new Rectangle2D.Double(10, 0, 20, 20)); // the same device rectangle
    g.fillRect(2, 2, 1, 1);
    g.setClip(null);
    g.fillRect(3, 3, 1, 1);
    Document doc = parse(g.svg());
    NodeList clips = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "clipPath");
    assertEquals(1, clips.getLength(), "one definition for one device rectangle");
    Element clip = (Element) clips.item(0);
    assertEquals("M10,0 L30,0 L30,20 L10,20 L10,0 Z", ((Element) clip.getElementsByTagNameNS("*", "path").item(0))
        .getAttribute("d"));
    List<Element> p = paths(doc);
    assertEquals(4, p.size());
    assertEquals("svg", p.get(0).getParentNode().getLocalName(), "first fill outside any group");
    Element group = (Element) p.get(1).getParentNode();
    assertEquals("url(#" + clip.getAttribute("id") + ")", group.getAttribute("clip-path"));
    assertTrue(group == p.get(2).getParentNode(), "same clip, same group");
    assertEquals("svg", p.get(3).getParentNode().getLocalName(), "clip removed, group closed");
  }

  @Test
  void copiesDrawIntoTheSameDocumentUntilDisposed() throws Exception {
    SvgCanvas g = new SvgCanvas(100, 100);
    Graphics2D copy = (Graphics2D) g.create();
    copy.setColor(Color.BLUE);
    copy.fillRect(0, 0, 5, 5);
    copy.dispose();
    copy.fillRect(0, 0, 6, 6); // ignored after dispose
    g.setColor(Color.GREEN);
    g.fillRect(0, 0, 7, 7);
    List<Element> p = paths(parse(g.svg()));
    assertEquals(2, p.size());
    assertTrue(p.get(0).getAttribute("style").startsWith("fill:rgb(0,0,255)"));
    assertTrue(p.get(1).getAttribute("style").startsWith("fill:rgb(0,255,0)"));
  }

  @Test
  void textIsWrittenAsGlyphOutlines() throws Exception {
    SvgCanvas g = new SvgCanvas(200, 50);
    g.setColor(Color.BLACK);
    g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
    g.drawString("Hz", 10f, 30f);
    g.drawString("", 10, 30);
    List<Element> p = paths(parse(g.svg()));
    assertEquals(1, p.size(), "one outline for the text, nothing for the empty string");
    assertTrue(p.get(0).getAttribute("d").startsWith("M"));
    assertTrue(p.get(0).getAttribute("style").startsWith("fill:rgb(0,0,0)"));
  }

  @Test
  void shapesWithCoordinatesNoViewerCanPlaceAreLeftOut() throws Exception {
    SvgCanvas g = new SvgCanvas(100, 100);
    g.draw(new Line2D.Double(0, 0, Double.NaN, 1));
    g.draw(new Line2D.Double(0, 0, 1e13, 1));
    g.draw(new Line2D.Double(0, 0, 3, 4));
    List<Element> p = paths(parse(g.svg()));
    assertEquals(1, p.size());
    assertEquals("M0,0 L3,4", p.get(0).getAttribute("d"));
  }

  @Test
  void imagesAreRefused() {
    SvgCanvas g = new SvgCanvas(100, 100);
    g.drawImage(new BufferedImage(2, 2, BufferedImage.TYPE_INT_RGB), 0, 0, null);
    assertThrows(IllegalStateException.class, g::svg);
  }

  private static XYChart sampleChart() {
    XYChart chart = new XYChartBuilder().width(640).height(400).title("damping").xAxisTitle("speed (m/s)")
        .yAxisTitle("g").build();
    ReportStyle.apply(chart);
    double[] x = new double[400];
    double[] y = new double[400];
    for (int i = 0; i < x.length; i++) {
      x[i] = 35 + i * 0.3375;
      y[i] = -0.1 + 0.2 * Math.sin(i / 37.0);
    }
    chart.addSeries("wing bending", x, y).setMarker(SeriesMarkers.NONE).setLineColor(ReportStyle.seriesColor(0))
        .setLineStyle(ReportStyle.seriesStroke(0));
    chart.addSeries("limit", new double[] {35, 170}, new double[] {-0.03, -0.03}).setMarker(SeriesMarkers.NONE)
        .setLineStyle(ReportStyle.referenceStroke(1.5f, new float[] {6f, 4f}));
    return chart;
  }

  @Test
  void wholeChartParsesWithItsSeriesStyles() throws Exception {
    ReportChart chart = new ReportChart("sample", "", sampleChart(), List.of());
    String svg = chart.svg();
    Document doc = parse(svg);
    assertEquals("640px", doc.getDocumentElement().getAttribute("width"));
    List<Element> p = paths(doc);
    assertTrue(p.size() > 20, "axes, labels and lines drawn: " + p.size());
    // the first mode colour of the house style strokes the series, the dashed limit line too
    assertTrue(p.stream().anyMatch(e -> e.getAttribute("style").contains("stroke:rgb(31,95,139);stroke-width:2.2")));
    assertTrue(p.stream().anyMatch(e -> e.getAttribute("style").contains("stroke-dasharray:6,4;")));
    assertFalse(svg.contains("NaN") || svg.contains("Infinity") || svg.contains("E-") || svg.contains("E+"));
  }

  @Test
  void chartsDrawnOnSeveralThreadsComeOutTheSame() throws Exception {
    String serial = new ReportChart("sample", "", sampleChart(), List.of()).svg();
    ExecutorService pool = Executors.newFixedThreadPool(4);
    try {
      List<Future<String>> parallel = new ArrayList<>();
      for (int i = 0; i < 8; i++) {
        parallel.add(pool.submit(() -> new ReportChart("sample", "", sampleChart(), List.of()).svg()));
      }
      for (Future<String> f : parallel) {
        assertEquals(serial, f.get());
      }
    } finally {
      pool.shutdown();
    }
  }
}
