package org.flexmargin.lattice;

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

  private InfluenceMatrix() {}

  /**
   * Builds D(k, M).
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
    java.util.Arrays.fill(d, 0, 2 * n * n, 0.0);
    FlowSymmetry sym = lattice.symmetry();
    Workspace ws = new Workspace();
    for (int j = 0; j < n; j++) {
      ws.sender(lattice, j, false);
      addSender(lattice, j, omegaOverU, mach, 1.0, ws, d);
      if (sym != FlowSymmetry.NONE) {
        ws.sender(lattice, j, true);
        addSender(lattice, j, omegaOverU, mach, sym == FlowSymmetry.SYMMETRIC ? 1.0 : -1.0, ws, d);
      }
    }
  }

  /** Per-sender geometry and scratch, reused over the receivers. */
  private static final class Workspace {
    double ax, ay, az, bx, by, bz, mx, my, mz, e, tanL, cg, sg, chord;
    final double[] k = new double[8];
    final double[] p1 = new double[10];
    final double[] p2 = new double[10];
    final double[] f = new double[5];
    final double[] g = new double[5];
    final double[] c = new double[10];

    void sender(BoxLattice l, int j, boolean image) {
      if (image) {
        ax = l.bx[j]; ay = -l.by[j]; az = l.bz[j];
        bx = l.ax[j]; by = -l.ay[j]; bz = l.az[j];
        sg = -l.sinG[j];
      } else {
        ax = l.ax[j]; ay = l.ay[j]; az = l.az[j];
        bx = l.bx[j]; by = l.by[j]; bz = l.bz[j];
        sg = l.sinG[j];
      }
      cg = l.cosG[j];
      chord = l.chord[j];
      mx = 0.5 * (ax + bx); my = 0.5 * (ay + by); mz = 0.5 * (az + bz);
      e = 0.5 * Math.hypot(by - ay, bz - az);
      tanL = (bx - ax) / (2 * e);
    }
  }

  private static void addSender(
      BoxLattice l, int j, double kbar, double mach, double sign, Workspace w, double[] d) {
    int n = l.size();
    double beta = Math.sqrt(1 - mach * mach);
    double steadyScale = sign * w.chord / 2;
    // the kernel integrals are normalwash positive down; this class uses positive up
    double incScale = -sign * w.chord / (8 * Math.PI);
    for (int i = 0; i < n; i++) {
      double px = l.cx[i], py = l.cy[i], pz = l.cz[i];
      double nY = -l.sinG[i], nZ = l.cosG[i];
      double v = horseshoeNormalwash(w, px / beta, py, pz, nY, nZ, beta);
      int idx = 2 * (i * n + j);
      d[idx] += steadyScale * v;
      if (kbar == 0) {
        continue;
      }
      // receiving point in the sender's local frame
      double dx = px - w.mx, dy = py - w.my, dz = pz - w.mz;
      double yb = dy * w.cg + dz * w.sg;
      double zb = -dy * w.sg + dz * w.cg;
      double cosDg = l.cosG[i] * w.cg + l.sinG[i] * w.sg;
      double sinDg = l.sinG[i] * w.cg - l.cosG[i] * w.sg;
      boolean planar = Math.abs(zb) < PLANAR * w.e;
      if (planar) {
        zb = 0;
      }
      for (int q = 0; q < 5; q++) {
        double eta = (q - 2) * 0.5 * w.e;
        IncrementalKernel.evaluate(dx - eta * w.tanL, yb - eta, zb, cosDg, sinDg, kbar, mach, w.k);
        w.p1[2 * q] = w.k[0];
        w.p1[2 * q + 1] = w.k[1];
        w.p2[2 * q] = w.k[2];
        w.p2[2 * q + 1] = w.k[3];
      }
      lineIntegrals(yb, zb, w.e, planar, w.f, w.g);
      double re = 0, im = 0;
      quartic(w.p1, w.e, w.c);
      for (int m = 0; m < 5; m++) {
        re += w.c[2 * m] * w.f[m];
        im += w.c[2 * m + 1] * w.f[m];
      }
      if (!planar) {
        quartic(w.p2, w.e, w.c);
        for (int m = 0; m < 5; m++) {
          re += w.c[2 * m] * w.g[m];
          im += w.c[2 * m + 1] * w.g[m];
        }
      }
      d[idx] += incScale * re;
      d[idx + 1] += incScale * im;
    }
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
   * bound vortex A -> B, trailing legs along +x.
   */
  private static double horseshoeNormalwash(
      Workspace w, double px, double py, double pz, double nY, double nZ, double beta) {
    double ax = w.ax / beta, bx = w.bx / beta;
    // bound segment A -> B
    double r1x = px - ax, r1y = py - w.ay, r1z = pz - w.az;
    double r2x = px - bx, r2y = py - w.by, r2z = pz - w.bz;
    double cxv = r1y * r2z - r1z * r2y, cyv = r1z * r2x - r1x * r2z, czv = r1x * r2y - r1y * r2x;
    double c2 = cxv * cxv + cyv * cyv + czv * czv;
    double vy = 0, vz = 0;
    double n1 = Math.sqrt(r1x * r1x + r1y * r1y + r1z * r1z);
    double n2 = Math.sqrt(r2x * r2x + r2y * r2y + r2z * r2z);
    if (c2 > 1e-24 * n1 * n1 * n2 * n2) {
      double r0x = bx - ax, r0y = w.by - w.ay, r0z = w.bz - w.az;
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
