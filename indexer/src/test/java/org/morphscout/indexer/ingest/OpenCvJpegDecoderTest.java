package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.colour.CieLab;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.silhouette.DefaultSilhouettes;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.testing.OutsideData;

/**
 * The fast JPEG path against the ImageIO path on real JPEGs made with ImageMagick (the {@code convert} tool, Debian
 * package {@code imagemagick}) from a real photograph (Debian {@code opencv-doc}: {@code squirrel_cls.jpg}, which
 * carries an EXIF block, enlarged to a camera-like 3072 px so that the DCT-domain reduction is used): EXIF orientations
 * 1, 3, 6 and 8 set with {@code -orient}, and copies tagged with non-sRGB ICC profiles embedded with {@code -profile}
 * (Ghostscript's Adobe RGB (1998)-compatible and ROMM RGB profiles, and the JDK's linear-RGB profile). Tolerance
 * (ours): the two analysis images within a mean CIEDE2000 of 1.5 (a difference near the threshold of a
 * just-noticeable difference, common practice) and the classical silhouettes within IoU 0.95.
 */
class OpenCvJpegDecoderTest {
  /** ICC profiles installed with Ghostscript (Debian libgs-common). */
  static final Path GHOSTSCRIPT_ICC = Path.of("/usr/share/color/icc/ghostscript");

  @TempDir static Path tmp;
  static Path big;

  @BeforeAll
  static void makeJpegs() throws IOException, InterruptedException {
    Path photo = OutsideData.require(OutsideData.OPENCV_SAMPLES.resolve("squirrel_cls.jpg"), "opencv-doc");
    if (!convertAvailable()) {
      OutsideData.unavailable("ImageMagick's convert is not on the PATH (Debian package imagemagick)");
    }
    big = tmp.resolve("squirrel-3072.jpg");
    convert(photo.toString(), "-resize", "3072x3072", "-quality", "92", big.toString());
  }

  static boolean convertAvailable() {
    try {
      Process p = new ProcessBuilder("convert", "-version").redirectErrorStream(true).start();
      p.getInputStream().readAllBytes();
      return p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0;
    } catch (IOException e) {
      return false;
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      return false;
    }
  }

  static void convert(String... args) throws IOException, InterruptedException {
    List<String> cmd = new ArrayList<>(List.of("convert"));
    cmd.addAll(List.of(args));
    Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
    String out = new String(p.getInputStream().readAllBytes());
    assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
    assertThat(p.exitValue()).as("convert %s: %s", cmd, out).isZero();
  }

  @Test
  void theNativeLibraryLoadsHere() {
    // Linux x86-64 is one of the platforms the org.openpnp:opencv artifact carries natives for.
    assertThat(OpenCvJpegDecoder.available()).isTrue();
    assertThat(OpenCvJpegDecoder.create(DecodeOptions.defaults())).isInstanceOf(OpenCvJpegDecoder.class);
  }

  @Test
  void everyOrientationDecodesLikeImageIoWithinTheTolerance() throws IOException, InterruptedException {
    ImageIoDecoder slow = new ImageIoDecoder(DecodeOptions.defaults());
    ImageDecoder fast = OpenCvJpegDecoder.create(DecodeOptions.defaults());
    String[] names = {"TopLeft", "BottomRight", "RightTop", "LeftBottom"};
    int[] tags = {1, 3, 6, 8};
    for (int i = 0; i < names.length; i++) {
      Path file = tmp.resolve("squirrel-" + tags[i] + ".jpg");
      convert(big.toString(), "-orient", names[i], file.toString());
      DecodedImage a = slow.decode(file);
      DecodedImage b = fast.decode(file);
      assertThat(b.orientation()).as("orientation of %s", file).isEqualTo(tags[i]).isEqualTo(a.orientation());
      assertThat(b.width()).isEqualTo(a.width());
      assertThat(b.height()).isEqualTo(a.height());
      assertThat(b.analysis().getWidth()).isEqualTo(a.analysis().getWidth());
      assertThat(b.analysis().getHeight()).isEqualTo(a.analysis().getHeight());
      assertThat(meanDeltaE00(a.analysis(), b.analysis())).as("mean ΔE00, orientation %d", tags[i]).isLessThan(1.5);
      Mask ma = new DefaultSilhouettes().extract(a.analysis()).mask();
      Mask mb = new DefaultSilhouettes().extract(b.analysis()).mask();
      assertThat(ma.iou(mb)).as("silhouette IoU, orientation %d", tags[i]).isGreaterThan(0.95);
    }
  }

