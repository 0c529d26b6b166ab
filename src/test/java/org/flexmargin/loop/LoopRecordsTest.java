package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/** Value semantics and layout of the loop package's result records, from their definitions. */
class LoopRecordsTest {

  @Test
  void eigenvaluesHaveValueSemanticsAndTheirDampingRatio() {
    // -3 +- 4j: |lambda| = 5, zeta = 3/5 (closed form); a pole at the origin has no ratio
    Eigenvalues e = new Eigenvalues(new double[] {-3, -3, 0}, new double[] {4, -4, 0});
    assertEquals(3, e.size());
    assertEquals(5.0, e.naturalFrequencyRadPerS(0), 1e-15);
    assertEquals(0.6, e.dampingRatio(1), 1e-15);
    assertTrue(Double.isNaN(e.dampingRatio(2)));
    assertEquals(0.0, e.maxRealPart(), 0.0);
    assertEquals(Double.NEGATIVE_INFINITY, Eigenvalues.none().maxRealPart());
    assertArrayEquals(new double[] {-3, -3, 0}, e.real(), 0.0);
    assertArrayEquals(new double[] {4, -4, 0}, e.imag(), 0.0);
    Eigenvalues same = new Eigenvalues(new double[] {-3, -3, 0}, new double[] {4, -4, 0});
    assertEquals(same, e);
    assertEquals(same.hashCode(), e.hashCode());
    assertNotEquals(new Eigenvalues(new double[] {-3, -3, 0}, new double[] {4, 4, 0}), e);
    assertNotEquals(new Eigenvalues(new double[] {-3, -2, 0}, new double[] {4, -4, 0}), e);
    assertNotEquals(e.hashCode(), new Eigenvalues(new double[] {-3, -3, 0}, new double[] {4, 4, 0}).hashCode());
    assertEquals("Eigenvalues[-3.0+4.0j, -3.0-4.0j, 0.0+0.0j]", e.toString());
    assertThrows(InvalidInputException.class, () -> new Eigenvalues(new double[1], new double[2]));
    assertThrows(InvalidInputException.class, () -> new Eigenvalues(null, new double[0]));
    assertThrows(InvalidInputException.class, () -> new Eigenvalues(new double[0], null));
  }

  @Test
  void frequencyResponseIndexesFrequencyThenOutputThenInput() {
    // 2 frequencies x 2 outputs x 3 inputs, value = 100 k + 10 output + input
    double[] re = new double[12];
    double[] im = new double[12];
    for (int k = 0; k < 2; k++) {
      for (int o = 0; o < 2; o++) {
        for (int i = 0; i < 3; i++) {
          re[(k * 2 + o) * 3 + i] = 100 * k + 10 * o + i;
          im[(k * 2 + o) * 3 + i] = -(100 * k + 10 * o + i);
        }
      }
    }
    FrequencyResponse fr = new FrequencyResponse(new double[] {1, 2}, 2, 3, re, im);
    assertEquals(2, fr.size());
    assertEquals(2, fr.outputCount());
    assertEquals(3, fr.inputCount());
    assertArrayEquals(new double[] {1, 2}, fr.omegaRadPerS(), 0.0);
    assertEquals(112, fr.real(1, 1, 2), 0.0);
    assertEquals(-12, fr.imag(0, 1, 2), 0.0);
    assertEquals(Math.hypot(101, 101), fr.magnitude(1, 0, 1), 1e-12);
    assertEquals(-Math.PI / 4, fr.phaseRad(1, 0, 1), 1e-15);
    assertThrows(InvalidInputException.class, fr::sisoReal);
    assertThrows(InvalidInputException.class, fr::sisoImag);
    assertThrows(InvalidInputException.class,
        () -> new FrequencyResponse(new double[] {1, 2}, 2, 3, new double[11], im));
    FrequencyResponse siso = new FrequencyResponse(new double[] {1, 2}, 1, 1, new double[] {1, 2},
        new double[] {3, 4});
    assertArrayEquals(new double[] {1, 2}, siso.sisoReal(), 0.0);
    assertArrayEquals(new double[] {3, 4}, siso.sisoImag(), 0.0);
  }

  @Test
  void transferFunctionBlocksCompareByCoefficients() {
    TransferFunctionBlock a = new TransferFunctionBlock(new double[] {1, 2}, new double[] {1, 3, 5});
    TransferFunctionBlock b = new TransferFunctionBlock(new double[] {1, 2}, new double[] {1, 3, 5});
    assertEquals(a, b);
    assertEquals(a.hashCode(), b.hashCode());
    assertNotEquals(a, new TransferFunctionBlock(new double[] {1, 2}, new double[] {1, 3, 6}));
    assertNotEquals(a, new TransferFunctionBlock(new double[] {1, 3}, new double[] {1, 3, 5}));
    assertArrayEquals(new double[] {1, 3, 5}, a.denominator(), 0.0);
    assertEquals("TransferFunctionBlock[[1.0, 2.0] / [1.0, 3.0, 5.0]]", a.toString());
    assertThrows(InvalidInputException.class,
        () -> new TransferFunctionBlock(new double[] {1}, new double[] {0, 1}));
    assertThrows(InvalidInputException.class,
        () -> new TransferFunctionBlock(new double[] {}, new double[] {1, 1}));
    assertThrows(InvalidInputException.class,
        () -> new TransferFunctionBlock(new double[] {1, 1, 1}, new double[] {1, 1}));
    assertThrows(InvalidInputException.class,
        () -> new TransferFunctionBlock(new double[] {Double.NaN}, new double[] {1, 1}));
    assertThrows(InvalidInputException.class,
        () -> new TransferFunctionBlock(new double[] {1}, new double[] {1, Double.NaN}));
  }
}
