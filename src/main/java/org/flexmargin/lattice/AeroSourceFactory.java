package org.flexmargin.lattice;

import java.util.Locale;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.aero.AeroSources;
import org.flexmargin.aero.ControlSurfaceForces;
import org.flexmargin.aero.TabulatedAero;
import org.flexmargin.model.AeroSpec;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.MachForceTable;
import org.flexmargin.model.MachGafTable;
import org.flexmargin.model.ModeTable;

/**
 * Picks the {@link AeroSource} of any aerodynamic specification. It sits above {@code aero} and
 * {@code lattice} so that neither imports the other's callers: lifting surfaces give a {@link
 * LatticeForces} table interpolated like a user table (at the lattice's sweep Mach number, with
 * its elevator column if it names one); strips and user tables go to {@link AeroSources}.
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
      return atMach(lattice, modes, forces(lattice, modes), lattice.mach());
    }
    return AeroSources.of(spec, modes);
  }

  /**
   * The forces of a configuration as a function of the Mach number, for matched-point envelopes:
   * lifting surfaces (forces computed once, interpolated in their Mach table) and tables at several
   * Mach numbers give the forces at any Mach number.
   *
   * @param spec aerodynamic data of a configuration (null for a built-in structure's own strips)
   * @param modes the configuration's mode table
   * @return the forces over Mach with their range; empty for data that do not depend on the Mach
   *     number (strip theory, a table at one Mach number)
   */
  public static Optional<MachForces> overMach(AeroSpec spec, ModeTable modes) {
    if (spec instanceof LatticeSpec lattice) {
      LatticeTable table = forces(lattice, modes);
      return Optional.of(new MachForces(m -> atMach(lattice, modes, table, m), lattice.mach(),
          table.forces().lowestMach(), table.forces().highestMach()));
    }
    if (spec instanceof MachGafTable tables) {
      return Optional.of(new MachForces(m -> AeroSources.of(tables.atMach(m), modes), tables.machNumber(),
          tables.forces().lowestMach(), tables.forces().highestMach()));
    }
    return Optional.empty();
  }

  /**
   * The forces of a configuration over Mach numbers.
   *
   * @param atMach the source at a Mach number (clamped into the tabulated range)
   * @param sweepMach Mach number (dimensionless) of the forces of sweeps not at one Mach number
   * @param lowestMach lowest tabulated Mach number (dimensionless)
   * @param highestMach highest tabulated Mach number (dimensionless)
   */
  public record MachForces(DoubleFunction<AeroSource> atMach, double sweepMach, double lowestMach,
      double highestMach) {}

  /**
   * The lattice's forces over its Mach numbers: those attached to the spec (read from the cache
   * file) or computed now.
   *
   * @param lattice the lifting surfaces
   * @param modes the mode table
   * @return the forces with their origin in words
   */
  public static LatticeTable forces(LatticeSpec lattice, ModeTable modes) {
    if (lattice.precomputed() != null) {
      // the spline check is cheap (no influence matrix): keep reporting it
      BoxLattice boxes = new BoxLattice(lattice.surfaces(), lattice.symmetry());
      ModalBoxes shapes = ModalBoxes.of(lattice, boxes, modes);
      return new LatticeTable(lattice.precomputed(), origin(boxes.size(), shapes.rigidHeaveErrorM(),
          shapes.rigidPitchErrorM()) + ", forces computed once for the run"
          + (lattice.forceCacheFile() == null ? "" : " and kept in " + lattice.forceCacheFile().getFileName()));
    }
    LatticeForces.Result r = LatticeForces.compute(lattice, modes);
    return new LatticeTable(r.forces(), origin(r.boxes(), r.rigidHeaveErrorM(), r.rigidPitchErrorM()));
  }

  private static String origin(int boxes, double heave, double pitch) {
    return String.format(Locale.ROOT, "doublet lattice, %d boxes (spline rigid heave error %.1e m, pitch %.1e m/rad)",
        boxes, heave, pitch);
  }

  /**
   * The source at one Mach number of a lattice's force table.
   *
   * @param lattice the lifting surfaces
   * @param modes the mode table
   * @param table the lattice's forces ({@link #forces})
   * @param mach Mach number; interpolated as {@link MachForceTable#atMach}, clamped outside
   * @return the source, implementing {@link ControlSurfaceForces}
   */
  public static AeroSource atMach(LatticeSpec lattice, ModeTable modes, LatticeTable table, double mach) {
    MachForceTable f = table.forces();
    double[] ks = lattice.reducedFrequencies();
    double[] elevator = null;
    if (lattice.elevatorControl() != null) {
      elevator = f.realColumn(f.columnNames().indexOf(lattice.elevatorControl()), mach, 0);
    }
    String text = String.format(Locale.ROOT, "%s, Mach %.3f%s, %s flow, k %.3g to %.3g%s",
        table.origin(), mach,
        f.machNumbers().length > 1 ? String.format(Locale.ROOT, " (table %.3g to %.3g)", f.lowestMach(),
            f.highestMach()) : "",
        lattice.symmetry().name().toLowerCase(Locale.ROOT), ks[0], ks[ks.length - 1],
        elevator == null ? "" : ", elevator \"" + lattice.elevatorControl() + "\""
            + (ks[0] > 0 ? String.format(Locale.ROOT, " (real part at k = %.3g)", ks[0]) : " (steady)"));
    return new Described(new TabulatedAero(f.atMach(mach)), text, elevator,
        lattice.elevatorControl() == null ? "" : lattice.elevatorControl());
  }

  /**
   * A lattice's forces and where they came from.
   *
   * @param forces Q(ik, M), columns the modes and then the control surfaces
   * @param origin one line for the description ("doublet lattice, 240 boxes, ...")
   */
  public record LatticeTable(MachForceTable forces, String origin) {}

  /** A source with its own description and the elevator's forces, if any. */
  private record Described(AeroSource inner, String text, double[] elevator, String elevatorName)
      implements AeroSource, ControlSurfaceForces {
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

    @Override
    public Optional<double[]> elevatorForcesM2PerRad() {
      return elevator == null ? Optional.empty() : Optional.of(elevator.clone());
    }
  }
}
