package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.sweep.Finding;
import org.flexmargin.sweep.Findings;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.SweepResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The written report folder: report.html is self-contained and well-formed, its findings numbers
 * are the numbers of results.json, and the chart files are the embedded images.
 *
 * <p>The results come from the real solver on two bundled cases: the Lee, Price &amp; Wong typical
 * section (validation, one configuration, two modes, flutter inside the sweep) and the invented
 * demo drone (two configurations, eight modes, flutter onset and damping-limit crossings).
 */
class ReportWriterTest {
  @TempDir static Path tmp;

  static Report lpw;
  static Report demo;

  /** One written report folder with its inputs. */
  record Report(Path folder, SweepResult result, List<Finding> findings, String html, JsonNode json) {}

  @BeforeAll
  static void writeReports() throws IOException {
    lpw = write(SharedResults.lpw(), "lpw");
    demo = write(SharedResults.demo(), "demo");
  }

  static Report write(AnalysisCase c, String name) throws IOException {
    SweepResult result = new CaseSweep(1).run(c, n -> { });
    return write(new SharedResults.Solved(result, Findings.of(result, new PlannedPath(c.sweep()).at(0))), name);
  }

  static Report write(SharedResults.Solved solved, String name) throws IOException {
    SweepResult result = solved.result();
    List<Finding> findings = solved.findings();
    Path folder = Files.createDirectories(tmp.resolve(name));
    ResultFiles.write(folder, result, findings, "test");
    Path html = ReportWriter.write(folder, result, findings, "test");
    assertEquals(folder.resolve("report.html"), html);
    return new Report(folder, result, findings, Files.readString(html, StandardCharsets.UTF_8),
        new ObjectMapper().readTree(folder.resolve("results.json").toFile()));
  }

  @Test
  void pageIsSelfContained() {
    for (Report r : List.of(lpw, demo)) {
      String h = r.html();
      assertFalse(h.contains("http://"), "no http:// reference");
      assertFalse(h.contains("https://"), "no https:// reference");
      assertFalse(h.contains("src=\"//"), "no protocol-relative source");
      assertFalse(h.toLowerCase().contains("<script"), "no script");
      assertFalse(h.toLowerCase().contains("<link"), "no linked style sheet or font");
      assertFalse(h.contains("@import") || h.contains("url("), "no resource loaded from CSS");
      Matcher src = Pattern.compile("src=\"([^\"]*)\"").matcher(h);
      int images = 0;
      while (src.find()) {
        assertTrue(src.group(1).startsWith("data:image/png;base64,"), "embedded image only");
        images++;
      }
      // open loop: V-g and V-f per configuration; with a loop also closed-loop V-g and V-f, four margin
      // charts, the root locus, Bode gain and phase, Nichols and (the demo has a notch) the notch chart
      int perConfiguration = r.result().analysisCase().loop() == null ? 2 : 2 + 2 + 4 + 1 + 3 + 1;
      // plus the three charts of the first screen's margin panel when there is a loop
      int panel = r.result().analysisCase().loop() == null ? 0 : 3;
      assertEquals(perConfiguration * r.result().configurations().size() + panel, images, "charts per configuration");
      Matcher href = Pattern.compile("href=\"([^\"]*)\"").matcher(h);
      while (href.find()) {
        assertTrue(href.group(1).startsWith("#"), "only links inside the page: " + href.group(1));
      }
    }
  }

