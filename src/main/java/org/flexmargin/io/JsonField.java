package org.flexmargin.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.PlausibleRange;

/**
 * One value of a {@link JsonInput} with its field path: typed, validated access that reports
 * failures as {@link InputFileException} with file, line and path. Instances are immutable.
 */
final class JsonField {
  private final JsonInput doc;
  private final JsonNode node;
  private final String path;

  JsonField(JsonInput doc, JsonNode node, String path) {
    this.doc = doc;
    this.node = node;
    this.path = path;
  }

  /** @return the path of key {@code key} inside the object at {@code parent} */
  static String childPath(String parent, String key) {
    return parent.isEmpty() ? key : parent + "." + key;
  }

  /** @return the field path */
  String path() {
    return path;
  }

  /** @return the 1-based line where the value starts (or its enclosing value), 0 if unknown */
  int line() {
    return doc.lineOf(path);
  }

  /** @return the file this field belongs to */
  SourceFile source() {
    return doc.source();
  }

  /** @return the Jackson node */
  JsonNode node() {
    return node;
  }

  /** @return an exception at this field */
  InputFileException fail(String expected, String found) {
    return new InputFileException(doc.source().display(), line(), path, expected, found);
  }

  /** @return a short description of a JSON value for messages */
  static String describe(JsonNode n) {
    if (n == null || n.isMissingNode()) {
      return "nothing";
    }
    if (n.isNumber()) {
      return n.isFloatingPointNumber() ? String.valueOf(n.doubleValue()) : n.asText();
    }
    if (n.isTextual()) {
      return "the text \"" + n.textValue() + "\"";
    }
    if (n.isObject()) {
      return "an object";
    }
    if (n.isArray()) {
      return "a list of " + n.size() + " entries";
    }
    return n.toString();
  }

  /** @return a description of this value for messages */
  String describe() {
    return describe(node);
  }

  /** Requires this value to be an object. @return this */
  JsonField object(String what) {
    if (!node.isObject()) {
      throw fail(what + " (a JSON object)", describe());
    }
    return this;
  }

  /**
   * Rejects keys outside {@code allowed}, naming the allowed ones.
   *
   * @param allowed the accepted keys
   */
  void allowOnly(Collection<String> allowed) {
    Iterator<String> names = node.fieldNames();
    while (names.hasNext()) {
      String name = names.next();
      if (!allowed.contains(name)) {
        JsonField c = new JsonField(doc, node.get(name), childPath(path, name));
        throw c.fail("one of the keys " + String.join(", ", allowed),
            "unknown key \"" + name + "\"" + Suggest.hint(name, allowed));
      }
    }
  }

  /** @return whether this object has key {@code key} */
  boolean has(String key) {
    return node.has(key);
  }

  /** @return the value at {@code key}, or {@code null} if absent */
  JsonField optional(String key) {
    JsonNode c = node.get(key);
    return c == null ? null : new JsonField(doc, c, childPath(path, key));
  }

  /** @return the value at {@code key}; fails naming {@code expected} if absent */
  JsonField required(String key, String expected) {
    JsonField c = optional(key);
    if (c == null) {
      throw new InputFileException(
          doc.source().display(), line(), childPath(path, key), expected, "nothing (required key missing)");
    }
    return c;
  }

  /**
   * Exactly one of {@code keys} must be present.
   *
   * @return the key that is present
   */
  String exactlyOne(String what, String... keys) {
    String present = null;
    for (String k : keys) {
      if (node.has(k)) {
        if (present != null) {
          throw optional(k).fail(
              "exactly one of " + String.join(", ", keys) + " (" + what + ")",
              "both \"" + present + "\" and \"" + k + "\"");
        }
        present = k;
      }
    }
    if (present == null) {
      throw new InputFileException(doc.source().display(), line(), childPath(path, keys[0]),
          "exactly one of the keys " + String.join(", ", keys) + " (" + what + ")", "none of them");
    }
    return present;
  }

  /** @return at most one of {@code keys}, or {@code null} if none is present */
  String atMostOne(String what, String... keys) {
    String present = null;
    for (String k : keys) {
      if (node.has(k)) {
        if (present != null) {
          throw optional(k).fail(
              "at most one of " + String.join(", ", keys) + " (" + what + ")",
              "both \"" + present + "\" and \"" + k + "\"");
        }
        present = k;
      }
    }
    return present;
  }

  /** @return this value as text */
  String text() {
    if (!node.isTextual()) {
      throw fail("a text value in double quotes", describe());
    }
    return node.textValue();
  }

  /**
   * Reads one of a fixed set of words, ignoring case ({@code "EAS"} reads as {@code "eas"}: every
   * set of words here differs in more than case, so this is never ambiguous).
   *
   * @param allowed the accepted words, as documented
   * @return the accepted word as documented
   */
  String choice(List<String> allowed) {
    String t = text();
    for (String a : allowed) {
      if (a.equalsIgnoreCase(t.strip())) {
        return a;
      }
    }
    throw fail(words(allowed), describe() + Suggest.hint(t, allowed));
  }

