package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.flexmargin.model.MachForceTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ForceCacheFileTest {
  static final String FP = "ab".repeat(32);

  static MachForceTable table() {
    double[][][][] re = new double[2][3][1][2];
    double[][][][] im = new double[2][3][1][2];
    for (int m = 0; m < 2; m++) {
      for (int k = 0; k < 3; k++) {
        re[m][k][0][0] = Math.PI * (m + 1) + k;
        re[m][k][0][1] = -1e-300 * k;
        im[m][k][0][0] = Math.E * k;
        im[m][k][0][1] = Double.MIN_VALUE;
      }
    }
    return new MachForceTable(0.4, new double[] {0.3, 0.6}, new double[] {0, 0.5, 1}, List.of("bend"),
        List.of("bend", "elevator"), re, im);
  }

  @Test
  void roundTripIsBitExactAndTheFingerprintDecides(@TempDir Path tmp) throws IOException {
    Path f = tmp.resolve("forces.bin");
    assertEquals("no cache file yet", ForceCacheFile.read(f, FP).note());
    ForceCacheFile.write(f, FP, table());
    MachForceTable back = ForceCacheFile.read(f, FP).forces().orElseThrow();
    assertArrayEquals(table().machNumbers(), back.machNumbers());
    assertArrayEquals(table().reducedFrequencies(), back.reducedFrequencies());
    assertEquals(table().columnNames(), back.columnNames());
    assertTrue(Arrays.deepEquals(table().real(), back.real()));
    assertTrue(Arrays.deepEquals(table().imag(), back.imag()));
    assertTrue(ForceCacheFile.read(f, "cd".repeat(32)).note().startsWith("computed for other inputs"));
    try (var files = Files.list(tmp)) {
      assertEquals(1, files.count(), "no temporary file left behind");
    }
  }

  @Test
  void damagedFilesAreReportedNotUsed(@TempDir Path tmp) throws IOException {
    Path f = tmp.resolve("forces.bin");
    ForceCacheFile.write(f, FP, table());
    byte[] good = Files.readAllBytes(f);
    Files.write(f, Arrays.copyOf(good, good.length - 20));
    assertEquals("truncated", ForceCacheFile.read(f, FP).note());
    byte[] bad = good.clone();
    bad[bad.length - 1] ^= 1;
    Files.write(f, bad);
    assertTrue(ForceCacheFile.read(f, FP).note().startsWith("damaged"));
    Files.writeString(f, "{\"format\": 1, \"note\": \"a JSON file, not a force cache\"}");
    assertTrue(ForceCacheFile.read(f, FP).forces().isEmpty());
    assertTrue(ForceCacheFile.read(f, FP).note().contains("not a flexmargin force cache"));
  }
}
