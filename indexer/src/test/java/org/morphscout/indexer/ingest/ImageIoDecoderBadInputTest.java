package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

/** Files a real library contains that are not good images: each gives a picture or a clear, stable reason. */
class ImageIoDecoderBadInputTest {
  @TempDir Path dir;

  private final ImageIoDecoder decoder = new ImageIoDecoder(DecodeOptions.defaults());

  private ImageReadException failure(Path file) {
    ImageReadException e = catchThrowableOfType(ImageReadException.class, () -> decoder.decode(file));
    assertThat(e).as("decoding %s should fail with ImageReadException", file).isNotNull();
    assertThat(e).isInstanceOf(MorphscoutException.class);
    assertThat(e.path()).isEqualTo(file);
    assertThat(e.getMessage()).contains(file.toString()).contains(e.reason());
    assertThat(e.reason()).doesNotContain(file.toString());
    return e;
  }

  private static BufferedImage photoLike(int w, int h, long seed) {
    // Smooth gradients plus seeded noise, so the compressed data is long enough to cut in the middle.
    Random rnd = new Random(seed);
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int r = (x * 255 / w + rnd.nextInt(40)) & 0xFF;
        int g = (y * 255 / h + rnd.nextInt(40)) & 0xFF;
        img.setRGB(x, y, r << 16 | g << 8 | rnd.nextInt(256));
      }
    }
    return img;
  }

  @Test
  void emptyFile() throws Exception {
    Path file = TestImages.write(dir, "empty.jpg", new byte[0]);
    ImageReadException e = failure(file);
    assertThat(e.failure()).isEqualTo(ReadFailure.EMPTY);
    assertThat(e.reason()).isEqualTo("empty file (0 bytes)");
  }

  @Test
  void truncatedJpeg() throws Exception {
    byte[] full = TestImages.jpeg(photoLike(200, 150, 11), false);
    Path file = TestImages.write(dir, "cut.jpg", Arrays.copyOf(full, full.length * 6 / 10));
    ImageReadException e = failure(file);
    assertThat(e.failure()).isEqualTo(ReadFailure.TRUNCATED);
    assertThat(e.reason()).isEqualTo("truncated JPEG data");
  }

  @Test
  void jpegWithDataAfterEndOfImageIsFine() throws Exception {
    // Phones append videos or depth maps after EOI; the image itself is complete (ITU-T T.81 B.2.1 ends the
    // image at EOI).
    byte[] full = TestImages.jpeg(photoLike(64, 48, 12), false);
    byte[] trailer = "ftypmp42 and then some video bytes".getBytes(StandardCharsets.US_ASCII);
    byte[] both = Arrays.copyOf(full, full.length + trailer.length);
    System.arraycopy(trailer, 0, both, full.length, trailer.length);
    DecodedImage d = decoder.decode(TestImages.write(dir, "motion.jpg", both));
    assertThat(d.width()).isEqualTo(64);
  }

  @Test
  void truncatedPng() throws Exception {
    byte[] full = TestImages.encode(photoLike(200, 150, 13), "png");
    Path file = TestImages.write(dir, "cut.png", Arrays.copyOf(full, full.length / 2));
    ImageReadException e = failure(file);
    assertThat(e.failure()).isEqualTo(ReadFailure.TRUNCATED);
    assertThat(e.reason()).isEqualTo("truncated PNG data");
  }

  @org.junit.jupiter.params.ParameterizedTest(name = "{0}")
  @org.junit.jupiter.params.provider.ValueSource(strings = {"tiff", "bmp", "gif", "png", "jpeg"})
  void truncatedFilesOfEveryFormatGiveAReasonNotAPartialPicture(String format) throws Exception {
    BufferedImage img = photoLike(120, 90, 14);
    byte[] full = format.equals("gif") ? TestImages.encode(img, "gif")
        : format.equals("jpeg") ? TestImages.jpeg(img, false) : TestImages.encode(img, format);
    Path file = TestImages.write(dir, "cut." + format, Arrays.copyOf(full, full.length / 2));
    ImageReadException e = failure(file);
    assertThat(e.failure()).as(e.reason()).isEqualTo(ReadFailure.TRUNCATED);
    assertThat(e.reason()).isEqualTo("truncated " + FileFormat.valueOf(format.toUpperCase(java.util.Locale.ROOT)).label() + " data");
  }

  @Test
  void randomBytesNamedJpg() throws Exception {
    long seed = 20261201L;
    byte[] junk = new byte[4096];
    new Random(seed).nextBytes(junk);
    junk[0] = 0x12; // make sure the seeded bytes do not start with a real signature
    Path file = TestImages.write(dir, "noise.jpg", junk);
    ImageReadException e = failure(file);
    assertThat(e.failure()).as("seed %d", seed).isEqualTo(ReadFailure.NOT_AN_IMAGE);
    assertThat(e.reason()).isEqualTo("not an image");
  }

  @Test
  void jpegMagicFollowedByGarbageFailsWithDecoderReason() throws Exception {
    byte[] junk = new byte[2048];
    new Random(7).nextBytes(junk);
    junk[0] = (byte) 0xFF;
    junk[1] = (byte) 0xD8;
    junk[2] = (byte) 0xFF;
    junk[3] = (byte) 0xE0;
    ImageReadException e = failure(TestImages.write(dir, "garbage.jpg", junk));
    assertThat(e.failure()).isIn(ReadFailure.DECODER_FAILED, ReadFailure.TRUNCATED);
    assertThat(e.reason()).matches("decoder failed: .+|truncated JPEG data");
  }

  @Test
  void heicIsReportedAsUnsupported() throws Exception {
    // ISO/IEC 14496-12 ftyp box: size 24, "ftyp", major brand "heic", minor version 0, compatible "mif1" "heic".
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.write(new byte[] {0, 0, 0, 24});
    b.write("ftypheic".getBytes(StandardCharsets.US_ASCII));
    b.write(new byte[] {0, 0, 0, 0});
    b.write("mif1heic".getBytes(StandardCharsets.US_ASCII));
    b.write(new byte[200]);
    ImageReadException e = failure(TestImages.write(dir, "IMG_0001.HEIC", b.toByteArray()));
    assertThat(e.failure()).isEqualTo(ReadFailure.UNSUPPORTED_FORMAT);
    assertThat(e.reason()).isEqualTo("unsupported format (HEIC)");
  }

  @Test
  void tiffBasedCameraRawIsReportedAsUnsupported() throws Exception {
    // A Nikon NEF is TIFF-structured ("MM\0*"); decoding it as TIFF would give the small embedded preview.
    byte[] nef = {'M', 'M', 0, 42, 0, 0, 0, 8, 0, 0, 0, 0, 0, 0, 0, 0};
    ImageReadException e = failure(TestImages.write(dir, "DSC_0001.NEF", nef));
    assertThat(e.reason()).isEqualTo("unsupported format (camera raw NEF)");
  }

  @Test
  void onePixelImage() throws Exception {
    BufferedImage one = TestImages.filled(1, 1, 0xFF336699);
    DecodedImage d = decoder.decode(TestImages.write(dir, "one.png", TestImages.encode(one, "png")));
    assertThat(d.width()).isEqualTo(1);
    assertThat(d.height()).isEqualTo(1);
    assertThat(d.analysis().getRGB(0, 0)).isEqualTo(0xFF336699);
  }

  @Test
  void fullyTransparentPng() throws Exception {
    BufferedImage clear = TestImages.filled(40, 30, 0x00000000);
    DecodedImage d = decoder.decode(TestImages.write(dir, "clear.png", TestImages.encode(clear, "png")));
    assertThat(d.hasAlpha()).isTrue();
    int[] px = d.analysis().getRGB(0, 0, 40, 30, null, 0, 40);
    assertThat(Arrays.stream(px).map(TestImages::alpha).max().orElseThrow()).isZero();
  }

  @Test
  void uniformGrey() throws Exception {
    BufferedImage grey = TestImages.filled(50, 50, 0xFF777777);
    DecodedImage d = decoder.decode(TestImages.write(dir, "grey.jpg", TestImages.jpeg(TestImages.rgb(grey), false)));
    int[] px = d.analysis().getRGB(0, 0, 50, 50, null, 0, 50);
    for (int p : px) {
      assertThat(TestImages.maxChannelDiff(p, 0xFF777777)).isLessThanOrEqualTo(2);
    }
  }

  @Test
  void fileDeletedBeforeDecoding() throws Exception {
    Path file = TestImages.write(dir, "gone.png", TestImages.encode(TestImages.filled(4, 4, -1), "png"));
    Files.delete(file);
    ImageReadException e = failure(file);
    assertThat(e.failure()).isEqualTo(ReadFailure.VANISHED);
    assertThat(e.reason()).isEqualTo("file disappeared before decoding");
  }

  @Test
  void folderNamedLikeAnImage() throws Exception {
    Path folder = Files.createDirectory(dir.resolve("album.jpg"));
    assertThat(failure(folder).failure()).isEqualTo(ReadFailure.NOT_AN_IMAGE);
  }

  @Test
  void hugeDeclaredPngIsRefusedFromItsHeaderWithoutAllocating() throws Exception {
    // Signature + IHDR (ISO/IEC 15948 section 11.2.2) declaring 100000 x 100000 RGB, correct CRC, nothing else.
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.write(TestImages.PNG_SIGNATURE);
    b.write(TestImages.pngChunk("IHDR", TestImages.ihdr(100_000, 100_000, 8, 2)));
    b.write(TestImages.pngChunk("IEND", new byte[0])); // so the structure check passes and the cap is what stops it
    Path file = TestImages.write(dir, "huge.png", b.toByteArray());

    com.sun.management.ThreadMXBean threads =
        (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
    decoder.decode(TestImages.write(dir, "warmup.png", TestImages.encode(TestImages.filled(8, 8, -1), "png")));
    long bytesBefore = threads.getCurrentThreadAllocatedBytes();
    ImageReadException e = failure(file);
    long allocated = threads.getCurrentThreadAllocatedBytes() - bytesBefore;

    assertThat(e.failure()).isEqualTo(ReadFailure.TOO_LARGE);
    assertThat(e.reason()).isEqualTo("image too large: 100000x100000 = 10000.0 MP exceeds the 250 MP cap");
    // Decoding would need 10^10 pixels (40 GB as ARGB); a header check allocates a few buffers at most.
    assertThat(allocated).as("bytes allocated").isLessThan(32L << 20);
  }

  @Test
  void capIsConfigurable() throws Exception {
    Path file = TestImages.write(dir, "small.png", TestImages.encode(TestImages.filled(1000, 500, -1), "png"));
    ImageIoDecoder strict = new ImageIoDecoder(DecodeOptions.defaults().withMaxPixels(400_000));
    assertThatThrownBy(() -> strict.decode(file))
        .isInstanceOfSatisfying(ImageReadException.class, e -> assertThat(e.reason())
            .isEqualTo("image too large: 1000x500 = 0.5 MP exceeds the 0.4 MP cap"));
    assertThat(decoder.decode(file).width()).isEqualTo(1000);
  }

  @Test
  void invalidOptionsAreRejected() {
    assertThatThrownBy(() -> DecodeOptions.defaults().withMaxPixels(0)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> DecodeOptions.defaults().withAnalysisLongSide(8))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new DecodeOptions(1000, 768, 1024, java.time.Duration.ZERO))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> DecodeOptions.defaults().withPerFileTimeLimit(java.time.Duration.ofSeconds(-1)))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
