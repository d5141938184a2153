package org.morphscout.indexer.preview;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ContactSheetTest {
  // thumb 64, 4 per line, gap 40, margin 10, font 12 -> line height ceil(19.2) = 20
  private static final ContactSheetStyle STYLE = new ContactSheetStyle(64, 4, 40, 10, 12);

  private static BufferedImage solid(int w, int h, Color c) {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = img.createGraphics();
    g.setColor(c);
    g.fillRect(0, 0, w, h);
    g.dispose();
    return img;
  }

  private static Color colour(int i) {
    return Color.getHSBColor(i / 10f, 0.9f, 0.8f);
  }

  private static ContactSheetRow row(String caption, int n, int width, int height) {
    List<ContactSheetRow.Tile> tiles = new ArrayList<>();
    List<Double> scores = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      tiles.add(new ContactSheetRow.Tile(solid(width, height, colour(i)), "image-" + i + ".jpg"));
      if (i > 0) {
        scores.add(0.1 * i);
      }
    }
    return new ContactSheetRow(caption, tiles, scores);
  }

  @Test
  void sizeFollowsTheDocumentedLayoutAndTilesAreDrawn() {
    List<ContactSheetRow> rows = List.of(
        row("chain 1 · max step 0.31 · unevenness 0.12", 3, 128, 32), // wide thumbnails, one line
        row("chain 2 · max step 0.40 · unevenness 0.20", 10, 50, 50)); // wraps onto 3 lines
    BufferedImage sheet = new ContactSheet(STYLE).render("Chains from a.jpg to b.jpg", rows);

    // Width: 2*10 + 4*64 + 3*40 + 40 (a row wraps) = 436.
    // Height: 2*10 + 20 (title) + [10 + 20 + 1*(64 + 20)] + [10 + 20 + 3*(64 + 20)] = 436.
    assertThat(sheet.getWidth()).isEqualTo(436);
    assertThat(sheet.getHeight()).isEqualTo(436);
    assertThat(new ContactSheet(STYLE).size(rows)).isEqualTo(new java.awt.Dimension(436, 436));

    int rowATop = 10 + 20 + 10 + 20;
    for (int i = 0; i < 3; i++) {
      int x = 10 + i * (64 + 40);
      assertThat(new Color(sheet.getRGB(x + 32, rowATop + 32))).as("tile %d of row 1", i).isEqualTo(colour(i));
      // 128x32 fitted into 64x64 becomes 64x16, centred: the box's top area stays white.
      assertThat(sheet.getRGB(x + 32, rowATop + 8) & 0xFFFFFF).isEqualTo(0xFFFFFF);
    }
    int rowBTop = rowATop + 64 + 20 + 10 + 20;
    for (int i = 0; i < 10; i++) {
      int x = 10 + (i % 4) * (64 + 40);
      int y = rowBTop + (i / 4) * (64 + 20);
      assertThat(new Color(sheet.getRGB(x + 32, y + 32))).as("tile %d of row 2", i).isEqualTo(colour(i));
    }
    // Text and step labels: dark pixels in the title line and in the gap between the first two tiles.
    assertThat(darkPixels(sheet, 10, 10, 400, 20)).isPositive();
    assertThat(darkPixels(sheet, 10 + 64, rowATop, 40, 32)).isPositive();
    // The right margin of a one-line row's last tile has no step label.
    assertThat(darkPixels(sheet, 10 + 2 * 104 + 64 + 2, rowATop, 30, 64)).isZero();
  }

  @Test
  void writesAReadablePng(@TempDir Path dir) throws IOException {
    Path out = dir.resolve("sheets/sheet.png");
    new ContactSheet().writePng("walk", List.of(row("walk · 7 images", 7, 40, 60)), out);
    BufferedImage back = ImageIO.read(out.toFile());
    assertThat(back.getWidth()).isEqualTo(2 * 16 + 6 * 160 + 6 * 56);
    assertThat(back.getHeight()).isEqualTo(2 * 16 + 21 + 16 + 21 + 2 * (160 + 21));
  }

  @Test
  void stepLabelsKeepThreeSignificantDigitsSoSmallStepsDiffer() {
    // a smooth walk's step costs: two decimals would print 0.02 for all three
    assertThat(List.of(0.02134, 0.01987, 0.0242).stream().map(ContactSheet::stepLabel))
        .containsExactly("0.0213", "0.0199", "0.0242");
    assertThat(ContactSheet.stepLabel(40.54)).isEqualTo("40.5");
    assertThat(ContactSheet.stepLabel(0.5)).isEqualTo("0.500");
    assertThat(ContactSheet.stepLabel(67)).isEqualTo("67.0");
    assertThat(ContactSheet.stepLabel(0)).isEqualTo("0");
    assertThat(ContactSheet.stepLabel(Double.NaN)).isEqualTo("–");
  }

  @Test
  void aLegendAddsOneLineUnderTheTitle() {
    List<ContactSheetRow> rows = List.of(row("walk", 3, 40, 40));
    java.awt.Dimension plain = new ContactSheet(STYLE).size(rows);
    BufferedImage sheet = new ContactSheet(STYLE).render("walk", "Number on each arrow: the step cost", rows);
    assertThat(sheet.getHeight()).isEqualTo(plain.height + 20);
    // the legend's line (below the 20 px title line) holds text
    assertThat(darkPixels(sheet, 10, 30, 250, 20)).isPositive(); // sheet width 2*10 + 3*64 + 2*40 = 292
  }

  @Test
  void rejectsMismatchedScores() {
    BufferedImage img = solid(8, 8, Color.RED);
    assertThatThrownBy(() -> new ContactSheetRow("x",
        List.of(new ContactSheetRow.Tile(img, "a"), new ContactSheetRow.Tile(img, "b")), List.of()))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new ContactSheetStyle(8, 1, 40, 0, 12)).isInstanceOf(IllegalArgumentException.class);
  }

  private static int darkPixels(BufferedImage img, int x0, int y0, int w, int h) {
    int count = 0;
    for (int y = y0; y < y0 + h; y++) {
      for (int x = x0; x < x0 + w; x++) {
        Color c = new Color(img.getRGB(x, y));
        if (c.getRed() + c.getGreen() + c.getBlue() < 3 * 160) {
          count++;
        }
      }
    }
    return count;
  }
}
