package org.morphscout.app.gui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.FeatureStore;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.ingest.DecodeOptions;
import org.morphscout.indexer.ingest.Thumbnails;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.values.ImageStatus;

/**
 * Writes a large catalog (tens of thousands of images) through the indexer's own stores, as the browser's scale
 * benchmark needs it: three roots with dated event folders, camera-style file names, a mix of statuses (mostly
 * ready, some pending, failed and missing), feature rows for the analysed images with a mix of flags (cut off,
 * several objects, low confidence), and a real thumbnail file for every analysed image.
 *
 * <p>The stored feature blobs have the sizes the real pipeline stores (560-d appearance vector, 1024-d shape vector,
 * 128 x 85 packed mask: the per-image volumes measured in docs/BENCHMARKS.md), so reading the flags scans as many
 * pages as it would in a real catalog; their content is one shared invented vector, since the library view never
 * reads it. Thumbnails are a few dozen distinct pictures written by the indexer's {@link Thumbnails} (256 px JPEG)
 * and hard-linked under every image's name (copied where links are not supported): the browser decodes each image
 * id separately, so sharing the file content changes nothing it holds. Nothing here is the indexer's analysis.
 */
public final class LargeCatalog {
  /** The appearance model the invented vectors are stored under. */
  public static final String MODEL = "bench-model";
  /** Dimension of the built-in appearance model (560-d, docs/BENCHMARKS.md "appearance vector 2240 bytes"). */
  static final int APPEARANCE_DIM = 560;
  /** Shape vector length (docs/BENCHMARKS.md "shape vector 4096 bytes" = 1024 float32). */
  static final int SHAPE_DIM = 1024;
  /** Rows per transaction: large enough to be quick, small enough to keep the writer's memory flat. */
  private static final int BATCH = 5_000;
  private static final int PROTOTYPES = 26;

  private static final String[] EVENTS = {"Lisbon trip", "Garden", "Birthday", "Harbour walk", "Studio tests",
      "Ceramics fair", "Snow day", "Market", "Beach", "Museum", "Workshop", "Wedding", "Hike", "Kitchen", "Zoo"};

  /**
   * What was written.
   *
   * @param dir the catalog folder
   * @param images rows written
   * @param ready analysed images (features and a thumbnail)
   * @param pending images found but not analysed
   * @param failed images that could not be read (flag FAILED)
   * @param missing analysed images no longer on disk
   * @param flagged images whose stored silhouette raises at least one flag (cut off, several objects, low confidence)
   * @param buildMs wall-clock time to write it
   * @param databaseBytes catalog.db plus its WAL
   */
  public record Built(Path dir, int images, int ready, int pending, int failed, int missing, int flagged,
      long buildMs, long databaseBytes) {}

  private LargeCatalog() {}

