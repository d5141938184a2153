package org.morphscout.indexer.ingest;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.CRC32;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;

/** Builders for the test files: every file a test reads is made here or in the test itself. */
final class TestImages {
  private TestImages() {}

  /** A TYPE_INT_ARGB image filled with {@code argb}. */
  static BufferedImage filled(int w, int h, int argb) {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        img.setRGB(x, y, argb);
      }
    }
    return img;
  }

  /** TYPE_INT_RGB copy of an image (JPEG writers want three channels). */
  static BufferedImage rgb(BufferedImage src) {
    BufferedImage out = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_RGB);
    out.createGraphics().drawImage(src, 0, 0, null);
    return out;
  }

  static void fillRect(BufferedImage img, int x0, int y0, int w, int h, int argb) {
    for (int y = y0; y < y0 + h; y++) {
      for (int x = x0; x < x0 + w; x++) {
        img.setRGB(x, y, argb);
      }
    }
  }

  /** Encodes {@code img} with the first ImageIO writer for {@code format}. */
  static byte[] encode(BufferedImage img, String format) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    if (!ImageIO.write(img, format, out)) {
      throw new IOException("no writer for " + format + " and " + img);
    }
    return out.toByteArray();
  }

  /** JPEG at quality 0.95, baseline or progressive. */
  static byte[] jpeg(BufferedImage img, boolean progressive) throws IOException {
    ImageWriter writer = ImageIO.getImageWritersByFormatName("jpeg").next();
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
      writer.setOutput(ios);
      ImageWriteParam p = writer.getDefaultWriteParam();
      p.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
      p.setCompressionQuality(0.95f);
      if (progressive) {
        p.setProgressiveMode(ImageWriteParam.MODE_DEFAULT);
      }
      writer.write(null, new IIOImage(img, null, null), p);
    } finally {
      writer.dispose();
    }
    return out.toByteArray();
  }

  /** Inserts a whole marker segment (starting with FF xx) right after SOI (ITU-T T.81 B.1.1.2). */
  static byte[] insertAfterSoi(byte[] jpeg, byte[] segment) {
    byte[] out = new byte[jpeg.length + segment.length];
    System.arraycopy(jpeg, 0, out, 0, 2);
    System.arraycopy(segment, 0, out, 2, segment.length);
    System.arraycopy(jpeg, 2, out, 2 + segment.length, jpeg.length - 2);
    return out;
  }

  /**
   * An Exif APP1 segment holding only IFD0 with one entry, Orientation.
   *
   * <p>Layout per CIPA DC-008-2019 (Exif 2.32) section 4.5.4 and 4.6.2, and TIFF 6.0 section 2: FF E1, 2-byte
   * big-endian length (counting itself), "Exif\0\0", TIFF header ("MM" 00 2A or "II" 2A 00, offset of IFD0 = 8),
   * IFD0: entry count (1), entry {tag 0x0112, type 3 = SHORT, count 1, value left-justified in the 4-byte field},
   * next-IFD offset 0.
   */
  static byte[] exifOrientationApp1(int orientation, boolean bigEndian) {
    ByteBuffer tiff = ByteBuffer.allocate(8 + 2 + 12 + 4);
    tiff.order(bigEndian ? ByteOrder.BIG_ENDIAN : ByteOrder.LITTLE_ENDIAN);
    tiff.put(bigEndian ? (byte) 'M' : (byte) 'I').put(bigEndian ? (byte) 'M' : (byte) 'I');
    tiff.putShort((short) 42).putInt(8);
    tiff.putShort((short) 1);
    tiff.putShort((short) 0x0112).putShort((short) 3).putInt(1).putShort((short) orientation).putShort((short) 0);
    tiff.putInt(0);
    return app1(tiff.array());
  }

  /** APP1 with the "Exif\0\0" identifier and the given payload. */
  static byte[] app1(byte[] tiffPayload) {
    byte[] id = "Exif\0\0".getBytes(StandardCharsets.ISO_8859_1);
    int length = 2 + id.length + tiffPayload.length;
    ByteBuffer b = ByteBuffer.allocate(2 + length);
    b.put((byte) 0xFF).put((byte) 0xE1).putShort((short) length).put(id).put(tiffPayload);
    return b.array();
  }

  /**
   * APP2 segment carrying a whole ICC profile: "ICC_PROFILE\0", sequence number 1, count 1, profile bytes
   * (ICC.1:2010 Annex B.4, embedding ICC profiles in JPEG files).
   */
  static byte[] iccApp2(byte[] profile) {
    byte[] id = "ICC_PROFILE\0".getBytes(StandardCharsets.ISO_8859_1);
    int length = 2 + id.length + 2 + profile.length;
    ByteBuffer b = ByteBuffer.allocate(2 + length);
    b.put((byte) 0xFF).put((byte) 0xE2).putShort((short) length).put(id).put((byte) 1).put((byte) 1).put(profile);
    return b.array();
  }

  /** ISO/IEC 15948 section 5.2: the PNG signature. */
  static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A};

  /** One PNG chunk: length, type, data, CRC-32 over type and data (ISO/IEC 15948 section 5.3 and 5.5). */
  static byte[] pngChunk(String type, byte[] data) {
    byte[] t = type.getBytes(StandardCharsets.US_ASCII);
    CRC32 crc = new CRC32();
    crc.update(t);
    crc.update(data);
    return ByteBuffer.allocate(12 + data.length)
        .putInt(data.length).put(t).put(data).putInt((int) crc.getValue()).array();
  }

  /**
   * IHDR data (ISO/IEC 15948 section 11.2.2): width, height (4 bytes each, big-endian), bit depth, colour type,
   * compression method 0, filter method 0, interlace method 0.
   */
  static byte[] ihdr(int width, int height, int bitDepth, int colourType) {
    return ByteBuffer.allocate(13)
        .putInt(width).putInt(height).put((byte) bitDepth).put((byte) colourType)
        .put((byte) 0).put((byte) 0).put((byte) 0).array();
  }

  static Path write(Path dir, String name, byte[] bytes) throws IOException {
    Path p = dir.resolve(name);
    Files.write(p, bytes);
    return p;
  }

  static int red(int argb) {
    return (argb >> 16) & 0xFF;
  }

  static int green(int argb) {
    return (argb >> 8) & 0xFF;
  }

  static int blue(int argb) {
    return argb & 0xFF;
  }

  static int alpha(int argb) {
    return argb >>> 24;
  }

  /** Largest per-channel difference of two ARGB values (alpha included). */
  static int maxChannelDiff(int a, int b) {
    int d = 0;
    for (int shift = 0; shift < 32; shift += 8) {
      d = Math.max(d, Math.abs(((a >>> shift) & 0xFF) - ((b >>> shift) & 0xFF)));
    }
    return d;
  }
}
