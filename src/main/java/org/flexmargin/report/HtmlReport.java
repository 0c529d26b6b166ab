package org.flexmargin.report;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Lays out a self-contained report page: inline style sheet only, no scripts, fonts, links or
 * other outside resources (images are embedded as data URIs by the sections), so the single file
 * can be archived, mailed and opened offline. The markup is well-formed XML as well as HTML.
 *
 * <p>Order: a short title block; the first screen (the verdict strip and margin panel, when given);
 * a short pointer to the cautions; the case description; the table of contents; the given sections
 * in order; then the cautions ({@link Cautions#TEXT}) in a prominent box, always last and never
 * optional. A print style sheet lays the page out as a document: no coloured bands, charts and
 * tables kept whole on a page, every section heading with its content, the link targets hidden.
 */
public final class HtmlReport {
  private HtmlReport() {}

  /** Anchor id of the cautions section. */
  public static final String CAUTIONS_ID = "cautions";

  private static final String CSS = String.join("\n",
      ":root{--ink:#1d2226;--muted:#5a6470;--rule:#d5d9dd;--band:#14384f;--accent:#b0121b;--soft:#f4f5f2}",
      "*{box-sizing:border-box}",
      "body{margin:0;background:#fff;color:var(--ink);font-family:'DejaVu Sans','Segoe UI',Helvetica,Arial,"
          + "sans-serif;font-size:14px;line-height:1.45}",
      "header.top{background:var(--band);color:#fff;padding:18px 32px 14px}",
      "header.top h1{margin:0 0 4px;font-size:24px;font-weight:600;letter-spacing:.2px}",
      "header.top p{margin:2px 0;color:#d8e4ec}",
      "main{max-width:1180px;margin:0 auto;padding:8px 32px 40px}",
      ".pointer{margin:14px 0;padding:8px 12px;border-left:5px solid var(--accent);background:#fbefef}",
      "nav.toc{margin:10px 0 18px;padding:8px 14px;background:var(--soft);border:1px solid var(--rule)}",
      "nav.toc ol{margin:4px 0;padding-left:22px}",
      "nav.toc a{color:var(--band)}",
      "h2{font-size:20px;margin:30px 0 10px;padding-bottom:4px;border-bottom:2px solid var(--band)}",
      "h3{font-size:16px;margin:22px 0 8px;color:var(--band)}",
      "table{border-collapse:collapse;margin:8px 0 14px;font-size:13px}",
      "table.provenance th{white-space:nowrap}",
      "th,td{border:1px solid var(--rule);padding:4px 8px;vertical-align:top}",
      "th{background:var(--soft);text-align:left;font-weight:600}",
      "td.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}",
      "tr.flutter td{background:#fdecea}",
      "tr.limit td{background:#fff6e6}",
      "tr.static td{background:#f3eefa}",
      "td.mono,span.mono{font-family:'DejaVu Sans Mono',Consolas,monospace;font-size:12px;word-break:break-all}",
      "figure{margin:14px 0 22px}",
      "figure img{display:block;max-width:100%;height:auto;border:1px solid var(--rule)}",
      "figcaption{color:var(--muted);margin-top:4px}",
      "ul.notes{margin:4px 0 0;padding-left:20px;color:#6b4a00}",
      ".headline{margin:6px 0;padding:6px 10px;background:var(--soft);border-left:4px solid var(--band)}",
      ".warn{color:#8a1c12;font-weight:600}",
      ".ok{color:#2f6b3a}",
      "section.cautions{margin-top:34px;padding:14px 20px;border:3px solid var(--accent);background:#fff8f6}",
      "section.cautions h2{border-bottom-color:var(--accent);color:var(--accent)}",
      "section.cautions li{margin:6px 0;font-size:15px}",
      ".verdict{margin:10px 0;padding:8px 14px;border:1px solid var(--rule);border-left:6px solid #2f6b3a}",
      ".verdict.fail{border-left-color:var(--accent);background:#fffafa}",
      ".verdict p{margin:4px 0}",
      ".verdict ul{margin:4px 0;padding-left:22px}",
      ".badge{display:inline-block;padding:0 8px;border-radius:3px;color:#fff;font-weight:700}",
      ".badge.ok{background:#2f6b3a;color:#fff}",
      ".badge.warn{background:var(--accent);color:#fff}",
      "table.compact{font-size:12px}",
      "table.compact td,table.compact th{padding:2px 6px;white-space:nowrap}",
      "table.compact td:last-child{white-space:normal}",
      "tr.fail td{background:#fdf1f0}",
      "footer{color:var(--muted);font-size:12px;margin-top:24px}",
      "section.first-screen{margin:12px 0 4px}",
      "table.verdict-strip{width:100%;margin:0 0 6px;font-size:13px}",
      "table.verdict-strip th,table.verdict-strip td{padding:5px 7px}",
      "table.verdict-strip tbody th{font-size:14px;white-space:nowrap}",
      "table.verdict-strip td.num{white-space:normal;text-align:left}",
      "td.fail-cell{background:#fdf1f0}",
      ".muted,.badge.muted{color:var(--muted)}",
      ".badge.muted{background:var(--soft);border:1px solid var(--rule)}",
      "p.strip-note{margin:2px 0 6px;color:var(--muted);font-size:12px}",
      "figure.panel{margin:4px 0 10px}",
      "div.panel-row{display:flex;flex-wrap:wrap;gap:6px}",
      "div.panel-row img{border:1px solid var(--rule);max-width:32.5%;height:auto}",
      "div.case{margin:8px 0;padding:6px 12px;background:var(--soft);border:1px solid var(--rule);font-size:13px}",
      "div.case p{margin:3px 0}",
      "@page{size:A4;margin:14mm 12mm}",
      "@media print{",
      "body{font-size:10pt;line-height:1.35}",
      "header.top{background:none;color:var(--ink);padding:0 0 4pt;border-bottom:2pt solid var(--ink)}",
      "header.top p{color:var(--ink)}",
      "main{max-width:none;padding:0}",
      "nav.toc{display:none}",
      "h2{break-after:avoid;page-break-after:avoid}",
      "h3{break-after:avoid;page-break-after:avoid}",
      "section{break-before:auto}",
      "figure,table.verdict-strip,div.verdict,tr,.headline{break-inside:avoid;page-break-inside:avoid}",
      "thead{display:table-header-group}",
      "figure img{max-width:100%;border:none}",
      "div.panel-row img{max-width:32.5%}",
      ".badge,.verdict.fail,tr.fail td,tr.flutter td,tr.limit td,td.fail-cell{-webkit-print-color-adjust:exact;"
          + "print-color-adjust:exact}",
      "section.cautions{break-inside:avoid;page-break-inside:avoid}",
      "footer{display:none}",
      "}");

  /**
   * @param title page title (plain text)
   * @param subtitleLines lines under the title (plain text)
   * @param sections body sections, in order; ids must be unique and differ from
   *     {@link #CAUTIONS_ID}
   * @return the complete page
   */
  public static String render(String title, List<String> subtitleLines, List<ReportSection> sections) {
    return render(title, subtitleLines, w -> { }, List.of(), sections);
  }

  /**
   * @param title page title (plain text)
   * @param subtitleLines short lines under the title (plain text)
   * @param firstScreen writes what comes first under the title (the verdict strip)
   * @param caseLines the case description, after the first screen (plain text, one paragraph each)
   * @param sections body sections, in order; ids must be unique and differ from
   *     {@link #CAUTIONS_ID}
   * @return the complete page
   */
  public static String render(String title, List<String> subtitleLines,
      java.util.function.Consumer<XhtmlWriter> firstScreen, List<String> caseLines, List<ReportSection> sections) {
    Set<String> ids = new HashSet<>();
    ids.add(CAUTIONS_ID);
    for (ReportSection s : sections) {
      if (!s.id().matches("[a-z0-9-]+") || !ids.add(s.id())) {
        throw new IllegalArgumentException("section id must be unique lower-case letters, digits, dashes: " + s.id());
      }
    }
    XhtmlWriter w = new XhtmlWriter();
    w.declaration("<!DOCTYPE html>");
    w.open("html", "lang", "en");
    w.open("head");
    w.empty("meta", "charset", "utf-8");
    w.empty("meta", "name", "viewport", "content", "width=device-width, initial-scale=1");
    w.element("title", title);
    w.style(CSS);
    w.close("head");
    w.open("body");
    w.open("header", "class", "top");
    w.element("h1", title);
    for (String line : subtitleLines) {
      w.element("p", line);
    }
    w.close("header");
    w.open("main");
    firstScreen.accept(w);
    w.element("p", "Analysis only: these results support, and never replace, ground and flight testing and the "
        + "airworthiness approval. Read the cautions at the end of this report.", "class", "pointer");
    if (!caseLines.isEmpty()) {
      w.open("div", "class", "case");
      for (String line : caseLines) {
        w.element("p", line);
      }
      w.close("div");
    }
    w.open("nav", "class", "toc");
    w.element("strong", "Contents");
    w.open("ol");
    for (ReportSection s : sections) {
      w.open("li").element("a", s.heading(), "href", "#" + s.id()).close("li");
    }
    w.open("li").element("a", "Cautions", "href", "#" + CAUTIONS_ID).close("li");
    w.close("ol");
    w.close("nav");
    for (ReportSection s : sections) {
      w.open("section", "id", s.id());
      w.element("h2", s.heading());
      s.writeBody(w);
      w.close("section");
    }
    w.open("section", "id", CAUTIONS_ID, "class", "cautions");
    w.element("h2", "Cautions");
    w.open("ul");
    for (String c : Cautions.TEXT) {
      w.element("li", c);
    }
    w.close("ul");
    w.close("section");
    w.element("footer", "Generated by flexmargin. This file is self-contained: charts are embedded, "
        + "and the same charts are in the charts folder beside it.");
    w.close("main");
    w.close("body");
    w.close("html");
    return w.finish();
  }
}
