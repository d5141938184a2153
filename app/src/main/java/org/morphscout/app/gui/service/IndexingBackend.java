package org.morphscout.app.gui.service;

import java.io.IOException;
import java.nio.file.Path;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/** Adds a folder to the catalog and analyses its images. */
public interface IndexingBackend {
  IndexSummary index(Path folder, ProgressListener progress, CancellationToken token) throws IOException;
}
