package org.morphscout.app.gui.service;

import java.util.List;
import org.morphscout.indexer.progress.CancellationToken;

/** Finds chains of similar real images between two endpoints. */
public interface ChainsBackend {
  /** Up to {@code request.alternatives()} chains, best first; empty when no chain fits the request. */
  List<ChainCandidate> find(long start, long end, ChainRequest request, CancellationToken token);
}