  @Test
  void pageIsWellFormedAndEndsWithTheCautions() throws Exception {
    Document doc = parse(demo.html());
    assertEquals("html", doc.getDocumentElement().getTagName());
    NodeList sections = doc.getElementsByTagName("section");
    List<String> ids = new ArrayList<>();
    for (int i = 0; i < sections.getLength(); i++) {
      ids.add(((Element) sections.item(i)).getAttribute("id"));
    }
    assertEquals(List.of(VerdictStrip.ID, "summary", "configuration-1", "configuration-2", "loop-1", "loop-2", "requirements",
        "diagnostics", "provenance", "cautions"), ids);
    Element cautions = (Element) sections.item(sections.getLength() - 1);
    NodeList items = cautions.getElementsByTagName("li");
    assertEquals(Cautions.TEXT.size(), items.getLength());
    for (int i = 0; i < items.getLength(); i++) {
      assertEquals(Cautions.TEXT.get(i), items.item(i).getTextContent());
    }
    for (InputFile f : demo.result().analysisCase().inputs()) {
      assertTrue(demo.html().contains(f.sha256()), "provenance lists " + f.path());
    }
  }

  @Test
  void firstScreenIsTheVerdictStripThenTheMarginPanelThenTheCase() throws Exception {
    Document doc = parse(demo.html());
    Element main = (Element) doc.getElementsByTagName("main").item(0);
    List<String> order = new ArrayList<>();
    for (org.w3c.dom.Node n = main.getFirstChild(); n != null; n = n.getNextSibling()) {
      if (n instanceof Element e) {
        order.add(e.getTagName() + (e.hasAttribute("id") ? "#" + e.getAttribute("id") : "")
            + (e.hasAttribute("class") ? "." + e.getAttribute("class") : ""));
      }
    }
    // the verdict strip (with the panel inside it) comes before the caution pointer, the case
    // description and the table of contents
    assertEquals(List.of("section#verdict.first-screen", "p.pointer", "div.case", "nav.toc"), order.subList(0, 4));
    Element strip = byId(doc, "section", VerdictStrip.ID);
    Element table = (Element) strip.getElementsByTagName("table").item(0);
    NodeList heads = table.getElementsByTagName("thead").item(0).getChildNodes().item(0).getChildNodes();
    List<String> columns = new ArrayList<>();
    for (int i = 0; i < heads.getLength(); i++) {
      columns.add(heads.item(i).getTextContent());
    }
    assertEquals(VerdictStrip.COLUMNS, columns);
    NodeList rows = ((Element) table.getElementsByTagName("tbody").item(0)).getElementsByTagName("tr");
    JsonNode confs = demo.json().get("configurations");
    assertEquals(confs.size(), rows.getLength(), "one row per configuration");
    for (int i = 0; i < rows.getLength(); i++) {
      Element row = (Element) rows.item(i);
      JsonNode c = confs.get(i);
      assertEquals(c.get("name").asText(), row.getAttribute("data-configuration"));
      String text = row.getTextContent();
      assertTrue(text.contains(c.get("clearance").get("passed").asBoolean() ? "PASS" : "FAIL"), text);
      // divergence and the lowest open- and closed-loop onsets are the values of results.json
      assertEquals(c.get("divergence").get("speed_eas_mps").asDouble(), cellValue(row, "divergence"), 0.0);
      assertEquals(lowestOnset(c.get("flutter").get("crossings")), cellValue(row, "open-loop"), 0.0);
      assertEquals(lowestOnset(c.get("loop").get("closed_loop_crossings")), cellValue(row, "closed-loop"), 0.0);
    }
    Element panel = (Element) strip.getElementsByTagName("figure").item(0);
    assertEquals("panel", panel.getAttribute("class"));
    assertEquals(3, panel.getElementsByTagName("img").getLength(), "gain, phase and structural panels");
    for (String stem : List.of("panel-gain", "panel-phase", "panel-structural")) {
      assertTrue(Files.exists(demo.folder().resolve("charts").resolve(stem + ".png")), stem);
    }
    // open loop only, no requirements: the strip says so and has no panel
    Element lpwStrip = byId(parse(lpw.html()), "section", VerdictStrip.ID);
    assertTrue(lpwStrip.getTextContent().contains("NOT ASSESSED"));
    assertEquals(0, lpwStrip.getElementsByTagName("figure").getLength());
  }

