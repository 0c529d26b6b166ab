package org.flexmargin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flexmargin.io.ForceCacheFile;
import org.flexmargin.lattice.LatticeForces;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.ModeTable;

/**
 * Fills in the forces of lifting surfaces once per run, before the analysis (so that the cost
 * estimate, the sweep and the report share them). With a {@code force_cache_file} they are taken
 * from the file when its fingerprint equals that of the present inputs, otherwise computed and
 * written to it.
 */
final class LatticeCache {
  private LatticeCache() {}

  /**
   * @param c the case as read
   * @param err where to say what was done ("flexmargin: ..." lines)
   * @param quiet say only what went wrong
   * @return the case with the forces attached to its lifting surfaces
   */
  static AnalysisCase prepare(AnalysisCase c, PrintWriter err, boolean quiet) {
    List<Configuration> configs = new ArrayList<>();
    boolean changed = false;
    for (Configuration cfg : c.configurations()) {
      if (cfg.aero() instanceof LatticeSpec l && l.precomputed() == null
          && cfg.structure() instanceof ModeTable modes) {
        configs.add(new Configuration(cfg.name(), cfg.structure(), filled(cfg.name(), l, modes, err, quiet),
            cfg.rigidBody()));
        changed = true;
      } else {
        configs.add(cfg);
      }
    }
    if (!changed) {
      return c;
    }
    return new AnalysisCase(c.format(), c.name(), c.description(), configs, c.sweep(), c.options(), c.inputs(),
        c.loop(), c.requirements(), c.warnings());
  }

  private static LatticeSpec filled(String config, LatticeSpec l, ModeTable modes, PrintWriter err, boolean quiet) {
    if (l.forceCacheFile() == null) {
      return l.withPrecomputed(LatticeForces.compute(l, modes).forces());
    }
    String fp = LatticeForces.fingerprint(l, modes);
    ForceCacheFile.Loaded loaded = ForceCacheFile.read(l.forceCacheFile(), fp);
    if (loaded.forces().isPresent()) {
      if (!quiet) {
        err.printf(Locale.ROOT, "flexmargin: configuration %s: lattice forces read from %s%n", config,
            l.forceCacheFile());
      }
      return l.withPrecomputed(loaded.forces().get());
    }
    long t0 = System.nanoTime();
    LatticeForces.Result r = LatticeForces.compute(l, modes);
    double seconds = (System.nanoTime() - t0) * 1e-9;
    try {
      ForceCacheFile.write(l.forceCacheFile(), fp, r.forces());
      if (!quiet) {
        err.printf(Locale.ROOT, "flexmargin: configuration %s: lattice forces computed in %.1f s (%d boxes, "
            + "%d Mach numbers x %d reduced frequencies; cache: %s) and written to %s%n", config, seconds,
            r.boxes(), l.machNumbers().length, l.reducedFrequencies().length, loaded.note(), l.forceCacheFile());
      }
    } catch (IOException e) {
      err.printf(Locale.ROOT, "flexmargin: warning: configuration %s: lattice force cache %s not written (%s); "
          + "the forces will be computed again next time%n", config, l.forceCacheFile(), e.getMessage());
    }
    return l.withPrecomputed(r.forces());
  }
}
