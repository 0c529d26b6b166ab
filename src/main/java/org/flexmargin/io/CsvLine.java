package org.flexmargin.io;

import java.util.ArrayList;
import java.util.List;

/** One line of a CSV file split into its fields. */
public final class CsvLine {
  private CsvLine() {}

  /**
   * Splits one CSV line (RFC 4180 quoting, no line breaks inside quotes).
   *
   * @param line the line, without its line end
   * @param file the file, for the error message
   * @param lineNo its 1-based line number, for the error message
   * @return the fields
   * @throws InputFileException if a quote is not closed
   */
  public static List<String> split(String line, String file, int lineNo) {
    List<String> out = new ArrayList<>();
    StringBuilder sb = new StringBuilder();
    boolean quoted = false;
    for (int k = 0; k < line.length(); k++) {
      char ch = line.charAt(k);
      if (quoted) {
        if (ch == '"') {
          if (k + 1 < line.length() && line.charAt(k + 1) == '"') {
            sb.append('"');
            k++;
          } else {
            quoted = false;
          }
        } else {
          sb.append(ch);
        }
      } else if (ch == '"') {
        quoted = true;
      } else if (ch == ',') {
        out.add(sb.toString());
        sb.setLength(0);
      } else {
        sb.append(ch);
      }
    }
    if (quoted) {
      throw new InputFileException(file, lineNo, "", "a closing double quote", "the end of the line");
    }
    out.add(sb.toString());
    return out;
  }
}
