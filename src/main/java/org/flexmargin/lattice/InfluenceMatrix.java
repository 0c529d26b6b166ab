package org.flexmargin.lattice;

import java.util.stream.IntStream;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.FlowSymmetry;

/**
 * The doublet-lattice influence matrix D(k, M): the normalwash w_i / U at the control point of box
 * i per unit pressure coefficient jump Delta Cp_j = (p_lower - p_upper) / q on box j, for harmonic
 * motion (Albano and Rodden, AIAA J. 7(2), 1969).
 *
 * <p>D = D0 + D1 + D2. The steady part D0 is the horseshoe vortex of each box (bound vortex on the
 * doublet line, trailing legs to x = +infinity in the box plane), from the Biot-Savart law in
 * Prandtl-Glauert coordinates (x / beta, y, z), with circulation Gamma = U Delta Cp chord / 2:
 * D0_ij = (chord_j / 2) v_ij . n_i for a unit circulation. The oscillatory increments
 *
 * <pre>
 *   D1_ij = chord_j / (8 pi) int_{-e}^{e} P1(eta) / r1^2 d eta   (planar part)
 *   D2_ij = chord_j / (8 pi) int_{-e}^{e} P2(eta) / r1^4 d eta   (non-planar part)
 * </pre>
 *
 * with the numerators of {@link IncrementalKernel} approximated by the quartic through their values
 * at eta = -e, -e/2, 0, e/2, e and integrated in closed form (Rodden, Taylor and McIntosh, J.
 * Aircraft 35(5), 1998). Receiving points within 1e-3 e of a sending box's plane use the planar
 * formulas (Hadamard finite part, D2 = 0). Reduced frequency k = omega b_ref / U.
 *
 * <p>Sign: mode shapes positive up; a positive Delta Cp is lift along the box normal and induces
 * downwash behind the box (D0_ii &lt; 0).
 */
public final class InfluenceMatrix {
  private static final double PLANAR = 1e-3;
  /** Rows per parallel task. */
  private static final int ROW_BLOCK = 8;

  private InfluenceMatrix() {}

  /**
   * Builds D(k, M). Rows are built in parallel in blocks (the common fork-join pool, or the pool
   * the caller runs in); each row is computed independently, so the result does not depend on the
   * number of threads.
   *
   * @param lattice the boxes
   * @param omegaOverU omega / U = k / b_ref (rad/m), &gt;= 0
   * @param mach Mach number in [0, 0.95]
   * @param out n x n complex matrix, reshaped if needed; modified
   */
  public static void build(BoxLattice lattice, double omegaOverU, double mach, ZMatrixRMaj out) {
    if (!(mach >= 0 && mach <= 0.95)) {
      throw new IllegalArgumentException("Mach number outside [0, 0.95]: " + mach);
    }
    if (!(omegaOverU >= 0) || Double.isInfinite(omegaOverU)) {
      throw new IllegalArgumentException("omega / U must be finite and >= 0: " + omegaOverU);
    }
    int n = lattice.size();
    out.reshape(n, n);
    double[] d = out.data;
    Senders senders = new Senders(lattice, omegaOverU, mach);
    int blocks = (n + ROW_BLOCK - 1) / ROW_BLOCK;
    IntStream.range(0, blocks).parallel().forEach(b -> {
      Workspace w = new Workspace(senders.count);
      for (int i = b * ROW_BLOCK; i < Math.min(n, (b + 1) * ROW_BLOCK); i++) {
        java.util.Arrays.fill(d, 2 * i * n, 2 * (i + 1) * n, 0.0);
        for (int t = 0; t < senders.count; t++) {
          addPair(lattice, i, senders, senders.order[t], omegaOverU, mach, w, d);
        }
      }
    });
  }

  /**
   * Geometry of every sending doublet line (the boxes, then their mirror images if the flow has a
   * symmetry), computed once per matrix: end points (x already divided by beta for the
   * horseshoe), midpoint, half-span, sweep, dihedral, chord, the sign of the image's load, and
   * exp(i omega eta tan(sweep) / U) at the five points eta = -e, -e/2, 0, e/2, e of the quartic.
   *
   * <p>Spanwise neighbours share a point: the outboard end of one doublet line is the inboard end
   * of the next (same coordinates, same plane, same half-span). {@code previous[s]} names the
   * sender whose outboard end is the inboard end of s (or -1), and {@code order} visits every such
   * predecessor first, so that the kernel at that point is evaluated once per receiver: four
   * evaluations per box pair instead of five.
   */
  private static final class Senders {
    final int count;
    final int[] column, previous, order;
    final double[] ax, ay, az, bx, by, bz, mx, my, mz, e, tanL, cg, sg, chord, sign, shift;

