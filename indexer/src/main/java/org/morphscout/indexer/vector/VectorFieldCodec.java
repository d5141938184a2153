package org.morphscout.indexer.vector;

import org.apache.lucene.codecs.KnnVectorsFormat;
import org.apache.lucene.codecs.lucene103.Lucene103Codec;
import org.apache.lucene.codecs.lucene99.Lucene99HnswScalarQuantizedVectorsFormat;
import org.apache.lucene.codecs.lucene99.Lucene99HnswVectorsFormat;

/**
 * Lucene's default codec with our HNSW parameters for the vector fields. Only writing needs this class: each segment
 * records its per-field vector format by name, and Lucene finds that format again when reading, so indexes written
 * with different options (or quantisation) stay readable by the plain default codec.
 *
 * <p>Upgrade note: Lucene 10.4 moves the int8 format to its backward-codecs module and offers
 * {@code Lucene104HnswScalarQuantizedVectorsFormat}; switching the writer there keeps old segments readable as long
 * as backward-codecs is on the class path.
 */
final class VectorFieldCodec extends Lucene103Codec {
  private final KnnVectorsFormat vectorFormat;

  VectorFieldCodec(LuceneIndexOptions options) {
    this.vectorFormat =
        switch (options.quantization()) {
          case NONE -> new Lucene99HnswVectorsFormat(options.maxConn(), options.beamWidth());
          // Lucene's two-argument constructor quantises to 7 bits per component (stored in one byte).
          case INT8 -> new Lucene99HnswScalarQuantizedVectorsFormat(options.maxConn(), options.beamWidth());
        };
  }

  @Override
  public KnnVectorsFormat getKnnVectorsFormatForField(String field) {
    return vectorFormat;
  }
}
