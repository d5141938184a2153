package org.morphscout.app.gui;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Polygon;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.awt.geom.RoundRectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import javax.imageio.ImageIO;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibrarySettings;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.values.ImageRow;

/**
 * Builds a small real catalog of invented pictures (plain shapes on a plain background) for tests and screenshots:
 * image files, thumbnails, stored features (mask, shape vector, an invented appearance vector) and one failure.
 * The features are not the indexer's: they are a stand-in so the browser has consistent data to show.
 */
public final class SampleCatalog {
  public static final String MODEL = "sample-model";

  /** One invented picture: a shape of some kind, size, colour and place. */
  record Picture(String folder, String name, String kind, double scale, Color colour, double dx, double rotate,
      boolean twin) {}

  private SampleCatalog() {}

  /**
   * Writes the pictures (and one damaged file) under {@code photos}, without a catalog, for tests that index them
   * with the real indexer.
   */
  public static void writePictures(Path photos, long seed) throws IOException {
    for (Picture p : pictures(seed)) {
      Path file = photos.resolve(p.folder()).resolve(p.name());
      Files.createDirectories(file.getParent());
      ImageIO.write(draw(p, 320, 240, true), "png", file.toFile());
    }
    Files.createDirectories(photos.resolve("street"));
    Files.write(photos.resolve("street").resolve("broken.jpg"), new byte[] {(byte) 0xFF, (byte) 0xD8, 1, 2, 3});
  }

  static List<Picture> pictures(long seed) {
    Random rnd = new Random(seed);
    List<Picture> pictures = new ArrayList<>();
    String[] kinds = {"round", "oval", "square", "tile", "star", "kite"};
    Color[] colours = {new Color(0xC0504D), new Color(0x4F81BD), new Color(0x9BBB59), new Color(0xE4A33A),
        new Color(0x8064A2), new Color(0x4BACC6)};
    int n = 0;
    for (String kind : kinds) {
      for (int i = 0; i < 4; i++) {
        String folder = n % 3 == 0 ? "garden" : n % 3 == 1 ? "studio" : "street";
        pictures.add(new Picture(folder, String.format("%s-%02d.png", kind, i + 1), kind, 0.45 + 0.12 * i,
            colours[(n + i) % colours.length], (rnd.nextDouble() - 0.5) * 0.2, (rnd.nextDouble() - 0.5) * 0.6,
            false));
        n++;
      }
    }
    pictures.add(new Picture("street", "round-cut.png", "round", 1.25, colours[0], 0.35, 0, false));
    pictures.add(new Picture("studio", "pair-of-tiles.png", "tile", 0.4, colours[2], 0, 0, true));
    return pictures;
  }

  /** Creates the catalog under {@code dir/catalog} and pictures under {@code dir/photos}; returns the catalog dir. */
  public static Path create(Path dir, long seed) throws IOException {
    Path catalogDir = dir.resolve("catalog");
    Path photos = dir.resolve("photos");
    List<Picture> pictures = pictures(seed);
    try (Library lib = Library.open(catalogDir)) {
      lib.features().registerModel(MODEL, 8, "invented test vectors");
      lib.features().putSetting(LibrarySettings.ACTIVE_MODEL, MODEL);
      long rootId = lib.images().ensureRoot(photos);
      for (Picture p : pictures) {
        Path file = photos.resolve(p.folder()).resolve(p.name());
        Files.createDirectories(file.getParent());
        BufferedImage img = draw(p, 320, 240, true);
        ImageIO.write(img, "png", file.toFile());
        long id = lib.images().insertPending(rootId, file.toString(), Files.size(file),
            Files.getLastModifiedTime(file).toMillis(), "hash-" + p.name());
        lib.images().markReady(id, 320, 240, 1, "png");
        Path thumb = lib.catalog().thumbnailBase(id);
        Files.createDirectories(thumb.getParent());
        ImageIO.write(img, "png", thumb.resolveSibling(thumb.getFileName() + ".png").toFile());
        lib.features().put(id, analysis(id, file, p));
      }
      Path broken = photos.resolve("street").resolve("broken.jpg");
      Files.write(broken, new byte[] {(byte) 0xFF, (byte) 0xD8, 1, 2, 3});
      long bad = lib.images().insertPending(rootId, broken.toString(), 5, 0, "hash-broken");
      lib.images().markFailed(bad, "not a readable JPEG: the file ends after 5 bytes", "TRUNCATED", 0);
    }
    return catalogDir;
  }