    Senders(BoxLattice l, double omegaOverU, double mach) {
      int n = l.size();
      count = l.symmetry() == FlowSymmetry.NONE ? n : 2 * n;
      double imageSign = l.symmetry() == FlowSymmetry.ANTISYMMETRIC ? -1 : 1;
      double beta = Math.sqrt(1 - mach * mach);
      column = new int[count];
      ax = new double[count]; ay = new double[count]; az = new double[count];
      bx = new double[count]; by = new double[count]; bz = new double[count];
      mx = new double[count]; my = new double[count]; mz = new double[count];
      e = new double[count]; tanL = new double[count]; cg = new double[count];
      sg = new double[count]; chord = new double[count]; sign = new double[count];
      shift = new double[10 * count];
      for (int s = 0; s < count; s++) {
        int j = s % n;
        boolean image = s >= n;
        column[s] = j;
        if (image) {
          // the mirror of A -> B runs from the image of B to the image of A (inboard to outboard)
          ax[s] = l.bx[j]; ay[s] = -l.by[j]; az[s] = l.bz[j];
          bx[s] = l.ax[j]; by[s] = -l.ay[j]; bz[s] = l.az[j];
          sg[s] = -l.sinG[j];
          sign[s] = imageSign;
        } else {
          ax[s] = l.ax[j]; ay[s] = l.ay[j]; az[s] = l.az[j];
          bx[s] = l.bx[j]; by[s] = l.by[j]; bz[s] = l.bz[j];
          sg[s] = l.sinG[j];
          sign[s] = 1;
        }
        cg[s] = l.cosG[j];
        chord[s] = l.chord[j];
        mx[s] = 0.5 * (ax[s] + bx[s]); my[s] = 0.5 * (ay[s] + by[s]); mz[s] = 0.5 * (az[s] + bz[s]);
        e[s] = 0.5 * Math.hypot(by[s] - ay[s], bz[s] - az[s]);
        tanL[s] = (bx[s] - ax[s]) / (2 * e[s]);
        ax[s] /= beta;
        bx[s] /= beta;
        for (int q = 0; q < 5; q++) {
          double a = omegaOverU * (q - 2) * 0.5 * e[s] * tanL[s];
          shift[10 * s + 2 * q] = Math.cos(a);
          shift[10 * s + 2 * q + 1] = Math.sin(a);
        }
      }
      previous = new int[count];
      order = new int[count];
      link();
    }

    /** Sets {@link #previous} and {@link #order} (see the class comment). */
    private void link() {
      java.util.Map<java.util.List<Double>, Integer> byOutboardEnd = new java.util.HashMap<>();
      java.util.Set<java.util.List<Double>> shared = new java.util.HashSet<>();
      for (int s = 0; s < count; s++) {
        java.util.List<Double> key = java.util.List.of(bx[s], by[s], bz[s], cg[s], sg[s], e[s]);
        if (byOutboardEnd.putIfAbsent(key, s) != null) {
          shared.add(key);
        }
      }
      int[] next = new int[count];
      java.util.Arrays.fill(next, -1);
      for (int s = 0; s < count; s++) {
        java.util.List<Double> key = java.util.List.of(ax[s], ay[s], az[s], cg[s], sg[s], e[s]);
        Integer p = shared.contains(key) ? null : byOutboardEnd.get(key);
        previous[s] = p == null || p == s ? -1 : p;
        if (previous[s] >= 0) {
          next[previous[s]] = s;
        }
      }
      int t = 0;
      for (int s = 0; s < count; s++) {
        if (previous[s] < 0) {
          for (int c = s; c >= 0; c = next[c]) {
            order[t++] = c;
          }
        }
      }
      if (t != count) {
        // a closed chain (not possible for trapezoids, which have an inboard end): no sharing
        java.util.Arrays.fill(previous, -1);
        for (int s = 0; s < count; s++) {
          order[s] = s;
        }
      }
    }
  }

