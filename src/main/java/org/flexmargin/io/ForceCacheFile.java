package org.flexmargin.io;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.flexmargin.model.MachForceTable;

/**
 * The file that keeps a lattice's computed forces between runs (docs/lifting-surfaces.md).
 *
 * <p>Format (binary, big-endian, Java {@code DataOutput}): the line {@value #MAGIC} as UTF-8
 * bytes; the format version (int, 1); the fingerprint of the inputs (modified UTF-8 string, 64
 * hexadecimal digits); the reference semichord (double, m); the Mach numbers (int count, doubles);
 * the reduced frequencies (int count, doubles); the row names and the column names (int count,
 * strings); then for each Mach number, reduced frequency, row and column the real and the
 * imaginary part (doubles); last the number of doubles written (long) as an end mark.
 *
 * <p>A file is used only when its fingerprint equals that of the present inputs; a missing, older,
 * foreign, truncated or otherwise unreadable file is reported and the forces are computed again.
 * Writes go to a temporary sibling that is renamed into place, so a reader never sees half a file.
 */
public final class ForceCacheFile {
  /** First line of every cache file. */
  public static final String MAGIC = "flexmargin lattice forces\n";
  private static final int VERSION = 1;

  private ForceCacheFile() {}

  /**
   * The outcome of reading a cache file.
   *
   * @param forces the forces when the file holds those of the given fingerprint
   * @param note why the file was not used (empty when it was)
   */
  public record Loaded(Optional<MachForceTable> forces, String note) {}

  /**
   * @param file the cache file
   * @param fingerprint the fingerprint of the present inputs
   * @return the forces, or the reason they were not taken from the file
   */
  public static Loaded read(Path file, String fingerprint) {
    try (InputStream raw = Files.newInputStream(file);
        DataInputStream in = new DataInputStream(new BufferedInputStream(raw))) {
      byte[] magic = new byte[MAGIC.length()];
      in.readFully(magic);
      if (!new String(magic, java.nio.charset.StandardCharsets.UTF_8).equals(MAGIC)) {
        return none("not a flexmargin force cache file");
      }
      int version = in.readInt();
      if (version != VERSION) {
        return none("cache format " + version + ", this version reads " + VERSION);
      }
      String stored = in.readUTF();
      if (!stored.equals(fingerprint)) {
        return none("computed for other inputs (geometry, modes, Mach numbers or reduced frequencies changed)");
      }
      double bRef = in.readDouble();
      double[] machs = doubles(in, 1000);
      double[] ks = doubles(in, 10000);
      List<String> rows = names(in);
      List<String> cols = names(in);
      double[][][][] re = new double[machs.length][ks.length][rows.size()][cols.size()];
      double[][][][] im = new double[machs.length][ks.length][rows.size()][cols.size()];
      long count = 0;
      for (int m = 0; m < machs.length; m++) {
        for (int k = 0; k < ks.length; k++) {
          for (int r = 0; r < rows.size(); r++) {
            for (int c = 0; c < cols.size(); c++) {
              re[m][k][r][c] = in.readDouble();
              im[m][k][r][c] = in.readDouble();
              count += 2;
            }
          }
        }
      }
      if (in.readLong() != count) {
        return none("damaged (the end mark does not match)");
      }
      return new Loaded(Optional.of(new MachForceTable(bRef, machs, ks, rows, cols, re, im)), "");
    } catch (NoSuchFileException e) {
      return none("no cache file yet");
    } catch (EOFException e) {
      return none("truncated");
    } catch (IOException | IllegalArgumentException | NegativeArraySizeException
        | OutOfMemoryError e) {
      return none("unreadable (" + e.getClass().getSimpleName() + ": " + e.getMessage() + ")");
    }
  }

  private static Loaded none(String why) {
    return new Loaded(Optional.empty(), why);
  }

  private static double[] doubles(DataInputStream in, int max) throws IOException {
    int n = in.readInt();
    if (n < 0 || n > max) {
      throw new IOException("count " + n + " out of range");
    }
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      v[i] = in.readDouble();
    }
    return v;
  }

  private static List<String> names(DataInputStream in) throws IOException {
    int n = in.readInt();
    if (n < 0 || n > 100000) {
      throw new IOException("count " + n + " out of range");
    }
    List<String> v = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      v.add(in.readUTF());
    }
    return v;
  }

  /**
   * Writes the forces atomically (temporary sibling, then rename).
   *
   * @param file the cache file; its folder must exist
   * @param fingerprint the fingerprint of the inputs the forces were computed from
   * @param t the forces
   * @throws IOException when the file cannot be written (the temporary file is removed)
   */
  public static void write(Path file, String fingerprint, MachForceTable t) throws IOException {
    Path dir = file.toAbsolutePath().getParent();
    Path tmp = Files.createTempFile(dir, "." + file.getFileName() + ".", ".tmp");
    try {
      try (OutputStream raw = Files.newOutputStream(tmp);
          DataOutputStream out = new DataOutputStream(new BufferedOutputStream(raw))) {
        out.write(MAGIC.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        out.writeInt(VERSION);
        out.writeUTF(fingerprint);
        out.writeDouble(t.referenceSemichordM());
        writeDoubles(out, t.machNumbers());
        writeDoubles(out, t.reducedFrequencies());
        writeNames(out, t.rowNames());
        writeNames(out, t.columnNames());
        long count = 0;
        int nm = t.machNumbers().length, nk = t.reducedFrequencies().length;
        for (int m = 0; m < nm; m++) {
          for (int k = 0; k < nk; k++) {
            for (int r = 0; r < t.rowNames().size(); r++) {
              for (int c = 0; c < t.columnNames().size(); c++) {
                out.writeDouble(t.realAt(m, k, r, c));
                out.writeDouble(t.imagAt(m, k, r, c));
                count += 2;
              }
            }
          }
        }
        out.writeLong(count);
      }
      try {
        Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
      }
    } finally {
      Files.deleteIfExists(tmp);
    }
  }

  private static void writeDoubles(DataOutputStream out, double[] v) throws IOException {
    out.writeInt(v.length);
    for (double d : v) {
      out.writeDouble(d);
    }
  }

  private static void writeNames(DataOutputStream out, List<String> v) throws IOException {
    out.writeInt(v.size());
    for (String s : v) {
      out.writeUTF(s);
    }
  }
}
