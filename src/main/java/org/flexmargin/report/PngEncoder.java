package org.flexmargin.report;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.awt.image.Raster;
import java.awt.image.SinglePixelPackedSampleModel;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * Encodes an image as PNG (Portable Network Graphics, ISO/IEC 15948:2004, the W3C PNG second
 * edition): the signature, one IHDR, one IDAT holding the zlib stream of the filtered rows, IEND.
 * Pixels are 8-bit truecolour (colour type 2), with an alpha sample (colour type 6) only when the
 * image has alpha; never interlaced. Every row takes filter type 0 (None) and the stream is
 * deflated at the fastest level. On charts (flat colour with anti-aliased edges) deflate's own
 * matching of repeated pixels already compresses the flat areas: measured on the demo report's
 * charts, the Up, Sub and Paeth filters gave larger files and cost more time than None at the
 * fastest levels, and trying every filter on every row, as a general-purpose encoder does, costs
 * several times more for about 15 % smaller files.
 */
final class PngEncoder {
  private PngEncoder() {}

  /** The 8-byte PNG signature (ISO/IEC 15948 clause 5.2). */
  static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'};
  /** Colour type of 8-bit RGB samples. */
  static final int TRUECOLOUR = 2;
  /** Colour type of 8-bit RGBA samples. */
  static final int TRUECOLOUR_ALPHA = 6;
  /** Filter type byte of the None filter (the row's samples as they are). */
  static final int FILTER_NONE = 0;

  /**
   * @param image the image; its pixels are read as sRGB (as {@link BufferedImage#getRGB} gives them)
   * @return the PNG file bytes
   */
  static byte[] encode(BufferedImage image) {
    int width = image.getWidth();
    int height = image.getHeight();
    boolean alpha = image.getColorModel().hasAlpha();
    int channels = alpha ? 4 : 3;
    byte[] filtered = filteredRows(new Rows(image), width, height, channels);
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    out.writeBytes(SIGNATURE);
    byte[] header = new byte[13];
    putInt(header, 0, width);
    putInt(header, 4, height);
    header[8] = 8; // bit depth
    header[9] = (byte) (alpha ? TRUECOLOUR_ALPHA : TRUECOLOUR);
    // header[10..12]: compression method 0 (deflate), filter method 0 (adaptive), no interlace
    writeChunk(out, "IHDR", header);
    writeChunk(out, "IDAT", deflate(filtered));
    writeChunk(out, "IEND", new byte[0]);
    return out.toByteArray();
  }

  /**
   * The image data before compression: each row is its filter type byte (None) and the row's
   * samples, red, green, blue (and alpha), one byte each.
   */
  static byte[] filteredRows(Rows rows, int width, int height, int channels) {
    byte[] data = new byte[(width * channels + 1) * height];
    int[] argb = new int[width];
    int pos = 0;
    for (int y = 0; y < height; y++) {
      rows.row(y, argb);
      data[pos++] = FILTER_NONE;
      for (int x = 0; x < width; x++) {
        int p = argb[x];
        data[pos++] = (byte) (p >>> 16);
        data[pos++] = (byte) (p >>> 8);
        data[pos++] = (byte) p;
        if (channels == 4) {
          data[pos++] = (byte) (p >>> 24);
        }
      }
    }
    return data;
  }

  /** @return the zlib stream (RFC 1950) of the data, deflated at the fastest level */
  static byte[] deflate(byte[] data) {
    Deflater deflater = new Deflater(Deflater.BEST_SPEED);
    try {
      deflater.setInput(data);
      deflater.finish();
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      byte[] buffer = new byte[64 * 1024];
      while (!deflater.finished()) {
        out.write(buffer, 0, deflater.deflate(buffer));
      }
      return out.toByteArray();
    } finally {
      deflater.end();
    }
  }

  /** Writes a chunk: length, type, data, and the CRC-32 of type and data (ISO/IEC 15948 clause 5.3). */
  private static void writeChunk(ByteArrayOutputStream out, String type, byte[] data) {
    byte[] typeBytes = type.getBytes(StandardCharsets.US_ASCII);
    byte[] word = new byte[4];
    putInt(word, 0, data.length);
    out.writeBytes(word);
    out.writeBytes(typeBytes);
    out.writeBytes(data);
    CRC32 crc = new CRC32();
    crc.update(typeBytes);
    crc.update(data);
    putInt(word, 0, (int) crc.getValue());
    out.writeBytes(word);
  }

  /** Writes a 32-bit big-endian integer (network byte order, as PNG stores every integer). */
  private static void putInt(byte[] b, int at, int v) {
    b[at] = (byte) (v >>> 24);
    b[at + 1] = (byte) (v >>> 16);
    b[at + 2] = (byte) (v >>> 8);
    b[at + 3] = (byte) v;
  }

  /**
   * Reads an image's rows as packed ARGB: straight from the pixel array for the integer RGB and
   * ARGB types (what charts are drawn on), through {@link BufferedImage#getRGB} one row at a time
   * for any other type.
   */
  static final class Rows {
    private final BufferedImage image;
    private final int[] pixels;
    private final int offset;
    private final int stride;

    Rows(BufferedImage image) {
      this.image = image;
      int type = image.getType();
      Raster raster = image.getRaster();
      if ((type == BufferedImage.TYPE_INT_RGB || type == BufferedImage.TYPE_INT_ARGB)
          && raster.getDataBuffer() instanceof DataBufferInt buffer
          && raster.getSampleModel() instanceof SinglePixelPackedSampleModel model) {
        pixels = buffer.getData();
        stride = model.getScanlineStride();
        offset = buffer.getOffset() - raster.getSampleModelTranslateY() * stride
            - raster.getSampleModelTranslateX();
      } else {
        pixels = null;
        stride = 0;
        offset = 0;
      }
    }

    /** @return whether rows are copied straight from the image's pixel array */
    boolean direct() {
      return pixels != null;
    }

    /**
     * @param y row index
     * @param argb receives the row's pixels (length at least the image width)
     */
    void row(int y, int[] argb) {
      int width = image.getWidth();
      if (pixels == null) {
        image.getRGB(0, y, width, 1, argb, 0, width);
        return;
      }
      System.arraycopy(pixels, offset + y * stride, argb, 0, width);
    }
  }
}
