package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.catalog.Catalog;
import org.morphscout.indexer.catalog.DecisionStore;
import org.morphscout.indexer.catalog.FeatureStore;
import org.morphscout.indexer.catalog.ImageRow;
import org.morphscout.indexer.catalog.ImageStore;
import org.morphscout.indexer.catalog.NeighbourStore;
import org.morphscout.indexer.catalog.PairStore;

/**
 * An open catalog and its stores. Thread-safe. Close it when done.
 *
 * <p>Services that need more (the vector index, the appearance model) are built on top of it, so that a command that
 * only reads decisions never opens the vector index or loads a model.
 */
public final class Library implements AutoCloseable {
  private final Catalog catalog;
  private final ImageStore images;
  private final FeatureStore features;
  private final DecisionStore decisions;
  private final NeighbourStore neighbours;
  private final PairStore pairs;

  private Library(Catalog catalog) {
    this.catalog = catalog;
    this.images = new ImageStore(catalog);
    this.features = new FeatureStore(catalog);
    this.decisions = new DecisionStore(catalog);
    this.neighbours = new NeighbourStore(catalog);
    this.pairs = new PairStore(catalog);
  }

  /** Opens (or creates) the catalog in {@code dir}. */
  public static Library open(Path dir) throws IOException {
    return new Library(Catalog.open(dir));
  }

  /**
   * Opens an existing catalog for reading only (commands that only look): nothing in the folder changes, it works on
   * read-only media, and the small tables are checked for damage first. See {@link Catalog#openForReading}.
   */
  public static Library openForReading(Path dir) throws IOException {
    return new Library(Catalog.openForReading(dir));
  }

  /** Opens an existing catalog; fails clearly when {@code dir} holds none. */
  public static Library openExisting(Path dir) throws IOException {
    if (!Files.exists(dir.resolve("catalog.db"))) {
      throw new MorphscoutException("no catalog in " + dir.toAbsolutePath().normalize()
          + ": index a folder first (morphscout index <folder>) or name the catalog with --catalog");
    }
    return open(dir);
  }

  public Catalog catalog() {
    return catalog;
  }

  public ImageStore images() {
    return images;
  }

  public FeatureStore features() {
    return features;
  }

  public DecisionStore decisions() {
    return decisions;
  }

  public NeighbourStore neighbours() {
    return neighbours;
  }

  /** The stored pairs: candidates chosen by each ready image and the measures of every chosen pair. */
  public PairStore pairs() {
    return pairs;
  }

  /** The catalog row of an image given by path (relative to the working directory or absolute). */
  public Optional<ImageRow> find(String pathArgument) {
    return images.byPath(Path.of(pathArgument).toAbsolutePath().normalize().toString());
  }

  /** Like {@link #find} but fails with a message naming the path when the image is not in the catalog. */
  public ImageRow require(String pathArgument) {
    return find(pathArgument).orElseThrow(() -> new MorphscoutException("image not in the catalog: "
        + Path.of(pathArgument).toAbsolutePath().normalize() + " (index its folder first: morphscout index <folder>)"));
  }

  @Override
  public void close() {
    catalog.close();
  }
}
