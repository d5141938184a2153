package org.morphscout.indexer.ingest;

import java.util.List;

/**
 * What a scan found.
 *
 * @param files image files, sorted by path, each real file once
 * @param problems places the scan could not read, sorted by path
 */
public record ScanResult(List<FoundFile> files, List<ScanProblem> problems) {
  public ScanResult {
    files = List.copyOf(files);
    problems = List.copyOf(problems);
  }
}
