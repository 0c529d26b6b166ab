package org.flexmargin.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.flexmargin.sweep.ClosedLoopPoint;
import org.flexmargin.sweep.ClosedLoopRoot;

/**
 * Closed-loop roots followed from speed to speed, so that a line in the closed-loop V-g and V-f
 * charts is one root throughout and never jumps where two roots swap their nearest-open-loop
 * labels.
 *
 * <p>Each oscillatory root (Im s &gt; 0) at a grid point continues the track whose linear
 * prediction from the two previous grid points (the previous point alone at a track's start) is
 * nearest, cheapest pair first, measured relative to the root's modulus; a root further than
 * {@link #MAX_RELATIVE_STEP} from the track's previous root is not joined. A track is named after the
 * open-loop parent of its first root: each structural mode names at most one track, the root
 * labelled with it and nearest its in-vacuo frequency at the first point where it appears (a later
 * root of that mode continues the same track across a gap when its track has ended). Every other
 * track (rigid body with the loop, short period, second roots of a mode) is a loop root. Roots on
 * the real axis end a track; roots labelled {@link ClosedLoopCharts#CONTROL_LOOP_LABEL} are left
 * out.
 */
final class RootTracks {
  private RootTracks() {}

  /** Largest |s_k - s_{k-1}| / max(|s_{k-1}|, 1 1/s) joined into one track. */
  static final double MAX_RELATIVE_STEP = 0.35;

  /**
   * One followed root.
   *
   * @param name structural mode name, or the open-loop label of a loop root
   * @param structural whether the track is a structural mode's root
   * @param realPerS Re s per grid point (NaN where absent), 1/s
   * @param imagRadPerS Im s per grid point (NaN where absent), rad/s
   */
  record Track(String name, boolean structural, double[] realPerS, double[] imagRadPerS) {
    /** @return g = 2 Re s / Im s per point (V-g convention, negative stable), NaN where absent */
    double[] dampingG() {
      double[] g = new double[realPerS.length];
      for (int i = 0; i < g.length; i++) {
        g[i] = 2 * realPerS[i] / imagRadPerS[i];
      }
      return g;
    }

    /** @return frequency per point, Hz, NaN where absent */
    double[] frequencyHz() {
      double[] f = new double[imagRadPerS.length];
      for (int i = 0; i < f.length; i++) {
        f[i] = imagRadPerS[i] / (2 * Math.PI);
      }
      return f;
    }
  }

  /**
   * @param points closed-loop roots per grid point, in sweep order
   * @param modeNames structural mode names
   * @param modeFrequenciesHz their in-vacuo frequencies, Hz
   * @return structural tracks in mode order, then loop tracks in order of appearance
   */
  static List<Track> of(List<ClosedLoopPoint> points, List<String> modeNames, double[] modeFrequenciesHz) {
    int n = points.size();
    List<double[]> re = new ArrayList<>();
    List<double[]> im = new ArrayList<>();
    List<String> names = new ArrayList<>();
    List<Boolean> structural = new ArrayList<>();
    Map<String, Integer> modeTrack = new HashMap<>();
    for (int i = 0; i < n; i++) {
      List<ClosedLoopRoot> roots = new ArrayList<>();
      for (ClosedLoopRoot r : points.get(i).roots()) {
        if (r.imagRadPerS() > 0 && !r.label().equals(ClosedLoopCharts.CONTROL_LOOP_LABEL)) {
          roots.add(r);
        }
      }
      boolean[] taken = new boolean[roots.size()];
      if (i > 0) {
        // cheapest-first joining of the roots at i with the tracks alive at i - 1
        List<double[]> pairs = new ArrayList<>();
        for (int t = 0; t < re.size(); t++) {
          double pr = re.get(t)[i - 1];
          double pi = im.get(t)[i - 1];
          if (Double.isNaN(pr)) {
            continue;
          }
          double scale = Math.max(Math.hypot(pr, pi), 1.0);
          // linear prediction from the two previous points, where both exist: roots that cross keep
          // their direction of motion instead of jumping to the nearer of the two
          double qr = pr;
          double qi = pi;
          if (i >= 2 && !Double.isNaN(re.get(t)[i - 2])) {
            qr = 2 * pr - re.get(t)[i - 2];
            qi = 2 * pi - im.get(t)[i - 2];
          }
          for (int k = 0; k < roots.size(); k++) {
            double step = Math.hypot(roots.get(k).realPerS() - pr, roots.get(k).imagRadPerS() - pi) / scale;
            if (step > MAX_RELATIVE_STEP) {
              continue;
            }
            double d = Math.hypot(roots.get(k).realPerS() - qr, roots.get(k).imagRadPerS() - qi) / scale;
            pairs.add(new double[] {d, t, k});
          }
        }
        pairs.sort((a, b) -> Double.compare(a[0], b[0]));
        boolean[] joined = new boolean[re.size()];
        for (double[] p : pairs) {
          int t = (int) p[1];
          int k = (int) p[2];
          if (!joined[t] && !taken[k]) {
            joined[t] = true;
            taken[k] = true;
            re.get(t)[i] = roots.get(k).realPerS();
            im.get(t)[i] = roots.get(k).imagRadPerS();
          }
        }
      }
      // roots left over start tracks; a structural mode claims the one nearest its frequency
      Integer[] order = new Integer[roots.size()];
      for (int k = 0; k < order.length; k++) {
        order[k] = k;
      }
      Arrays.sort(order, (a, b) -> Double.compare(distanceToMode(roots.get(a), modeNames, modeFrequenciesHz),
          distanceToMode(roots.get(b), modeNames, modeFrequenciesHz)));
      for (int k : order) {
        if (taken[k]) {
          continue;
        }
        ClosedLoopRoot r = roots.get(k);
        Integer own = modeTrack.get(r.label());
        int mode = modeNames.indexOf(r.label());
        int t;
        if (own != null && (i == 0 || Double.isNaN(re.get(own)[i - 1])) && Double.isNaN(re.get(own)[i])) {
          t = own; // the mode's track resumes after a gap
        } else {
          t = re.size();
          re.add(MarginCharts.nan(n));
          im.add(MarginCharts.nan(n));
          boolean claims = mode >= 0 && own == null;
          names.add(r.label());
          structural.add(claims);
          if (claims) {
            modeTrack.put(r.label(), t);
          }
        }
        re.get(t)[i] = r.realPerS();
        im.get(t)[i] = r.imagRadPerS();
      }
    }
    List<Track> out = new ArrayList<>();
    for (String m : modeNames) {
      Integer t = modeTrack.get(m);
      if (t != null) {
        out.add(new Track(m, true, re.get(t), im.get(t)));
      }
    }
    for (int t = 0; t < re.size(); t++) {
      if (!structural.get(t)) {
        out.add(new Track(names.get(t), false, re.get(t), im.get(t)));
      }
    }
    return out;
  }

  /** Relative distance of a root from the in-vacuo frequency of the mode it is labelled with. */
  private static double distanceToMode(ClosedLoopRoot r, List<String> modeNames, double[] modeFrequenciesHz) {
    int m = modeNames.indexOf(r.label());
    return m < 0 ? Double.POSITIVE_INFINITY : Math.abs(r.frequencyHz() / modeFrequenciesHz[m] - 1);
  }
}
