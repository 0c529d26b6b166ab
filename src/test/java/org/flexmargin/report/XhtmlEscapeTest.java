package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/** Escaping of text and attribute values, with and without anything to replace. */
class XhtmlEscapeTest {
  @Test
  void plainTextComesBackAsItIs() {
    String uri = "data:image/png;base64,iVBORw0KGgo+/=\tline\n";
    assertSame(uri, XhtmlWriter.escape(uri));
    assertEquals("", XhtmlWriter.escape(""));
  }

  @Test
  void replacementsAfterAPlainStretchAndControlCharactersDropped() {
    assertEquals("V_L &lt; 1.15 &amp; g &gt; 0 &quot;q&quot; &#39;x&#39;", XhtmlWriter.escape("V_L < 1.15 & g > 0 \"q\" 'x'"));
    assertEquals("ab", XhtmlWriter.escape("a\u0007b"), "bell removed");
    assertEquals("ab", XhtmlWriter.escape("\u0000ab"), "first character removed");
    assertEquals("a\tb\nc&amp;", XhtmlWriter.escape("a\tb\r\nc&").replace("\r", ""));
    assertEquals("\u00b0 &amp; \u03b6", XhtmlWriter.escape("\u00b0 & \u03b6"), "non-ASCII kept");
  }
}
