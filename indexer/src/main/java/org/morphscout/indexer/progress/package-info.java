/** Progress reporting and cooperative cancellation for long work (indexing, pair discovery, graph building). */
package org.morphscout.indexer.progress;
