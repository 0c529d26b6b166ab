package org.flexmargin.report;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;

/**
 * Builds markup that is both HTML5 and well-formed XML (every element closed, attributes quoted,
 * only the five XML entities), so that reports can be checked with a strict XML parser. All text
 * and attribute values are escaped here; callers never write raw markup. Not thread-safe.
 */
public final class XhtmlWriter {
  private final StringBuilder out = new StringBuilder(1 << 16);
  private final Deque<String> open = new ArrayDeque<>();

  /** Starts an empty document. */
  public XhtmlWriter() {}

  /**
   * @param text any text
   * @return the text with {@code & < > " '} replaced by character references, and control
   *     characters other than tab and newline removed (they are not allowed in XML)
   */
  public static String escape(String text) {
    int first = 0;
    while (first < text.length() && plain(text.charAt(first))) {
      first++;
    }
    if (first == text.length()) {
      return text; // nothing to replace (the common case, e.g. an embedded chart's data URI)
    }
    StringBuilder b = new StringBuilder(text.length() + 16).append(text, 0, first);
    for (int i = first; i < text.length(); i++) {
      char ch = text.charAt(i);
      switch (ch) {
        case '&' -> b.append("&amp;");
        case '<' -> b.append("&lt;");
        case '>' -> b.append("&gt;");
        case '"' -> b.append("&quot;");
        case '\'' -> b.append("&#39;");
        default -> {
          if (plain(ch)) {
            b.append(ch);
          }
        }
      }
    }
    return b.toString();
  }

  /** @return whether {@link #escape} writes the character as it is */
  private static boolean plain(char ch) {
    return ch != '&' && ch != '<' && ch != '>' && ch != '"' && ch != '\'' && (ch >= 0x20 || ch == '\n' || ch == '\t');
  }

  /**
   * Writes raw text that is known to be markup-free (a doctype line).
   *
   * @param declaration e.g. {@code <!DOCTYPE html>}
   * @return this
   */
  public XhtmlWriter declaration(String declaration) {
    if (!declaration.startsWith("<!") || declaration.indexOf('>') != declaration.length() - 1) {
      throw new IllegalArgumentException("not a declaration: " + declaration);
    }
    out.append(declaration).append('\n');
    return this;
  }

  /**
   * Opens an element.
   *
   * @param tag element name (lower-case letters and digits)
   * @param attributes name, value pairs; a null value leaves the attribute out
   * @return this
   */
  public XhtmlWriter open(String tag, String... attributes) {
    startTag(tag, attributes);
    out.append('>');
    open.push(tag);
    return this;
  }

  /**
   * Closes the innermost open element, which must be {@code tag}.
   *
   * @param tag element name
   * @return this
   */
  public XhtmlWriter close(String tag) {
    String top = open.poll();
    if (!tag.equals(top)) {
      throw new IllegalStateException("closing <" + tag + "> but <" + top + "> is open");
    }
    out.append("</").append(tag).append('>');
    if (isBlock(tag)) {
      out.append('\n');
    }
    return this;
  }

  /**
   * Writes an element with text content.
   *
   * @param tag element name
   * @param text content (escaped)
   * @param attributes name, value pairs
   * @return this
   */
  public XhtmlWriter element(String tag, String text, String... attributes) {
    open(tag, attributes);
    text(text);
    return close(tag);
  }

  /**
   * Writes an element without content, e.g. {@code <img .../>}.
   *
   * @param tag element name
   * @param attributes name, value pairs
   * @return this
   */
  public XhtmlWriter empty(String tag, String... attributes) {
    startTag(tag, attributes);
    out.append("/>");
    return this;
  }

  /**
   * @param text text content (escaped)
   * @return this
   */
  public XhtmlWriter text(String text) {
    out.append(escape(text));
    return this;
  }

  /**
   * Writes a text-only style sheet: the content must not contain a {@code <}, so it needs no
   * escaping and stays valid in both HTML and XML.
   *
   * @param css the style rules
   * @return this
   */
  public XhtmlWriter style(String css) {
    if (css.indexOf('<') >= 0 || css.indexOf('&') >= 0) {
      throw new IllegalArgumentException("style sheet must not contain < or &");
    }
    out.append("<style>").append(css).append("</style>\n");
    return this;
  }

  /** @return the markup; every element must be closed */
  public String finish() {
    if (!open.isEmpty()) {
      throw new IllegalStateException("unclosed elements: " + open);
    }
    return out.toString();
  }

  private void startTag(String tag, String... attributes) {
    if (!tag.matches("[a-z][a-z0-9]*")) {
      throw new IllegalArgumentException("bad tag " + tag);
    }
    if (attributes.length % 2 != 0) {
      throw new IllegalArgumentException("attributes come in name, value pairs");
    }
    out.append('<').append(tag);
    for (int i = 0; i < attributes.length; i += 2) {
      String name = attributes[i];
      if (!name.toLowerCase(Locale.ROOT).matches("[a-z][a-z0-9-]*") || name.startsWith("on")) {
        throw new IllegalArgumentException("bad attribute name " + name);
      }
      if (attributes[i + 1] != null) {
        out.append(' ').append(name).append("=\"").append(escape(attributes[i + 1])).append('"');
      }
    }
  }

  private static boolean isBlock(String tag) {
    return switch (tag) {
      case "html", "head", "body", "section", "table", "tr", "thead", "tbody", "ul", "ol", "li", "figure",
          "div", "header", "footer", "nav", "p", "h1", "h2", "h3", "dl", "dd" -> true;
      default -> false;
    };
  }
}
