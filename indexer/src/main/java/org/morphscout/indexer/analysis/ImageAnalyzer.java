package org.morphscout.indexer.analysis;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.morphscout.indexer.feature.AppearanceEmbedder;
import org.morphscout.indexer.feature.ColourStatistics;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.ingest.ContentHash;
import org.morphscout.indexer.ingest.DecodedImage;
import org.morphscout.indexer.ingest.ImageDecoder;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.ShapeDescriptors;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.silhouette.SilhouetteExtractor;

/**
 * Turns image files into {@link ImageAnalysis} records. Thread-safe: {@link #prepare} may run on many threads at once;
 * {@link #finish} runs the appearance model on a batch.
 */
public final class ImageAnalyzer {
  private final ImageDecoder decoder;
  private final SilhouetteExtractor silhouettes;
  private final ShapeDescriptors shapes;
  private final ColourStatistics colours;
  private final AppearanceEmbedder embedder;

  public ImageAnalyzer(ImageDecoder decoder, SilhouetteExtractor silhouettes, ShapeDescriptors shapes,
      ColourStatistics colours, AppearanceEmbedder embedder) {
    this.decoder = decoder;
    this.silhouettes = silhouettes;
    this.shapes = shapes;
    this.colours = colours;
    this.embedder = embedder;
  }

  public ImageDecoder decoder() {
    return decoder;
  }

  public SilhouetteExtractor silhouettes() {
    return silhouettes;
  }

  public AppearanceEmbedder embedder() {
    return embedder;
  }

  /**
   * Decodes a file and computes everything but the appearance vector.
   *
   * @param contentHash the file's hash when already known, else null (it is computed)
   * @throws org.morphscout.indexer.ingest.ImageReadException when the file cannot be read as an image
   */
  public PreparedImage prepare(Path file, String contentHash) throws IOException {
    String hash = contentHash != null ? contentHash : ContentHash.sha256Hex(file);
    DecodedImage decoded = decoder.decode(file);
    return prepare(file, hash, decoded);
  }

  /** Computes silhouette, shape, colour and pixel fingerprint of an already decoded image. */
  public PreparedImage prepare(Path file, String contentHash, DecodedImage decoded) {
    Silhouette silhouette = silhouettes.extract(decoded.analysis());
    ShapeDescriptor shape = shapes.describe(silhouette.mask());
    ColourStats colour = colours.compute(decoded.analysis(), silhouette.mask());
    float[] fingerprint = PixelFingerprint.of(decoded.analysis(), silhouette.mask());
    return new PreparedImage(file, contentHash, decoded, silhouette, shape, colour, fingerprint);
  }

  /** Runs the appearance model on a batch; {@code ids} gives each image's catalog id (-1 when outside it). */
  public List<ImageAnalysis> finish(List<PreparedImage> batch, List<Long> ids) {
    if (batch.size() != ids.size()) {
      throw new IllegalArgumentException("one id per prepared image expected");
    }
    List<float[]> vectors = embedder.embed(batch.stream().map(p -> p.decoded().analysis()).toList());
    List<ImageAnalysis> result = new ArrayList<>(batch.size());
    for (int i = 0; i < batch.size(); i++) {
      PreparedImage p = batch.get(i);
      result.add(new ImageAnalysis(ids.get(i), p.file().toAbsolutePath().normalize().toString(), p.decoded().width(),
          p.decoded().height(), p.decoded().format(), vectors.get(i), embedder.modelId(),
          p.silhouette().shrunk(ImageAnalysis.MASK_LONG_SIDE), p.shape(),
          p.colour(), p.contentHash(), p.fingerprint()));
    }
    return result;
  }

  /** Analyses one file outside the catalog (id -1). */
  public ImageAnalysis analyze(Path file) throws IOException {
    return finish(List.of(prepare(file, null)), List.of(-1L)).get(0);
  }
}
