package org.morphscout.indexer.testing;

import com.twelvemonkeys.imageio.color.ColorSpaces;
import java.awt.Transparency;
import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.IndexColorModel;
import java.awt.image.WritableRaster;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Random;
import java.util.zip.CRC32;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

/**
 * Builders of the awkward files a real library holds, for tests outside the ingest package (the ingest tests keep
 * their own package-private builders). Every method writes one file into {@code dir} and returns its path; every
 * file is made here, from nothing but the given picture or seed. Layouts follow the cited standards.
 */
public final class BadFiles {
  private BadFiles() {}

  /** ISO/IEC 15948 section 5.2: the PNG signature. */
  private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A};

  public static Path write(Path dir, String name, byte[] bytes) throws IOException {
    Path p = dir.resolve(name);
    Files.write(p, bytes);
    return p;
  }

  public static Path empty(Path dir, String name) throws IOException {
    return write(dir, name, new byte[0]);
  }

  /** The first {@code fraction} of a JPEG of {@code picture} (baseline, default quality). */
  public static Path truncatedJpeg(Path dir, String name, BufferedImage picture, double fraction) throws IOException {
    byte[] full = encode(rgb(picture), "jpeg");
    return write(dir, name, Arrays.copyOf(full, (int) (full.length * fraction)));
  }

  /** The first {@code fraction} of a PNG of {@code picture}. */
  public static Path truncatedPng(Path dir, String name, BufferedImage picture, double fraction) throws IOException {
    byte[] full = encode(picture, "png");
    return write(dir, name, Arrays.copyOf(full, (int) (full.length * fraction)));
  }

  /** Seeded random bytes; the first byte is forced to 0x12 so no image signature can start the file. */
  public static Path randomBytes(Path dir, String name, long seed, int length) throws IOException {
    byte[] junk = new byte[length];
    new Random(seed).nextBytes(junk);
    junk[0] = 0x12;
    return write(dir, name, junk);
  }

  /**
   * A structurally valid PNG whose IHDR declares {@code width x height} 8-bit RGB and which holds no image data:
   * signature, IHDR (ISO/IEC 15948 section 11.2.2), IEND, each chunk with its CRC-32 (section 5.3).
   */
  public static Path pngHeaderOnly(Path dir, String name, int width, int height) throws IOException {
    byte[] ihdr = ByteBuffer.allocate(13).putInt(width).putInt(height).put((byte) 8).put((byte) 2)
        .put((byte) 0).put((byte) 0).put((byte) 0).array();
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.writeBytes(PNG_SIGNATURE);
    b.writeBytes(pngChunk("IHDR", ihdr));
    b.writeBytes(pngChunk("IEND", new byte[0]));
    return write(dir, name, b.toByteArray());
  }

  private static byte[] pngChunk(String type, byte[] data) {
    byte[] t = type.getBytes(StandardCharsets.US_ASCII);
    CRC32 crc = new CRC32();
    crc.update(t);
    crc.update(data);
    return ByteBuffer.allocate(12 + data.length).putInt(data.length).put(t).put(data).putInt((int) crc.getValue())
        .array();
  }

  /**
   * A 4-component CMYK JPEG of {@code picture} (inks C = 255 - R, M = 255 - G, Y = 255 - B, K = 0, the common-practice
   * naive separation), written by TwelveMonkeys' JPEG writer with an APP14 "Adobe" marker (Adobe Technical Note 5116
   * section 18).
   */
  public static Path cmykJpeg(Path dir, String name, BufferedImage picture) throws IOException {
    ColorSpace cmyk = ColorSpaces.getColorSpace(ColorSpaces.CS_GENERIC_CMYK);
    ComponentColorModel cm = new ComponentColorModel(cmyk, false, false, Transparency.OPAQUE, DataBuffer.TYPE_BYTE);
    WritableRaster r = cm.createCompatibleWritableRaster(picture.getWidth(), picture.getHeight());
    for (int y = 0; y < picture.getHeight(); y++) {
      for (int x = 0; x < picture.getWidth(); x++) {
        int p = picture.getRGB(x, y);
        r.setPixel(x, y, new int[] {255 - (p >> 16 & 0xFF), 255 - (p >> 8 & 0xFF), 255 - (p & 0xFF), 0});
      }
    }
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ImageWriter writer = ImageIO.getImageWritersByFormatName("jpeg").next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
      writer.setOutput(ios);
      writer.write(new BufferedImage(cm, r, false, null));
    } finally {
      writer.dispose();
    }
    return write(dir, name, out.toByteArray());
  }

  /** A 16-bit-per-sample RGB PNG of {@code picture}; 8 to 16 bit by v * 257 (ISO/IEC 15948 section 12.5). */
  public static Path png16BitRgb(Path dir, String name, BufferedImage picture) throws IOException {
    ComponentColorModel cm = new ComponentColorModel(
        ColorSpace.getInstance(ColorSpace.CS_sRGB), false, false, Transparency.OPAQUE, DataBuffer.TYPE_USHORT);
    WritableRaster r = cm.createCompatibleWritableRaster(picture.getWidth(), picture.getHeight());
    for (int y = 0; y < picture.getHeight(); y++) {
      for (int x = 0; x < picture.getWidth(); x++) {
        int p = picture.getRGB(x, y);
        r.setPixel(x, y, new int[] {(p >> 16 & 0xFF) * 257, (p >> 8 & 0xFF) * 257, (p & 0xFF) * 257});
      }
    }
    return write(dir, name, encode(new BufferedImage(cm, r, false, null), "png"));
  }

  /**
   * A grey + alpha PNG (colour type 4, ISO/IEC 15948 section 11.2.2): the picture's luma (BT.601 weights, common
   * practice) with alpha 255 where {@code opaque} says so and 0 elsewhere: a cut-out.
   */
  public static Path greyAlphaPng(Path dir, String name, BufferedImage picture, boolean[] opaque) throws IOException {
    ComponentColorModel cm = new ComponentColorModel(
        ColorSpace.getInstance(ColorSpace.CS_GRAY), true, false, Transparency.TRANSLUCENT, DataBuffer.TYPE_BYTE);
    int w = picture.getWidth();
    WritableRaster r = cm.createCompatibleWritableRaster(w, picture.getHeight());
    for (int y = 0; y < picture.getHeight(); y++) {
      for (int x = 0; x < w; x++) {
        int p = picture.getRGB(x, y);
        int luma = (int) Math.round(0.299 * (p >> 16 & 0xFF) + 0.587 * (p >> 8 & 0xFF) + 0.114 * (p & 0xFF));
        r.setPixel(x, y, new int[] {luma, opaque[y * w + x] ? 255 : 0});
      }
    }
    return write(dir, name, encode(new BufferedImage(cm, r, false, null), "png"));
  }

  /** An animated GIF (GIF89a with a Graphic Control Extension per frame, 0.5 s each) of the given frames. */
  public static Path animatedGif(Path dir, String name, BufferedImage... frames) throws IOException {
    BufferedImage[] indexedFrames = new BufferedImage[frames.length];
    for (int i = 0; i < frames.length; i++) {
      indexedFrames[i] = indexed(frames[i]);
    }
    return writeAnimatedGif(dir.resolve(name), indexedFrames);
  }

  /**
   * Writes already palette-indexed frames as an animated GIF (GIF89a, a Graphic Control Extension per frame, 0.5 s
   * each), for callers that need their own palette.
   */
  public static Path writeAnimatedGif(Path file, BufferedImage... indexedFrames) throws IOException {
    ImageWriter writer = ImageIO.getImageWritersByFormatName("gif").next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(file.toFile())) {
      writer.setOutput(ios);
      writer.prepareWriteSequence(null);
      for (BufferedImage frame : indexedFrames) {
        IIOMetadata meta = writer.getDefaultImageMetadata(new ImageTypeSpecifier(frame), null);
        IIOMetadataNode root = (IIOMetadataNode) meta.getAsTree("javax_imageio_gif_image_1.0");
        IIOMetadataNode gce = new IIOMetadataNode("GraphicControlExtension");
        gce.setAttribute("disposalMethod", "none");
        gce.setAttribute("userInputFlag", "FALSE");
        gce.setAttribute("transparentColorFlag", "FALSE");
        gce.setAttribute("delayTime", "50");
        gce.setAttribute("transparentColorIndex", "0");
        root.appendChild(gce);
        meta.setFromTree("javax_imageio_gif_image_1.0", root);
        writer.writeToSequence(new IIOImage(frame, null, meta), null);
      }
      writer.endWriteSequence();
    } finally {
      writer.dispose();
    }
    return file;
  }

  /** A 6x6x6 colour-cube palette image (216 colours; GIF holds at most 256). */
  private static BufferedImage indexed(BufferedImage src) {
    byte[] r = new byte[216];
    byte[] g = new byte[216];
    byte[] b = new byte[216];
    for (int i = 0; i < 216; i++) {
      r[i] = (byte) (i / 36 * 51);
      g[i] = (byte) (i / 6 % 6 * 51);
      b[i] = (byte) (i % 6 * 51);
    }
    BufferedImage out = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_BYTE_INDEXED,
        new IndexColorModel(8, 216, r, g, b));
    out.createGraphics().drawImage(src, 0, 0, null);
    return out;
  }

  /** A multi-page TIFF, one page per picture (TIFF 6.0 section 2: a chain of IFDs). */
  public static Path multiPageTiff(Path dir, String name, BufferedImage... pages) throws IOException {
    Path file = dir.resolve(name);
    ImageWriter writer = ImageIO.getImageWritersByFormatName("tiff").next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(file.toFile())) {
      writer.setOutput(ios);
      writer.prepareWriteSequence(null);
      for (BufferedImage p : pages) {
        writer.writeToSequence(new IIOImage(rgb(p), null, null), null);
      }
      writer.endWriteSequence();
    } finally {
      writer.dispose();
    }
    return file;
  }

  /**
   * The start of a HEIC file: an ISO/IEC 14496-12 ftyp box (size 24, "ftyp", major brand "heic", minor version 0,
   * compatible brands "mif1" "heic") followed by zeros.
   */
  public static Path heic(Path dir, String name) throws IOException {
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.writeBytes(new byte[] {0, 0, 0, 24});
    b.writeBytes("ftypheic".getBytes(StandardCharsets.US_ASCII));
    b.writeBytes(new byte[] {0, 0, 0, 0});
    b.writeBytes("mif1heic".getBytes(StandardCharsets.US_ASCII));
    b.writeBytes(new byte[200]);
    return write(dir, name, b.toByteArray());
  }

  /** A TIFF-structured camera raw stub (big-endian TIFF header "MM\0*", TIFF 6.0 section 2), e.g. a Nikon NEF. */
  public static Path tiffBasedRaw(Path dir, String name) throws IOException {
    return write(dir, name, new byte[] {'M', 'M', 0, 42, 0, 0, 0, 8, 0, 0, 0, 0, 0, 0, 0, 0});
  }

  /** A PNG of an image filled with one ARGB value. */
  public static Path filledPng(Path dir, String name, int w, int h, int argb) throws IOException {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    int[] row = new int[w];
    Arrays.fill(row, argb);
    for (int y = 0; y < h; y++) {
      img.setRGB(0, y, w, 1, row, 0, w);
    }
    return write(dir, name, encode(img, "png"));
  }

  /** A JPEG of an opaque image filled with one RGB value. */
  public static Path filledJpeg(Path dir, String name, int w, int h, int rgb) throws IOException {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
    int[] row = new int[w];
    Arrays.fill(row, rgb);
    for (int y = 0; y < h; y++) {
      img.setRGB(0, y, w, 1, row, 0, w);
    }
    return write(dir, name, encode(img, "jpeg"));
  }

  /** Encodes with the first ImageIO writer for {@code format}. */
  public static byte[] encode(BufferedImage img, String format) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    if (!ImageIO.write(img, format, out)) {
      throw new IOException("no ImageIO writer for " + format + " and " + img);
    }
    return out.toByteArray();
  }

  /** A TYPE_INT_RGB copy (JPEG, TIFF and GIF writers want no alpha). */
  public static BufferedImage rgb(BufferedImage src) {
    BufferedImage out = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_RGB);
    out.createGraphics().drawImage(src, 0, 0, null);
    return out;
  }
}