  /** Scratch of one thread. */
  private static final class Workspace {
    /** kernel numerators {re P1, im P1, re P2, im P2} at the outboard end of each sender. */
    final double[] outboard;
    final double[] k = new double[24];
    final double[] p1 = new double[10];
    final double[] p2 = new double[10];
    final double[] f = new double[5];
    final double[] g = new double[5];
    final double[] c = new double[10];

    Workspace(int senders) {
      outboard = new double[4 * senders];
    }
  }

  /** Adds the normalwash at receiver i of sender s to D[i][column of s]. */
  private static void addPair(
      BoxLattice l, int i, Senders sd, int s, double kbar, double mach, Workspace w, double[] d) {
    int n = l.size();
    double beta = Math.sqrt(1 - mach * mach);
    double sign = sd.sign[s];
    double px = l.cx[i], py = l.cy[i], pz = l.cz[i];
    double nY = -l.sinG[i], nZ = l.cosG[i];
    double v = horseshoeNormalwash(sd, s, px / beta, py, pz, nY, nZ);
    int idx = 2 * (i * n + sd.column[s]);
    double chord = sd.chord[s];
    d[idx] += sign * chord / 2 * v;
    if (kbar == 0) {
      return;
    }
    // receiving point in the sender's local frame
    double cg = sd.cg[s], sg = sd.sg[s], e = sd.e[s], tanL = sd.tanL[s];
    double dx = px - sd.mx[s], dy = py - sd.my[s], dz = pz - sd.mz[s];
    double yb = dy * cg + dz * sg;
    double zb = -dy * sg + dz * cg;
    double cosDg = l.cosG[i] * cg + l.sinG[i] * sg;
    double sinDg = l.sinG[i] * cg - l.cosG[i] * sg;
    boolean planar = Math.abs(zb) < PLANAR * e;
    if (planar) {
      zb = 0;
    }
    // exp(-i kbar x0) at the midpoint; at eta it is that times exp(i kbar eta tanL)
    double mr = Math.cos(kbar * dx), mi = -Math.sin(kbar * dx);
    int prev = sd.previous[s];
    for (int q = 0; q < 5; q++) {
      double[] src = w.k;
      int at = 0;
      if (q == 0 && prev >= 0) {
        // the inboard end is the outboard end of the previous sender, evaluated just before
        src = w.outboard;
        at = 4 * prev;
      } else {
        double eta = (q - 2) * 0.5 * e;
        double sr = sd.shift[10 * s + 2 * q], si = sd.shift[10 * s + 2 * q + 1];
        IncrementalKernel.evaluate(dx - eta * tanL, yb - eta, zb, cosDg, sinDg, kbar, mach,
            mr * sr - mi * si, mr * si + mi * sr, w.k);
      }
      w.p1[2 * q] = src[at];
      w.p1[2 * q + 1] = src[at + 1];
      w.p2[2 * q] = src[at + 2];
      w.p2[2 * q + 1] = src[at + 3];
    }
    System.arraycopy(w.k, 0, w.outboard, 4 * s, 4);
    lineIntegrals(yb, zb, e, planar, w.f, w.g);
    double re = 0, im = 0;
    quartic(w.p1, e, w.c);
    for (int m = 0; m < 5; m++) {
      re += w.c[2 * m] * w.f[m];
      im += w.c[2 * m + 1] * w.f[m];
    }
    if (!planar) {
      quartic(w.p2, e, w.c);
      for (int m = 0; m < 5; m++) {
        re += w.c[2 * m] * w.g[m];
        im += w.c[2 * m + 1] * w.g[m];
      }
    }
    // the kernel integrals are normalwash positive down; this class uses positive up
    double incScale = -sign * chord / (8 * Math.PI);
    d[idx] += incScale * re;
    d[idx + 1] += incScale * im;
  }

  /**
   * Coefficients c0..c4 (complex, interleaved) of the quartic through the values at eta = -e,
   * -e/2, 0, e/2, e (interleaved complex in {@code p}).
   */
  static void quartic(double[] p, double e, double[] c) {
    for (int part = 0; part < 2; part++) {
      double a = p[part], b = p[2 + part], m = p[4 + part], dd = p[6 + part], f = p[8 + part];
      double c1 = (8 * (dd - b) - (f - a)) / (6 * e);
      double c3 = ((f - a) / 2 - c1 * e) / (e * e * e);
      double s1 = (a + f) / 2 - m, s2 = (b + dd) / 2 - m;
      double c2 = (16 * s2 - s1) / (3 * e * e);
      double c4 = (s1 - c2 * e * e) / (e * e * e * e);
      c[part] = m;
      c[2 + part] = c1;
      c[4 + part] = c2;
      c[6 + part] = c3;
      c[8 + part] = c4;
    }
  }

