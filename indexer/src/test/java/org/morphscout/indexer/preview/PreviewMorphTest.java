package org.morphscout.indexer.preview;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageInputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.warp.TestMasks;
import org.morphscout.indexer.warp.WarpEstimator;
import org.morphscout.indexer.warp.WarpResult;

class PreviewMorphTest {
  @TempDir Path dir;

  /** A striped egg on white, 320x240, moved by (dx, dy) pixels; the mask is at half resolution. */
  private static BufferedImage picture(int dx, int dy) {
    BufferedImage img = new BufferedImage(320, 240, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = img.createGraphics();
    g.setColor(Color.WHITE);
    g.fillRect(0, 0, 320, 240);
    g.translate(dx, dy); // move the whole painting, texture included
    g.setClip(new Ellipse2D.Double(100, 40, 100, 150));
    for (int y = 0; y < 240; y += 12) {
      g.setColor(y % 24 == 0 ? new Color(200, 40, 30) : new Color(30, 60, 180));
      g.fillRect(0, y, 320, 12);
    }
    g.dispose();
    return img;
  }

  private static Silhouette silhouette(int dx, int dy) {
    Mask m = TestMasks.draw(160, 120, new Ellipse2D.Double((100 + dx) / 2.0, (40 + dy) / 2.0, 50, 75));
    return new Silhouette(m, 1, false, m.coverage(), 1, "test");
  }

  private final PreviewMorph morph = new PreviewMorph(320);

  private List<BufferedImage> movedEggFrames(int count) {
    Silhouette sa = silhouette(0, 0);
    Silhouette sb = silhouette(30, 10);
    WarpResult warp = new WarpEstimator().estimate(sa.mask(), sb.mask());
    return morph.frames(picture(0, 0), sa, picture(30, 10), sb, warp, count);
  }

  @Test
  void firstFrameIsAAndLastIsBBroughtOntoA() {
    BufferedImage a = picture(0, 0);
    List<BufferedImage> frames = movedEggFrames(5);
    assertThat(frames).hasSize(5).allSatisfy(f -> {
      assertThat(f.getWidth()).isEqualTo(320);
      assertThat(f.getHeight()).isEqualTo(240);
    });
    // t = 0 samples A at its own pixel centres: identical up to rounding.
    assertThat(maxDiff(frames.get(0), a, 0)).isLessThanOrEqualTo(1);
    // B is A's picture moved by (30, 10); brought back by the similarity it must match A, except near stripe edges
    // (sub-pixel error of the alignment) and the image border (clamped samples).
    assertThat(meanDiff(frames.get(4), a, 40)).isLessThan(12.0);
    assertThat(meanDiff(picture(30, 10), a, 40)).as("control: unaligned B differs").isGreaterThan(40.0);
  }

  @Test
  void inBetweenFramesHaveInBetweenShapes() {
    // A narrow egg (60 px wide) into a wide one (120 px): the similarity scales B by sqrt(area A / area B) =
    // sqrt(1/2), so the last frame's egg is about 85 px wide (geometry); the warp bends A's outline towards it, so
    // the middle frame's object width must lie strictly between the first and the last frame's.
    BufferedImage narrow = solidEgg(30, 75);
    BufferedImage wide = solidEgg(60, 75);
    Silhouette sn = eggSilhouette(30, 75);
    Silhouette sw = eggSilhouette(60, 75);
    WarpResult warp = new WarpEstimator().estimate(sn.mask(), sw.mask());
    List<BufferedImage> frames = morph.frames(narrow, sn, wide, sw, warp, 5);
    int w0 = redWidth(frames.get(0), 120);
    int w2 = redWidth(frames.get(2), 120);
    int w4 = redWidth(frames.get(4), 120);
    assertThat(w0).isBetween(58, 62);
    assertThat(w4).isGreaterThan(w0 + 10);
    assertThat(w2).isGreaterThan(w0).isLessThan(w4);
  }

  private static BufferedImage solidEgg(double rx, double ry) {
    BufferedImage img = new BufferedImage(320, 240, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = img.createGraphics();
    g.setColor(Color.WHITE);
    g.fillRect(0, 0, 320, 240);
    g.setColor(Color.RED);
    g.fill(new Ellipse2D.Double(160 - rx, 120 - ry, 2 * rx, 2 * ry));
    g.dispose();
    return img;
  }

  private static Silhouette eggSilhouette(double rx, double ry) {
    Mask m = TestMasks.draw(160, 120, new Ellipse2D.Double(80 - rx / 2, 60 - ry / 2, rx, ry));
    return new Silhouette(m, 1, false, m.coverage(), 1, "test");
  }

  /** Number of reddish pixels (green channel below 128) on a row. */
  private static int redWidth(BufferedImage img, int row) {
    int n = 0;
    for (int x = 0; x < img.getWidth(); x++) {
      if (((img.getRGB(x, row) >> 8) & 0xff) < 128) {
        n++;
      }
    }
    return n;
  }

  @Test
  void chainFramesShareOneSize() {
    Silhouette s0 = silhouette(0, 0);
    Silhouette s1 = silhouette(30, 10);
    BufferedImage tall = new BufferedImage(240, 320, BufferedImage.TYPE_INT_ARGB);
    Mask tallMask = TestMasks.draw(120, 160, new Ellipse2D.Double(30, 40, 50, 75));
    Silhouette s2 = new Silhouette(tallMask, 1, false, tallMask.coverage(), 1, "test");
    WarpEstimator est = new WarpEstimator();
    List<BufferedImage> frames = morph.chain(
        List.of(new PreviewMorph.Stop(picture(0, 0), s0), new PreviewMorph.Stop(picture(30, 10), s1),
            new PreviewMorph.Stop(tall, s2)),
        List.of(est.estimate(s0.mask(), s1.mask()), est.estimate(s1.mask(), s2.mask())), 4);
    assertThat(frames).hasSize(7).allSatisfy(f -> {
      assertThat(f.getWidth()).isEqualTo(320);
      assertThat(f.getHeight()).isEqualTo(240);
    });
  }

  @Test
  void gifIsReadableBackWithAllFramesDelaysAndLoop() throws IOException {
    List<BufferedImage> frames = movedEggFrames(4);
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    AnimatedGifWriter.write(frames, List.of(80, 80, 80, 500), 0, Color.WHITE, bytes);
    ImageReader reader = ImageIO.getImageReadersByFormatName("gif").next();
    try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
      reader.setInput(in);
      assertThat(reader.getNumImages(true)).isEqualTo(4);
      IIOMetadataNode first = (IIOMetadataNode) reader.getImageMetadata(0).getAsTree("javax_imageio_gif_image_1.0");
      // GIF89a: delay in hundredths of a second -> 80 ms is 8.
      assertThat(attribute(first, "GraphicControlExtension", "delayTime")).isEqualTo("8");
      IIOMetadataNode app = (IIOMetadataNode) first.getElementsByTagName("ApplicationExtension").item(0);
      assertThat(app.getAttribute("applicationID")).isEqualTo("NETSCAPE");
      assertThat(app.getAttribute("authenticationCode")).isEqualTo("2.0");
      // NETSCAPE2.0 sub-block: 1, loop count little-endian (0 = forever).
      assertThat((byte[]) app.getUserObject()).containsExactly(1, 0, 0);
      IIOMetadataNode last = (IIOMetadataNode) reader.getImageMetadata(3).getAsTree("javax_imageio_gif_image_1.0");
      assertThat(attribute(last, "GraphicControlExtension", "delayTime")).isEqualTo("50");
      BufferedImage back = reader.read(0);
      assertThat(back.getWidth()).isEqualTo(320);
      assertThat(meanDiff(back, frames.get(0), 0)).as("palette reduction only").isLessThan(10.0);
    } finally {
      reader.dispose();
    }
    Path file = dir.resolve("morph.gif");
    AnimatedGifWriter.write(frames, 100, file);
    assertThat(Files.size(file)).isGreaterThan(0);
  }

  @Test
  void stripPlacesFramesSideBySide() throws IOException {
    List<BufferedImage> frames = movedEggFrames(3);
    BufferedImage strip = FrameStrip.compose(frames, 6, Color.WHITE);
    assertThat(strip.getWidth()).isEqualTo(3 * 320 + 2 * 6);
    assertThat(strip.getHeight()).isEqualTo(240);
    assertThat(strip.getRGB(2 * 326 + 150, 100)).isEqualTo(frames.get(2).getRGB(150, 100));
    Path png = dir.resolve("strip.png");
    FrameStrip.write(frames, png);
    assertThat(ImageIO.read(png.toFile()).getWidth()).isEqualTo(3 * 320 + 2 * 4);

    // with a legend: a band above the frames holding dark text, the frames below it unchanged
    Path withLegend = dir.resolve("strip-with-legend.png");
    FrameStrip.write(frames, "3 preview frames, left to right", withLegend);
    BufferedImage read = ImageIO.read(withLegend.toFile());
    assertThat(read.getHeight()).isEqualTo(240 + FrameStrip.LEGEND_BAND);
    assertThat(read.getRGB(2 * 324 + 150, FrameStrip.LEGEND_BAND + 100)).isEqualTo(frames.get(2).getRGB(150, 100));
    int dark = 0;
    for (int y = 0; y < FrameStrip.LEGEND_BAND; y++) {
      for (int x = 0; x < 200; x++) {
        dark += (read.getRGB(x, y) & 0xFF) < 128 ? 1 : 0;
      }
    }
    assertThat(dark).as("dark pixels of the legend's text").isGreaterThan(50);
  }

  @Test
  void rejectsTooFewFrames() {
    Silhouette s = silhouette(0, 0);
    WarpResult w = new WarpEstimator().estimate(s.mask(), s.mask());
    assertThatThrownBy(() -> morph.frames(picture(0, 0), s, picture(0, 0), s, w, 1))
        .hasMessageContaining("at least 2 frames");
  }

  private static String attribute(IIOMetadataNode root, String node, String attr) {
    return ((IIOMetadataNode) root.getElementsByTagName(node).item(0)).getAttribute(attr);
  }

  private static int maxDiff(BufferedImage p, BufferedImage q, int border) {
    int max = 0;
    for (int y = border; y < p.getHeight() - border; y++) {
      for (int x = border; x < p.getWidth() - border; x++) {
        int a = p.getRGB(x, y);
        int b = q.getRGB(x, y);
        for (int s = 0; s < 24; s += 8) {
          max = Math.max(max, Math.abs(((a >> s) & 0xff) - ((b >> s) & 0xff)));
        }
      }
    }
    return max;
  }

  private static double meanDiff(BufferedImage p, BufferedImage q, int border) {
    double sum = 0;
    long n = 0;
    for (int y = border; y < p.getHeight() - border; y++) {
      for (int x = border; x < p.getWidth() - border; x++) {
        int a = p.getRGB(x, y);
        int b = q.getRGB(x, y);
        for (int s = 0; s < 24; s += 8) {
          sum += Math.abs(((a >> s) & 0xff) - ((b >> s) & 0xff));
          n++;
        }
      }
    }
    return sum / n;
  }
}
