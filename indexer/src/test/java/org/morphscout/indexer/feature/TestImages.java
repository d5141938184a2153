package org.morphscout.indexer.feature;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.SplittableRandom;

/** Seeded synthetic analysis images for tests: gradients, shapes, noise and (optionally) transparent areas. */
final class TestImages {
  private TestImages() {}

  static BufferedImage random(long seed, int width, int height, boolean withAlpha) {
    SplittableRandom rnd = new SplittableRandom(seed);
    BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
    int c0 = rnd.nextInt() & 0xFFFFFF;
    int c1 = rnd.nextInt() & 0xFFFFFF;
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        double t = (x + y) / (double) (width + height);
        int rgb = 0;
        for (int s = 0; s <= 16; s += 8) {
          double v = ((c0 >> s) & 0xFF) * (1 - t) + ((c1 >> s) & 0xFF) * t + rnd.nextInt(-12, 13);
          rgb |= (int) Math.max(0, Math.min(255, v)) << s;
        }
        img.setRGB(x, y, 0xFF000000 | rgb);
      }
    }
    Graphics2D g = img.createGraphics();
    for (int i = 0; i < 6; i++) {
      g.setColor(new Color(rnd.nextInt() & 0xFFFFFF));
      g.setStroke(new BasicStroke(1 + rnd.nextInt(6)));
      int x = rnd.nextInt(width);
      int y = rnd.nextInt(height);
      if (rnd.nextBoolean()) {
        g.fillOval(x, y, 5 + rnd.nextInt(width / 2), 5 + rnd.nextInt(height / 2));
      } else {
        g.drawLine(x, y, rnd.nextInt(width), rnd.nextInt(height));
      }
    }
    g.dispose();
    if (withAlpha) {
      for (int y = 0; y < height / 3; y++) {
        for (int x = 0; x < width; x++) {
          img.setRGB(x, y, img.getRGB(x, y) & 0x00FFFFFF | (x % 7 == 0 ? 0x80 : 0) << 24);
        }
      }
    }
    return img;
  }
}