  @Test
  void speedUnitAppliesToTheTables() throws Exception {
    // the same sections in knots (charts left out: tables only); 1 kt = 1852/3600 m/s exactly
    SweepResult r = demo.result();
    List<ReportSection> sections = new ArrayList<>(OpenLoopSections.of(r, demo.findings(), java.util.Map.of(), "test",
        java.time.Instant.EPOCH, SpeedAxisUnit.KNOTS));
    sections.addAll(1, ClearanceSections.of(r, java.util.Map.of(), SpeedAxisUnit.KNOTS));
    Document doc = parse(HtmlReport.render("knots", List.of(), sections));
    Element findingsTable = byId(doc, "table", "findings");
    NodeList heads = findingsTable.getElementsByTagName("th");
    assertEquals("EAS (kt)", heads.item(3).getTextContent());
    assertEquals("EAS (m/s)", heads.item(4).getTextContent());
    assertEquals("TAS (kt)", heads.item(5).getTextContent());
    Element firstRow = (Element) ((Element) findingsTable.getElementsByTagName("tbody").item(0))
        .getElementsByTagName("tr").item(0);
    double eas = demo.findings().get(0).speedEasMps();
    assertEquals(String.format(java.util.Locale.ROOT, "%.1f", eas * 3600.0 / 1852.0),
        firstRow.getElementsByTagName("td").item(3).getTextContent());
    // the per-speed margin table of the loop section starts with EAS in knots
    Element loop = byId(doc, "section", "loop-1");
    Element perSpeed = (Element) loop.getElementsByTagName("table").item(0);
    assertEquals("EAS (kt)", perSpeed.getElementsByTagName("th").item(0).getTextContent());
    double v0 = r.configurations().get(0).servo().points().get(0).condition().speedEasMps();
    Element cell = (Element) perSpeed.getElementsByTagName("td").item(0);
    assertEquals(String.format(java.util.Locale.ROOT, "%.2f", v0 * 3600.0 / 1852.0), cell.getTextContent());
    assertEquals("kt", cell.getAttribute("data-unit"));
  }

  @Test
  void pageHasAPrintStyleSheet() {
    String css = demo.html().substring(demo.html().indexOf("<style>"), demo.html().indexOf("</style>"));
    String print = css.substring(css.indexOf("@media print{"));
    for (String rule : List.of("nav.toc{display:none}", "break-inside:avoid", "thead{display:table-header-group}",
        "print-color-adjust:exact")) {
      assertTrue(print.contains(rule), rule);
    }
    assertTrue(css.contains("@page{"), "page size and margins");
  }

  /** @return the lowest speed of a flutter onset in a crossings array of results.json */
  private static double lowestOnset(JsonNode crossings) {
    double v = Double.POSITIVE_INFINITY;
    for (JsonNode x : crossings) {
      if (x.get("kind").asText().equals("flutter_onset")) {
        v = Math.min(v, x.get("speed_eas_mps").asDouble());
      }
    }
    return v;
  }

  /** @return the data-value of the first element with one inside the strip cell of that key */
  private static double cellValue(Element row, String key) {
    NodeList cells = row.getElementsByTagName("td");
    for (int i = 0; i < cells.getLength(); i++) {
      Element td = (Element) cells.item(i);
      if (key.equals(td.getAttribute("data-key"))) {
        NodeList inner = td.getElementsByTagName("*");
        for (int k = 0; k < inner.getLength(); k++) {
          String v = ((Element) inner.item(k)).getAttribute("data-value");
          if (!v.isEmpty()) {
            return Double.parseDouble(v);
          }
        }
        return Double.NaN;
      }
    }
    throw new AssertionError("no cell " + key);
  }

