package org.morphscout.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.morphscout.indexer.catalog.ImageStore;
import org.morphscout.indexer.library.CatalogCheck;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibrarySettings;
import org.morphscout.indexer.library.StoredPairCounts;
import org.morphscout.indexer.values.Folder;
import org.morphscout.indexer.values.ImageFailure;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.values.SilhouetteCounts;
import org.morphscout.indexer.values.VectorSegments;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout status}: what the catalog holds. */
@Command(
    name = "status",
    mixinStandardHelpOptions = true,
    header = "Show the catalog: folders, counts by status, failures with reasons, size, appearance model.",
    description = "Also shows the silhouettes by what made them, the stored pairs, and the vector index (images, "
        + "segments). Reads the catalog without changing it (also on read-only media); damage in the small tables "
        + "is noticed at every open, --check reads everything.")
final class StatusCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @Option(names = "--json", description = "Write JSON to stdout.")
  boolean json;

  @Option(names = "--check", description = "Also read every page of the database and check the vector index against "
      + "it (a few seconds for large catalogs; opening only checks the header and the small tables). Exit 3 when "
      + "something is damaged.")
  boolean check;

  @Override
  public Integer call() throws Exception {
    PrintWriter out = spec.commandLine().getOut();
    try (Library library = Library.openForReading(root.catalogDir())) {
      Map<ImageStatus, Integer> counts = library.countsByStatus();
      List<String> folders = library.folders().stream().map(Folder::path).toList();
      List<ImageFailure> failures = library.failures();
      String model = library.activeModel().orElse("none yet");
      long bytes = library.databaseBytes();
      CatalogCheck checked = check ? CatalogCheck.run(library) : null;
      SilhouetteCounts silhouettes = library.silhouetteCounts();
      StoredPairCounts pairs = StoredPairCounts.of(library);
      Optional<VectorSegments> segments = Optional.empty();
      String vectorsUnreadable = null;
      try {
        segments = library.vectorSegments();
      } catch (IOException | RuntimeException e) {
        vectorsUnreadable = e.getMessage(); // the rest of the summary still helps; index rebuilds the vector index
      }
      if (json) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("catalog", library.dir().toString());
        doc.put("images", counts.values().stream().mapToInt(Integer::intValue).sum());
        doc.put("ready", counts.get(ImageStatus.READY));
        doc.put("pending", counts.get(ImageStatus.PENDING));
        doc.put("failed", counts.get(ImageStatus.FAILED));
        doc.put("missing", counts.get(ImageStatus.MISSING));
        doc.put("folders", folders);
        List<Map<String, String>> fails = new ArrayList<>();
        for (ImageFailure f : failures) {
          fails.add(Map.of("path", f.path(), "reason", f.reason()));
        }
        doc.put("failures", fails);
        doc.put("databaseBytes", bytes);
        doc.put("model", model);
        doc.put("decisions", library.decisions().count());
        doc.put("silhouettes", Map.of("bySource", silhouettes.bySource(), "uncertain", silhouettes.uncertain()));
        Map<String, Object> stored = new LinkedHashMap<>();
        stored.put("pairs", pairs.pairs());
        stored.put("notWarped", pairs.bounded()); // text: "not warped: too poor to show"
        stored.put("duplicates", pairs.duplicates());
        stored.put("stale", pairs.stale());
        stored.put("unmeasured", pairs.unmeasured());
        stored.put("imagesWaiting", pairs.waiting());
        stored.put("complete", pairs.complete());
        doc.put("storedPairs", stored);
        if (vectorsUnreadable != null) {
          doc.put("vectorIndex", Map.of("unreadable", vectorsUnreadable));
        }
        segments.ifPresent(g -> {
          Map<String, Object> vectors = new LinkedHashMap<>();
          vectors.put("images", g.images());
          vectors.put("segments", g.count());
          vectors.put("outsideLargest", g.outsideLargest());
          vectors.put("deleted", g.deleted());
          doc.put("vectorIndex", vectors);
        });
        if (checked != null) {
          doc.put("check", Map.of("database", checked.database(), "vectors", checked.vectors()));
        }
        JsonOut.write(out, doc);
        return checked == null || checked.ok() ? ExitCodes.OK : ExitCodes.ERROR;
      }
      out.printf("catalog     %s (%s)%n", Terminal.safe(library.dir().toString()), Text.bytes(bytes));
      out.printf("model       %s%n", model);
      out.printf("folders     %s%n",
          folders.isEmpty() ? "none" : String.join("\n            ", folders.stream().map(Terminal::safe).toList()));
      out.printf("images      %d ready, %d pending, %d failed, %d missing%n", counts.get(ImageStatus.READY),
          counts.get(ImageStatus.PENDING), counts.get(ImageStatus.FAILED), counts.get(ImageStatus.MISSING));
      out.printf("decisions   %d%n", library.decisions().count());
      out.printf("silhouettes %s; %d uncertain%n", silhouettes.bySource().isEmpty() ? "none yet"
          : String.join(", ", silhouettes.bySource().entrySet().stream().map(e -> e.getValue() + " " + e.getKey())
              .toList()), silhouettes.uncertain());
      out.printf("pairs       %d stored (%d not warped: too poor to show, %d near-duplicates)%s%n", pairs.pairs(),
          pairs.bounded(), pairs.duplicates(), pairs.complete() ? "; pair queries read them"
              : "; not up to date (" + pairs.waiting() + " images waiting, " + pairs.stale() + " stale, "
                  + pairs.unmeasured() + " unmeasured): pair queries score live until index runs");
      segments.ifPresent(g -> out.printf("vectors     %d images in %d segment%s%s%n", g.images(), g.count(),
          g.count() == 1 ? "" : "s", g.count() == 1 ? ""
              : " (" + g.outsideLargest() + " outside the largest; index merges them once they are a tenth)"));
      if (vectorsUnreadable != null) {
        out.printf("vectors     unreadable: %s (the next index run rebuilds the vector index from the catalog)%n",
            Terminal.safe(vectorsUnreadable));
      }
      if (checked != null) {
        out.printf("check       database: %s%n            vector index: %s%n", Terminal.safe(checked.database()),
            Terminal.safe(checked.vectors()));
      }
      if (!failures.isEmpty()) {
        out.println();
        out.println("failures:");
        for (ImageFailure f : failures) {
          out.printf("  %s%n    %s%n", Terminal.safe(f.path()), Terminal.safe(f.reason()));
        }
      }
      return checked == null || checked.ok() ? ExitCodes.OK : ExitCodes.ERROR;
    }
  }
}
