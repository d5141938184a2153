package org.morphscout.indexer.vector;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.apache.lucene.index.DocValues;
import org.apache.lucene.index.FloatVectorValues;
import org.apache.lucene.index.KnnVectorValues;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.NumericDocValues;
import org.apache.lucene.index.ReaderUtil;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.util.VectorUtil;
import org.morphscout.indexer.vector.VectorIndex.Hit;

/**
 * Turns the graph search's candidates into results: reads each candidate's stored float vector, computes the exact
 * cosine with the query, and keeps the best {@code k}.
 *
 * <p>Why rescore instead of converting Lucene's score ({@code (1 + dot) / 2} for DOT_PRODUCT): with int8 quantisation
 * that score is only an estimate, so ranking and reported similarity would differ from an exact scan; the float
 * vectors are kept on disk anyway, and reading a few dozen of them costs far less than the graph search. This is the
 * usual "oversample, then rerank with full precision" pattern (common practice for quantised vector search).
 * Stateless.
 */
final class ExactRescorer {
  private ExactRescorer() {}

  /** Best first; ties broken by smaller id so results are deterministic. */
  static final Comparator<Hit> BEST_FIRST =
      Comparator.comparingDouble((Hit h) -> -h.similarity()).thenComparingLong(Hit::id);

  static List<Hit> rescore(
      IndexSearcher searcher, ScoreDoc[] candidates, String vectorField, float[] unitQuery, int k)
      throws IOException {
    ScoreDoc[] byDoc = candidates.clone();
    // Doc-value and vector iterators only move forward, so visit candidates in doc order.
    Arrays.sort(byDoc, Comparator.comparingInt((ScoreDoc sd) -> sd.doc));
    List<LeafReaderContext> leaves = searcher.getIndexReader().leaves();
    List<Hit> hits = new ArrayList<>(byDoc.length);
    int i = 0;
    while (i < byDoc.length) {
      int leafIndex = ReaderUtil.subIndex(byDoc[i].doc, leaves);
      LeafReaderContext leaf = leaves.get(leafIndex);
      int leafEnd = leaf.docBase + leaf.reader().maxDoc();
      NumericDocValues ids = DocValues.getNumeric(leaf.reader(), LuceneSchema.ID_VALUE);
      FloatVectorValues vectors = leaf.reader().getFloatVectorValues(vectorField);
      KnnVectorValues.DocIndexIterator vectorDocs = vectors == null ? null : vectors.iterator();
      for (; i < byDoc.length && byDoc[i].doc < leafEnd; i++) {
        int doc = byDoc[i].doc - leaf.docBase;
        if (vectorDocs == null || !ids.advanceExact(doc) || vectorDocs.advance(doc) != doc) {
          throw new IllegalStateException("vector index document " + doc + " lacks its id or vector");
        }
        float cosine = VectorUtil.dotProduct(unitQuery, vectors.vectorValue(vectorDocs.index()));
        hits.add(new Hit(ids.longValue(), VectorMath.clampCosine(cosine)));
      }
    }
    hits.sort(BEST_FIRST);
    return hits.size() > k ? List.copyOf(hits.subList(0, k)) : List.copyOf(hits);
  }
}
