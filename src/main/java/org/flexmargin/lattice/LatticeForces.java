package org.flexmargin.lattice;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.ControlSurface;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.MachForceTable;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplinePoint;

/**
 * Generalized aerodynamic forces of the doublet lattice in the modal coordinates of a mode table,
 * on the case's lists of Mach numbers and reduced frequencies:
 *
 * <pre>
 *   Q(ik, M) = H^T diag(S_j n_z,j) D(k, M)^-1 [W_modes | W_controls]
 *   W_modes = n_z (dh/dx + i (k / b_ref) h),  W_controls = dh_c/dx + i (k / b_ref) h_c
 * </pre>
 *
 * with h and dh/dx the splined vertical displacement and slope of each mode at the control points,
 * h_c the normal motion of each control surface per radian ({@link ControlColumns}), H the
 * displacements at the load points, S the box areas and n_z the vertical component of the box
 * normals (F = q_dyn Q x, the project's normalisation). Rows are the modes; columns the modes and
 * then the control surfaces. With a flow symmetry, the forces are those on the given half (whose
 * structure the mode table describes); the image only adds its flow.
 *
 * <p>The (Mach, k) pairs are computed in parallel (the common fork-join pool); each uses its own
 * influence matrix.
 */
public final class LatticeForces {
  private LatticeForces() {}

  /**
   * @param spec the lifting surfaces
   * @param modes the mode table whose stations the splines name
   * @return the forces over the spec's Mach numbers and reduced frequencies
   */
  public static Result compute(LatticeSpec spec, ModeTable modes) {
    BoxLattice lattice = new BoxLattice(spec.surfaces(), spec.symmetry());
    ModalBoxes shapes = ModalBoxes.of(spec, lattice, modes);
    ControlColumns controls = ControlColumns.of(lattice, spec.surfaces(), spec.controlSurfaces());
    double[] ks = spec.reducedFrequencies();
    double[] machs = spec.machNumbers();
    int m = modes.size();
    int cols = m + controls.size();
    double[][][][] re = new double[machs.length][ks.length][m][cols];
    double[][][][] im = new double[machs.length][ks.length][m][cols];
    IntStream.range(0, machs.length * ks.length).parallel().forEach(p -> {
      int a = p / ks.length, q = p % ks.length;
      ZMatrixRMaj qm = forces(lattice, shapes, controls, ks[q] / spec.referenceSemichordM(), machs[a]);
      for (int r = 0; r < m; r++) {
        for (int c = 0; c < cols; c++) {
          re[a][q][r][c] = qm.getReal(r, c);
          im[a][q][r][c] = qm.getImag(r, c);
        }
      }
    });
    List<String> columns = new ArrayList<>(modes.modeNames());
    columns.addAll(controls.names());
    MachForceTable table = new MachForceTable(spec.referenceSemichordM(), machs, ks, modes.modeNames(), columns, re, im);
    return new Result(table, lattice.size(), shapes.rigidHeaveErrorM(), shapes.rigidPitchErrorM());
  }

  /**
   * The forces and what the lattice reports about itself.
   *
   * @param forces Q(ik, M) on the listed Mach numbers and reduced frequencies
   * @param boxes number of boxes (without a mirror image)
   * @param rigidHeaveErrorM largest spline error of a unit rigid heave at any box point (m)
   * @param rigidPitchErrorM largest spline error of a unit rigid pitch at any box point (m/rad)
   */
  public record Result(MachForceTable forces, int boxes, double rigidHeaveErrorM, double rigidPitchErrorM) {
    /**
     * @param mach Mach number
     * @return the mode-by-mode forces at that Mach number (interpolated as {@link MachForceTable})
     */
    public GafTable table(double mach) {
      return forces.atMach(mach);
    }
  }

