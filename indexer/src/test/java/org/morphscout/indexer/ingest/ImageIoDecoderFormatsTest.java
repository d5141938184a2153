package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.morphscout.indexer.ingest.TestImages.alpha;
import static org.morphscout.indexer.ingest.TestImages.blue;
import static org.morphscout.indexer.ingest.TestImages.green;
import static org.morphscout.indexer.ingest.TestImages.maxChannelDiff;
import static org.morphscout.indexer.ingest.TestImages.red;

import com.twelvemonkeys.imageio.color.ColorSpaces;
import java.awt.Transparency;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.awt.image.BufferedImage;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.IndexColorModel;
import java.awt.image.WritableRaster;
import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.testing.BadFiles;

/** Each decoder path: files written in the test with ImageIO/TwelveMonkeys writers (or built by hand). */
class ImageIoDecoderFormatsTest {
  private static final int RED = 0xFFFF0000;
  private static final int BLUE = 0xFF0000FF;
  private static final int YELLOW = 0xFFFFFF00;
  private static final int GREY = 0xFF808080;

  @TempDir Path dir;

  private final ImageIoDecoder decoder = new ImageIoDecoder(DecodeOptions.defaults());

  /** 64 x 32: left half red, right half blue, a yellow 8 x 8 block at the top-left. */
  private static BufferedImage halves() {
    BufferedImage img = TestImages.filled(64, 32, RED);
    TestImages.fillRect(img, 32, 0, 32, 32, BLUE);
    TestImages.fillRect(img, 0, 0, 8, 8, YELLOW);
    return img;
  }

  private static void assertHalves(DecodedImage d, int tolerance) {
    BufferedImage a = d.analysis();
    assertThat(a.getType()).isEqualTo(BufferedImage.TYPE_INT_ARGB);
    assertThat(a.getWidth()).isEqualTo(64);
    assertThat(a.getHeight()).isEqualTo(32);
    assertNear(a.getRGB(2, 2), YELLOW, tolerance);
    assertNear(a.getRGB(16, 20), RED, tolerance);
    assertNear(a.getRGB(48, 20), BLUE, tolerance);
  }

  private static void assertNear(int got, int expected, int tolerance) {
    assertThat(maxChannelDiff(got, expected))
        .as("got %08x, expected %08x +- %d", got, expected, tolerance)
        .isLessThanOrEqualTo(tolerance);
  }

  @Test
  void baselineJpeg() throws Exception {
    byte[] bytes = TestImages.jpeg(TestImages.rgb(halves()), false);
    // ITU-T T.81 Table B.1: SOF0 (FFC0) marks baseline DCT.
    assertThat(containsMarker(bytes, 0xC0)).isTrue();
    DecodedImage d = decoder.decode(TestImages.write(dir, "baseline.jpg", bytes));
    assertThat(d.format()).isEqualTo("jpeg");
    assertThat(d.hasAlpha()).isFalse();
    assertHalves(d, 24);
  }

  @Test
  void progressiveJpeg() throws Exception {
    byte[] bytes = TestImages.jpeg(TestImages.rgb(halves()), true);
    // ITU-T T.81 Table B.1: SOF2 (FFC2) marks progressive DCT, Huffman coding.
    assertThat(containsMarker(bytes, 0xC2)).isTrue();
    assertHalves(decoder.decode(TestImages.write(dir, "progressive.jpg", bytes)), 24);
  }