  @Test
  void summaryNumbersAreTheNumbersOfResultsJson() throws Exception {
    for (Report r : List.of(lpw, demo)) {
      Document doc = parse(r.html());
      JsonNode findings = r.json().get("findings");
      Element table = byId(doc, "table", "findings");
      NodeList rows = ((Element) table.getElementsByTagName("tbody").item(0)).getElementsByTagName("tr");
      assertEquals(findings.size(), rows.getLength(), "one row per finding");
      int checked = 0;
      for (int i = 0; i < rows.getLength(); i++) {
        Element row = (Element) rows.item(i);
        assertEquals(Integer.toString(i), row.getAttribute("data-finding"));
        JsonNode f = findings.get(i);
        NodeList cells = row.getElementsByTagName("td");
        assertEquals(f.get("configuration").asText(), cells.item(0).getTextContent());
        assertEquals(f.get("finding").asText(), cells.item(1).getTextContent());
        assertEquals(f.get("mode").asText(), cells.item(2).getTextContent());
        assertEquals(f.get("remark").asText(), cells.item(cells.getLength() - 1).getTextContent());
        for (int k = 0; k < cells.getLength(); k++) {
          Element cell = (Element) cells.item(k);
          if (cell.hasAttribute("data-key")) {
            checkNumber(cell, f);
            checked++;
          }
        }
      }
      assertEquals(6 * findings.size(), checked, "EAS m/s and kt, TAS, Mach, altitude, frequency per finding");
      // the headline sentences above the table quote findings too
      NodeList spans = doc.getElementsByTagName("span");
      int quoted = 0;
      for (int i = 0; i < spans.getLength(); i++) {
        Element s = (Element) spans.item(i);
        if (s.hasAttribute("data-finding")) {
          checkNumber(s, findings.get(Integer.parseInt(s.getAttribute("data-finding"))));
          quoted++;
        }
      }
      assertTrue(quoted > 0, "headline quotes at least the divergence speed");
    }
  }

  /**
   * Every clearance number of the page (verdicts, governing requirement, flutter rule, margin onsets,
   * the per-requirement and per-speed tables) names its place in results.json by a JSON pointer;
   * the value there must be the page's full value exactly, and the shown text a correct rounding.
   */
  @Test
  void clearanceNumbersAreTheNumbersOfResultsJson() throws Exception {
    Document doc = parse(demo.html());
    NodeList all = doc.getElementsByTagName("*");
    int checked = 0;
    List<String> pointers = new ArrayList<>();
    for (int i = 0; i < all.getLength(); i++) {
      Element e = (Element) all.item(i);
      if (!e.hasAttribute("data-json")) {
        continue;
      }
      String pointer = e.getAttribute("data-json");
      pointers.add(pointer);
      JsonNode expected = demo.json().at(pointer);
      assertFalse(expected.isMissingNode(), "results.json has " + pointer);
      if (expected.isBoolean()) {
        assertEquals(Boolean.toString(expected.asBoolean()), e.getAttribute("data-value"), pointer);
        assertEquals(expected.asBoolean() ? "PASS" : "FAIL", e.getTextContent().toUpperCase(), pointer);
      } else {
        checkNumber(e, expected, pointer);
      }
      checked++;
    }
    for (int c = 0; c < demo.result().configurations().size(); c++) {
      String base = "/configurations/" + c + "/clearance";
      boolean stability = demo.json().at(base + "/governing/unit").asText().isEmpty();
      for (String p : stability ? List.of(base + "/passed", base + "/governing/speed_eas_mps")
          : List.of(base + "/passed", base + "/governing/required", base + "/governing/achieved")) {
        assertTrue(pointers.contains(p), "the summary quotes " + p);
      }
      int onsets = demo.json().at(base + "/margin_onsets").size();
      assertTrue(onsets > 0, "the demo has margin onsets");
      for (int k = 0; k < onsets; k++) {
        assertTrue(pointers.contains(base + "/margin_onsets/" + k + "/speed_eas_mps"), "onset " + k + " quoted");
      }
      int flutterChecks = demo.json().at(base + "/flutter_rule/checks").size();
      for (int k = 0; k < flutterChecks; k++) {
        assertTrue(pointers.contains(base + "/flutter_rule/checks/" + k + "/achieved"), "flutter check quoted");
        assertTrue(pointers.contains(base + "/flutter_rule/checks/" + k + "/required"), "flutter check quoted");
      }
    }
    assertTrue(checked > 100, "per-speed table and summary carry pointers: " + checked);
  }

