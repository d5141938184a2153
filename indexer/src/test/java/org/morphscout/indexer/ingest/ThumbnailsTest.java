package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ThumbnailsTest {
  @TempDir Path dir;

  private final Thumbnails thumbnails = new Thumbnails(DecodeOptions.defaults());

  @Test
  void opaquePictureBecomesJpegOfTheRightSize() throws Exception {
    BufferedImage analysis = TestImages.filled(768, 512, 0xFF2060A0);
    Path written = thumbnails.write(analysis, dir.resolve("thumbs"), "img-1");
    assertThat(written.getFileName().toString()).isEqualTo("img-1.jpg");
    byte[] bytes = Files.readAllBytes(written);
    assertThat(bytes[0] & 0xFF).isEqualTo(0xFF); // ITU-T T.81 SOI
    assertThat(bytes[1] & 0xFF).isEqualTo(0xD8);
    BufferedImage back = ImageIO.read(written.toFile());
    assertThat(back.getWidth()).isEqualTo(256);
    assertThat(back.getHeight()).isEqualTo(171); // 512 * 256 / 768 = 170.67
    assertThat(TestImages.maxChannelDiff(back.getRGB(100, 80), 0xFF2060A0)).isLessThanOrEqualTo(4);
  }

  @Test
  void transparentPictureBecomesPngWithAlpha() throws Exception {
    BufferedImage analysis = TestImages.filled(300, 600, 0x00000000);
    TestImages.fillRect(analysis, 100, 200, 100, 200, 0xFFFF0000);
    Path written = thumbnails.write(analysis, dir, "cut-out");
    assertThat(written.getFileName().toString()).isEqualTo("cut-out.png");
    BufferedImage back = ImageIO.read(written.toFile());
    assertThat(back.getWidth()).isEqualTo(128);
    assertThat(back.getHeight()).isEqualTo(256);
    assertThat(back.getRGB(64, 128)).isEqualTo(0xFFFF0000);
    assertThat(TestImages.alpha(back.getRGB(5, 5))).isZero();
  }

  @Test
  void replacesAtomicallyAndLeavesNoTemporaryFiles() throws Exception {
    Path first = thumbnails.write(TestImages.filled(50, 50, 0xFF000000), dir, "same");
    Path second = thumbnails.write(TestImages.filled(50, 50, 0xFFFFFFFF), dir, "same");
    assertThat(second).isEqualTo(first);
    assertThat(TestImages.red(ImageIO.read(second.toFile()).getRGB(25, 25))).isGreaterThan(250);
    try (Stream<Path> files = Files.list(dir)) {
      assertThat(files.map(p -> p.getFileName().toString())).containsExactly("same.jpg");
    }
  }

  @Test
  void explicitTargetPicksTheFormatFromItsExtension() throws Exception {
    BufferedImage half = TestImages.filled(64, 64, 0x80000000); // 50 % black
    Path jpg = dir.resolve("sub/x.jpeg");
    thumbnails.writeTo(half, jpg);
    // Porter-Duff "over" white: 0 * 128/255 + 255 * 127/255 = 127.
    int p = ImageIO.read(jpg.toFile()).getRGB(32, 32);
    assertThat(TestImages.red(p)).isBetween(124, 130);
    Path png = dir.resolve("x.png");
    thumbnails.writeTo(half, png);
    assertThat(TestImages.alpha(ImageIO.read(png.toFile()).getRGB(32, 32))).isEqualTo(128);
    org.assertj.core.api.Assertions.assertThatThrownBy(() -> thumbnails.writeTo(half, dir.resolve("x.gif")))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void smallPicturesAreNotEnlarged() throws Exception {
    Path written = thumbnails.write(TestImages.filled(40, 20, 0xFF00FF00), dir, "tiny");
    BufferedImage back = ImageIO.read(written.toFile());
    assertThat(back.getWidth()).isEqualTo(40);
    assertThat(back.getHeight()).isEqualTo(20);
  }
}
