package org.flexmargin.report;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.intermediate.commands.Command;
import de.erichseifert.vectorgraphics2d.intermediate.commands.DrawImageCommand;
import de.erichseifert.vectorgraphics2d.intermediate.commands.DrawStringCommand;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Paint;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.font.GlyphVector;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.awt.geom.PathIterator;
import java.text.AttributedCharacterIterator;
import java.util.HashMap;
import java.util.Map;

/**
 * A drawing surface that writes SVG text as it is drawn on: every {@code draw} and {@code fill}
 * becomes one {@code <path>} element with the current colour, stroke and transform, inside a group
 * that carries the current clip. The graphics state (transform, clip, colour, stroke, font, copies
 * made with {@code create()}) is kept by the {@link VectorGraphics2D} this extends; only the
 * shapes are written here, straight into one text buffer, without an intermediate document.
 *
 * <p>Text is drawn as glyph outlines (the fonts of the machine that drew the chart, so the file
 * looks the same everywhere). Images are not supported: drawing one fails in {@link #svg()}.
 */
final class SvgCanvas extends VectorGraphics2D {
  /** The text shared by this canvas and the copies made from it with {@code create()}. */
  private Output output;

  /**
   * @param width page width (px), positive
   * @param height page height (px), positive
   */
  SvgCanvas(int width, int height) {
    if (width <= 0 || height <= 0) {
      throw new IllegalArgumentException("page size must be positive: " + width + " x " + height);
    }
    output = new Output(width, height);
  }

  /** The SVG text and the clip paths defined so far. */
  private static final class Output {
    final int width;
    final int height;
    final StringBuilder defs = new StringBuilder();
    final StringBuilder body = new StringBuilder(1 << 16);
    final Map<String, String> clipIds = new HashMap<>();
    /** Clip id of the open group, or null when no group is open. */
    String openClip;

    Output(int width, int height) {
      this.width = width;
      this.height = height;
    }
  }

  @Override
  public Object clone() throws CloneNotSupportedException {
    SvgCanvas copy = (SvgCanvas) super.clone();
    copy.output = output; // copies draw into the same document
    return copy;
  }

  @Override
  public void draw(Shape s) {
    if (isDisposed() || s == null) {
      return;
    }
    StringBuilder style = new StringBuilder(96).append("fill:none;");
    appendPaint(style, "stroke");
    appendStroke(style, getStroke());
    element(s, style);
  }

  @Override
  public void fill(Shape s) {
    if (isDisposed() || s == null) {
      return;
    }
    StringBuilder style = new StringBuilder(48);
    appendPaint(style, "fill");
    style.append("stroke:none;");
    element(s, style);
  }

  @Override
  public void drawString(String str, float x, float y) {
    if (str != null && !str.isEmpty()) {
      fill(getFont().createGlyphVector(getFontRenderContext(), str).getOutline(x, y));
    }
  }

  @Override
  public void drawString(String str, int x, int y) {
    drawString(str, (float) x, (float) y);
  }

  @Override
  public void drawString(AttributedCharacterIterator text, float x, float y) {
    if (text != null && text.getEndIndex() > text.getBeginIndex()) {
      fill(new TextLayout(text, getFontRenderContext()).getOutline(AffineTransform.getTranslateInstance(x, y)));
    }
  }

  @Override
  public void drawString(AttributedCharacterIterator text, int x, int y) {
    drawString(text, (float) x, (float) y);
  }

  @Override
  public void drawGlyphVector(GlyphVector g, float x, float y) {
    if (g != null) {
      fill(g.getOutline(x, y));
    }
  }

  /**
   * @return the whole SVG document drawn so far
   * @throws IllegalStateException if an image or other element this canvas does not write was drawn
   */
  String svg() {
    for (Command<?> c : getCommands()) {
      if (c instanceof DrawImageCommand || c instanceof DrawStringCommand) {
        throw new IllegalStateException("chart element not supported in SVG: " + c.getClass().getSimpleName());
      }
    }
    Output o = output;
    StringBuilder doc = new StringBuilder(o.body.length() + o.defs.length() + 400);
    doc.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
        .append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(o.width)
        .append("px\" height=\"").append(o.height).append("px\" viewBox=\"0 0 ").append(o.width).append(' ')
        .append(o.height).append("\">\n");
    if (o.defs.length() > 0) {
      doc.append("<defs>\n").append(o.defs).append("</defs>\n");
    }
    doc.append(o.body);
    if (o.openClip != null) {
      doc.append("</g>\n");
    }
    return doc.append("</svg>\n").toString();
  }

