package org.flexmargin.notch;

import java.util.List;
import org.flexmargin.loop.NotchFilter;

/**
 * Evaluates candidate notch sets on {@link LoopSamples}: L = L_rest + L_path prod N_i on every
 * stored grid, the structural peak per mode, the phase loss at the rigid-body crossovers and the
 * rigid-body margins estimated on the rigid-band grid (crossings located by linear interpolation in
 * ln w between grid points, 60 per decade). A workspace: not thread-safe.
 */
public final class NotchEvaluator {
  private final LoopSamples samples;
  private final double[][] nRe;
  private final double[][] nIm;
  private final double[] v = new double[2];

  /** @param samples the sampled loop */
  public NotchEvaluator(LoopSamples samples) {
    this.samples = samples;
    int g = samples.grids().size();
    nRe = new double[g][];
    nIm = new double[g][];
    for (int i = 0; i < g; i++) {
      nRe[i] = new double[samples.grids().get(i).length];
      nIm[i] = new double[nRe[i].length];
    }
  }

  /** @return the samples */
  public LoopSamples samples() {
    return samples;
  }

  /** prod N_i(j w) on every grid. */
  private void prepare(List<NotchFilter> notches) {
    for (int g = 0; g < nRe.length; g++) {
      double[] w = samples.grids().get(g);
      double[] re = nRe[g];
      double[] im = nIm[g];
      for (int i = 0; i < w.length; i++) {
        double pr = 1;
        double pi = 0;
        for (NotchFilter n : notches) {
          n.response(w[i], v);
          double t = pr * v[0] - pi * v[1];
          pi = pr * v[1] + pi * v[0];
          pr = t;
        }
        re[i] = pr;
        im[i] = pi;
      }
    }
  }

  /**
   * @param notches candidate notches (in the carrying paths, on top of what the samples contain)
   * @return the loop with them at every sample
   */
  public SampleEvaluation evaluate(List<NotchFilter> notches) {
    prepare(notches);
    int ns = samples.size();
    int nm = samples.modeNames().size();
    double[][] peakDb = new double[ns][nm];
    double[][] peakHz = new double[ns][nm];
    double[] loss = new double[ns];
    double[] lossHz = new double[ns];
    double[] pm = new double[ns];
    double[] gmInc = new double[ns];
    double[] gmRed = new double[ns];
    double[] margins = new double[3];
    for (int s = 0; s < ns; s++) {
      LoopSamples.Sample smp = samples.samples().get(s);
      java.util.Arrays.fill(peakDb[s], Double.NaN);
      java.util.Arrays.fill(peakHz[s], Double.NaN);
      for (int k = 0; k < smp.modeGrid.length; k++) {
        int g = smp.modeGrid[k];
        double[] w = samples.grids().get(g);
        double best = -1;
        int at = 0;
        for (int i = 0; i < w.length; i++) {
          double lr = smp.restRe[k][i] + smp.pathRe[k][i] * nRe[g][i] - smp.pathIm[k][i] * nIm[g][i];
          double li = smp.restIm[k][i] + smp.pathRe[k][i] * nIm[g][i] + smp.pathIm[k][i] * nRe[g][i];
          double mag2 = lr * lr + li * li;
          if (mag2 > best) {
            best = mag2;
            at = i;
          }
        }
        int mode = smp.modeIndex[k];
        double db = 10 * Math.log10(best);
        if (!(db <= peakDb[s][mode])) {
          peakDb[s][mode] = db;
          peakHz[s][mode] = w[at] / (2 * Math.PI);
        }
      }
      loss[s] = 0;
      lossHz[s] = Double.NaN;
      for (double wc : smp.crossovers) {
        double l = phaseLossDeg(notches, wc, v);
        if (Double.isNaN(lossHz[s]) || l > loss[s]) {
          loss[s] = l;
          lossHz[s] = wc / (2 * Math.PI);
        }
      }
      rigidMargins(smp, margins);
      pm[s] = margins[0];
      gmInc[s] = margins[1];
      gmRed[s] = margins[2];
    }
    return new SampleEvaluation(peakDb, peakHz, loss, lossHz, pm, gmInc, gmRed);
  }

  /**
   * @param notches notches
   * @param omegaRadPerS frequency, rad/s
   * @param work two-element workspace
   * @return -arg prod N_i(j w), deg (positive = lag), summed per notch so it is not wrapped
   */
  static double phaseLossDeg(List<NotchFilter> notches, double omegaRadPerS, double[] work) {
    double sum = 0;
    for (NotchFilter n : notches) {
      n.response(omegaRadPerS, work);
      sum += Math.atan2(work[1], work[0]);
    }
    return -Math.toDegrees(sum);
  }

  /** Rigid-body PM (deg), GM+ (dB), GM- (dB) of rest + path N on the rigid grid. */
  private void rigidMargins(LoopSamples.Sample smp, double[] out) {
    int g = smp.rigidGrid;
    double[] w = samples.grids().get(g);
    double pm = Double.POSITIVE_INFINITY;
    double gmInc = Double.POSITIVE_INFINITY;
    double gmRed = Double.NEGATIVE_INFINITY;
    double prevLog = 0;
    double prevPhase = 0;
    for (int i = 0; i < w.length; i++) {
      double lr = smp.rigidRestRe[i] + smp.rigidPathRe[i] * nRe[g][i] - smp.rigidPathIm[i] * nIm[g][i];
      double li = smp.rigidRestIm[i] + smp.rigidPathRe[i] * nIm[g][i] + smp.rigidPathIm[i] * nRe[g][i];
      double logMag = 0.5 * Math.log(lr * lr + li * li);
      double ph = Math.atan2(li, lr);
      if (i > 0) {
        ph = prevPhase + wrap(ph - prevPhase);
        if ((prevLog <= 0) != (logMag <= 0)) {
          double t = prevLog / (prevLog - logMag);
          double phc = prevPhase + t * (ph - prevPhase);
          pm = Math.min(pm, Math.toDegrees(wrap(Math.PI + phc)));
        }
        long ka = (long) Math.floor((prevPhase + Math.PI) / (2 * Math.PI));
        long kb = (long) Math.floor((ph + Math.PI) / (2 * Math.PI));
        for (long k = Math.min(ka, kb) + 1; k <= Math.max(ka, kb); k++) {
          double target = -Math.PI + 2 * Math.PI * k;
          double t = (target - prevPhase) / (ph - prevPhase);
          double gm = -20 / Math.log(10) * (prevLog + t * (logMag - prevLog));
          if (gm > 0) {
            gmInc = Math.min(gmInc, gm);
          } else {
            gmRed = Math.max(gmRed, gm);
          }
        }
      }
      prevLog = logMag;
      prevPhase = ph;
    }
    out[0] = pm;
    out[1] = gmInc;
    out[2] = gmRed;
  }

  private static double wrap(double a) {
    double r = Math.IEEEremainder(a, 2 * Math.PI);
    return r <= -Math.PI ? r + 2 * Math.PI : r;
  }
}