  /** Writes {@code images} rows into a new catalog under {@code dir/catalog}; all randomness from {@code seed}. */
  public static Built create(Path dir, int images, long seed) throws IOException {
    long t0 = System.nanoTime();
    Path catalogDir = dir.resolve("catalog");
    SplittableRandom rnd = new SplittableRandom(seed);
    List<Path> prototypes = prototypes(dir.resolve("thumbnail-prototypes"), seed);
    int[] counts = new int[5]; // ready, pending, failed, missing, flagged
    try (Library lib = Library.open(catalogDir)) {
      lib.features().registerModel(MODEL, APPEARANCE_DIM, "invented vectors for the browser benchmark");
      Path base = dir.resolve("home").resolve("ana");
      long[] roots = {lib.images().ensureRoot(base.resolve("Pictures")),
          lib.images().ensureRoot(base.resolve("Phone backup").resolve("DCIM")),
          lib.images().ensureRoot(dir.resolve("media").resolve("archive").resolve("Scans 2009-2014"))};
      String[] rootPaths = lib.images().roots().stream()
          .sorted((a, b) -> Long.compare(a.id(), b.id())).map(r -> r.path()).toArray(String[]::new);
      Shared shared = Shared.make(rnd);
      PathMaker paths = new PathMaker(rnd);
      for (int from = 0; from < images; from += BATCH) {
        int to = Math.min(images, from + BATCH);
        int first = from;
        lib.catalog().inTransaction(c -> {
          for (int i = first; i < to; i++) {
            // 70 % library folders, 25 % phone backup, 5 % scans, in contiguous runs as a scan would add them
            double where = (double) i / images;
            int r = where < 0.70 ? 0 : where < 0.95 ? 1 : 2;
            PathMaker.Name name = paths.next(r);
            String path = rootPaths[r] + "/" + name.relative();
            long id = lib.images().insertPending(roots[r], path, 1_500_000 + rnd.nextInt(6_500_000),
                1_400_000_000_000L + (long) i * 60_000L, hex(rnd));
            double status = rnd.nextDouble();
            if (status < 0.02) {
              counts[1]++; // pending: found by the last scan, not analysed yet
            } else if (status < 0.035) {
              lib.images().markFailed(id, "not a readable JPEG: the file ends after " + rnd.nextInt(4096)
                  + " bytes", "TRUNCATED", 0);
              counts[2]++;
            } else {
              lib.images().markReady(id, name.width(), name.height(), 1, name.format());
              boolean flagged = putFeatures(lib, id, path, name, shared, rnd);
              counts[4] += flagged ? 1 : 0;
              if (status < 0.05) {
                lib.images().setStatus(id, ImageStatus.MISSING);
                counts[3]++;
              } else {
                counts[0]++;
              }
              linkThumbnail(lib, id, prototypes.get(rnd.nextInt(prototypes.size())));
            }
          }
          return null;
        });
      }
    }
    long db = Files.size(catalogDir.resolve("catalog.db"));
    Path wal = catalogDir.resolve("catalog.db-wal");
    db += Files.exists(wal) ? Files.size(wal) : 0;
    return new Built(catalogDir, images, counts[0], counts[1], counts[2], counts[3], counts[4],
        (System.nanoTime() - t0) / 1_000_000, db);
  }

  /** Stores a feature row; returns whether its silhouette raises a flag. */
  private static boolean putFeatures(Library lib, long id, String path, PathMaker.Name name, Shared shared,
      SplittableRandom rnd) {
    // flag rates are our choice for a mixed library: ~8 % cut off, ~5 % several objects, ~6 % low confidence
    boolean touches = rnd.nextDouble() < 0.08;
    int components = rnd.nextDouble() < 0.05 ? 2 + rnd.nextInt(3) : 1;
    double confidence = rnd.nextDouble() < 0.06 ? 0.1 + 0.35 * rnd.nextDouble() : 0.55 + 0.45 * rnd.nextDouble();
    Silhouette s = new Silhouette(shared.mask(), components, touches, shared.coverage(), confidence, "border-model");
    lib.features().put(id, new ImageAnalysis(id, path, name.width(), name.height(), name.format(),
        shared.appearance(), MODEL, s, shared.shape(), shared.colour(), ""));
    return touches || components > 1 || confidence < 0.5;
  }

  private static void linkThumbnail(Library lib, long id, Path prototype) {
    Path base = lib.catalog().thumbnailBase(id);
    Path target = base.resolveSibling(base.getFileName() + ".jpg");
    try {
      Files.createDirectories(target.getParent());
      try {
        Files.createLink(target, prototype);
      } catch (UnsupportedOperationException | IOException e) {
        Files.copy(prototype, target);
      }
    } catch (IOException e) {
      throw new java.io.UncheckedIOException("cannot write thumbnail " + target, e);
    }
  }

  /** A few dozen distinct thumbnails, written by the indexer's own thumbnail writer from 768 x 512 pictures. */
  private static List<Path> prototypes(Path dir, long seed) throws IOException {
    Files.createDirectories(dir);
    Thumbnails writer = new Thumbnails(DecodeOptions.defaults());
    List<Path> out = new ArrayList<>();
    List<SampleCatalog.Picture> pictures = SampleCatalog.pictures(seed);
    for (int i = 0; i < Math.min(PROTOTYPES, pictures.size()); i++) {
      Path p = dir.resolve("p" + i + ".jpg");
      writer.writeTo(SampleCatalog.draw(pictures.get(i), 768, 512, true), p);
      out.add(p);
    }
    return out;
  }

  private static String hex(SplittableRandom rnd) {
    // a SHA-256 is 64 hex digits: the string the catalog keeps per row, so its length matters for memory
    return String.format(Locale.ROOT, "%016x%016x%016x%016x", rnd.nextLong(), rnd.nextLong(), rnd.nextLong(),
        rnd.nextLong());
  }

