package org.flexmargin.lattice;

import java.util.stream.IntStream;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.ModeTable;

/**
 * Generalized aerodynamic forces of the doublet lattice in the modal coordinates of a mode table,
 * on the case's list of reduced frequencies:
 *
 * <pre>
 *   Q(ik) = H^T diag(S_j n_z,j) D(k, M)^-1 [n_z (dh/dx + i (k / b_ref) h)]
 * </pre>
 *
 * with h and dh/dx the splined vertical displacement and slope of each mode at the control points,
 * H the displacements at the load points, S the box areas and n_z the vertical component of the box
 * normals (F = q_dyn Q xi, the project's normalisation). With a flow symmetry, the forces are those
 * on the given half (whose structure the mode table describes); the image only adds its flow.
 *
 * <p>Reduced frequencies are computed in parallel (the common fork-join pool); each uses its own
 * influence matrix.
 */
public final class LatticeForces {
  private LatticeForces() {}

  /**
   * @param spec the lifting surfaces
   * @param modes the mode table whose stations the splines name
   * @return the forces as a table over the spec's reduced frequencies, rows and columns the modes
   */
  public static Result compute(LatticeSpec spec, ModeTable modes) {
    BoxLattice lattice = new BoxLattice(spec.surfaces(), spec.symmetry());
    ModalBoxes shapes = ModalBoxes.of(spec, lattice, modes);
    double[] ks = spec.reducedFrequencies();
    int m = modes.size();
    double[][][] re = new double[ks.length][m][m];
    double[][][] im = new double[ks.length][m][m];
    IntStream.range(0, ks.length).parallel().forEach(q -> {
      ZMatrixRMaj qm = forces(lattice, shapes, ks[q] / spec.referenceSemichordM(), spec.mach());
      for (int r = 0; r < m; r++) {
        for (int c = 0; c < m; c++) {
          re[q][r][c] = qm.getReal(r, c);
          im[q][r][c] = qm.getImag(r, c);
        }
      }
    });
    GafTable table = new GafTable(spec.referenceSemichordM(), spec.mach(), modes.modeNames(), ks, re, im);
    return new Result(table, lattice.size(), shapes.rigidHeaveErrorM(), shapes.rigidPitchErrorM());
  }

  /**
   * The forces and what the lattice reports about itself.
   *
   * @param table Q(ik) on the listed reduced frequencies
   * @param boxes number of boxes (without a mirror image)
   * @param rigidHeaveErrorM largest spline error of a unit rigid heave at any box point (m)
   * @param rigidPitchErrorM largest spline error of a unit rigid pitch at any box point (m/rad)
   */
  public record Result(GafTable table, int boxes, double rigidHeaveErrorM, double rigidPitchErrorM) {}

  static ZMatrixRMaj forces(BoxLattice l, ModalBoxes shapes, double omegaOverU, double mach) {
    int n = l.size();
    int m = shapes.hControl()[0].length;
    ZMatrixRMaj w = new ZMatrixRMaj(n, m);
    for (int i = 0; i < n; i++) {
      double nz = l.cosG[i];
      for (int j = 0; j < m; j++) {
        w.set(i, j, nz * shapes.slopeControl()[i][j], nz * omegaOverU * shapes.hControl()[i][j]);
      }
    }
    PressureSolver ps = new PressureSolver(l);
    if (!ps.factorise(omegaOverU, mach)) {
      throw new IllegalStateException("singular doublet-lattice influence matrix (overlapping boxes?)");
    }
    ZMatrixRMaj cp = new ZMatrixRMaj(n, m);
    ps.solve(w, cp);
    ZMatrixRMaj q = new ZMatrixRMaj(m, m);
    for (int r = 0; r < m; r++) {
      for (int c = 0; c < m; c++) {
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
}
