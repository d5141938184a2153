package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.morphscout.indexer.ingest.TestImages.maxChannelDiff;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Decodes JPEGs carrying a hand-built Exif APP1 segment with each Orientation value (CIPA DC-008-2019, tag
 * 0x0112) and checks where the marked stored corners end up, using the table in {@link OrientationTest#SIDES}.
 */
class ExifOrientationDecodeTest {
  private static final int RED = 0xFFFF0000;
  private static final int BLUE = 0xFF0000FF;
  private static final int GREEN = 0xFF00FF00;
  private static final int GREY = 0xFF808080;
  /** JPEG at quality 0.95 with 16-pixel flat blocks keeps colours within a few levels (common practice). */
  private static final int TOLERANCE = 24;

  @TempDir Path dir;

  /** 96 x 48 grey picture; 16 x 16 blocks: red at stored top-left, blue at top-right, green at bottom-left. */
  private static BufferedImage marked() {
    BufferedImage img = TestImages.filled(96, 48, GREY);
    TestImages.fillRect(img, 0, 0, 16, 16, RED);
    TestImages.fillRect(img, 80, 0, 16, 16, BLUE);
    TestImages.fillRect(img, 0, 32, 16, 16, GREEN);
    return TestImages.rgb(img);
  }

  @ParameterizedTest(name = "orientation {0}")
  @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8})
  void decodedPictureIsUpright(int tag) throws Exception {
    byte[] jpeg = TestImages.insertAfterSoi(
        TestImages.jpeg(marked(), false), TestImages.exifOrientationApp1(tag, tag % 2 == 0));
    Path file = TestImages.write(dir, "oriented-" + tag + ".jpg", jpeg);

    DecodedImage d = new ImageIoDecoder(DecodeOptions.defaults()).decode(file);

    assertThat(d.orientation()).isEqualTo(tag);
    boolean swap = tag >= 5;
    assertThat(d.width()).isEqualTo(swap ? 48 : 96);
    assertThat(d.height()).isEqualTo(swap ? 96 : 48);
    BufferedImage a = d.analysis();
    assertThat(a.getWidth()).isEqualTo(d.width());
    assertThat(a.getHeight()).isEqualTo(d.height());
    checkBlock(a, tag, false, false, RED);
    checkBlock(a, tag, false, true, BLUE);
    checkBlock(a, tag, true, false, GREEN);
  }

  /** Samples 4 px inside the corner where the stored corner block must be (blocks are 16 px). */
  private static void checkBlock(BufferedImage a, int tag, boolean lastRow, boolean lastCol, int colour) {
    int[] c = OrientationTest.expectedCorner(tag, lastRow, lastCol, a.getWidth(), a.getHeight());
    int x = c[0] == 0 ? 4 : c[0] - 4;
    int y = c[1] == 0 ? 4 : c[1] - 4;
    int got = a.getRGB(x, y);
    assertThat(maxChannelDiff(got, colour))
        .as("tag %d: pixel (%d,%d) = %08x, expected about %08x", tag, x, y, got, colour)
        .isLessThanOrEqualTo(TOLERANCE);
  }

  @ParameterizedTest(name = "TIFF orientation {0}")
  @ValueSource(ints = {3, 6, 7})
  void tiffOrientationTagIsApplied(int tag) throws Exception {
    // TIFF 6.0 section 8, tag 274 Orientation: same eight values as Exif (which took them from TIFF). Written
    // through the TwelveMonkeys TIFF writer's native metadata tree (TIFFField number 274).
    BufferedImage img = marked();
    ImageWriter writer = ImageIO.getImageWritersByFormatName("tiff").next();
    IIOMetadata meta = writer.getDefaultImageMetadata(new ImageTypeSpecifier(img), null);
    String format = meta.getNativeMetadataFormatName();
    IIOMetadataNode root = new IIOMetadataNode(format);
    IIOMetadataNode ifd = new IIOMetadataNode("TIFFIFD");
    IIOMetadataNode field = new IIOMetadataNode("TIFFField");
    field.setAttribute("number", "274");
    field.setAttribute("name", "Orientation");
    IIOMetadataNode shorts = new IIOMetadataNode("TIFFShorts");
    IIOMetadataNode value = new IIOMetadataNode("TIFFShort");
    value.setAttribute("value", Integer.toString(tag));
    shorts.appendChild(value);
    field.appendChild(shorts);
    ifd.appendChild(field);
    root.appendChild(ifd);
    meta.mergeTree(format, root);
    Path file = dir.resolve("oriented-" + tag + ".tif");
    try (ImageOutputStream out = ImageIO.createImageOutputStream(file.toFile())) {
      writer.setOutput(out);
      writer.write(null, new IIOImage(img, null, meta), null);
    } finally {
      writer.dispose();
    }

    DecodedImage d = new ImageIoDecoder(DecodeOptions.defaults()).decode(file);

    assertThat(d.orientation()).isEqualTo(tag);
    assertThat(d.width()).isEqualTo(tag >= 5 ? 48 : 96);
    checkBlock(d.analysis(), tag, false, false, RED);
    checkBlock(d.analysis(), tag, false, true, BLUE);
    checkBlock(d.analysis(), tag, true, false, GREEN);
  }

  @Test
  void brokenExifIsToleratedAsNormal() throws Exception {
    // An APP1 "Exif" segment whose TIFF header is garbage (neither "II" nor "MM"): metadata is unreadable, the
    // pixels are fine.
    byte[] junk = {'X', 'Y', 0, 42, 0, 0, 0, 8, 1, 2, 3, 4};
    byte[] jpeg = TestImages.insertAfterSoi(TestImages.jpeg(marked(), false), TestImages.app1(junk));
    Path file = TestImages.write(dir, "broken-exif.jpg", jpeg);

    DecodedImage d = new ImageIoDecoder(DecodeOptions.defaults()).decode(file);

    assertThat(d.orientation()).isEqualTo(1);
    checkBlock(d.analysis(), 1, false, false, RED);
  }

  @Test
  void outOfRangeOrientationIsTreatedAsNormal() throws Exception {
    // CIPA DC-008-2019 defines only 1..8; 9 is "reserved".
    byte[] jpeg = TestImages.insertAfterSoi(
        TestImages.jpeg(marked(), false), TestImages.exifOrientationApp1(9, true));
    Path file = TestImages.write(dir, "reserved-orientation.jpg", jpeg);

    DecodedImage d = new ImageIoDecoder(DecodeOptions.defaults()).decode(file);

    assertThat(d.orientation()).isEqualTo(1);
    assertThat(d.width()).isEqualTo(96);
  }
}