  /** @return {@code "a", "b" or "c"} */
  static String words(List<String> allowed) {
    StringBuilder sb = new StringBuilder();
    for (int i = 0; i < allowed.size(); i++) {
      if (i > 0) {
        sb.append(i == allowed.size() - 1 ? " or " : ", ");
      }
      sb.append('"').append(allowed.get(i)).append('"');
    }
    return sb.toString();
  }

  /**
   * Reads a number and checks it against its plausible and usual ranges ({@link ReadLog#check}).
   *
   * @param r the quantity
   * @return the value (not yet checked for sign: the model records do that)
   */
  double quantity(PlausibleRange r) {
    return quantity(r, 1.0, r.unit());
  }

  /**
   * Reads a number given in another unit, converts it to the range's SI unit and checks it.
   *
   * @param r the quantity
   * @param toSi factor from the written unit to the range's unit
   * @param writtenUnit the unit as written (for messages)
   * @return the value in the range's unit
   */
  double quantity(PlausibleRange r, double toSi, String writtenUnit) {
    double v = number();
    double si = v * toSi;
    String shown = describe() + (writtenUnit.isEmpty() ? "" : " " + writtenUnit);
    return doc.log().check(r, si, shown, doc.source().display(), line(), path);
  }

  /** @return the log of the read this field belongs to */
  ReadLog log() {
    return doc.log();
  }

  /** @return this value as a double (may be non-finite; range checks follow) */
  double number() {
    if (!node.isNumber()) {
      throw fail("a number", describe());
    }
    return node.doubleValue();
  }

  /** @return this value as a finite double */
  double finite() {
    double v = number();
    if (!Double.isFinite(v)) {
      throw fail("a finite number", describe());
    }
    return v;
  }

  /** @return this value as a finite double &gt; 0 */
  double positive() {
    double v = number();
    if (!Double.isFinite(v) || v <= 0) {
      throw fail("a finite value > 0", describe());
    }
    return v;
  }

  /** @return this value as an int (an integral number) */
  int integer() {
    if (!node.isNumber()) {
      throw fail("a whole number", describe());
    }
    double v = node.doubleValue();
    if (!node.isIntegralNumber() && v != Math.rint(v) || Math.abs(v) > Integer.MAX_VALUE) {
      throw fail("a whole number", describe());
    }
    return (int) v;
  }

  /** @return this value as a list of its entries */
  List<JsonField> list(String what) {
    if (!node.isArray()) {
      throw fail(what + " (a JSON list in [ ])", describe());
    }
    List<JsonField> out = new ArrayList<>(node.size());
    for (int i = 0; i < node.size(); i++) {
      out.add(new JsonField(doc, node.get(i), path + "[" + i + "]"));
    }
    return out;
  }

  /** @return the entries of this object, in file order */
  List<Map.Entry<String, JsonField>> entries() {
    List<Map.Entry<String, JsonField>> out = new ArrayList<>();
    Iterator<Map.Entry<String, JsonNode>> it = node.fields();
    while (it.hasNext()) {
      Map.Entry<String, JsonNode> e = it.next();
      out.add(Map.entry(e.getKey(), new JsonField(doc, e.getValue(), childPath(path, e.getKey()))));
    }
    return out;
  }

  /** @return this value as a list of finite numbers */
  double[] numbers(String what) {
    List<JsonField> items = list(what);
    double[] out = new double[items.size()];
    for (int i = 0; i < out.length; i++) {
      out[i] = items.get(i).finite();
    }
    return out;
  }

  /** @return this value as a list of numbers, each checked against {@code range} */
  double[] quantities(String what, PlausibleRange range) {
    List<JsonField> items = list(what);
    double[] out = new double[items.size()];
    for (int i = 0; i < out.length; i++) {
      out[i] = items.get(i).finite();
      items.get(i).quantity(range);
    }
    return out;
  }

  /**
   * Builds a model record from this object, turning its {@link InvalidInputException} into an
   * {@link InputFileException} at the offending key (path relative to this object).
   */
  <T> T build(Supplier<T> constructor) {
    try {
      return constructor.get();
    } catch (InvalidInputException e) {
      throw wrap(e);
    }
  }

  /** @return {@code e} located in this file, its field path taken relative to this value */
  InputFileException wrap(InvalidInputException e) {
    String rel = e.fieldPath();
    String full = rel.isEmpty() ? path : rel.startsWith("[") ? path + rel : childPath(path, rel);
    String msg = e.getMessage();
    String expected = "valid input";
    String found = msg;
    String prefix = rel + ": expected ";
    if (msg != null && msg.startsWith(prefix)) {
      String rest = msg.substring(prefix.length());
      int cut = rest.lastIndexOf(", found ");
      if (cut >= 0) {
        expected = rest.substring(0, cut);
        found = rest.substring(cut + ", found ".length());
      }
    }
    return new InputFileException(doc.source().display(), doc.lineOf(full), full, expected, found, e);
  }
}
