package org.flexmargin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import org.flexmargin.model.ControlSurface;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.PlausibleRange;
import org.flexmargin.model.SplineGroup;
import org.flexmargin.model.SplineKind;
import org.flexmargin.model.SplinePoint;
import org.flexmargin.model.SurfacePoint;

/**
 * Reads the {@code lifting_surfaces} form of a configuration's {@code aero} section (documented in
 * docs/lifting-surfaces.md): surfaces by leading-edge points, chords and box counts, the Mach
 * number, the flow symmetry, the reduced frequencies and the splines that tie the surfaces to the
 * mode table's stations.
 */
final class LatticeReader {
  /** Reduced frequencies used when the case lists none. */
  static final double[] DEFAULT_REDUCED_FREQUENCIES =
      {0, 0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.4, 0.6, 0.8, 1.0, 1.5, 2.0};

  private LatticeReader() {}

  /**
   * @param f the {@code lifting_surfaces} object
   * @param table the configuration's mode table (stations of the splines)
   * @param resolve turns a path relative to the case file into a path
   */
  static LatticeSpec read(JsonField f, ModeTable table, Function<String, Path> resolve) {
    f.object("lifting-surface data");
    f.allowOnly(List.of("reference_semichord_m", "mach", "mach_numbers", "flow_symmetry", "reduced_frequencies",
        "surfaces", "splines", "control_surfaces", "elevator_control", "force_cache_file"));
    JsonField bRefField = f.required("reference_semichord_m", "the reference semichord (m)");
    double bRef = bRefField.positive();
    bRefField.quantity(PlausibleRange.SEMICHORD);
    double mach = f.required("mach", "the Mach number of the forces, 0 to 0.95").finite();
    double[] machs = f.has("mach_numbers")
        ? f.optional("mach_numbers").numbers("a list of Mach numbers, increasing, 0 to 0.95") : null;
    List<ControlSurface> controls = new ArrayList<>();
    if (f.has("control_surfaces")) {
      for (JsonField c : f.optional("control_surfaces").list("a list of control surfaces")) {
        controls.add(control(c));
      }
    }
    String elevator = f.has("elevator_control")
        ? f.optional("elevator_control").text() : null;
    Path cache = null;
    if (f.has("force_cache_file")) {
      JsonField cf = f.optional("force_cache_file");
      String rel = cf.text();
      if (rel.isBlank()) {
        throw cf.fail("a file name for the force cache (relative to the case file)", "an empty name");
      }
      cache = resolve.apply(rel);
    }
    FlowSymmetry sym = FlowSymmetry.NONE;
    if (f.has("flow_symmetry")) {
      sym = choice(f.optional("flow_symmetry"), FlowSymmetry.class, "none, symmetric or antisymmetric");
    }
    double[] ks = f.has("reduced_frequencies")
        ? f.optional("reduced_frequencies").numbers("a list of reduced frequencies")
        : DEFAULT_REDUCED_FREQUENCIES;
    List<LiftingSurface> surfaces = new ArrayList<>();
    for (JsonField s : nonEmpty(f, "surfaces", "a list of lifting surfaces")) {
      surfaces.add(surface(s));
    }
    Set<String> stations = table.modes().get(0).shapes().keySet();
    List<SplineGroup> splines = new ArrayList<>();
    for (JsonField g : nonEmpty(f, "splines", "a list of splines")) {
      splines.add(spline(g, stations, table.name()));
    }
    FlowSymmetry symmetry = sym;
    Path cacheFile = cache;
    return f.build(() -> new LatticeSpec(bRef, mach, symmetry, surfaces, splines, ks, machs, controls, elevator,
        cacheFile, null));
  }

