package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Image;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.testing.OutsideData;

/**
 * The classical extractor's object count on pictures as small as the demo's tiny problem picture (96 px long side),
 * against the same pictures at full size: a tiny picture is no reason by itself to count several objects. (The demo's
 * tiny ivory jar on a cream backdrop is counted as two because the classical silhouette finds only its shadowed side
 * and its shadow, at any size; the auto silhouettes of {@code index} and the browser replace it with the learned
 * model's whole jar.)
 *
 * <p>Sources: Debian package {@code opencv-doc} (OpenCV's sample data: {@code orange.jpg}, a photograph of one
 * orange, and {@code detect_blob.png}, a drawing of many separate shapes, used by OpenCV's blob detector sample) and
 * {@code python3-skimage} (scikit-image's {@code horse.png}, one horse's silhouette). Each is read where the package
 * installs it and shrunk here by area averaging; nothing of them is committed.
 */
class ObjectCountOnSmallPicturesTest {
  private static final int SMALL = 96;

  private static BufferedImage read(Path file) throws IOException {
    BufferedImage img = ImageIO.read(file.toFile());
    assertThat(img).as("%s decodes", file).isNotNull();
    return img;
  }

  /** {@code img} shrunk by area averaging to a long side of {@link #SMALL} pixels, as ImageMagick's -resize does. */
  private static BufferedImage small(BufferedImage img) {
    double f = SMALL / (double) Math.max(img.getWidth(), img.getHeight());
    int w = (int) Math.round(img.getWidth() * f);
    int h = (int) Math.round(img.getHeight() * f);
    BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
    out.createGraphics().drawImage(img.getScaledInstance(w, h, Image.SCALE_AREA_AVERAGING), 0, 0, null);
    return out;
  }

  @Test
  void oneObjectStaysOneWhenThePictureIsTiny() throws IOException {
    BorderModelSilhouettes classical = new BorderModelSilhouettes();
    for (Path file : new Path[] {
        OutsideData.require(OutsideData.OPENCV_SAMPLES.resolve("orange.jpg"), "opencv-doc"),
        OutsideData.require(OutsideData.SKIMAGE_DATA.resolve("horse.png"), "python3-skimage")}) {
      BufferedImage full = read(file);
      Silhouette large = classical.extract(full);
      Silhouette tiny = classical.extract(small(full));
      assertThat(large.components()).as("%s at %dx%d", file, full.getWidth(), full.getHeight()).isEqualTo(1);
      assertThat(tiny.components()).as("%s at %d px", file, SMALL).isEqualTo(1);
      // the same object, not a fragment of it: its share of the frame agrees within 5 points
      assertThat(tiny.coverage()).as("%s coverage at %d px against full size", file, SMALL)
          .isCloseTo(large.coverage(), org.assertj.core.data.Offset.offset(0.05));
    }
  }

  @Test
  void severalObjectsStaySeveralWhenThePictureIsTiny() throws IOException {
    Path file = OutsideData.require(OutsideData.OPENCV_SAMPLES.resolve("detect_blob.png"), "opencv-doc");
    BufferedImage full = read(file);
    BorderModelSilhouettes classical = new BorderModelSilhouettes();
    // The drawing holds more than a dozen separate shapes; at 96 px the smallest fall under the count's share of the
    // largest (BorderModelOptions.minComponentFraction) or merge, but several remain.
    assertThat(classical.extract(full).components()).as("%s at full size", file).isGreaterThan(5);
    assertThat(classical.extract(small(full)).components()).as("%s at %d px", file, SMALL).isGreaterThan(5);
  }
}
