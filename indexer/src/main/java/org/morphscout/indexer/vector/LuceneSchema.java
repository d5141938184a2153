package org.morphscout.indexer.vector;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field.Store;
import org.apache.lucene.document.KnnFloatVectorField;
import org.apache.lucene.document.NumericDocValuesField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.index.DocValues;
import org.apache.lucene.index.FieldInfo;
import org.apache.lucene.index.IndexReader;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.NumericDocValues;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.index.Term;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.index.VectorSimilarityFunction;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TermInSetQuery;
import org.apache.lucene.util.Bits;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.FixedBitSet;
import org.morphscout.indexer.vector.VectorIndex.Field;

/**
 * The layout of one image's Lucene document: an exact-match id term (for replace and delete), the id again as a
 * doc value (cheap to read back from a hit), and up to two unit vectors compared by dot product (= cosine).
 * Stateless.
 */
final class LuceneSchema {
  /** Indexed, not tokenised: the target of updateDocument / deleteDocuments and of the exclude filter. */
  static final String ID_TERM = "id";
  /** The same id as a numeric doc value, read back per hit without loading stored fields. */
  static final String ID_VALUE = "id_value";

  private LuceneSchema() {}

  static String fieldName(Field field) {
    return field.name().toLowerCase(Locale.ROOT);
  }

  static Term idTerm(long id) {
    return new Term(ID_TERM, Long.toString(id));
  }

  private static Collection<BytesRef> idTerms(Set<Long> ids) {
    List<BytesRef> terms = new ArrayList<>(ids.size());
    for (long id : ids) {
      terms.add(new BytesRef(Long.toString(id)));
    }
    return terms;
  }

  /**
   * The documents of {@code leaf} a search may return: the live ones minus those of the {@code exclude} ids, or null
   * (Lucene's "all") when nothing is deleted or excluded. One term look-up per excluded id, so meant for a few ids.
   */
  static Bits acceptDocs(LeafReader leaf, Set<Long> exclude) throws IOException {
    Bits live = leaf.getLiveDocs();
    Terms terms = exclude.isEmpty() ? null : leaf.terms(ID_TERM);
    if (terms == null) {
      return live;
    }
    FixedBitSet excluded = new FixedBitSet(leaf.maxDoc());
    TermsEnum ids = terms.iterator();
    PostingsEnum docs = null;
    for (BytesRef id : idTerms(exclude)) {
      if (ids.seekExact(id)) {
        docs = ids.postings(docs, PostingsEnum.NONE);
        for (int d = docs.nextDoc(); d != DocIdSetIterator.NO_MORE_DOCS; d = docs.nextDoc()) {
          excluded.set(d);
        }
      }
    }
    if (excluded.cardinality() == 0) {
      return live;
    }
    return new Bits() {
      @Override
      public boolean get(int doc) {
        return !excluded.get(doc) && (live == null || live.get(doc));
      }

      @Override
      public int length() {
        return excluded.length();
      }
    };
  }

  /**
   * A filter accepting every image but {@code exclude}, or null (Lucene's "no filter") when there is nothing to
   * exclude. A pre-filter rather than over-fetching and dropping: it still yields k results however many ids are
   * excluded, and Lucene switches to an exact scan by itself when the filter leaves few documents.
   */
  static Query excludeFilter(Set<Long> exclude) {
    if (exclude == null || exclude.isEmpty()) {
      return null;
    }
    return new BooleanQuery.Builder()
        .add(new MatchAllDocsQuery(), Occur.FILTER)
        .add(new TermInSetQuery(ID_TERM, idTerms(exclude)), Occur.MUST_NOT)
        .build();
  }

  /** One image's document; the vectors must already be unit length (DOT_PRODUCT assumes it). */
  static Document document(long id, float[] unitAppearance, float[] unitShape) {
    Document doc = new Document();
    doc.add(new StringField(ID_TERM, Long.toString(id), Store.NO));
    doc.add(new NumericDocValuesField(ID_VALUE, id));
    if (unitAppearance != null) {
      doc.add(new KnnFloatVectorField(
          fieldName(Field.APPEARANCE), unitAppearance, VectorSimilarityFunction.DOT_PRODUCT));
    }
    if (unitShape != null) {
      doc.add(new KnnFloatVectorField(fieldName(Field.SHAPE), unitShape, VectorSimilarityFunction.DOT_PRODUCT));
    }
    return doc;
  }

  /** The vector dimension of {@code field} in {@code reader}, or 0 when no segment holds that field. */
  static int dimension(IndexReader reader, Field field) {
    String name = fieldName(field);
    for (LeafReaderContext leaf : reader.leaves()) {
      FieldInfo info = leaf.reader().getFieldInfos().fieldInfo(name);
      if (info != null && info.getVectorDimension() > 0) {
        return info.getVectorDimension();
      }
    }
    return 0;
  }

  /** The ids of all live documents. */
  static Set<Long> ids(IndexReader reader) throws IOException {
    Set<Long> ids = new HashSet<>(Math.max(16, reader.numDocs() * 4 / 3 + 1));
    for (LeafReaderContext leaf : reader.leaves()) {
      Bits live = leaf.reader().getLiveDocs();
      NumericDocValues values = DocValues.getNumeric(leaf.reader(), ID_VALUE);
      for (int doc = values.nextDoc(); doc != DocIdSetIterator.NO_MORE_DOCS; doc = values.nextDoc()) {
        if (live == null || live.get(doc)) {
          ids.add(values.longValue());
        }
      }
    }
    return ids;
  }
}