  @Test
  void cmykJpegComesOutInRgb() throws Exception {
    // 4-channel image in TwelveMonkeys' generic CMYK space; its JPEG writer stores Adobe-style CMYK with an APP14
    // "Adobe" marker (transform 0 = no colour transform; Adobe Technical Note 5116 section 18).
    ColorSpace cmyk = ColorSpaces.getColorSpace(ColorSpaces.CS_GENERIC_CMYK);
    ComponentColorModel cm =
        new ComponentColorModel(cmyk, false, false, Transparency.OPAQUE, DataBuffer.TYPE_BYTE);
    WritableRaster r = cm.createCompatibleWritableRaster(48, 16);
    int[][] inks = {{255, 0, 0, 0}, {0, 0, 0, 0}, {0, 0, 0, 255}}; // cyan, paper white, full black
    for (int y = 0; y < 16; y++) {
      for (int x = 0; x < 48; x++) {
        r.setPixel(x, y, inks[x / 16]);
      }
    }
    BufferedImage img = new BufferedImage(cm, r, false, null);
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ImageWriter writer = ImageIO.getImageWritersByFormatName("jpeg").next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
      writer.setOutput(ios);
      writer.write(img);
    }
    byte[] bytes = out.toByteArray();
    assertThat(new String(bytes, 0, 64, java.nio.charset.StandardCharsets.ISO_8859_1)).contains("Adobe");
    assertThat(sofComponentCount(bytes)).as("a 4-component (CMYK) frame").isEqualTo(4);

