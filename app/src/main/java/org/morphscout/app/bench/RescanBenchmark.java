package org.morphscout.app.bench;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.util.List;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.IndexReport;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * Indexing a large library that barely changed: {@code n} files already in the catalog and unchanged (written as tiny
 * placeholder files, their catalog rows written directly, since analysing 100,000 pictures first would take hours and
 * is not what is measured), re-scanned by {@code index}; then {@code added} new small pictures (seeded shapes on plain
 * grounds) indexed into the same library, analysis and stored pairs included.
 */
public final class RescanBenchmark {
  /**
   * @param files files in the library before the addition
   * @param rescanSeconds wall time of {@code index} over the unchanged library
   * @param unchanged files the re-scan reported unchanged
   * @param added files added
   * @param addSeconds wall time of {@code index} after the addition
   * @param indexed files the second run analysed
   * @param threads indexing threads
   */
  public record Result(int files, double rescanSeconds, int unchanged, int added, double addSeconds, int indexed,
      int threads) {}

  private RescanBenchmark() {}

  public static Result run(Path work, int n, int added, long seed) throws IOException {
    Path root = work.resolve("library").toAbsolutePath().normalize();
    Path catalogDir = work.resolve("catalog");
    writePlaceholders(root, n);
    IndexOptions options = IndexOptions.defaults();
    try (Library library = Library.open(catalogDir)) {
      register(library, root, n);
      LibraryIndexer indexer = new LibraryIndexer(library, AnalysisSetup.defaults(), options);
      long t = System.nanoTime();
      IndexReport rescan = indexer.index(List.of(root), ProgressListener.NONE, CancellationToken.none());
      double rescanSeconds = (System.nanoTime() - t) / 1e9;
      writePictures(root.resolve("new"), added, seed);
      t = System.nanoTime();
      IndexReport add = indexer.index(List.of(root), ProgressListener.NONE, CancellationToken.none());
      double addSeconds = (System.nanoTime() - t) / 1e9;
      return new Result(n, rescanSeconds, rescan.unchanged(), added, addSeconds, add.indexed(), options.threads());
    }
  }

  private static Path placeholder(Path root, int i) {
    return root.resolve("f" + (i / 1000)).resolve(i + ".png");
  }

  private static void writePlaceholders(Path root, int n) throws IOException {
    byte[] bytes = new byte[64];
    for (int i = 0; i < n; i++) {
      Path p = placeholder(root, i);
      if (i % 1000 == 0) {
        Files.createDirectories(p.getParent());
      }
      Files.write(p, bytes);
    }
  }

  /** Catalog rows of the placeholders as ready, unchanged images (same size and modification time as on disk). */
  private static void register(Library library, Path root, int n) throws IOException {
    long rootId = library.images().ensureRoot(root);
    long[] mtimes = new long[n];
    for (int i = 0; i < n; i++) {
      mtimes[i] = Files.getLastModifiedTime(placeholder(root, i)).toMillis();
    }
    library.catalog().inTransaction(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT INTO images(root_id, path, size, mtime_ms, content_hash, "
          + "width, height, orientation, format, status, first_seen, updated_at) VALUES (?, ?, 64, ?, ?, 640, 480, 1, "
          + "'png', 'ready', 'x', 'x')")) {
        for (int i = 0; i < n; i++) {
          s.setLong(1, rootId);
          s.setString(2, placeholder(root, i).toString());
          s.setLong(3, mtimes[i]);
          s.setString(4, String.format("%064x", i));
          s.addBatch();
        }
        s.executeBatch();
      }
      return null;
    });
  }

  private static void writePictures(Path dir, int count, long seed) throws IOException {
    Files.createDirectories(dir);
    SplittableRandom random = new SplittableRandom(seed);
    for (int i = 0; i < count; i++) {
      BufferedImage img = new BufferedImage(160, 120, BufferedImage.TYPE_INT_RGB);
      Graphics2D g = img.createGraphics();
      g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
      g.setColor(new Color(200 + random.nextInt(40), 200 + random.nextInt(40), 200 + random.nextInt(40)));
      g.fillRect(0, 0, 160, 120);
      g.setColor(new Color(random.nextInt(160), random.nextInt(160), random.nextInt(160)));
      int w = 30 + random.nextInt(70);
      int h = 30 + random.nextInt(60);
      if (random.nextBoolean()) {
        g.fillOval(80 - w / 2, 60 - h / 2, w, h);
      } else {
        g.fillRoundRect(80 - w / 2, 60 - h / 2, w, h, random.nextInt(30), random.nextInt(30));
      }
      g.dispose();
      ImageIO.write(img, "png", dir.resolve(i + ".png").toFile());
    }
  }
}
