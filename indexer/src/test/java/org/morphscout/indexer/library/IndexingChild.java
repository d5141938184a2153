package org.morphscout.indexer.library;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * A child process for {@link CrashRecoveryIT}: indexes one folder into one catalog, like {@code morphscout index},
 * and says on stdout which phase it is in (one line per phase, flushed), so the test knows when the writer lock is
 * held. Exit code 0 when the run ended, 3 with the message on stderr when the indexer refused (catalog in use).
 *
 * <p>Usage: {@code IndexingChild <catalog> <folder> <threads> <commitEvery>}.
 */
public final class IndexingChild {
  private IndexingChild() {}

  public static void main(String[] args) throws Exception {
    PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
    Path catalog = Path.of(args[0]);
    Path folder = Path.of(args[1]);
    // Small batches and commits, so that kills fall between, and inside, many catalog and index commits.
    IndexOptions options = new IndexOptions(Integer.parseInt(args[2]), 8, java.time.Duration.ofSeconds(60), false,
        false, 6, Integer.parseInt(args[3]), false);
    ProgressListener phases = new ProgressListener() {
      private volatile boolean analysing;

      @Override
      public void phase(String name, long total) {
        analysing = name.equals("analysing");
        out.println("phase " + name + " " + total);
      }

      @Override
      public void progressed(long done, String item) {
        if (analysing) {
          out.println("analysed " + done);
        }
      }
    };
    try (Library library = Library.open(catalog)) {
      IndexReport r = new LibraryIndexer(library, AnalysisSetup.defaults(), options)
          .index(List.of(folder), phases, CancellationToken.none());
      out.println("done indexed=" + r.indexed() + " unchanged=" + r.unchanged() + " failed=" + r.failed()
          + " restored=" + r.vectorsRestored());
    } catch (MorphscoutException e) {
      System.err.println("index: " + e.getMessage());
      System.exit(3);
    }
    System.exit(0); // ONNX Runtime and Lucene leave no non-daemon threads, but do not depend on it
  }
}