  /** Feature content shared by every row (the view never reads it; only its stored size matters). */
  private record Shared(Mask mask, double coverage, float[] appearance, ShapeDescriptor shape, ColourStats colour) {
    static Shared make(SplittableRandom rnd) {
      int w = FeatureStore.MASK_LONG_SIDE;
      int h = 85;
      byte[] bits = new byte[w * h];
      int area = 0;
      for (int y = 0; y < h; y++) {
        for (int x = 0; x < w; x++) {
          double dx = (x - w / 2.0) / (w * 0.3);
          double dy = (y - h / 2.0) / (h * 0.4);
          if (dx * dx + dy * dy <= 1) {
            bits[y * w + x] = 1;
            area++;
          }
        }
      }
      Mask mask = new Mask(w, h, bits);
      float[] appearance = unit(rnd, APPEARANCE_DIM);
      ShapeDescriptor shape = new ShapeDescriptor(unit(rnd, SHAPE_DIM), new double[] {0.17, 0.002, 1e-4, 1e-5,
          1e-10, 1e-7, 1e-11}, 0.2, 0.1, 0.6, 0.8, 1.1, (double) area / (w * h), 0.5, 0.5, 0.05);
      double[] lab = {55, 12, 28};
      ColourStats colour = new ColourStats(lab, new double[] {9, 4, 6}, new double[] {88, 1, 4},
          new double[] {3, 1, 2}, List.of(new ColourStats.DominantColour(lab, 0.7),
              new ColourStats.DominantColour(new double[] {40, 10, 20}, 0.3)));
      return new Shared(mask, (double) area / (w * h), appearance, shape, colour);
    }

    private static float[] unit(SplittableRandom rnd, int n) {
      float[] v = new float[n];
      double norm = 0;
      for (int i = 0; i < n; i++) {
        v[i] = (float) (rnd.nextDouble() - 0.5);
        norm += v[i] * v[i];
      }
      for (int i = 0; i < n; i++) {
        v[i] /= (float) Math.sqrt(norm);
      }
      return v;
    }
  }

  /** Camera-style names in dated event folders, a few hundred images to a folder. */
  private static final class PathMaker {
    record Name(String relative, int width, int height, String format) {}

    private final SplittableRandom rnd;
    private final int[] inFolder = new int[3];
    private final int[] folderSize = new int[3];
    private final String[] folder = new String[3];
    private final int[] serial = {4000, 1, 1};
    private int day;

    PathMaker(SplittableRandom rnd) {
      this.rnd = rnd;
    }

    Name next(int root) {
      if (folder[root] == null || inFolder[root] >= folderSize[root]) {
        day += 1 + rnd.nextInt(9);
        int year = 2009 + Math.min(16, day / 365);
        int month = 1 + (day % 365) / 31;
        int dom = 1 + (day % 31) % 28;
        String date = String.format(Locale.ROOT, "%d-%02d-%02d", year, month, dom);
        folder[root] = switch (root) {
          case 0 -> year + "/" + date + " " + EVENTS[rnd.nextInt(EVENTS.length)];
          case 1 -> String.format(Locale.ROOT, "Camera/%d/%02d", year, month);
          default -> "Box " + (1 + day % 40) + "/" + EVENTS[rnd.nextInt(EVENTS.length)];
        };
        inFolder[root] = 0;
        folderSize[root] = 80 + rnd.nextInt(400);
      }
      inFolder[root]++;
      int n = serial[root]++;
      return switch (root) {
        case 0 -> rnd.nextInt(4) == 0
            ? new Name(folder[0] + String.format(Locale.ROOT, "/DSC_%05d.NEF.jpg", n), 6000, 4000, "jpeg")
            : new Name(folder[0] + String.format(Locale.ROOT, "/IMG_%05d.JPG", n), 5472, 3648, "jpeg");
        case 1 -> rnd.nextInt(10) == 0
            ? new Name(folder[1] + String.format(Locale.ROOT, "/Screenshot_%08d.png", n), 1080, 2400, "png")
            : new Name(folder[1] + String.format(Locale.ROOT, "/PXL_%08d_%06d.jpg", 20190000 + n / 100, n),
                4032, 3024, "jpeg");
        default -> new Name(folder[2] + String.format(Locale.ROOT, "/scan-%04d.tif", n), 2480, 3508, "tiff");
      };
    }
  }
}