  private static void checkNumber(Element cell, JsonNode expected, String what) {
    String text = cell.getTextContent();
    if (expected.isNull()) {
      assertEquals("null", cell.getAttribute("data-value"), what);
      return;
    }
    double value = Double.parseDouble(cell.getAttribute("data-value"));
    assertEquals(expected.asDouble(), value, 0.0, what);
    if ("kt".equals(cell.getAttribute("data-unit"))) {
      value *= 3600.0 / 1852.0; // shown in knots (1 kt = 1852/3600 m/s exactly)
    }
    Matcher m = Pattern.compile("^-?[0-9]+(\\.[0-9]+)?").matcher(text);
    assertTrue(m.find(), what + ": number shown, got " + text);
    String shownText = m.group();
    double shown = Double.parseDouble(shownText);
    int dot = shownText.indexOf('.');
    int decimals = dot < 0 ? 0 : shownText.length() - dot - 1;
    // half a unit of the last shown digit, plus 1e-9 relative for the decimal conversion
    assertTrue(Math.abs(shown - value) <= 0.5 * Math.pow(10, -decimals) + 1e-9 * Math.abs(value),
        what + ": shown " + text + " for " + value);
  }

  /**
   * The cell's full value must be results.json's value exactly (both are Java's shortest
   * round-trip decimal of the same double), and the shown text a correct rounding of it: within
   * half a unit of its last shown digit (plus 1e-9 relative for the decimal conversion).
   */
  private static void checkNumber(Element cell, JsonNode finding) {
    String key = cell.getAttribute("data-key");
    JsonNode expected = finding.get(key);
    assertNotNull(expected, "results.json has " + key);
    String text = cell.getTextContent();
    if (expected.isNull()) {
      assertEquals("null", cell.getAttribute("data-value"), key);
      assertEquals(OpenLoopSections.MISSING, text, key);
      return;
    }
    double value = Double.parseDouble(cell.getAttribute("data-value"));
    assertEquals(expected.asDouble(), value, 0.0, key);
    if ("kt".equals(cell.getAttribute("data-unit"))) {
      // a speed shown in knots: the text is the SI value converted (1 kt = 1852/3600 m/s exactly)
      value *= 3600.0 / 1852.0;
    }
    if (text.equals("static")) {
      assertEquals("divergence", finding.get("finding").asText());
      assertEquals(0.0, value, 0.0);
      return;
    }
    double shown = Double.parseDouble(text);
    int dot = text.indexOf('.');
    int decimals = dot < 0 ? 0 : text.length() - dot - 1;
    double halfUnit = 0.5 * Math.pow(10, -decimals);
    assertTrue(Math.abs(shown - value) <= halfUnit + 1e-9 * Math.abs(value),
        key + ": shown " + text + " for " + value);
  }

