package org.flexmargin.io;

import java.util.Collection;
import java.util.Locale;

/** "Did you mean ...?" for mistyped keys and values: the closest allowed word by edit distance. */
final class Suggest {
  private Suggest() {}

  /**
   * @param typed what the user wrote
   * @param allowed the accepted words
   * @return the closest accepted word if it is close enough to be a slip (at most 2 edits, or a
   *     third of the word for long words, case ignored), else {@code null}
   */
  static String closest(String typed, Collection<String> allowed) {
    String t = typed.toLowerCase(Locale.ROOT);
    String best = null;
    int bestDistance = Integer.MAX_VALUE;
    for (String a : allowed) {
      int d = distance(t, a.toLowerCase(Locale.ROOT));
      if (d < bestDistance) {
        bestDistance = d;
        best = a;
      }
    }
    int tolerance = Math.max(2, Math.min(t.length(), best == null ? 0 : best.length()) / 3);
    return best != null && bestDistance <= tolerance ? best : null;
  }

  /** @return {@code " (did you mean \"x\"?)"} or the empty string */
  static String hint(String typed, Collection<String> allowed) {
    String c = closest(typed, allowed);
    return c == null ? "" : " (did you mean \"" + c + "\"?)";
  }

  /** Optimal string alignment distance (Levenshtein with adjacent transpositions). */
  static int distance(String a, String b) {
    if (Math.abs(a.length() - b.length()) > 8) {
      return Math.abs(a.length() - b.length());
    }
    int[][] d = new int[a.length() + 1][b.length() + 1];
    for (int i = 0; i <= a.length(); i++) {
      d[i][0] = i;
    }
    for (int j = 0; j <= b.length(); j++) {
      d[0][j] = j;
    }
    for (int i = 1; i <= a.length(); i++) {
      for (int j = 1; j <= b.length(); j++) {
        int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
        int v = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
        if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
          v = Math.min(v, d[i - 2][j - 2] + 1);
        }
        d[i][j] = v;
      }
    }
    return d[a.length()][b.length()];
  }
}