    DecodedImage d = decoder.decode(TestImages.write(dir, "cmyk.jpg", bytes));
    // Expected colours from the common-practice CMYK -> RGB relation R = 255(1-C)(1-K), G = 255(1-M)(1-K),
    // B = 255(1-Y)(1-K): cyan (0,255,255), white (255,255,255), black (0,0,0). An ICC-managed conversion lands
    // near these but not on them (printing inks are duller: SWOP cyan is about (0,160,230), from memory), hence
    // the wide tolerance on cyan's green and blue.
    assertCyanWhiteBlack(d.analysis());
  }

  @org.junit.jupiter.params.ParameterizedTest(name = "YCCK {0}")
  @org.junit.jupiter.params.provider.ValueSource(booleans = {false, true})
  void adobeCmykAndYcckJpegsComeOutInRgb(boolean ycck) throws Exception {
    // Hand-laid Adobe JPEG (see AdobeJpegBuilder): 48 x 16, cyan | paper white | full black.
    int[][] inks = new int[48 * 16][];
    int[][] blocks = {{255, 0, 0, 0}, {0, 0, 0, 0}, {0, 0, 0, 255}};
    for (int i = 0; i < inks.length; i++) {
      inks[i] = blocks[(i % 48) / 16];
    }
    byte[] bytes = AdobeJpegBuilder.build(48, 16, inks, ycck);
    assertThat(sofComponentCount(bytes)).isEqualTo(4);
    // APP14 right after SOI (offset 2): FF EE, length (2), "Adobe" (5), version (2), flags0 (2), flags1 (2), then
    // the transform byte at file offset 2 + 2 + 2 + 5 + 6 = 17.
    assertThat(new String(bytes, 6, 5, java.nio.charset.StandardCharsets.US_ASCII)).isEqualTo("Adobe");
    assertThat(bytes[17]).as("Adobe transform byte").isEqualTo((byte) (ycck ? 2 : 0));
    DecodedImage d = decoder.decode(TestImages.write(dir, ycck ? "ycck.jpg" : "adobe-cmyk.jpg", bytes));
    assertCyanWhiteBlack(d.analysis());
  }

  /** Cyan, white, black blocks of 16 px: see {@link #cmykJpegComesOutInRgb()} for the expected values. */
  private static void assertCyanWhiteBlack(BufferedImage a) {
    int cyan = a.getRGB(8, 8);
    assertThat(red(cyan)).as("cyan R %08x", cyan).isLessThan(60);
    assertThat(green(cyan)).as("cyan G %08x", cyan).isGreaterThan(140);
    assertThat(blue(cyan)).as("cyan B %08x", cyan).isGreaterThan(200);
    assertNear(a.getRGB(24, 8), 0xFFFFFFFF, 20);
    int black = a.getRGB(40, 8);
    assertThat(Math.max(red(black), Math.max(green(black), blue(black)))).as("black %08x", black).isLessThan(70);
  }

  @Test
  void jpegWithEmbeddedIccProfileIsConvertedToSrgb() throws Exception {
    // Stored samples are 128 in an image tagged with the JDK's linear-light RGB profile, i.e. linear 128/255.
    // IEC 61966-2-1 (sRGB) encoding: V = 1.055 L^(1/2.4) - 0.055 for L > 0.0031308; L = 0.50196 gives
    // V = 0.7354, i.e. 187.5 of 255.
    BufferedImage img = TestImages.filled(16, 16, 0xFF808080);
    byte[] plain = TestImages.jpeg(TestImages.rgb(img), false);
    byte[] icc = ICC_Profile.getInstance(ColorSpace.CS_LINEAR_RGB).getData();
    byte[] tagged = TestImages.insertAfterSoi(plain, TestImages.iccApp2(icc));
    DecodedImage d = decoder.decode(TestImages.write(dir, "linear-icc.jpg", tagged));
    int p = d.analysis().getRGB(8, 8);
    double l = 128 / 255.0;
    int expected = (int) Math.round(255 * (1.055 * Math.pow(l, 1 / 2.4) - 0.055));
    assertThat(red(p)).as("%08x vs sRGB %d", p, expected).isBetween(expected - 4, expected + 4);
    assertThat(green(p)).isBetween(expected - 4, expected + 4);
    assertThat(blue(p)).isBetween(expected - 4, expected + 4);
  }

  @Test
  void pngWithIccpChunkIsConvertedToSrgb() throws Exception {
    // Same check as for JPEG, with the profile in an iCCP chunk (ISO/IEC 15948 section 11.3.3.3: profile name,
    // NUL, compression method 0, zlib-compressed profile), placed right after IHDR.
    byte[] plain = TestImages.encode(TestImages.rgb(TestImages.filled(16, 16, 0xFF808080)), "png");
    byte[] icc = ICC_Profile.getInstance(ColorSpace.CS_LINEAR_RGB).getData();
    ByteArrayOutputStream data = new ByteArrayOutputStream();
    data.writeBytes("linear\0".getBytes(java.nio.charset.StandardCharsets.ISO_8859_1));
    data.write(0);
    try (var z = new java.util.zip.DeflaterOutputStream(data)) {
      z.write(icc);
    }
    byte[] chunk = TestImages.pngChunk("iCCP", data.toByteArray());
    int afterIhdr = 8 + 12 + 13; // signature, IHDR length/type/CRC + 13 data bytes
    byte[] tagged = new byte[plain.length + chunk.length];
    System.arraycopy(plain, 0, tagged, 0, afterIhdr);
    System.arraycopy(chunk, 0, tagged, afterIhdr, chunk.length);
    System.arraycopy(plain, afterIhdr, tagged, afterIhdr + chunk.length, plain.length - afterIhdr);

    DecodedImage d = decoder.decode(TestImages.write(dir, "linear-icc.png", tagged));
    int p = d.analysis().getRGB(8, 8);
    int expected = (int) Math.round(255 * (1.055 * Math.pow(128 / 255.0, 1 / 2.4) - 0.055)); // IEC 61966-2-1
    assertThat(red(p)).as("%08x vs sRGB %d", p, expected).isBetween(expected - 4, expected + 4);
  }

  @Test
  void pngExifChunkOrientationIsApplied() throws Exception {
    // PNG eXIf chunk (Extensions to the PNG 1.2 Specification, version 1.5.0, section 3.7; PNG 3rd edition
    // section 11.3.6.1): the chunk data is the Exif TIFF structure without the "Exif\0\0" prefix. Orientation 6
    // (rotate 90 CW to view) turns the stored 64 x 32 into 32 x 64 with the stored top-left block at top-right.
    byte[] plain = TestImages.encode(TestImages.rgb(halves()), "png");
    byte[] app1 = TestImages.exifOrientationApp1(6, true);
    byte[] tiff = java.util.Arrays.copyOfRange(app1, 4 + 6, app1.length);
    byte[] chunk = TestImages.pngChunk("eXIf", tiff);
    int afterIhdr = 8 + 12 + 13;
    byte[] tagged = new byte[plain.length + chunk.length];
    System.arraycopy(plain, 0, tagged, 0, afterIhdr);
    System.arraycopy(chunk, 0, tagged, afterIhdr, chunk.length);
    System.arraycopy(plain, afterIhdr, tagged, afterIhdr + chunk.length, plain.length - afterIhdr);

    DecodedImage d = decoder.decode(TestImages.write(dir, "exif.png", tagged));
    assertThat(d.orientation()).isEqualTo(6);
    assertThat(d.width()).isEqualTo(32);
    assertThat(d.height()).isEqualTo(64);
    assertThat(d.analysis().getRGB(29, 2)).isEqualTo(YELLOW);
  }

  @Test
  void png8BitRgb() throws Exception {
    BufferedImage rgb = TestImages.rgb(halves());
    DecodedImage d = decoder.decode(TestImages.write(dir, "rgb8.png", TestImages.encode(rgb, "png")));
    assertThat(d.format()).isEqualTo("png");
    assertThat(d.hasAlpha()).isFalse();
    assertHalves(d, 0); // lossless
  }

  @Test
  void png16BitRgb() throws Exception {
    ComponentColorModel cm = new ComponentColorModel(
        ColorSpace.getInstance(ColorSpace.CS_sRGB), false, false, Transparency.OPAQUE, DataBuffer.TYPE_USHORT);
    WritableRaster r = cm.createCompatibleWritableRaster(64, 32);
    BufferedImage ref = halves();
    for (int y = 0; y < 32; y++) {
      for (int x = 0; x < 64; x++) {
        int p = ref.getRGB(x, y);
        // 8 -> 16 bit by replication (v * 257), ISO/IEC 15948 section 12.5 recommended scaling.
        r.setPixel(x, y, new int[] {red(p) * 257, green(p) * 257, blue(p) * 257});
      }
    }
    BufferedImage img = new BufferedImage(cm, r, false, null);
    byte[] bytes = TestImages.encode(img, "png");
    assertThat(bytes[24]).as("IHDR bit depth (ISO/IEC 15948 11.2.2)").isEqualTo((byte) 16);
    assertHalves(decoder.decode(TestImages.write(dir, "rgb16.png", bytes)), 1);
  }

  @Test
  void pngPalette() throws Exception {
    byte[] reds = {(byte) 255, 0, (byte) 255};
    byte[] greens = {0, 0, (byte) 255};
    byte[] blues = {0, (byte) 255, 0};
    IndexColorModel icm = new IndexColorModel(2, 3, reds, greens, blues);
    BufferedImage img = new BufferedImage(64, 32, BufferedImage.TYPE_BYTE_BINARY, icm);
    WritableRaster r = img.getRaster();
    for (int y = 0; y < 32; y++) {
      for (int x = 0; x < 64; x++) {
        r.setSample(x, y, 0, x < 8 && y < 8 ? 2 : x < 32 ? 0 : 1);
      }
    }
    byte[] bytes = TestImages.encode(img, "png");
    assertThat(bytes[25]).as("IHDR colour type 3 = palette (ISO/IEC 15948 11.2.2)").isEqualTo((byte) 3);
    assertHalves(decoder.decode(TestImages.write(dir, "palette.png", bytes)), 0);
  }

  @Test
  void pngGreyKeepsItsLevels() throws Exception {
    // ISO/IEC 15948 section 13.13: grey samples carry the same (gamma-encoded) meaning as colour samples, so
    // grey 128 must stay (128,128,128) rather than being treated as linear light (which would give 188).
    BufferedImage g = new BufferedImage(32, 16, BufferedImage.TYPE_BYTE_GRAY);
    for (int x = 0; x < 32; x++) {
      for (int y = 0; y < 16; y++) {
        g.getRaster().setSample(x, y, 0, x < 16 ? 128 : 30);
      }
    }
    DecodedImage d = decoder.decode(TestImages.write(dir, "grey8.png", TestImages.encode(g, "png")));
    assertThat(d.analysis().getRGB(4, 4)).isEqualTo(0xFF808080);
    assertThat(d.analysis().getRGB(20, 4)).isEqualTo(0xFF1E1E1E);
    assertThat(d.hasAlpha()).isFalse();
  }

  @Test
  void png16BitGrey() throws Exception {
    BufferedImage g = new BufferedImage(16, 16, BufferedImage.TYPE_USHORT_GRAY);
    for (int x = 0; x < 16; x++) {
      for (int y = 0; y < 16; y++) {
        g.getRaster().setSample(x, y, 0, 0x8080); // = 128 * 257
      }
    }
    byte[] bytes = TestImages.encode(g, "png");
    assertThat(bytes[24]).isEqualTo((byte) 16);
    DecodedImage d = decoder.decode(TestImages.write(dir, "grey16.png", bytes));
    assertThat(d.analysis().getRGB(3, 3)).isEqualTo(0xFF808080);
  }

  @Test
  void pngGreyWithAlpha() throws Exception {
    ComponentColorModel cm = new ComponentColorModel(
        ColorSpace.getInstance(ColorSpace.CS_GRAY), true, false, Transparency.TRANSLUCENT, DataBuffer.TYPE_BYTE);
    WritableRaster r = cm.createCompatibleWritableRaster(16, 8);
    for (int y = 0; y < 8; y++) {
      for (int x = 0; x < 16; x++) {
        r.setPixel(x, y, x < 8 ? new int[] {200, 255} : new int[] {60, 100});
      }
    }
    byte[] bytes = TestImages.encode(new BufferedImage(cm, r, false, null), "png");
    assertThat(bytes[25]).as("IHDR colour type 4 = greyscale with alpha").isEqualTo((byte) 4);
    DecodedImage d = decoder.decode(TestImages.write(dir, "grey-alpha.png", bytes));
    assertThat(d.hasAlpha()).isTrue();
    assertThat(d.analysis().getRGB(2, 2)).isEqualTo(0xFFC8C8C8);
    assertThat(d.analysis().getRGB(12, 2)).isEqualTo(0x643C3C3C);
  }

  @Test
  void pngRgbaKeepsAlpha() throws Exception {
    BufferedImage img = halves();
    TestImages.fillRect(img, 40, 10, 8, 8, 0x80123456);
    TestImages.fillRect(img, 56, 24, 8, 8, 0x00000000);
    byte[] bytes = TestImages.encode(img, "png");
    assertThat(bytes[25]).as("IHDR colour type 6 = RGBA").isEqualTo((byte) 6);
    DecodedImage d = decoder.decode(TestImages.write(dir, "rgba.png", bytes));
    assertThat(d.hasAlpha()).isTrue();
    assertHalves(d, 0);
    assertThat(d.analysis().getRGB(44, 14)).isEqualTo(0x80123456);
    assertThat(alpha(d.analysis().getRGB(60, 28))).isZero();
  }

  @Test
  void tiffFirstPageIsUsed() throws Exception {
    Path file = dir.resolve("two-pages.tif");
    ImageWriter writer = ImageIO.getImageWritersByFormatName("tiff").next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(file.toFile())) {
      writer.setOutput(ios);
      writer.prepareWriteSequence(null);
      writer.writeToSequence(new IIOImage(TestImages.rgb(halves()), null, null), null);
      writer.writeToSequence(new IIOImage(TestImages.rgb(TestImages.filled(64, 32, GREY)), null, null), null);
      writer.endWriteSequence();
    } finally {
      writer.dispose();
    }
    DecodedImage d = decoder.decode(file);
    assertThat(d.format()).isEqualTo("tiff");
    assertHalves(d, 0);
  }

  @Test
  void tiffWithEmbeddedIccProfileIsConvertedToSrgb() throws Exception {
    // Samples 128 in the JDK's linear-light RGB space; the TIFF writer embeds the profile (TIFF tag 34675,
    // ICC.1:2010 Annex B.3) and the result must be sRGB 188 (IEC 61966-2-1, see the JPEG case).
    ComponentColorModel cm = new ComponentColorModel(
        ColorSpace.getInstance(ColorSpace.CS_LINEAR_RGB), false, false, Transparency.OPAQUE, DataBuffer.TYPE_BYTE);
    WritableRaster r = cm.createCompatibleWritableRaster(16, 16);
    for (int y = 0; y < 16; y++) {
      for (int x = 0; x < 16; x++) {
        r.setPixel(x, y, new int[] {128, 128, 128});
      }
    }
    byte[] bytes = TestImages.encode(new BufferedImage(cm, r, false, null), "tiff");
    DecodedImage d = decoder.decode(TestImages.write(dir, "linear.tif", bytes));
    int p = d.analysis().getRGB(8, 8);
    int expected = (int) Math.round(255 * (1.055 * Math.pow(128 / 255.0, 1 / 2.4) - 0.055));
    assertThat(red(p)).as("%08x vs sRGB %d", p, expected).isBetween(expected - 4, expected + 4);
  }

  @Test
  void bmp() throws Exception {
    BufferedImage bgr = new BufferedImage(64, 32, BufferedImage.TYPE_3BYTE_BGR);
    bgr.createGraphics().drawImage(halves(), 0, 0, null);
    DecodedImage d = decoder.decode(TestImages.write(dir, "plain.bmp", TestImages.encode(bgr, "bmp")));
    assertThat(d.format()).isEqualTo("bmp");
    assertHalves(d, 0);
  }

  @Test
  void animatedGifFirstFrameIsUsed() throws Exception {
    // This test's own 4-colour palette keeps the exact colours that assertHalves checks.
    Path file = BadFiles.writeAnimatedGif(dir.resolve("anim.gif"), indexed(halves()),
        indexed(TestImages.filled(64, 32, GREY)));
    try (var in = ImageIO.createImageInputStream(file.toFile())) {
      var reader = ImageIO.getImageReaders(in).next();
      reader.setInput(in);
      assertThat(reader.getNumImages(true)).as("the file really is animated").isEqualTo(2);
      reader.dispose();
    }
    DecodedImage d = decoder.decode(file);
    assertThat(d.format()).isEqualTo("gif");
    assertHalves(d, 0);
  }

  private static BufferedImage indexed(BufferedImage src) {
    byte[] r = {(byte) 255, 0, (byte) 255, (byte) 128};
    byte[] g = {0, 0, (byte) 255, (byte) 128};
    byte[] b = {0, (byte) 255, 0, (byte) 128};
    BufferedImage out = new BufferedImage(
        src.getWidth(), src.getHeight(), BufferedImage.TYPE_BYTE_INDEXED, new IndexColorModel(8, 4, r, g, b));
    out.createGraphics().drawImage(src, 0, 0, null);
    return out;
  }

  @Test
  void losslessWebPBuiltByHand() throws Exception {
    // 64 x 32, see WebPLosslessBuilder: green 0 -> red (255,0,0), green 255 -> yellow (255,255,0).
    boolean[] pattern = new boolean[64 * 32];
    for (int y = 0; y < 32; y++) {
      for (int x = 0; x < 64; x++) {
        pattern[y * 64 + x] = x < 8 && y < 8;
      }
    }
    byte[] webp = WebPLosslessBuilder.build(64, 32, pattern, 255, 0, 255, 0, 255);
    DecodedImage d = decoder.decode(TestImages.write(dir, "built.webp", webp));
    assertThat(d.format()).isEqualTo("webp");
    assertThat(d.width()).isEqualTo(64);
    assertThat(d.height()).isEqualTo(32);
    assertThat(d.analysis().getRGB(2, 2)).isEqualTo(YELLOW);
    assertThat(d.analysis().getRGB(40, 20)).isEqualTo(RED);
    assertThat(d.analysis().getRGB(12, 2)).isEqualTo(RED);
  }

  @Test
  void losslessWebPWithAlpha() throws Exception {
    boolean[] pattern = new boolean[16 * 8];
    pattern[0] = true;
    byte[] webp = WebPLosslessBuilder.build(16, 8, pattern, 10, 20, 200, 30, 128);
    DecodedImage d = decoder.decode(TestImages.write(dir, "alpha.webp", webp));
    assertThat(d.hasAlpha()).isTrue();
    assertThat(d.analysis().getRGB(0, 0)).isEqualTo(0x800AC81E);
    assertThat(d.analysis().getRGB(5, 5)).isEqualTo(0x800A141E);
  }

  @Test
  void extendedWebPWithExifOrientation() throws Exception {
    // VP8X container with an EXIF chunk carrying orientation 8 (rotate 270 CW to view): stored 64 x 32 with the
    // marked block at the stored top-left ends up at the upright bottom-left (CIPA DC-008-2019: 8 = left/bottom).
    boolean[] pattern = new boolean[64 * 32];
    for (int y = 0; y < 8; y++) {
      for (int x = 0; x < 8; x++) {
        pattern[y * 64 + x] = true;
      }
    }
    byte[] simple = WebPLosslessBuilder.build(64, 32, pattern, 255, 0, 255, 0, 255);
    byte[] app1 = TestImages.exifOrientationApp1(8, false);
    byte[] tiff = java.util.Arrays.copyOfRange(app1, 4 + 6, app1.length);
    byte[] webp = WebPLosslessBuilder.withExif(simple, 64, 32, false, tiff);
    DecodedImage d = decoder.decode(TestImages.write(dir, "exif.webp", webp));
    assertThat(d.orientation()).isEqualTo(8);
    assertThat(d.width()).isEqualTo(32);
    assertThat(d.height()).isEqualTo(64);
    assertThat(d.analysis().getRGB(2, 61)).isEqualTo(YELLOW);
    assertThat(d.analysis().getRGB(2, 2)).isEqualTo(RED);
  }

  @Test
  void wideWebPIsSubsampled() throws Exception {
    // 3200 x 8: step 3200 / 1536 = 2; left half yellow, right half red.
    boolean[] pattern = new boolean[3200 * 8];
    for (int i = 0; i < pattern.length; i++) {
      pattern[i] = i % 3200 < 1600;
    }
    byte[] webp = WebPLosslessBuilder.build(3200, 8, pattern, 255, 0, 255, 0, 255);
    DecodedImage d = decoder.decode(TestImages.write(dir, "wide.webp", webp));
    assertThat(d.width()).isEqualTo(3200);
    assertThat(d.analysis().getWidth()).isEqualTo(768);
    assertThat(d.analysis().getHeight()).isEqualTo(2);
    assertThat(d.analysis().getRGB(100, 1)).isEqualTo(YELLOW);
    assertThat(d.analysis().getRGB(700, 1)).isEqualTo(RED);
  }

  @Test
  void fineDetailIsAreaAveragedNotAliased() throws Exception {
    // 1600 x 1000 (decoded at full size: 1600 / 1536 gives step 1): 1 px black / 1 px white vertical stripes. Point
    // sampling down to 768 px would give black or white columns (aliasing); an area average gives mid grey
    // (127.5). The left quarter is solid red and must stay exactly red.
    BufferedImage img = new BufferedImage(1600, 1000, BufferedImage.TYPE_INT_RGB);
    int[] row = new int[1600];
    for (int x = 0; x < 1600; x++) {
      row[x] = x < 400 ? 0xFF0000 : (x % 2 == 0 ? 0x000000 : 0xFFFFFF);
    }
    for (int y = 0; y < 1000; y++) {
      img.setRGB(0, y, 1600, 1, row, 0, 1600);
    }
    DecodedImage d = decoder.decode(TestImages.write(dir, "stripes.png", TestImages.encode(img, "png")));
    assertThat(d.analysis().getWidth()).isEqualTo(768);
    assertThat(d.analysis().getHeight()).isEqualTo(480);
    assertThat(d.analysis().getRGB(100, 200)).isEqualTo(0xFFFF0000);
    for (int x = 300; x < 760; x += 7) {
      int p = d.analysis().getRGB(x, 240);
      assertThat(red(p)).as("x=%d: %08x", x, p).isBetween(118, 137);
    }
  }

  @Test
  void wideImageIsSubsampledToTheAnalysisSize() throws Exception {
    // 4000 x 250: step 4000 / 1536 = 2, decoded 2000 x 125, then averaged to 768 x 48. Full size is reported.
    BufferedImage img = new BufferedImage(4000, 250, BufferedImage.TYPE_INT_RGB);
    int[] row = new int[4000];
    for (int x = 0; x < 4000; x++) {
      row[x] = x < 1000 ? 0xFF0000 : x < 3000 ? 0x00FF00 : 0x0000FF;
    }
    for (int y = 0; y < 250; y++) {
      img.setRGB(0, y, 4000, 1, row, 0, 4000);
    }
    DecodedImage d = decoder.decode(TestImages.write(dir, "wide.png", TestImages.encode(img, "png")));
    assertThat(d.width()).isEqualTo(4000);
    assertThat(d.height()).isEqualTo(250);
    assertThat(d.analysis().getWidth()).isEqualTo(768);
    assertThat(d.analysis().getHeight()).isEqualTo(48);
    assertThat(d.analysis().getRGB(50, 20)).isEqualTo(0xFFFF0000);
    assertThat(d.analysis().getRGB(384, 20)).isEqualTo(0xFF00FF00);
    assertThat(d.analysis().getRGB(700, 20)).isEqualTo(0xFF0000FF);
  }

  @Test
  void subsamplingStepKeepsTwiceTheAnalysisSize() {
    assertThat(ImageIoDecoder.subsampling(12000, 8000, 768)).isEqualTo(7); // 12000 / 7 = 1715 >= 1536
    assertThat(ImageIoDecoder.subsampling(1000, 800, 768)).isEqualTo(1);
    assertThat(ImageIoDecoder.subsampling(100_000, 10, 768)).isEqualTo(65);
  }

  @Test
  void pngNamedJpgStillDecodes() throws Exception {
    // The format comes from the magic bytes, not the name.
    Path file = TestImages.write(dir, "misnamed.jpg", TestImages.encode(TestImages.rgb(halves()), "png"));
    DecodedImage d = decoder.decode(file);
    assertThat(d.format()).isEqualTo("png");
    assertHalves(d, 0);
    assertThat(Files.exists(file)).isTrue();
  }

  private static boolean containsMarker(byte[] jpeg, int marker) {
    for (int i = 0; i + 1 < jpeg.length; i++) {
      if ((jpeg[i] & 0xFF) == 0xFF && (jpeg[i + 1] & 0xFF) == marker) {
        return true;
      }
    }
    return false;
  }

  /** Number of components in the first SOFn segment (ITU-T T.81 B.2.2: Nf at offset 7 of the segment). */
  private static int sofComponentCount(byte[] jpeg) {
    int i = 2;
    while (i + 4 < jpeg.length) {
      int marker = jpeg[i + 1] & 0xFF;
      int len = ((jpeg[i + 2] & 0xFF) << 8) | (jpeg[i + 3] & 0xFF);
      if (marker >= 0xC0 && marker <= 0xCF && marker != 0xC4 && marker != 0xC8 && marker != 0xCC) {
        return jpeg[i + 9] & 0xFF;
      }
      i += 2 + len;
    }
    return -1;
  }
}