  static ZMatrixRMaj forces(BoxLattice l, ModalBoxes shapes, ControlColumns controls, double omegaOverU,
      double mach) {
    int n = l.size();
    int m = shapes.hControl()[0].length;
    int nc = controls.size();
    ZMatrixRMaj w = new ZMatrixRMaj(n, m + nc);
    for (int i = 0; i < n; i++) {
      double nz = l.cosG[i];
      for (int j = 0; j < m; j++) {
        w.set(i, j, nz * shapes.slopeControl()[i][j], nz * omegaOverU * shapes.hControl()[i][j]);
      }
      for (int j = 0; j < nc; j++) {
        w.set(i, m + j, controls.slopeControl()[i][j], omegaOverU * controls.hControl()[i][j]);
      }
    }
    PressureSolver ps = new PressureSolver(l);
    if (!ps.factorise(omegaOverU, mach)) {
      throw new IllegalStateException("singular doublet-lattice influence matrix (overlapping boxes?)");
    }
    ZMatrixRMaj cp = new ZMatrixRMaj(n, m + nc);
    ps.solve(w, cp);
    ZMatrixRMaj q = new ZMatrixRMaj(m, m + nc);
    for (int r = 0; r < m; r++) {
      for (int c = 0; c < m + nc; c++) {
        double sr = 0, si = 0;
        for (int i = 0; i < n; i++) {
          double f = shapes.hLoad()[i][r] * l.area[i] * l.cosG[i];
          sr += f * cp.getReal(i, c);
          si += f * cp.getImag(i, c);
        }
        q.set(r, c, sr, si);
      }
    }
    return q;
  }

  /**
   * A fingerprint of everything the forces depend on: the geometry, boxes, flow symmetry, splines,
   * control surfaces, Mach numbers, reduced frequencies, reference semichord and the mode shapes at
   * the spline stations (SHA-256 of their text with 17 significant digits). Equal fingerprints mean
   * the same forces; the cache file is reused only when they are equal.
   *
   * @param spec the lifting surfaces
   * @param modes the mode table
   * @return 64 hexadecimal digits
   */
  public static String fingerprint(LatticeSpec spec, ModeTable modes) {
    StringBuilder t = new StringBuilder("lattice forces v1\n");
    t.append("bref ").append(num(spec.referenceSemichordM())).append(" symmetry ").append(spec.symmetry()).append('\n');
    for (double v : spec.machNumbers()) {
      t.append("mach ").append(num(v)).append('\n');
    }
    for (double v : spec.reducedFrequencies()) {
      t.append("k ").append(num(v)).append('\n');
    }
    for (LiftingSurface s : spec.surfaces()) {
      t.append("surface ").append(s.name()).append(' ')
          .append(num(s.rootLeadingEdge().xM())).append(' ').append(num(s.rootLeadingEdge().yM())).append(' ')
          .append(num(s.rootLeadingEdge().zM())).append(' ').append(num(s.rootChordM())).append(' ')
          .append(num(s.tipLeadingEdge().xM())).append(' ').append(num(s.tipLeadingEdge().yM())).append(' ')
          .append(num(s.tipLeadingEdge().zM())).append(' ').append(num(s.tipChordM())).append(' ')
          .append(s.chordwiseBoxes()).append(' ').append(s.spanwiseBoxes()).append('\n');
    }
    List<String> stations = new ArrayList<>();
    for (SplineGroup g : spec.splines()) {
      t.append("spline ").append(g.kind()).append(' ').append(g.surfaces()).append('\n');
      for (SplinePoint p : g.points()) {
        t.append(" point ").append(p.station()).append(' ').append(num(p.xM())).append(' ').append(num(p.yM())).append('\n');
        stations.add(p.station());
      }
    }
    for (ControlSurface c : spec.controlSurfaces()) {
      t.append("control ").append(c.name()).append(' ').append(c.surface()).append(' ')
          .append(num(c.hingeChordFraction())).append(' ').append(num(c.fromSpanFraction())).append(' ')
          .append(num(c.toSpanFraction())).append('\n');
    }
    for (ElasticMode mode : modes.modes()) {
      t.append("mode ").append(mode.name()).append('\n');
      for (String st : stations) {
        ShapeValue v = mode.shapes().get(st);
        t.append(' ').append(st).append(' ').append(v == null ? "-" : num(v.displacementM()) + " " + num(v.rotationRad()))
            .append('\n');
      }
    }
    try {
      byte[] d = MessageDigest.getInstance("SHA-256").digest(t.toString().getBytes(StandardCharsets.UTF_8));
      StringBuilder hex = new StringBuilder();
      for (byte b : d) {
        hex.append(String.format(Locale.ROOT, "%02x", b));
      }
      return hex.toString();
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
    }
  }

  private static String num(double v) {
    return String.format(Locale.ROOT, "%.17g", v);
  }
}
