package org.morphscout.indexer.vector;

import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.vector.LuceneIndexOptions.Quantization;

/** The behavioural contract on the Lucene index with int8-quantised graphs. */
class LuceneInt8VectorIndexTest extends VectorIndexContractTest {
  @TempDir Path dir;

  @Override
  protected VectorIndex newIndex() throws IOException {
    return LuceneVectorIndex.open(dir.resolve("vectors"), LuceneIndexOptions.defaults().withQuantization(Quantization.INT8));
  }
}
