package org.morphscout.demo;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferByte;
import java.awt.image.DataBufferInt;
import java.util.ArrayList;
import java.util.List;

/**
 * Draws a {@link Shot}: backdrop, floor shadows, then each vessel shaded as a turned, glazed object, and returns the
 * picture with its exact ground-truth masks.
 *
 * <p>Pipeline: the backdrop and shadows are painted in linear RGB; each vessel's outline is filled twice with
 * Java2D, once antialiased (coverage, for compositing) and once aliased (the mask: pixel centres inside the outline);
 * covered pixels are shaded per pixel, with 2x2 supersampling where a pixel straddles an inner boundary (rim,
 * opening, handle); finally exposure is applied, the result is encoded to sRGB and the same seeded sensor grain is
 * added to the picture and the plate (so outside the vessels they are identical).
 *
 * <p>Deterministic: all rendering hints are set explicitly, maths that the JIT might intrinsify differently uses
 * {@link StrictMath}, and there is no shared state. Thread-safe; one instance can serve several threads.
 */
public final class VesselRenderer {
  /** Sensor grain amplitude, in 8-bit sRGB steps (peak). */
  private static final double GRAIN = 1.6;
  private static final int GRAIN_TILE = 256;

  public VesselRenderer() {}

  public Rendering render(Shot shot) {
    int w = shot.width();
    int h = shot.height();
    int n = w * h;
    float[] plate = new float[3 * n];
    BackdropPainter.paint(shot, plate);
    List<VesselGeometry> geos = new ArrayList<>();
    for (Placement p : shot.vessels()) {
      geos.add(new VesselGeometry(p, shot.cameraTilt()));
    }
    for (VesselGeometry g : geos) {
      FloorShadows.apply(shot, g, plate);
    }
    float[] img = plate.clone();
    byte[] unionCoverage = new byte[n];
    byte[] unionMask = new byte[n];
    List<GroundTruthMask> masks = new ArrayList<>();
    for (int v = 0; v < geos.size(); v++) {
      VesselGeometry g = geos.get(v);
      Placement p = shot.vessels().get(v);
      byte[] cov = fill(g.outline(), w, h, true);
      byte[] mask = fill(g.outline(), w, h, false);
      VesselShader shader = new VesselShader(g, p.glaze(), shot.lighting(), shot.backdrop().colourA());
      composite(g, shader, cov, w, h, img);
      for (int i = 0; i < n; i++) {
        mask[i] = mask[i] != 0 ? (byte) 1 : 0;
        unionMask[i] |= mask[i];
        if ((cov[i] & 0xFF) > (unionCoverage[i] & 0xFF)) {
          unionCoverage[i] = cov[i];
        }
      }
      masks.add(new GroundTruthMask(w, h, mask));
    }
    long grainSeed = shot.backdrop().seed() ^ 0x6A09E667F3BCC908L;
    double exposure = shot.lighting().exposure();
    BufferedImage picture = encode(img, w, h, exposure, grainSeed);
    return new Rendering(picture, () -> encode(plate, w, h, exposure, grainSeed), new GroundTruthMask(w, h, unionMask),
        masks, unionCoverage);
  }

