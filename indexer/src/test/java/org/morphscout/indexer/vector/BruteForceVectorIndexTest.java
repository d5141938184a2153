package org.morphscout.indexer.vector;

/** The behavioural contract on the exact in-memory reference. */
class BruteForceVectorIndexTest extends VectorIndexContractTest {
  @Override
  protected VectorIndex newIndex() {
    return new BruteForceVectorIndex();
  }
}
