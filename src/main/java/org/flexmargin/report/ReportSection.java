package org.flexmargin.report;

/**
 * One titled section of the HTML report. The open-loop results, and later the loop and margin
 * analyses, each contribute sections; {@link HtmlReport} lays them out in order, with a table of
 * contents, and always ends with the cautions.
 */
public interface ReportSection {
  /** @return anchor id, unique in the report: lower-case letters, digits and dashes */
  String id();

  /** @return heading text (plain, escaped when written) */
  String heading();

  /**
   * Writes the body of the section (everything under the heading).
   *
   * @param out the document being written
   */
  void writeBody(XhtmlWriter out);

  /**
   * A section from its parts.
   *
   * @param id anchor id
   * @param heading heading text
   * @param body writes the body
   * @return the section
   */
  static ReportSection of(String id, String heading, java.util.function.Consumer<XhtmlWriter> body) {
    return new ReportSection() {
      @Override
      public String id() {
        return id;
      }

      @Override
      public String heading() {
        return heading;
      }

      @Override
      public void writeBody(XhtmlWriter out) {
        body.accept(out);
      }
    };
  }
}