  /** Writes one path element, in a group with the current clip. */
  private void element(Shape s, StringBuilder style) {
    StringBuilder d = new StringBuilder(64);
    PathIterator it = s.getPathIterator(null);
    if (!appendPath(d, it)) {
      return; // nothing to draw, or a coordinate no viewer can place
    }
    Output o = output;
    enterClip(o);
    StringBuilder b = o.body;
    b.append("<path d=\"").append(d).append("\" style=\"").append(style);
    if (it.getWindingRule() == PathIterator.WIND_EVEN_ODD) {
      b.append("fill-rule:evenodd;");
    }
    b.append('"');
    AffineTransform t = getTransform();
    if (!t.isIdentity()) {
      b.append(" transform=\"matrix(");
      SvgNumber.append(b, t.getScaleX()).append(' ');
      SvgNumber.append(b, t.getShearY()).append(' ');
      SvgNumber.append(b, t.getShearX()).append(' ');
      SvgNumber.append(b, t.getScaleY()).append(' ');
      SvgNumber.append(b, t.getTranslateX()).append(' ');
      SvgNumber.append(b, t.getTranslateY()).append(")\"");
    }
    b.append("/>\n");
  }

  /** Opens the group of the current clip (device space) if it differs from the open one. */
  private void enterClip(Output o) {
    Shape userClip = getClip();
    String id = null;
    if (userClip != null) {
      StringBuilder d = new StringBuilder(64);
      if (appendPath(d, userClip.getPathIterator(getTransform()))) {
        String key = d.toString();
        id = o.clipIds.get(key);
        if (id == null) {
          id = "clip" + (o.clipIds.size() + 1);
          o.clipIds.put(key, id);
          o.defs.append("<clipPath id=\"").append(id).append("\"><path d=\"").append(key).append("\"/></clipPath>\n");
        }
      }
    }
    if (id == null ? o.openClip == null : id.equals(o.openClip)) {
      return;
    }
    if (o.openClip != null) {
      o.body.append("</g>\n");
    }
    if (id != null) {
      o.body.append("<g clip-path=\"url(#").append(id).append(")\">\n");
    }
    o.openClip = id;
  }

  /**
   * Appends SVG path data.
   *
   * @return false if the path has no segment or a coordinate that cannot be written
   */
  private static boolean appendPath(StringBuilder d, PathIterator it) {
    double[] c = new double[6];
    boolean any = false;
    while (!it.isDone()) {
      int type = it.currentSegment(c);
      int n = switch (type) {
        case PathIterator.SEG_MOVETO, PathIterator.SEG_LINETO -> 2;
        case PathIterator.SEG_QUADTO -> 4;
        case PathIterator.SEG_CUBICTO -> 6;
        default -> 0;
      };
      for (int i = 0; i < n; i++) {
        if (!SvgNumber.writable(c[i])) {
          return false;
        }
      }
      if (d.length() > 0) {
        d.append(' ');
      }
      d.append(switch (type) {
        case PathIterator.SEG_MOVETO -> 'M';
        case PathIterator.SEG_LINETO -> 'L';
        case PathIterator.SEG_QUADTO -> 'Q';
        case PathIterator.SEG_CUBICTO -> 'C';
        default -> 'Z';
      });
      for (int i = 0; i < n; i++) {
        if (i > 0) {
          d.append(i % 2 == 0 ? ' ' : ',');
        }
        SvgNumber.append(d, c[i]);
      }
      any = true;
      it.next();
    }
    return any;
  }

  /** Appends "fill:rgb(...);" or "stroke:rgb(...);" with the opacity of a translucent colour. */
  private void appendPaint(StringBuilder style, String property) {
    Paint p = getPaint();
    Color color = p instanceof Color pc ? pc : getColor();
    style.append(property).append(":rgb(").append(color.getRed()).append(',').append(color.getGreen()).append(',')
        .append(color.getBlue()).append(");");
    if (color.getAlpha() < 255) {
      style.append(property).append("-opacity:");
      SvgNumber.append(style, color.getAlpha() / 255.0).append(';');
    }
  }

  /** Appends the width, joins, caps and dashes of a stroke (a plain 1 px line if not a BasicStroke). */
  private static void appendStroke(StringBuilder style, Stroke stroke) {
    if (!(stroke instanceof BasicStroke s)) {
      return;
    }
    if (s.getLineWidth() != 1f) {
      style.append("stroke-width:");
      SvgNumber.append(style, s.getLineWidth()).append(';');
    }
    style.append("stroke-miterlimit:");
    SvgNumber.append(style, s.getMiterLimit()).append(';');
    style.append(switch (s.getEndCap()) {
      case BasicStroke.CAP_ROUND -> "stroke-linecap:round;";
      case BasicStroke.CAP_SQUARE -> "stroke-linecap:square;";
      default -> "";
    });
    style.append(switch (s.getLineJoin()) {
      case BasicStroke.JOIN_ROUND -> "stroke-linejoin:round;";
      case BasicStroke.JOIN_BEVEL -> "stroke-linejoin:bevel;";
      default -> "";
    });
    float[] dash = s.getDashArray();
    if (dash != null && dash.length > 0) {
      style.append("stroke-dasharray:");
      for (int i = 0; i < dash.length; i++) {
        SvgNumber.append(i > 0 ? style.append(',') : style, dash[i]);
      }
      style.append(';');
      if (s.getDashPhase() != 0f) {
        style.append("stroke-dashoffset:");
        SvgNumber.append(style, s.getDashPhase()).append(';');
      }
    }
  }
}