  private static void composite(VesselGeometry g, VesselShader shader, byte[] cov, int w, int h, float[] img) {
    Rectangle r = g.bounds().intersection(new Rectangle(0, 0, w, h));
    double[] col = new double[3];
    double[] acc = new double[3];
    int[] regions = new int[4];
    double[] offs = {0.25, 0.75};
    double[] rowR = new double[2];
    for (int y = r.y; y < r.y + r.height; y++) {
      rowR[0] = g.rowRadius(y + offs[0]);
      rowR[1] = g.rowRadius(y + offs[1]);
      for (int x = r.x; x < r.x + r.width; x++) {
        int i = y * w + x;
        int c = cov[i] & 0xFF;
        if (c == 0) {
          continue;
        }
        boolean same = true;
        for (int s = 0; s < 4; s++) {
          regions[s] = g.region(x + offs[s & 1], y + offs[s >> 1], rowR[s >> 1]);
          same &= regions[s] == regions[0];
        }
        if (same && regions[0] != VesselGeometry.OUTSIDE) {
          shader.shade(x + 0.5, y + 0.5, regions[0], col);
        } else {
          acc[0] = 0;
          acc[1] = 0;
          acc[2] = 0;
          int used = 0;
          for (int s = 0; s < 4; s++) {
            if (regions[s] == VesselGeometry.OUTSIDE) {
              continue;
            }
            shader.shade(x + offs[s & 1], y + offs[s >> 1], regions[s], col);
            acc[0] += col[0];
            acc[1] += col[1];
            acc[2] += col[2];
            used++;
          }
          if (used == 0) {
            // Edge pixel whose samples all miss: shade as the nearest part (handle strap or body side).
            int region = g.nearestHandle(x + 0.5, y + 0.5, null) <= 1.6 ? VesselGeometry.HANDLE
                : VesselGeometry.BODY;
            shader.shade(x + 0.5, y + 0.5, region, col);
          } else {
            col[0] = acc[0] / used;
            col[1] = acc[1] / used;
            col[2] = acc[2] / used;
          }
        }
        float a = c / 255f;
        int k = 3 * i;
        img[k] = (float) (img[k] * (1 - a) + col[0] * a);
        img[k + 1] = (float) (img[k + 1] * (1 - a) + col[1] * a);
        img[k + 2] = (float) (img[k + 2] * (1 - a) + col[2] * a);
      }
    }
  }

  /** Fills the outline into a gray raster: antialiased gives coverage 0..255, aliased gives pixel-centre inclusion. */
  private static byte[] fill(Shape shape, int w, int h, boolean antialias) {
    BufferedImage gray = new BufferedImage(w, h, BufferedImage.TYPE_BYTE_GRAY);
    Graphics2D g = gray.createGraphics();
    try {
      g.setRenderingHint(RenderingHints.KEY_ANTIALIASING,
          antialias ? RenderingHints.VALUE_ANTIALIAS_ON : RenderingHints.VALUE_ANTIALIAS_OFF);
      g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
      g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
      g.setColor(Color.WHITE);
      g.fill(shape);
    } finally {
      g.dispose();
    }
    return ((DataBufferByte) gray.getRaster().getDataBuffer()).getData();
  }

  private static BufferedImage encode(float[] lin, int w, int h, double exposure, long grainSeed) {
    BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
    int[] px = ((DataBufferInt) out.getRaster().getDataBuffer()).getData();
    int[] grain = grainTile(grainSeed);
    // The tile repeats every 256 px; a seeded odd stride per row hides the repetition.
    int stride = 2 * (int) (grainSeed & 0x3F) + 77;
    for (int y = 0; y < h; y++) {
      int rowOffset = (y * stride) & (GRAIN_TILE - 1);
      int tileRow = (y & (GRAIN_TILE - 1)) * GRAIN_TILE;
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        int gr = grain[tileRow + ((x + rowOffset) & (GRAIN_TILE - 1))];
        int r = Colours.toSrgb(lin[3 * i] * exposure) + gr;
        int g = Colours.toSrgb(lin[3 * i + 1] * exposure) + gr;
        int b = Colours.toSrgb(lin[3 * i + 2] * exposure) + gr;
        px[i] = Colours.pack8(r, g, b);
      }
    }
    return out;
  }

  /** Triangular-distributed luma grain in whole 8-bit steps, GRAIN_TILE x GRAIN_TILE, from the seed. */
  private static int[] grainTile(long seed) {
    int[] tile = new int[GRAIN_TILE * GRAIN_TILE];
    for (int i = 0; i < tile.length; i++) {
      long bits = Noise.mix(seed ^ Noise.mix(i + 0x9E3779B97F4A7C15L));
      double u = ((bits >>> 40) + ((bits >>> 16) & 0xFFFFFF)) * 0x1.0p-24 - 1;
      tile[i] = (int) Math.round(GRAIN * u);
    }
    return tile;
  }
}