  @Test
  void anEmbeddedRgbProfileIsAppliedOnTheFastPathAsImageIoAppliesIt() throws IOException, InterruptedException {
    // Real profiles as photographers' files carry them: Ghostscript's Adobe RGB (1998)-compatible and ROMM RGB
    // (ProPhoto) profiles (Debian libgs-common, which ImageMagick brings), and the JDK's linear-RGB profile.
    Path linear = tmp.resolve("linear-rgb.icc");
    Files.write(linear, ICC_Profile.getInstance(ColorSpace.CS_LINEAR_RGB).getData());
    List<Path> profiles = List.of(OutsideData.require(GHOSTSCRIPT_ICC.resolve("a98.icc"), "libgs-common"),
        OutsideData.require(GHOSTSCRIPT_ICC.resolve("rommrgb.icc"), "libgs-common"), linear);
    Path turned = tmp.resolve("squirrel-turned.jpg");
    convert(big.toString(), "-orient", "RightTop", turned.toString());
    DecodedImage untagged = new ImageIoDecoder(DecodeOptions.defaults()).decode(turned);
    for (Path icc : profiles) {
      // Tagged and turned (EXIF orientation 6), so the profile and the orientation are checked together.
      Path tagged = tmp.resolve("squirrel-" + icc.getFileName() + ".jpg");
      convert(big.toString(), "-profile", icc.toString(), "-orient", "RightTop", tagged.toString());
      JpegHeader header = JpegHeader.read(Files.readAllBytes(tagged)).orElseThrow();
      assertThat(header.iccProfile()).isTrue();
      assertThat(header.profile()).get().isEqualTo(Files.readAllBytes(icc));
      DecodedImage a = new ImageIoDecoder(DecodeOptions.defaults()).decode(tagged);
      DecodedImage b = OpenCvJpegDecoder.create(DecodeOptions.defaults()).decode(tagged);
      assertThat(b.orientation()).isEqualTo(6).isEqualTo(a.orientation());
      // The fast path took it (its resampling differs from ImageIO's) and agrees within the tolerance.
      assertThat(samePixels(a.analysis(), b.analysis())).as("decoded by the fast path: %s", icc).isFalse();
      assertThat(meanDeltaE00(a.analysis(), b.analysis())).as("mean ΔE00 with %s", icc).isLessThan(1.5);
      Mask ma = new DefaultSilhouettes().extract(a.analysis()).mask();
      Mask mb = new DefaultSilhouettes().extract(b.analysis()).mask();
      assertThat(ma.iou(mb)).as("silhouette IoU with %s", icc).isGreaterThan(0.95);
      // And the profile was applied: the same samples taken as sRGB read clearly differently.
      assertThat(meanDeltaE00(b.analysis(), untagged.analysis())).as("profile %s applied", icc).isGreaterThan(3);
    }
  }

  @Test
  void joinsAProfileSplitOverSeveralMarkersInSequenceOrder() {
    // ICC.1 annex B.4: a profile over 64 KB is split over APP2 markers numbered from 1; writers may reorder them.
    byte[] jpeg = jpegWithProfileChunks(new int[][] {{2, 2}, {1, 2}}, new byte[][] {{4, 5, 6}, {1, 2, 3}});
    JpegHeader h = JpegHeader.read(jpeg).orElseThrow();
    assertThat(h.profileChunks()).isEqualTo(2);
    assertThat(h.profile()).get().isEqualTo(new byte[] {1, 2, 3, 4, 5, 6});
    // A chunk missing, or numbered past the count: the file has a profile, but not one that can be read.
    JpegHeader missing = JpegHeader.read(jpegWithProfileChunks(new int[][] {{1, 2}}, new byte[][] {{1}})).orElseThrow();
    assertThat(missing.iccProfile()).isTrue();
    assertThat(missing.profile()).isEmpty();
    assertThat(OpenCvJpegDecoder.rgbSpace(missing)).isEmpty();
    JpegHeader beyond = JpegHeader.read(jpegWithProfileChunks(new int[][] {{3, 2}}, new byte[][] {{1}})).orElseThrow();
    assertThat(beyond.profile()).isEmpty();
    // A whole profile that is not a valid ICC profile is not taken either.
    assertThat(OpenCvJpegDecoder.rgbSpace(h)).isEmpty();
  }