  /**
   * F_n = int_{-e}^{e} eta^n / ((eta - y)^2 + z^2) d eta and G_n = int eta^n / (...)^2 d eta for
   * n = 0..4 (Hadamard finite part when planar).
   */
  static void lineIntegrals(double y, double z, double e, boolean planar, double[] f, double[] g) {
    double s = y * y + z * z;
    double[] mom = {2 * e, 0, 2 * e * e * e / 3};
    if (planar) {
      f[0] = 2 * e / (y * y - e * e);
      f[1] = Math.log(Math.abs((e - y) / (e + y))) + y * f[0];
    } else {
      double az = Math.abs(z);
      f[0] = (Math.atan((e - y) / az) + Math.atan((e + y) / az)) / az;
      f[1] = 0.5 * Math.log(((e - y) * (e - y) + z * z) / ((e + y) * (e + y) + z * z)) + y * f[0];
      double t1 = e - y, t0 = -e - y;
      double q1 = t1 * t1 + z * z, q0 = t0 * t0 + z * z;
      g[0] = (t1 / q1 - t0 / q0) / (2 * z * z)
          + (Math.atan(t1 / az) - Math.atan(t0 / az)) / (2 * az * az * az);
      g[1] = -0.5 * (1 / q1 - 1 / q0) + y * g[0];
    }
    for (int m = 2; m < 5; m++) {
      f[m] = mom[m - 2] + 2 * y * f[m - 1] - s * f[m - 2];
      if (!planar) {
        g[m] = f[m - 2] + 2 * y * g[m - 1] - s * g[m - 2];
      }
    }
  }

  /**
   * Normalwash n . v at (px, py, pz) (x already divided by beta) of a unit-circulation horseshoe:
   * bound vortex A -> B of sender s, trailing legs along +x.
   */
  private static double horseshoeNormalwash(
      Senders sd, int s, double px, double py, double pz, double nY, double nZ) {
    double ax = sd.ax[s], ay = sd.ay[s], az = sd.az[s];
    double bx = sd.bx[s], by = sd.by[s], bz = sd.bz[s];
    // bound segment A -> B
    double r1x = px - ax, r1y = py - ay, r1z = pz - az;
    double r2x = px - bx, r2y = py - by, r2z = pz - bz;
    double cxv = r1y * r2z - r1z * r2y, cyv = r1z * r2x - r1x * r2z, czv = r1x * r2y - r1y * r2x;
    double c2 = cxv * cxv + cyv * cyv + czv * czv;
    double vy = 0, vz = 0;
    double n1 = Math.sqrt(r1x * r1x + r1y * r1y + r1z * r1z);
    double n2 = Math.sqrt(r2x * r2x + r2y * r2y + r2z * r2z);
    if (c2 > 1e-24 * n1 * n1 * n2 * n2) {
      double r0x = bx - ax, r0y = by - ay, r0z = bz - az;
      double dot = r0x * (r1x / n1 - r2x / n2) + r0y * (r1y / n1 - r2y / n2) + r0z * (r1z / n1 - r2z / n2);
      double f = dot / (4 * Math.PI * c2);
      vy += f * cyv;
      vz += f * czv;
    }
    // leg B -> +inf along x: v = (x^ x r)/|x^ x r|^2 (1 + x^.r/|r|) / 4 pi, r = P - B
    double lb = legFactor(r2x, r2y, r2z, n2);
    vy += lb * (-r2z);
    vz += lb * r2y;
    // leg +inf -> A: opposite sense
    double la = legFactor(r1x, r1y, r1z, n1);
    vy -= la * (-r1z);
    vz -= la * r1y;
    return vy * nY + vz * nZ;
  }

  private static double legFactor(double rx, double ry, double rz, double norm) {
    double c2 = ry * ry + rz * rz;
    if (c2 <= 1e-24 * norm * norm) {
      return 0;
    }
    return (1 + rx / norm) / (4 * Math.PI * c2);
  }
}
