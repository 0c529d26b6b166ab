package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.zip.CRC32;
import java.util.zip.Inflater;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The PNG encoder against independent readers: the JDK's own PNG decoder ({@code ImageIO.read})
 * must return exactly the source pixels, and the chunk structure and CRCs are checked byte by byte
 * against the PNG specification (ISO/IEC 15948:2004 clauses 5.2 signature, 5.3 chunk layout,
 * 11.2.2 IHDR; clause numbers and byte values from memory) with {@link CRC32} and {@link Inflater}
 * from {@code java.util.zip}. PNG is lossless, so every comparison is exact.
 */
class PngEncoderTest {
  @BeforeAll
  static void headless() {
    System.setProperty("java.awt.headless", "true");
  }

  /** One chunk as read back from the bytes. */
  private record Chunk(String type, byte[] data, int storedCrc, int computedCrc) {}

  static List<Arguments> images() {
    return List.of(
        Arguments.of("1x1 RGB", noise(1, 1, BufferedImage.TYPE_INT_RGB, 1)),
        Arguments.of("1x1 ARGB", noise(1, 1, BufferedImage.TYPE_INT_ARGB, 2)),
        Arguments.of("odd width RGB", noise(37, 5, BufferedImage.TYPE_INT_RGB, 3)),
        Arguments.of("odd width ARGB", noise(13, 9, BufferedImage.TYPE_INT_ARGB, 4)),
        Arguments.of("one row", noise(101, 1, BufferedImage.TYPE_INT_RGB, 5)),
        Arguments.of("one column", noise(1, 77, BufferedImage.TYPE_INT_RGB, 6)),
        Arguments.of("3-byte BGR", noise(29, 11, BufferedImage.TYPE_3BYTE_BGR, 7)),
        Arguments.of("4-byte ABGR", noise(17, 8, BufferedImage.TYPE_4BYTE_ABGR, 8)),
        Arguments.of("int BGR", noise(23, 6, BufferedImage.TYPE_INT_BGR, 9)),
        Arguments.of("grey", noise(19, 7, BufferedImage.TYPE_BYTE_GRAY, 10)),
        Arguments.of("drawing", drawing(301, 157, BufferedImage.TYPE_INT_RGB)),
        Arguments.of("translucent drawing", drawing(120, 90, BufferedImage.TYPE_INT_ARGB)),
        Arguments.of("sub-image", noise(40, 30, BufferedImage.TYPE_INT_RGB, 11).getSubimage(7, 5, 21, 13)),
        Arguments.of("ARGB sub-image", noise(40, 30, BufferedImage.TYPE_INT_ARGB, 12).getSubimage(3, 9, 30, 17)));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("images")
  void theJdkDecoderReadsBackEverySourcePixel(String name, BufferedImage source) throws Exception {
    BufferedImage decoded = ImageIO.read(new ByteArrayInputStream(PngEncoder.encode(source)));
    int w = source.getWidth();
    int h = source.getHeight();
    assertEquals(w, decoded.getWidth(), name);
    assertEquals(h, decoded.getHeight(), name);
    assertEquals(source.getColorModel().hasAlpha(), decoded.getColorModel().hasAlpha(), name);
    assertArrayEquals(source.getRGB(0, 0, w, h, null, 0, w), decoded.getRGB(0, 0, w, h, null, 0, w), name);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("images")
  void chunksFollowTheSpecificationAndCarryCorrectCrcs(String name, BufferedImage source) throws Exception {
    byte[] png = PngEncoder.encode(source);
    // clause 5.2: the signature 137 80 78 71 13 10 26 10
    assertArrayEquals(new byte[] {(byte) 137, 80, 78, 71, 13, 10, 26, 10}, Arrays.copyOf(png, 8), name);
    List<Chunk> chunks = chunks(png);
    assertEquals(List.of("IHDR", "IDAT", "IEND"), chunks.stream().map(Chunk::type).toList(), name);
    for (Chunk c : chunks) {
      assertEquals(c.computedCrc(), c.storedCrc(), name + " " + c.type() + " CRC");
    }
    ByteBuffer ihdr = ByteBuffer.wrap(chunks.get(0).data());
    assertEquals(13, ihdr.remaining(), name);
    assertEquals(source.getWidth(), ihdr.getInt(), name);
    assertEquals(source.getHeight(), ihdr.getInt(), name);
    boolean alpha = source.getColorModel().hasAlpha();
    // bit depth 8; colour type 6 (RGBA) or 2 (RGB); compression 0, filter method 0, no interlace
    assertArrayEquals(new byte[] {8, (byte) (alpha ? 6 : 2), 0, 0, 0}, Arrays.copyOfRange(ihdr.array(), 8, 13), name);
    assertEquals(0, chunks.get(2).data().length, name + " IEND is empty");

    // the inflated IDAT is, row by row, filter byte 0 (None) then R, G, B (, A) of each pixel
    byte[] raw = inflate(chunks.get(1).data());
    int w = source.getWidth();
    int channels = alpha ? 4 : 3;
    assertEquals((w * channels + 1) * source.getHeight(), raw.length, name);
    for (int y = 0; y < source.getHeight(); y++) {
      int row = y * (w * channels + 1);
      assertEquals(0, raw[row], name + " filter of row " + y);
      for (int x = 0; x < w; x++) {
        int argb = source.getRGB(x, y);
        int at = row + 1 + x * channels;
        int[] expected = alpha
            ? new int[] {argb >>> 16 & 0xFF, argb >>> 8 & 0xFF, argb & 0xFF, argb >>> 24}
            : new int[] {argb >>> 16 & 0xFF, argb >>> 8 & 0xFF, argb & 0xFF};
        for (int k = 0; k < channels; k++) {
          assertEquals(expected[k], raw[at + k] & 0xFF, name + " pixel " + x + "," + y + " sample " + k);
        }
      }
    }
  }

  @Test
  void theZlibStreamIsDeflatedAtTheFastestLevel() throws Exception {
    // RFC 1950 (zlib format) section 2.2, from memory: FLEVEL (the top two bits of the second
    // header byte) is 0 for the fastest compressor; the header as a big-endian 16-bit number is a multiple of 31
    byte[] idat = chunks(PngEncoder.encode(drawing(200, 100, BufferedImage.TYPE_INT_RGB))).get(1).data();
    assertEquals(0x78, idat[0] & 0xFF, "deflate, 32 KiB window");
    assertEquals(0, (idat[1] & 0xFF) >>> 6, "FLEVEL: fastest");
    assertEquals(0, ((idat[0] & 0xFF) << 8 | idat[1] & 0xFF) % 31);
  }

  @Test
  void flatAreasCompress() {
    // a single-colour 500 x 400 image is 600 400 raw bytes; deflate's matches cover it in a small
    // fraction of that (at most 258 bytes per match, a few bits each)
    BufferedImage flat = new BufferedImage(500, 400, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = flat.createGraphics();
    g.setColor(new Color(0xF4F6F8));
    g.fillRect(0, 0, 500, 400);
    g.dispose();
    byte[] png = PngEncoder.encode(flat);
    assertTrue(png.length < 10_000, png.length + " bytes");
  }

  @Test
  void integerRgbAndArgbImagesAreReadFromTheirPixelArrays() {
    assertTrue(new PngEncoder.Rows(noise(4, 3, BufferedImage.TYPE_INT_RGB, 1)).direct());
    assertTrue(new PngEncoder.Rows(noise(4, 3, BufferedImage.TYPE_INT_ARGB, 1)).direct());
    assertTrue(new PngEncoder.Rows(noise(9, 8, BufferedImage.TYPE_INT_ARGB, 1).getSubimage(2, 3, 4, 4)).direct());
    assertFalse(new PngEncoder.Rows(noise(4, 3, BufferedImage.TYPE_INT_BGR, 1)).direct());
    assertFalse(new PngEncoder.Rows(noise(4, 3, BufferedImage.TYPE_INT_ARGB_PRE, 1)).direct());
    assertFalse(new PngEncoder.Rows(noise(4, 3, BufferedImage.TYPE_3BYTE_BGR, 1)).direct());
  }

  @Test
  void theTopByteOfAnOpaqueImageIsIgnored() throws Exception {
    // TYPE_INT_RGB has no alpha; whatever its unused top byte holds, the pixels are opaque
    BufferedImage rgb = new BufferedImage(3, 2, BufferedImage.TYPE_INT_RGB);
    int[] raw = {0x00123456, 0x7F654321, 0xFFABCDEF, 0x01000000, 0x80FFFFFF, 0x00000001};
    rgb.getRaster().setDataElements(0, 0, 3, 2, raw);
    BufferedImage decoded = ImageIO.read(new ByteArrayInputStream(PngEncoder.encode(rgb)));
    int[] expected = {0xFF123456, 0xFF654321, 0xFFABCDEF, 0xFF000000, 0xFFFFFFFF, 0xFF000001};
    assertArrayEquals(expected, decoded.getRGB(0, 0, 3, 2, null, 0, 3));
  }

  private static List<Chunk> chunks(byte[] png) {
    ByteBuffer b = ByteBuffer.wrap(png, 8, png.length - 8);
    List<Chunk> out = new ArrayList<>();
    while (b.hasRemaining()) {
      int length = b.getInt();
      byte[] typeAndData = new byte[4 + length];
      b.get(typeAndData);
      CRC32 crc = new CRC32();
      crc.update(typeAndData);
      out.add(new Chunk(new String(typeAndData, 0, 4, StandardCharsets.US_ASCII),
          Arrays.copyOfRange(typeAndData, 4, typeAndData.length), b.getInt(), (int) crc.getValue()));
    }
    return out;
  }

  private static byte[] inflate(byte[] zlib) throws Exception {
    Inflater inflater = new Inflater();
    inflater.setInput(zlib);
    java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
    byte[] buf = new byte[4096];
    while (!inflater.finished()) {
      int n = inflater.inflate(buf);
      assertTrue(n > 0 || !inflater.needsInput(), "stream complete");
      out.write(buf, 0, n);
    }
    assertEquals(0, inflater.getRemaining(), "nothing after the zlib stream");
    inflater.end();
    return out.toByteArray();
  }

  /** Random pixels (seeded): every sample value, random alpha where the type has one. */
  private static BufferedImage noise(int w, int h, int type, long seed) {
    BufferedImage img = new BufferedImage(w, h, type);
    Random r = new Random(seed);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        img.setRGB(x, y, r.nextInt());
      }
    }
    return img;
  }

  /** An anti-aliased drawing like a chart's: flat fills, lines, text, translucent fill. */
  private static BufferedImage drawing(int w, int h, int type) {
    BufferedImage img = new BufferedImage(w, h, type);
    Graphics2D g = img.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setColor(new Color(0xF4F6F8));
    g.fillRect(0, 0, w, h);
    g.setColor(new Color(0x1F5F8B));
    g.setStroke(new BasicStroke(2.2f));
    g.drawLine(5, h - 5, w - 5, 5);
    g.setColor(new Color(0x1F, 0x5F, 0x8B, 38));
    g.fillRect(w / 4, h / 4, w / 2, h / 3);
    g.setColor(Color.BLACK);
    g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
    g.drawString("V (m/s)", 10, 20);
    g.dispose();
    return img;
  }
}
