package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.Catalog;
import org.morphscout.indexer.catalog.DecisionStore;
import org.morphscout.indexer.catalog.FeatureStore;
import org.morphscout.indexer.catalog.ImageStore;
import org.morphscout.indexer.catalog.NeighbourStore;
import org.morphscout.indexer.catalog.PairStore;
import org.morphscout.indexer.values.Folder;
import org.morphscout.indexer.values.ImageFailure;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.values.SilhouetteCounts;
import org.morphscout.indexer.values.SilhouetteTraits;
import org.morphscout.indexer.values.VectorSegments;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/**
 * An open catalog and its stores. Thread-safe. Close it when done.
 *
 * <p>The application reads the catalog through the methods below and the services of this package, never through
 * the stores (an architecture test holds it to that); the store accessors are for the library's own services and for
 * the benchmarks that measure them.
 *
 * <p>Services that need more (the vector index, the appearance model) are built on top of it, so that a command that
 * only reads decisions never opens the vector index or loads a model.
 */
public final class Library implements AutoCloseable {
  private final Catalog catalog;
  private final ImageStore images;
  private final FeatureStore features;
  private final Decisions decisions;
  private final NeighbourStore neighbours;
  private final PairStore pairs;

  private Library(Catalog catalog) {
    this.catalog = catalog;
    this.images = new ImageStore(catalog);
    this.features = new FeatureStore(catalog);
    this.decisions = new Decisions(new DecisionStore(catalog));
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

  /** The user's decisions on pairs. */
  public Decisions decisions() {
    return decisions;
  }

  public NeighbourStore neighbours() {
    return neighbours;
  }

  /** The stored pairs: candidates chosen by each ready image and the measures of every chosen pair. */
  public PairStore pairs() {
    return pairs;
  }

  /** The catalog folder. */
  public Path dir() {
    return catalog.dir();
  }

  /** Size of the catalog's database files on disk, in bytes. */
  public long databaseBytes() throws IOException {
    return catalog.databaseBytes();
  }

  /** The folders given to {@code index}, by path. */
  public List<Folder> folders() {
    return images.roots();
  }

  /** The image with this catalog id, when there is one. */
  public Optional<ImageRow> image(long id) {
    return images.byId(id);
  }

  /** Every image in the catalog, whatever its status. */
  public List<ImageRow> allImages() {
    return images.all();
  }

  /** The images with the given status. */
  public List<ImageRow> imagesWith(ImageStatus status) {
    return images.withStatus(status);
  }

  /** How many images have each status (every status present, zero when none). */
  public Map<ImageStatus, Integer> countsByStatus() {
    return images.countsByStatus();
  }

  /** The images that could not be read or analysed, with their reasons, by path. */
  public List<ImageFailure> failures() {
    return images.failures();
  }

  /** Why an image failed, when it did. */
  public Optional<String> failureReason(long id) {
    return images.failureReason(id);
  }

  /** The stored analysis of a ready image (vectors, silhouette, colour); empty when it has none. */
  public Optional<ImageAnalysis> analysis(ImageRow row) {
    return features.load(row);
  }

  /** Like {@link #analysis(ImageRow)}, by catalog id. */
  public Optional<ImageAnalysis> analysis(long id) {
    return images.byId(id).flatMap(features::load);
  }

  /** The cached thumbnail file of an image, when there is one. */
  public Optional<Path> thumbnail(long id) {
    return catalog.thumbnail(id);
  }

  /** The silhouettes of the ready images counted by what made them, and how many are uncertain. */
  public SilhouetteCounts silhouetteCounts() {
    return features.silhouetteCounts();
  }

  /** The stored silhouettes that have something to report (several objects, cut off by the frame, uncertain). */
  public List<SilhouetteTraits> notableSilhouettes() {
    return features.notableSilhouettes();
  }

  /** How many ready images have features made by the appearance model {@code modelId}. */
  public int readyCount(String modelId) {
    return features.readyIds(modelId).size();
  }

  /** The appearance model the catalog's vectors were made by; empty before the first index. */
  public Optional<String> activeModel() {
    return LibrarySettings.activeModel(features);
  }

  /** Whether the catalog keeps its vector index quantised to int8 (chosen by {@code index --int8}). */
  public boolean int8Vectors() {
    return features.setting(LibrarySettings.VECTOR_QUANTIZATION).orElse("NONE").equals("INT8");
  }

  /**
   * How the vector index's last commit is split into segments (each a graph that every search visits), or empty
   * before the first indexing run. Reads the commit point only, so it is cheap at any library size.
   */
  public Optional<VectorSegments> vectorSegments() throws IOException {
    return LuceneVectorIndex.committedSegments(catalog.vectorDir());
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
