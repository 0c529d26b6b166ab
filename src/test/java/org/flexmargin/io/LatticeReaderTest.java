package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LatticeSpec;
import org.flexmargin.model.SplineKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lifting_surfaces section of a case file: a good case and one test per kind of error. */
class LatticeReaderTest {
  private static final Path DIR = Path.of("src/test/resources/lattice");

  private static String fails(String file) {
    return assertThrows(InputFileException.class, () -> CaseReader.read(DIR.resolve(file))).getMessage();
  }

  private static void assertHas(String message, String... parts) {
    for (String p : parts) {
      assertTrue(message.contains(p), () -> "message <" + message + "> lacks <" + p + ">");
    }
  }

  @Test
  void readsSurfacesSplinesAndSettings() {
    AnalysisCase c = CaseReader.read(DIR.resolve("lattice-case.json"));
    LatticeSpec s = assertInstanceOf(LatticeSpec.class, c.configurations().get(0).aero());
    assertEquals(0.3, s.mach());
    assertEquals(FlowSymmetry.SYMMETRIC, s.symmetry(), "enum values in any case");
    assertEquals(32, s.boxCount());
    assertEquals(0.8, s.surfaces().get(0).tipLeadingEdge().xM());
    assertEquals(SplineKind.BEAM, s.splines().get(0).kind());
    assertEquals(3, s.splines().get(0).points().size());
    assertEquals(5, s.reducedFrequencies().length);
  }

  @Test
  void namesTheFieldOfEachError() {
    assertHas(fails("bad-station.json"), "bad-station.json", "points[2].station", "\"tipp\"", "mid, root, tip");
    assertHas(fails("bad-symmetry.json"), "flow_symmetry", "none, symmetric or antisymmetric", "\"mirror\"");
    assertHas(fails("bad-boxes.json"), "surfaces[0].chordwise_boxes");
    assertHas(fails("bad-key.json"), "spline_list", "unknown key");
  }

  private static String failsWith(Path dir, String caseText) throws IOException {
    Path file = dir.resolve("case.json");
    Files.writeString(file, caseText);
    return assertThrows(InputFileException.class, () -> CaseReader.read(file)).getMessage();
  }

  /** Finite but absurd geometry is refused at read time with the key, not later in the solver. */
  @Test
  void refusesAbsurdGeometryAtReadTime(@TempDir Path tmp) throws IOException {
    Files.copy(DIR.resolve("wing-modes.json"), tmp.resolve("wing-modes.json"));
    String base = Files.readString(DIR.resolve("lattice-case.json"));
    assertHas(failsWith(tmp, base.replace("\"root_chord_m\": 1.0", "\"root_chord_m\": 1e308")),
        "case.json", "surfaces[0]", "root_chord_m");
    assertHas(failsWith(tmp, base.replace("[0.8, 3.0, 0.1]", "[0.8, 1e9, 0.1]")), "case.json", "y_m");
    assertHas(failsWith(tmp, base.replace("\"reference_semichord_m\": 0.4", "\"reference_semichord_m\": 1e308")),
        "case.json", "reference_semichord_m");
    assertHas(failsWith(tmp, base.replace("\"chordwise_boxes\": 4, \"spanwise_boxes\": 8",
        "\"chordwise_boxes\": 200, \"spanwise_boxes\": 500")), "case.json", "surfaces", "100000 boxes");
  }

  /** Chords and the reference semichord are checked against their plausible ranges, with the range's name. */
  @Test
  void chordsOutsideThePlausibleRangeNameTheRangeAndTheOverride(@TempDir Path tmp) throws IOException {
    Files.copy(DIR.resolve("wing-modes.json"), tmp.resolve("wing-modes.json"));
    String base = Files.readString(DIR.resolve("lattice-case.json"));
    assertHas(failsWith(tmp, base.replace("\"root_chord_m\": 1.0", "\"root_chord_m\": 80")),
        "surfaces[0].root_chord_m", "[0, 60] m", "lifting_surface.chord_m", "plausibility_overrides");
    assertHas(failsWith(tmp, base.replace("\"reference_semichord_m\": 0.4", "\"reference_semichord_m\": 150")),
        "reference_semichord_m", "aero.semichord_m");
    // listed in plausibility_overrides, an 80 m chord is read (with a warning)
    Path file = tmp.resolve("lifted.json");
    Files.writeString(file, base.replace("\"root_chord_m\": 1.0", "\"root_chord_m\": 80")
        .replaceFirst("\\{", "{\"plausibility_overrides\": [\"lifting_surface.chord_m\"], "));
    LatticeSpec s = assertInstanceOf(LatticeSpec.class, CaseReader.read(file).configurations().get(0).aero());
    assertEquals(80, s.surfaces().get(0).rootChordM());
  }

  /** Control surfaces, Mach numbers and the cache file, and their errors. */
  @Test
  void readsControlSurfacesMachNumbersAndTheCacheFile(@TempDir Path tmp) throws IOException {
    Files.copy(DIR.resolve("wing-modes.json"), tmp.resolve("wing-modes.json"));
    String base = Files.readString(DIR.resolve("lattice-case.json"));
    String extra = "\"mach_numbers\": [0.2, 0.3, 0.5], \"elevator_control\": \"flap\", "
        + "\"force_cache_file\": \"forces.bin\", \"control_surfaces\": [{\"name\": \"flap\", \"surface\": \"wing\", "
        + "\"hinge_chord_fraction\": 0.75, \"span_fractions\": [0.5, 1]}],\n          \"mach\": 0.3,";
    Path file = tmp.resolve("case.json");
    Files.writeString(file, base.replace("\"mach\": 0.3,", extra));
    LatticeSpec s = assertInstanceOf(LatticeSpec.class, CaseReader.read(file).configurations().get(0).aero());
    assertEquals(3, s.machNumbers().length);
    assertEquals("flap", s.elevatorControl());
    assertEquals(0.75, s.controlSurfaces().get(0).hingeChordFraction());
    assertEquals(0.5, s.controlSurfaces().get(0).fromSpanFraction());
    assertEquals(tmp.resolve("forces.bin").normalize(), s.forceCacheFile());
    // hinge between box edges (4 chordwise boxes), span limit between edges (8 spanwise boxes),
    // unknown surface, unknown elevator, Mach outside the list
    assertHas(failsWith(tmp, base.replace("\"mach\": 0.3,", extra.replace("0.75", "0.7"))),
        "control_surfaces[0].hinge_chord_fraction", "a box edge", "1/4");
    assertHas(failsWith(tmp, base.replace("\"mach\": 0.3,", extra.replace("[0.5, 1]", "[0.3, 1]"))),
        "control_surfaces[0].span_fractions[0]", "1/8");
    assertHas(failsWith(tmp, base.replace("\"mach\": 0.3,", extra.replace("\"surface\": \"wing\"", "\"surface\": \"tail\""))),
        "control_surfaces[0].surface", "\"tail\"");
    assertHas(failsWith(tmp, base.replace("\"mach\": 0.3,", extra.replace("\"elevator_control\": \"flap\"",
        "\"elevator_control\": \"rudder\""))), "elevator_control", "\"rudder\"");
    assertHas(failsWith(tmp, base.replace("\"mach\": 0.3,", extra.replace("[0.2, 0.3, 0.5]", "[0.4, 0.5]"))),
        "lifting_surfaces.mach", "within the listed mach_numbers");
  }
}