  private static ControlSurface control(JsonField c) {
    c.object("a control surface");
    c.allowOnly(List.of("name", "surface", "hinge_chord_fraction", "span_fractions"));
    String name = c.required("name", "the control-surface name").text();
    String surface = c.required("surface", "the name of the lifting surface that carries it").text();
    double hinge = c.required("hinge_chord_fraction", "the hinge line as a fraction of the chord").finite();
    double from = 0, to = 1;
    if (c.has("span_fractions")) {
      JsonField sf = c.optional("span_fractions");
      double[] v = sf.numbers("[inner, outer] span fractions from the root, 0 to 1");
      if (v.length != 2) {
        throw sf.fail("two span fractions [inner, outer]", v.length + " numbers");
      }
      from = v[0];
      to = v[1];
    }
    double inner = from, outer = to;
    return c.build(() -> new ControlSurface(name, surface, hinge, inner, outer));
  }

  private static List<JsonField> nonEmpty(JsonField f, String key, String what) {
    List<JsonField> items = f.required(key, what).list(what);
    if (items.isEmpty()) {
      throw f.optional(key).fail("at least one entry", "an empty list");
    }
    return items;
  }

  private static LiftingSurface surface(JsonField s) {
    s.object("a lifting surface");
    s.allowOnly(List.of("name", "root_leading_edge_m", "root_chord_m", "tip_leading_edge_m",
        "tip_chord_m", "chordwise_boxes", "spanwise_boxes"));
    String name = s.required("name", "the surface name").text();
    SurfacePoint root = point(s.required("root_leading_edge_m", "the root leading edge [x, y, z] (m)"));
    double cr = s.required("root_chord_m", "the root chord (m)").quantity(PlausibleRange.SURFACE_CHORD);
    SurfacePoint tip = point(s.required("tip_leading_edge_m", "the tip leading edge [x, y, z] (m)"));
    double ct = s.required("tip_chord_m", "the tip chord (m)").quantity(PlausibleRange.SURFACE_CHORD);
    int nc = s.required("chordwise_boxes", "the number of chordwise boxes").integer();
    int ns = s.required("spanwise_boxes", "the number of spanwise boxes").integer();
    return s.build(() -> new LiftingSurface(name, root, cr, tip, ct, nc, ns));
  }

  private static SurfacePoint point(JsonField p) {
    double[] v = p.numbers("a point [x, y, z] (m)");
    if (v.length != 3) {
      throw p.fail("three coordinates [x, y, z] (m)", v.length + " numbers");
    }
    return p.build(() -> new SurfacePoint(v[0], v[1], v[2]));
  }

  private static SplineGroup spline(JsonField g, Set<String> stations, String tableName) {
    g.object("a spline");
    g.allowOnly(List.of("kind", "surfaces", "points"));
    SplineKind kind = choice(g.required("kind", "beam or surface"), SplineKind.class, "beam or surface");
    List<String> names = new ArrayList<>();
    for (JsonField n : g.required("surfaces", "the names of the surfaces it moves").list("a list of names")) {
      names.add(n.text());
    }
    List<SplinePoint> points = new ArrayList<>();
    for (JsonField p : g.required("points", "the structural points").list("a list of points")) {
      p.object("a spline point");
      p.allowOnly(List.of("station", "x_m", "y_m"));
      JsonField st = p.required("station", "a station of the mode table");
      String station = st.text();
      if (!stations.contains(station)) {
        throw st.fail("a station of mode table \"" + tableName + "\" ("
            + String.join(", ", new TreeSet<>(stations)) + ")", "\"" + station + "\"");
      }
      double x = p.required("x_m", "x of the point (m)").finite();
      double y = p.required("y_m", "y of the point (m)").finite();
      points.add(p.build(() -> new SplinePoint(station, x, y)));
    }
    return g.build(() -> new SplineGroup(kind, names, points));
  }

  private static <E extends Enum<E>> E choice(JsonField f, Class<E> type, String expected) {
    String v = f.text();
    try {
      return Enum.valueOf(type, v.trim().toUpperCase(Locale.ROOT));
    } catch (IllegalArgumentException e) {
      throw f.fail(expected, "\"" + v + "\"");
    }
  }
}
