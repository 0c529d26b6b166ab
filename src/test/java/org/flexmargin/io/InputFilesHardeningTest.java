package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.api.parallel.Isolated;

/**
 * Files that are not files, files that are too large, and content beyond the parser's limits: each
 * is refused at once in our own words, with file and line where there is one.
 */
@Isolated("changes the input size limit, a system property every reader consults")
class InputFilesHardeningTest {
  private static final Path GOOD = Path.of("src/test/resources/io");

  private static void assertHas(String message, String... parts) {
    for (String p : parts) {
      assertTrue(message.contains(p), () -> "message <" + message + "> lacks <" + p + ">");
    }
  }

  /** A copy of the small test case whose first configuration reads {@code table} as mode table. */
  private static Path caseWithModeTable(Path dir, String table) throws IOException {
    String text = Files.readString(GOOD.resolve("good-case.json"))
        .replaceFirst("\"good-modes.json\"", "\"" + table + "\"");
    Files.copy(GOOD.resolve("good-modes.json"), dir.resolve("good-modes.json"));
    Files.copy(GOOD.resolve("good-forces.json"), dir.resolve("good-forces.json"));
    Path c = dir.resolve("case.json");
    Files.writeString(c, text);
    return c;
  }

  @Test
  void aModeTableLinkedToADeviceIsRefusedBeforeItIsOpened(@TempDir Path dir) throws IOException {
    Path dev = Path.of("/dev/zero");
    assumeTrue(Files.exists(dev), "needs a character device");
    Files.createSymbolicLink(dir.resolve("zero.json"), dev);
    Path c = caseWithModeTable(dir, "zero.json");
    // First release: read /dev/zero until the JVM ran out of memory. Bound: 10 s is ample for a refusal.
    InputFileException e = assertTimeoutPreemptively(Duration.ofSeconds(10),
        () -> assertThrows(InputFileException.class, () -> CaseReader.read(c)));
    assertHas(e.getMessage(), "case.json:", "configurations[0].mode_table", "not a regular file",
        "symbolic link", "zero.json");
  }

  @Test
  void aNamedPipeIsRefusedInsteadOfBlocking(@TempDir Path dir) throws Exception {
    Path fifo = dir.resolve("pipe.json");
    Process p;
    try {
      p = new ProcessBuilder("mkfifo", fifo.toString()).start();
    } catch (IOException e) {
      assumeTrue(false, "mkfifo not available");
      return;
    }
    assumeTrue(p.waitFor() == 0 && Files.exists(fifo), "mkfifo failed");
    // First release: blocked forever on open. Bound: 10 s.
    InputFileException e = assertTimeoutPreemptively(Duration.ofSeconds(10),
        () -> assertThrows(InputFileException.class, () -> CaseReader.read(fifo)));
    assertHas(e.getMessage(), "pipe.json", "not a regular file", "named pipe");
  }

  @Test
  void aFileAboveTheSizeLimitIsRefusedNamingTheLimitAndHowToRaiseIt(@TempDir Path dir) throws IOException {
    Path big = dir.resolve("big.json");
    Files.write(big, new byte[3 << 20]);
    InputFileException e = assertThrows(InputFileException.class,
        () -> SourceFile.read(big, "big.json", 2L << 20));
    assertHas(e.getMessage(), "big.json: expected a readable regular file of at most 2 MB",
        SourceFile.LIMIT_ENVIRONMENT, SourceFile.LIMIT_PROPERTY, "found a file of 3 MB");
    assertEquals(512L << 20, SourceFile.DEFAULT_LIMIT_MB << 20);
  }

  @Test
  void theSizeLimitOverrideIsValidated() {
    String before = System.getProperty(SourceFile.LIMIT_PROPERTY);
    try {
      System.setProperty(SourceFile.LIMIT_PROPERTY, "64");
      assertEquals(64L << 20, SourceFile.limitBytes());
      System.setProperty(SourceFile.LIMIT_PROPERTY, "lots");
      InputFileException e = assertThrows(InputFileException.class, SourceFile::limitBytes);
      assertHas(e.getMessage(), SourceFile.LIMIT_PROPERTY, "a whole number of megabytes", "\"lots\"");
    } finally {
      if (before == null) {
        System.clearProperty(SourceFile.LIMIT_PROPERTY);
      } else {
        System.setProperty(SourceFile.LIMIT_PROPERTY, before);
      }
    }
  }

  @Test
  void deepNestingIsReportedInOurWordsWithItsLine(@TempDir Path dir) throws IOException {
    Path f = dir.resolve("deep.json");
    String deep = "[".repeat(2000) + "]".repeat(2000);
    Files.writeString(f, "{\n\"format\": 1,\n\"name\": " + deep + "\n}\n");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(f));
    assertHas(e.getMessage(), "deep.json:3:", "nested at most " + JsonInput.MAX_NESTING_DEPTH, "deeper nesting");
    assertFalse(e.getMessage().contains("StreamReadConstraints"), e.getMessage());
    assertFalse(e.getMessage().contains("maxNestingDepth"), e.getMessage());
  }

  @Test
  void aHugeTextValueIsReportedInOurWordsWithItsLine(@TempDir Path dir) throws IOException {
    Path f = dir.resolve("long.json");
    Files.writeString(f, "{\n\"format\": 1,\n\"description\": \"" + "x".repeat(JsonInput.MAX_STRING_LENGTH + 10)
        + "\"\n}\n");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(f));
    assertHas(e.getMessage(), "long.json:3:", "a text value of at most 1000000 characters");
    assertFalse(e.getMessage().contains("StreamReadConstraints"), e.getMessage());
  }

  @Test
  void aHugeNumberIsReportedInOurWords(@TempDir Path dir) throws IOException {
    Path f = dir.resolve("digits.json");
    Files.writeString(f, "{\n\"format\": " + "9".repeat(5000) + "\n}\n");
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.read(f));
    assertHas(e.getMessage(), "digits.json:2:", "a number of at most");
    assertFalse(e.getMessage().contains("StreamReadConstraints"), e.getMessage());
  }

  @Test
  void aNonUtf8ByteInACsvTableIsReportedWithItsLineAndColumn(@TempDir Path dir) throws IOException {
    byte[] good = Files.readAllBytes(GOOD.resolve("good-modes.csv"));
    String text = new String(good, StandardCharsets.UTF_8);
    int thirdLine = text.indexOf('\n', text.indexOf('\n') + 1) + 1;
    byte[] bad = good.clone();
    bad[thirdLine + 2] = (byte) 0xE9; // a Latin-1 e-acute, as a spreadsheet saving in Windows-1252 writes it
    Path f = dir.resolve("latin1.csv");
    Files.write(f, bad);
    InputFileException e = assertThrows(InputFileException.class, () -> CaseReader.readModeTable(f));
    assertHas(e.getMessage(), "latin1.csv:3:", "expected UTF-8 text", "0xE9 at column 3");
  }
}