  @Test
  void chartFilesAreThePngImagesEmbeddedInThePage() throws IOException {
    for (Report r : List.of(lpw, demo)) {
      for (var c : r.result().configurations()) {
        List<String> kinds = r.result().analysisCase().loop() == null ? List.of("vg-", "vf-")
          : List.of("vg-", "vf-", "cl-vg-", "cl-vf-", "margins-gain-", "margins-phase-", "margins-delay-",
              "margins-structural-", "root-locus-", "bode-gain-", "bode-phase-", "nichols-", "notches-");
      for (String kind : kinds) {
          Path png = r.folder().resolve("charts").resolve(kind + ResultFiles.fileSafe(c.configuration()) + ".png");
          byte[] bytes = Files.readAllBytes(png);
          // PNG signature, ISO/IEC 15948 (PNG specification), section 5.2
          assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'},
              java.util.Arrays.copyOf(bytes, 8));
          BufferedImage img = ImageIO.read(new ByteArrayInputStream(bytes));
          assertEquals(ReportStyle.CHART_WIDTH_PX, img.getWidth());
          assertEquals(ReportStyle.CHART_HEIGHT_PX, img.getHeight());
          assertTrue(r.html().contains("data:image/png;base64," + Base64.getEncoder().encodeToString(bytes)),
              "the page embeds exactly the file's image");
          Path svg = png.resolveSibling(png.getFileName().toString().replace(".png", ".svg"));
          String svgText = Files.readString(svg, StandardCharsets.UTF_8);
          assertTrue(svgText.contains("<svg"), "SVG copy written");
        }
      }
    }
  }

  @Test
  void everyConfigurationHasAModesTableRowPerMode() throws Exception {
    Document doc = parse(demo.html());
    for (int i = 0; i < demo.result().configurations().size(); i++) {
      Element section = byId(doc, "section", "configuration-" + (i + 1));
      Element table = (Element) section.getElementsByTagName("table").item(0);
      NodeList rows = ((Element) table.getElementsByTagName("tbody").item(0)).getElementsByTagName("tr");
      assertEquals(demo.result().configurations().get(i).modeNames().size(), rows.getLength());
    }
  }

  @Test
  void textIsEscaped() throws Exception {
    // a case whose names and description contain markup characters; the section is real
    double mass = 100 * Math.PI * 1.225;
    String name = "wing <b>\"A&B\"</b> 'x'";
    AnalysisCase c = new AnalysisCase(1, "escape<script>", "desc & <script>alert(1)</script>",
        List.of(new Configuration(name,
            new TypicalSection(1.0, mass, -0.5, 0.25, 0.25, 2.0, 10.0, 2 * Math.PI, 1.0, 0.0), null)),
        new SpeedSweep(0.0, AirspeedKind.TRUE, 150.0, 450.0, 31), AnalysisOptions.defaults(),
        List.of(new InputFile("in<put>&.json", "00ff")));
    Report r = write(c, "escape");
    assertFalse(r.html().contains("<script"), "markup in names is not markup in the page");
    assertFalse(r.html().contains("<b>"));
    Document doc = parse(r.html());
    Element section = byId(doc, "section", "configuration-1");
    assertEquals("Configuration " + name, section.getElementsByTagName("h2").item(0).getTextContent());
    assertTrue(doc.getDocumentElement().getTextContent().contains("in<put>&.json"));
    assertTrue(Files.exists(r.folder().resolve("charts").resolve("vg-" + ResultFiles.fileSafe(name) + ".png")));
  }

  static Document parse(String html) throws Exception {
    DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
    f.setNamespaceAware(false);
    f.setValidating(false);
    f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
    f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
    DocumentBuilder b = f.newDocumentBuilder();
    b.setErrorHandler(new org.xml.sax.ErrorHandler() {
      @Override
      public void warning(org.xml.sax.SAXParseException e) throws org.xml.sax.SAXException {
        throw e;
      }

      @Override
      public void error(org.xml.sax.SAXParseException e) throws org.xml.sax.SAXException {
        throw e;
      }

      @Override
      public void fatalError(org.xml.sax.SAXParseException e) throws org.xml.sax.SAXException {
        throw e;
      }
    });
    return b.parse(new ByteArrayInputStream(html.getBytes(StandardCharsets.UTF_8)));
  }

  static Element byId(Document doc, String tag, String id) {
    NodeList all = doc.getElementsByTagName(tag);
    for (int i = 0; i < all.getLength(); i++) {
      Element e = (Element) all.item(i);
      if (id.equals(e.getAttribute("id"))) {
        return e;
      }
    }
    throw new AssertionError("no <" + tag + " id=\"" + id + "\">");
  }
}