  static BufferedImage draw(Picture p, int w, int h, boolean background) {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = img.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING,
        background ? RenderingHints.VALUE_ANTIALIAS_ON : RenderingHints.VALUE_ANTIALIAS_OFF);
    g.setColor(background ? new Color(0xF2EFE8) : Color.BLACK);
    g.fillRect(0, 0, w, h);
    g.setColor(background ? p.colour() : Color.WHITE);
    double cx = w * (0.5 + p.dx());
    double cy = h * 0.5;
    double r = Math.min(w, h) * 0.4 * p.scale();
    if (p.twin()) {
      g.fill(shape(p.kind(), cx - r * 1.3, cy, r, p.rotate()));
      g.fill(shape(p.kind(), cx + r * 1.3, cy, r, p.rotate()));
    } else {
      g.fill(shape(p.kind(), cx, cy, r, p.rotate()));
    }
    g.dispose();
    return img;
  }

  static Shape shape(String kind, double cx, double cy, double r, double rotate) {
    Shape s = switch (kind) {
      case "round" -> new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r);
      case "oval" -> new Ellipse2D.Double(cx - r, cy - r * 0.6, 2 * r, 1.2 * r);
      case "square" -> new Rectangle2D.Double(cx - r * 0.85, cy - r * 0.85, 1.7 * r, 1.7 * r);
      case "tile" -> new RoundRectangle2D.Double(cx - r, cy - r * 0.7, 2 * r, 1.4 * r, r * 0.6, r * 0.6);
      case "star" -> star(cx, cy, r);
      default -> new Polygon(new int[] {(int) cx, (int) (cx + r * 0.7), (int) cx, (int) (cx - r * 0.7)},
          new int[] {(int) (cy - r), (int) cy, (int) (cy + r), (int) cy}, 4);
    };
    return AffineTransform.getRotateInstance(rotate, cx, cy).createTransformedShape(s);
  }

  private static Shape star(double cx, double cy, double r) {
    Polygon p = new Polygon();
    for (int i = 0; i < 10; i++) {
      double a = Math.PI / 5 * i - Math.PI / 2;
      double rr = i % 2 == 0 ? r : r * 0.45;
      p.addPoint((int) Math.round(cx + rr * Math.cos(a)), (int) Math.round(cy + rr * Math.sin(a)));
    }
    return p;
  }

  static ImageAnalysis analysis(long id, Path file, Picture p) {
    BufferedImage m = draw(p, 128, 96, false);
    byte[] bits = new byte[128 * 96];
    boolean touches = false;
    for (int y = 0; y < 96; y++) {
      for (int x = 0; x < 128; x++) {
        if ((m.getRGB(x, y) & 0xFF) > 127) {
          bits[y * 128 + x] = 1;
          touches |= x == 0 || y == 0 || x == 127 || y == 95;
        }
      }
    }
    Mask mask = new Mask(128, 96, bits);
    Mask grid = normalise(mask, 16);
    float[] shape = new float[256];
    double norm = 0;
    for (int i = 0; i < 256; i++) {
      shape[i] = grid.get(i) ? 1 : 0;
      norm += shape[i];
    }
    for (int i = 0; i < 256; i++) {
      shape[i] /= (float) Math.max(1e-9, Math.sqrt(norm));
    }
    float[] rgb = p.colour().getRGBColorComponents(null);
    // invented appearance vector: object colour and size, not a learned embedding
    float[] appearance = {rgb[0], rgb[1], rgb[2], (float) p.scale() * 0.5f, 0.3f, 0.2f, 0.1f, 0.1f};
    double[] lab = {100 * (0.3 * rgb[0] + 0.59 * rgb[1] + 0.11 * rgb[2]), 80 * (rgb[0] - rgb[1]),
        80 * (rgb[1] - rgb[2])};
    ColourStats colour = new ColourStats(lab, new double[] {6, 4, 4}, new double[] {94, 0, 3},
        new double[] {1, 1, 1}, List.of(new ColourStats.DominantColour(lab, 0.9),
            new ColourStats.DominantColour(new double[] {lab[0] * 0.7, lab[1], lab[2]}, 0.1)));
    double coverage = mask.coverage();
    Silhouette s = new Silhouette(mask, p.twin() ? 2 : 1, touches, coverage, p.name().startsWith("star-01")
        ? 0.35 : 0.9, "border-model");
    ShapeDescriptor d = new ShapeDescriptor(shape, new double[7], 0.2, 0.2, 0.6, 0.6, 1.33, coverage, 0.5 + p.dx(),
        0.5, p.rotate());
    // No pixel fingerprint (unknown): near-duplicates among the samples are decided by the other evidence.
    return new ImageAnalysis(id, file.toString(), 320, 240, "png", appearance, MODEL, s, d, colour,
        "hash-" + p.name(), null);
  }

  /** The row of a sample picture by file name. */
  public static ImageRow row(Library lib, String name) {
    return lib.images().all().stream().filter(r -> r.path().endsWith("/" + name)).findFirst().orElseThrow();
  }

  /**
   * The sample shape vector's grid: the mask moved so its centroid sits at the grid centre and scaled so its area is
   * 18% of the grid (translation + isotropic scale, as moment-based shape comparison normalises; Hu 1962).
   */
  private static Mask normalise(Mask m, int size) {
    int area = m.area();
    if (area == 0) {
      return Mask.empty(size, size);
    }
    double cx = 0;
    double cy = 0;
    for (int y = 0; y < m.height(); y++) {
      for (int x = 0; x < m.width(); x++) {
        if (m.get(x, y)) {
          cx += x + 0.5;
          cy += y + 0.5;
        }
      }
    }
    cx /= area;
    cy /= area;
    double scale = Math.sqrt(0.18 * size * size / area);
    byte[] out = new byte[size * size];
    double half = size / 2.0;
    for (int gy = 0; gy < size; gy++) {
      int sy = (int) Math.floor((gy + 0.5 - half) / scale + cy);
      for (int gx = 0; gx < size; gx++) {
        int sx = (int) Math.floor((gx + 0.5 - half) / scale + cx);
        if (sy >= 0 && sy < m.height() && sx >= 0 && sx < m.width() && m.get(sx, sy)) {
          out[gy * size + gx] = 1;
        }
      }
    }
    return new Mask(size, size, out);
  }
}