  @Test
  void aPhotoWithAnAdobeMarkerAsAdobesToolsSaveItTakesTheFastPath() throws IOException, InterruptedException {
    // Adobe's tools add an APP14 "Adobe" marker with colour transform 1 (YCbCr) to colour JPEGs; the same photo with
    // that marker spliced in after SOI decodes on the fast path like ImageIO within the tolerance. With transform 0
    // (samples stored as RGB) the fast path leaves it to ImageIO: the same pixels as ImageIO gives.
    byte[] photo = Files.readAllBytes(big);
    ImageIoDecoder slow = new ImageIoDecoder(DecodeOptions.defaults());
    ImageDecoder fast = OpenCvJpegDecoder.create(DecodeOptions.defaults());
    Path ycc = TestImages.write(tmp, "squirrel-adobe-ycc.jpg", withAdobeMarker(photo, 1));
    assertThat(JpegHeader.read(Files.readAllBytes(ycc))).get().extracting(JpegHeader::adobeTransform).isEqualTo(1);
    DecodedImage a = slow.decode(ycc);
    DecodedImage b = fast.decode(ycc);
    assertThat(samePixels(a.analysis(), b.analysis())).as("decoded by the fast path").isFalse();
    assertThat(meanDeltaE00(a.analysis(), b.analysis())).isLessThan(1.5);
    assertThat(meanDeltaE00(b.analysis(), fast.decode(big).analysis())).as("as without the marker").isLessThan(0.01);

    Path rgb = TestImages.write(tmp, "squirrel-adobe-rgb.jpg", withAdobeMarker(photo, 0));
    assertThat(samePixels(fast.decode(rgb).analysis(), slow.decode(rgb).analysis())).as("refused").isTrue();
  }

  /** The JPEG with an APP14 Adobe marker (version 100, no flags, the given transform) inserted after SOI. */
  private static byte[] withAdobeMarker(byte[] jpeg, int transform) {
    byte[] marker = {(byte) 0xFF, (byte) 0xEE, 0, 14, 'A', 'd', 'o', 'b', 'e', 0, 100, 0, 0, 0, 0, (byte) transform};
    byte[] out = new byte[jpeg.length + marker.length];
    System.arraycopy(jpeg, 0, out, 0, 2);
    System.arraycopy(marker, 0, out, 2, marker.length);
    System.arraycopy(jpeg, 2, out, 2 + marker.length, jpeg.length - 2);
    return out;
  }

  /** SOI, APP2 ICC_PROFILE markers with the given (sequence, count) and data, a 3-component SOF0 of 8x8, SOS. */
  private static byte[] jpegWithProfileChunks(int[][] numbers, byte[][] data) {
    java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
    out.writeBytes(new byte[] {(byte) 0xFF, (byte) 0xD8});
    byte[] signature = "ICC_PROFILE\0".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
    for (int k = 0; k < numbers.length; k++) {
      int length = 2 + signature.length + 2 + data[k].length;
      out.writeBytes(new byte[] {(byte) 0xFF, (byte) 0xE2, (byte) (length >> 8), (byte) length});
      out.writeBytes(signature);
      out.writeBytes(new byte[] {(byte) numbers[k][0], (byte) numbers[k][1]});
      out.writeBytes(data[k]);
    }
    out.writeBytes(new byte[] {(byte) 0xFF, (byte) 0xC0, 0, 17, 8, 0, 8, 0, 8, 3, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1});
    out.writeBytes(new byte[] {(byte) 0xFF, (byte) 0xDA, 0, 2});
    return out.toByteArray();
  }

  @Test
  void whereTheNativeLibraryCannotLoadItSaysSoOnceAndEveryFileDecodesAsImageIoDoes() throws IOException {
    // A machine without a fitting native build: the loader throws what System.load throws there.
    AtomicInteger attempts = new AtomicInteger();
    List<String> warnings = new ArrayList<>();
    OpenCvJpegDecoder.NativeLibrary absent = new OpenCvJpegDecoder.NativeLibrary(() -> {
      attempts.incrementAndGet();
      throw new UnsatisfiedLinkError("no opencv_java in java.library.path");
    }, warnings::add);
    DecodedImage reference = new ImageIoDecoder(DecodeOptions.defaults()).decode(big);
    for (int run = 0; run < 3; run++) { // three decoders of one run, as index, bench and the browser make them
      ImageDecoder decoder = OpenCvJpegDecoder.create(DecodeOptions.defaults(), absent);
      assertThat(decoder).isInstanceOf(ImageIoDecoder.class);
      DecodedImage d = decoder.decode(big);
      assertThat(d.width()).isEqualTo(reference.width());
      assertThat(d.height()).isEqualTo(reference.height());
      assertThat(d.orientation()).isEqualTo(reference.orientation());
      assertThat(samePixels(d.analysis(), reference.analysis())).isTrue();
    }
    assertThat(attempts).hasValue(1);
    assertThat(warnings).hasSize(1);
    assertThat(warnings.getFirst()).contains("not available").contains("UnsatisfiedLinkError").contains("ImageIO");

    // Any other failure of the loader (here an unpacking error) means the same.
    List<String> more = new ArrayList<>();
    OpenCvJpegDecoder.NativeLibrary unpackFails = new OpenCvJpegDecoder.NativeLibrary(() -> {
      throw new IllegalStateException("cannot write the native library to the temporary folder");
    }, more::add);
    assertThat(OpenCvJpegDecoder.create(DecodeOptions.defaults(), unpackFails)).isInstanceOf(ImageIoDecoder.class);
    assertThat(OpenCvJpegDecoder.create(DecodeOptions.defaults(), unpackFails)).isInstanceOf(ImageIoDecoder.class);
    assertThat(more).hasSize(1);

    // And a loader that works gives the fast decoder, silently.
    List<String> none = new ArrayList<>();
    OpenCvJpegDecoder.NativeLibrary present = new OpenCvJpegDecoder.NativeLibrary(() -> { }, none::add);
    assertThat(OpenCvJpegDecoder.create(DecodeOptions.defaults(), present)).isInstanceOf(OpenCvJpegDecoder.class);
    assertThat(none).isEmpty();
  }

