package org.flexmargin.structure;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.junit.jupiter.api.Test;

class StructuralModelTest {

  private static final double[][] M = {{2.0, 0.5}, {0.5, 1.0}};
  private static final double[][] C = {{0.1, 0.0}, {0.0, 0.2}};
  private static final double[][] K = {{100.0, -10.0}, {-10.0, 50.0}};

  @Test
  void fromModeTableBuildsDiagonalModalMatrices() {
    // modal equations (Hodges & Pierce, Introduction to Structural Dynamics and Aeroelasticity,
    // ch. 3): K_ii = (2 pi f_i)^2 m_i, C_ii = 2 zeta_i omega_i m_i. Expectations:
    // mode a: f = 2 Hz, m = 3 kg, zeta = 0.02 -> K = 473.74 N/m, C = 1.5080 N s/m;
    // mode b: f = 7.5 Hz, m = 0.4 kg, zeta = 0 -> K = 888.26 N/m, C = 0.
    // Tolerance 1e-12 relative: rounding.
    double omegaA = 2 * Math.PI * 2.0;
    double omegaB = 2 * Math.PI * 7.5;
    ModeTable table =
        new ModeTable(
            "t",
            List.of(
                new ElasticMode("a", 2.0, 0.02, 3.0, Map.of("p", new ShapeValue(1, 0))),
                new ElasticMode("b", 7.5, 0.0, 0.4, Map.of())));
    StructuralModel model = StructuralModel.fromModeTable(table);
    assertEquals(List.of("a", "b"), model.coordinateNames());
    assertEquals(3.0, model.mass(0, 0));
    assertEquals(0.4, model.mass(1, 1));
    assertEquals(omegaA * omegaA * 3.0, model.stiffness(0, 0), 1e-12 * 473.7);
    assertEquals(omegaB * omegaB * 0.4, model.stiffness(1, 1), 1e-12 * 888.3);
    assertEquals(2 * 0.02 * omegaA * 3.0, model.damping(0, 0), 1e-12 * 1.51);
    assertEquals(0.0, model.damping(1, 1));
    assertEquals(0.0, model.mass(0, 1));
    assertEquals(0.0, model.stiffness(1, 0));
    assertEquals(0.0, model.damping(0, 1));
  }

  @Test
  void arraysAreCopiedInAndOut() {
    double[][] m = {{2.0, 0.5}, {0.5, 1.0}};
    StructuralModel model = new StructuralModel(List.of("x", "y"), m, C, K);
    m[0][0] = 99;
    assertEquals(2.0, model.mass(0, 0));
    double[][] out = model.massKg();
    out[0][0] = 77;
    assertEquals(2.0, model.massKg()[0][0]);
    assertNotSame(model.stiffnessNPerM(), model.stiffnessNPerM());
    DMatrixRMaj ejml = model.stiffnessMatrix();
    assertEquals(-10.0, ejml.get(0, 1));
    ejml.set(0, 1, 5);
    assertEquals(-10.0, model.stiffness(0, 1));
    assertArrayEquals(new double[] {0.1, 0.0, 0.0, 0.2}, model.dampingMatrix().data);
    assertArrayEquals(new double[] {2.0, 0.5, 0.5, 1.0}, model.massMatrix().data);
    assertEquals(2, model.size());
    assertEquals(1, model.indexOf("y"));
    assertEquals(model, new StructuralModel(List.of("x", "y"), M, C, K));
    assertEquals(model.hashCode(), new StructuralModel(List.of("x", "y"), M, C, K).hashCode());
  }

  @Test
  void badInputIsRejectedWithTheFieldPath() {
    List<String> names = List.of("x", "y");
    assertEquals(
        "mass_kg",
        assertThrows(
                InvalidInputException.class,
                () -> new StructuralModel(names, new double[][] {{1, 0}}, C, K))
            .fieldPath());
    assertEquals(
        "damping_ns_per_m[1]",
        assertThrows(
                InvalidInputException.class,
                () -> new StructuralModel(names, M, new double[][] {{1, 0}, {0}}, K))
            .fieldPath());
    assertEquals(
        "stiffness_n_per_m[0][1]",
        assertThrows(
                InvalidInputException.class,
                () -> new StructuralModel(names, M, C, new double[][] {{1, Double.NaN}, {0, 1}}))
            .fieldPath());
    // not symmetric
    assertEquals(
        "mass_kg[0][1]",
        assertThrows(
                InvalidInputException.class,
                () -> new StructuralModel(names, new double[][] {{2, 0.5}, {0.4, 1}}, C, K))
            .fieldPath());
    // symmetric but indefinite: eigenvalues 3 and -1
    assertEquals(
        "mass_kg",
        assertThrows(
                InvalidInputException.class,
                () -> new StructuralModel(names, new double[][] {{1, 2}, {2, 1}}, C, K))
            .fieldPath());
    assertEquals(
        "coordinate_names[1]",
        assertThrows(
                InvalidInputException.class, () -> new StructuralModel(List.of("x", "x"), M, C, K))
            .fieldPath());
    assertEquals(
        "coordinate_names",
        assertThrows(InvalidInputException.class, () -> new StructuralModel(List.of(), M, C, K))
            .fieldPath());
  }
}
