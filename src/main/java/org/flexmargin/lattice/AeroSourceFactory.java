package org.flexmargin.lattice;

import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.AeroSources;
import org.flexmargin.aero.TabulatedAero;
import org.flexmargin.model.AeroSpec;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.ModeTable;
import org.ejml.data.ZMatrixRMaj;

/**
 * Picks the {@link AeroSource} of any aerodynamic specification. It sits above {@code aero} and
 * {@code lattice} so that neither imports the other's callers: lifting surfaces give a {@link
 * LatticeForces} table interpolated like a user table; strips and user tables go to {@link
 * AeroSources}.
 */
public final class AeroSourceFactory {
  private AeroSourceFactory() {}

  /**
   * @param spec aerodynamic data of a configuration
   * @param modes the configuration's mode table
   * @return a new immutable source
   * @throws org.flexmargin.model.InvalidInputException as {@link AeroSources#of}, and for splines
   *     that name stations missing from the modes
   */
  public static AeroSource of(AeroSpec spec, ModeTable modes) {
    if (spec instanceof LatticeSpec lattice && modes != null) {
      LatticeForces.Result r = LatticeForces.compute(lattice, modes);
      String text = String.format(
          "doublet lattice, %d boxes, Mach %.2f, %s flow, k %.3g to %.3g "
              + "(spline rigid heave error %.1e m, pitch %.1e m/rad)",
          r.boxes(), lattice.mach(), lattice.symmetry().name().toLowerCase(),
          lattice.reducedFrequencies()[0],
          lattice.reducedFrequencies()[lattice.reducedFrequencies().length - 1],
          r.rigidHeaveErrorM(), r.rigidPitchErrorM());
      return new Described(new TabulatedAero(r.table()), text);
    }
    return AeroSources.of(spec, modes);
  }

  /** A source with its own description. */
  private record Described(AeroSource inner, String text) implements AeroSource {
    @Override
    public int size() {
      return inner.size();
    }

    @Override
    public double referenceSemichordM() {
      return inner.referenceSemichordM();
    }

    @Override
    public double minReducedFrequency() {
      return inner.minReducedFrequency();
    }

    @Override
    public double maxReducedFrequency() {
      return inner.maxReducedFrequency();
    }

    @Override
    public void forces(double reducedFrequency, ZMatrixRMaj out) {
      inner.forces(reducedFrequency, out);
    }

    @Override
    public String description() {
      return text;
    }
  }
}