  @Test
  void aFileTheFastPathRefusesFallsBackForThatFileOnly() throws IOException, InterruptedException {
    Path grey = tmp.resolve("squirrel-grey.jpg"); // refused: an embedded profile that is not RGB (Ghostscript's sGray)
    convert(big.toString(), "-colorspace", "Gray",
        "-profile", OutsideData.require(GHOSTSCRIPT_ICC.resolve("sgray.icc"), "libgs-common").toString(),
        grey.toString());
    assertThat(JpegHeader.read(Files.readAllBytes(grey))).get().extracting(JpegHeader::iccProfile).isEqualTo(true);
    Path png = tmp.resolve("squirrel.png"); // refused: not a JPEG
    convert(big.toString(), "-resize", "1600x1600", png.toString());
    Path cmyk = TestImages.write(tmp, "inks.jpg", AdobeJpegBuilder.build(48, 16, inks(48, 16), false)); // Adobe

    ImageIoDecoder slow = new ImageIoDecoder(DecodeOptions.defaults());
    ImageDecoder fast = OpenCvJpegDecoder.create(DecodeOptions.defaults());
    DecodedImage fastAlone = OpenCvJpegDecoder.create(DecodeOptions.defaults()).decode(big);
    // One decoder, refused and accepted files interleaved: each refused file is decoded exactly as ImageIO does it,
    // and the plain JPEG after each one still takes the fast path (the same pixels as a fresh fast decoder gives,
    // which differ from ImageIO's by the resampling).
    for (Path refused : List.of(grey, png, cmyk)) {
      DecodedImage viaFast = fast.decode(refused);
      DecodedImage viaSlow = slow.decode(refused);
      assertThat(samePixels(viaFast.analysis(), viaSlow.analysis())).as("%s as ImageIO", refused).isTrue();
      assertThat(viaFast.width()).isEqualTo(viaSlow.width());
      DecodedImage next = fast.decode(big);
      assertThat(samePixels(next.analysis(), fastAlone.analysis())).as("fast path after %s", refused).isTrue();
      assertThat(samePixels(next.analysis(), slow.decode(big).analysis())).isFalse();
    }
  }

  private static int[][] inks(int w, int h) {
    int[][] inks = new int[w * h][];
    for (int i = 0; i < inks.length; i++) {
      inks[i] = (i % w) < w / 2 ? new int[] {255, 0, 0, 0} : new int[] {0, 0, 0, 0}; // cyan | paper white
    }
    return inks;
  }

  static boolean samePixels(BufferedImage a, BufferedImage b) {
    if (a.getWidth() != b.getWidth() || a.getHeight() != b.getHeight()) {
      return false;
    }
    int w = a.getWidth();
    int h = a.getHeight();
    return java.util.Arrays.equals(a.getRGB(0, 0, w, h, null, 0, w), b.getRGB(0, 0, w, h, null, 0, w));
  }

  @Test
  void readsTheHeaderItNeeds() throws IOException {
    JpegHeader h = JpegHeader.read(Files.readAllBytes(big)).orElseThrow();
    assertThat(h.width()).isEqualTo(3072);
    assertThat(h.height()).isEqualTo(2446);
    assertThat(h.components()).isEqualTo(3);
    assertThat(JpegHeader.read(new byte[] {1, 2, 3, 4})).isEmpty();
    assertThat(OpenCvJpegDecoder.reduction(3072, 3072, 768)).isEqualTo(4);
    assertThat(OpenCvJpegDecoder.reduction(6000, 4000, 768)).isEqualTo(4);
    assertThat(OpenCvJpegDecoder.reduction(700, 500, 768)).isEqualTo(1);
  }

  static double meanDeltaE00(BufferedImage a, BufferedImage b) {
    double sum = 0;
    int n = 0;
    for (int y = 0; y < a.getHeight(); y++) {
      for (int x = 0; x < a.getWidth(); x++) {
        sum += Ciede2000.difference(CieLab.toLab(a.getRGB(x, y)), CieLab.toLab(b.getRGB(x, y)));
        n++;
      }
    }
    return sum / n;
  }
}
