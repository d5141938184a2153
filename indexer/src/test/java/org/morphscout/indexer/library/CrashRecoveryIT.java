package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.Folders;
import org.morphscout.indexer.testing.BadFiles;
import org.morphscout.indexer.testing.CatalogChecks;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/**
 * Kills an indexing process hard (SIGKILL through {@link Process#destroyForcibly()} on Linux) at seeded random
 * moments, again and again, over a library of a few hundred pictures. After every kill: the catalog opens and SQLite
 * finds it sound, decisions made before are intact, no file has two rows, the vector index holds nothing the catalog
 * does not hold as ready (and agrees with it exactly once synchronised), and a second indexer process in the middle of a
 * run is refused with "catalog in use". A last run finishes with every picture indexed exactly once.
 *
 * <p>The seed is printed and can be set with {@code -Dmorphscout.crash.seed=<n>}.
 */
class CrashRecoveryIT {
  private static final long SEED = Long.getLong("morphscout.crash.seed", 20261203L);
  private static final int KILLS = 10;
  /** Families of 25 blends each: 8 x 25 = 200 pictures, TestFamilies.SIZE (320 px) square. */
  private static final Archetype[][] FAMILIES = {
    {Archetype.VASE, Archetype.BOTTLE}, {Archetype.JUG, Archetype.JAR}, {Archetype.BOWL, Archetype.CUP},
    {Archetype.AMPHORA, Archetype.VASE}, {Archetype.BOTTLE, Archetype.JUG}, {Archetype.JAR, Archetype.BOWL},
    {Archetype.CUP, Archetype.AMPHORA}, {Archetype.VASE, Archetype.JAR},
  };
  private static final int PER_FAMILY = 25;

  @TempDir Path tmp;

  @Test
  @Timeout(value = 8, unit = TimeUnit.MINUTES)
  void killedIndexingRunsLeaveAConsistentCatalogAndALastRunFinishesTheJob() throws Exception {
    System.out.println("CrashRecoveryIT seed " + SEED + " (-Dmorphscout.crash.seed=" + SEED + " repeats this run)");
    SplittableRandom rnd = new SplittableRandom(SEED);
    Path staging = Files.createDirectories(tmp.resolve("staging"));
    Path root = Files.createDirectories(tmp.resolve("library"));
    Path catalog = tmp.resolve("catalog");
    List<String> good = new ArrayList<>();
    List<String> bad = new ArrayList<>();
    for (int f = 0; f < FAMILIES.length; f++) {
      List<FamilyItem> items = TestFamilies.silhouetteFamily(SEED + f, PER_FAMILY, FAMILIES[f][0], FAMILIES[f][1]);
      for (int i = 0; i < items.size(); i++) {
        Path p = staging.resolve(String.format("f%d/%s-%02d.jpg", f, items.get(i).label(), i));
        Files.createDirectories(p.getParent());
        ImageIO.write(items.get(i).image(), "jpeg", p.toFile());
      }
    }
    Path badDir = Files.createDirectories(staging.resolve("f0"));
    BadFiles.empty(badDir, "empty.jpg");
    BadFiles.randomBytes(badDir, "noise.jpg", SEED, 2048);
    BadFiles.truncatedJpeg(badDir, "cut.jpg",
        TestFamilies.silhouetteFamily(SEED, 2, Archetype.CUP, Archetype.BOWL).get(0).image(), 0.5);

    // Before the crashes: the first family indexed completely, and decisions taken on it.
    copyFolder(staging.resolve("f0"), root.resolve("f0"));
    Process first = child(catalog, root);
    assertThat(first.waitFor(180, TimeUnit.SECONDS)).isTrue();
    assertThat(first.exitValue()).as(Files.readString(catalog.resolveSibling("child.err"))).isZero();
    List<Decision> decisions;
    Set<String> decided;
    try (Library library = Library.open(catalog)) {
      List<ImageRow> ready = library.images().withStatus(ImageStatus.READY);
      assertThat(ready).hasSize(PER_FAMILY);
      library.decisions().decide(ready.get(0).id(), ready.get(1).id(), DecisionKind.APPROVED, "smooth");
      library.decisions().decide(ready.get(2).id(), ready.get(9).id(), DecisionKind.REJECTED, "too far");
      decisions = library.decisions().all();
      // Decisions belong to the pictures judged: the runs below change some pictures, never these.
      decided = Set.of(ready.get(0).path(), ready.get(1).path(), ready.get(2).path(), ready.get(9).path());
    }
    for (int f = 1; f < FAMILIES.length; f++) {
      copyFolder(staging.resolve("f" + f), root.resolve("f" + f));
    }
    try (Stream<Path> files = Files.walk(root)) {
      files.filter(Files::isRegularFile).forEach(p -> {
        String key = CatalogChecks.key(p);
        (Set.of("empty.jpg", "noise.jpg", "cut.jpg").contains(p.getFileName().toString()) ? bad : good).add(key);
      });
    }

    int kills = 0;
    boolean inUseChecked = false;
    for (int round = 0; kills < KILLS; round++) {
      assertThat(round).as("seed %d: runs keep finishing before the kill", SEED).isLessThan(3 * KILLS);
      Process p = child(catalog, root);
      try {
        long delay;
        if (round % 2 == 0) {
          delay = rnd.nextLong(300, 6000); // from the start: opening, migrating, loading the model, scanning, syncing
        } else {
          // While analysing, storing and committing: after a random number of pictures, then a random moment.
          awaitLine(p, catalog, "phase analysing", 120);
          if (!inUseChecked) {
            secondIndexerIsRefused(catalog, root);
            inUseChecked = true;
          }
          awaitLine(p, catalog, "analysed " + rnd.nextInt(1, 40) + "\n", 120);
          delay = rnd.nextLong(0, 300);
        }
        boolean ended = p.waitFor(delay, TimeUnit.MILLISECONDS);
        if (!ended) {
          p.destroyForcibly();
          assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
          kills++;
        }
        System.out.printf("CrashRecoveryIT round %d: %s (%d ms after the last wait); %s%n", round,
            ended ? "ended" : "killed", delay, summary(catalog));
        if (ended) {
          // On a fast machine a run can finish all its work before the kill: give the next runs more to do.
          changeSome(good, decided, rnd);
        }
      } finally {
        p.destroyForcibly();
      }
      checkAfterCrash(catalog, decisions, "seed " + SEED + ", round " + round);
    }
    assertThat(inUseChecked).as("the cross-process lock check ran").isTrue();

    // The last run finishes the job; one more finds nothing to do.
    for (String expected : new String[] {"done indexed=", "done indexed=0 "}) {
      Process last = child(catalog, root);
      assertThat(last.waitFor(180, TimeUnit.SECONDS)).as("seed %d: the last run ends", SEED).isTrue();
      assertThat(last.exitValue()).as("seed %d: %s", SEED, Files.readString(catalog.resolveSibling("child.err")))
          .isZero();
      assertThat(lastLine(catalog)).startsWith(expected);
    }
    try (Library library = Library.open(catalog)) {
      String context = "seed " + SEED + ", after the last run";
      assertThat(library.images().all()).extracting(ImageRow::path).as(context)
          .containsExactlyInAnyOrderElementsOf(concat(good, bad));
      assertThat(library.images().withStatus(ImageStatus.READY)).extracting(ImageRow::path).as(context)
          .containsExactlyInAnyOrderElementsOf(good);
      assertThat(library.images().withStatus(ImageStatus.FAILED)).extracting(ImageRow::path).as(context)
          .containsExactlyInAnyOrderElementsOf(bad);
      assertThat(library.decisions().all()).as(context).isEqualTo(decisions);
      CatalogChecks.catalogAndIndexAgree(library, context);
      CatalogChecks.noDuplicatesOrOrphans(library, context);
      assertThat(CatalogChecks.integrityCheck(library)).isEqualTo("ok");
      Set<Long> linked = library.neighbours().idsWithLinks();
      assertThat(library.images().withStatus(ImageStatus.READY)).as("%s: every ready image has neighbours", context)
          .allSatisfy(r -> assertThat(linked).contains(r.id()));
    }
  }

  /** A second indexer on the same catalog, while the first holds it, is refused and says why. */
  private void secondIndexerIsRefused(Path catalog, Path root) throws Exception {
    Path out = tmp.resolve("second.out");
    Path err = tmp.resolve("second.err");
    Process second = new ProcessBuilder(command(catalog, root)).redirectOutput(out.toFile()).redirectError(err.toFile())
        .start();
    try {
      assertThat(second.waitFor(120, TimeUnit.SECONDS)).isTrue();
      assertThat(second.exitValue()).as("exit code of the second indexer").isEqualTo(3);
      assertThat(Files.readString(err)).contains("catalog in use");
      assertThat(Files.readString(out)).doesNotContain("done");
    } finally {
      second.destroyForcibly();
    }
  }

  /** The checks that must hold at any moment a crash can leave behind. */
  private void checkAfterCrash(Path catalog, List<Decision> decisions, String context)
      throws IOException {
    try (Library library = Library.open(catalog)) {
      assertThat(CatalogChecks.integrityCheck(library)).as(context).isEqualTo("ok");
      assertThat(library.decisions().all()).as(context).isEqualTo(decisions);
      CatalogChecks.noDuplicatesOrOrphans(library, context);
      // The index is committed after the catalog, so before any repair it holds no image the catalog lacks.
      Set<Long> ready = new HashSet<>();
      library.images().withStatus(ImageStatus.READY).forEach(r -> ready.add(r.id()));
      try (LuceneVectorIndex idx = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir())) {
        assertThat(ready).as("%s: ready images contain every indexed id", context).containsAll(idx.ids());
      }
    }
    // On a copy (the next run must meet the crash as it was): the next open's sync makes both agree exactly.
    Path copy = tmp.resolve("copy");
    Folders.deleteTree(copy);
    Files.createDirectories(copy);
    for (String name : new String[] {"catalog.db", "catalog.db-wal", "catalog.db-shm"}) {
      if (Files.exists(catalog.resolve(name))) {
        Files.copy(catalog.resolve(name), copy.resolve(name));
      }
    }
    copyFolder(catalog.resolve("vectors"), copy.resolve("vectors"));
    Files.deleteIfExists(copy.resolve("vectors/write.lock"));
    try (Library library = Library.open(copy)) {
      String model = LibrarySettings.activeModel(library.features()).orElseThrow();
      try (LuceneVectorIndex idx = LuceneVectorIndex.open(library.catalog().vectorDir(),
          LuceneIndexOptions.defaults())) {
        List<Long> invalid = new ArrayList<>();
        VectorSync.sync(library.features(), idx, model, false, invalid);
        assertThat(invalid).as(context).isEmpty();
      }
      CatalogChecks.catalogAndIndexAgree(library, context + ", after sync");
    }
  }

  private Process child(Path catalog, Path root) throws IOException {
    return new ProcessBuilder(command(catalog, root))
        .redirectOutput(catalog.resolveSibling("child.out").toFile())
        .redirectError(catalog.resolveSibling("child.err").toFile())
        .start();
  }

  private static List<String> command(Path catalog, Path root) {
    String java = ProcessHandle.current().info().command().orElse(
        Path.of(System.getProperty("java.home"), "bin", "java").toString());
    return List.of(java, "--add-modules", "jdk.incubator.vector", "--enable-native-access=ALL-UNNAMED",
        "-Dai.djl.offline=true", "-Djava.awt.headless=true", "-Xmx1g",
        "-Dorg.slf4j.simpleLogger.defaultLogLevel=warn",
        "-cp", System.getProperty("java.class.path"), IndexingChild.class.getName(),
        catalog.toString(), root.toString(), "2", "16");
  }

  /**
   * Changes 60 of the good files (one byte appended after the JPEG end marker, which decoders ignore), so the next run
   * analyses them again; they stay good files.
   */
  private static void changeSome(List<String> good, Set<String> keep, SplittableRandom rnd) throws IOException {
    List<String> jpegs = good.stream().filter(g -> g.endsWith(".jpg") && !keep.contains(g)).toList();
    for (int i = 0; i < 60 && !jpegs.isEmpty(); i++) {
      Path file = Path.of(jpegs.get(rnd.nextInt(jpegs.size())));
      Files.write(file, new byte[] {0}, java.nio.file.StandardOpenOption.APPEND);
    }
  }

  private static void awaitLine(Process p, Path catalog, String prefix, int seconds) throws Exception {
    long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
    Path out = catalog.resolveSibling("child.out");
    while (System.nanoTime() < end && p.isAlive()) {
      if (Files.exists(out) && Files.readString(out, StandardCharsets.UTF_8).contains(prefix)) {
        return;
      }
      Thread.sleep(20);
    }
  }

  /** The size of the run's analysis work and the last thing it said. */
  private static String summary(Path catalog) throws IOException {
    List<String> lines = Files.readAllLines(catalog.resolveSibling("child.out"));
    String work = lines.stream().filter(l -> l.startsWith("phase analysing")).findFirst().orElse("");
    return lines.isEmpty() ? "(no output yet)" : work + " ... " + lines.get(lines.size() - 1);
  }

  private static String lastLine(Path catalog) throws IOException {
    List<String> lines = Files.readAllLines(catalog.resolveSibling("child.out"));
    return lines.isEmpty() ? "(no output)" : lines.get(lines.size() - 1);
  }

  private static List<String> concat(List<String> a, List<String> b) {
    List<String> all = new ArrayList<>(a);
    all.addAll(b);
    return all;
  }

  private static void copyFolder(Path from, Path to) throws IOException {
    try (Stream<Path> files = Files.walk(from)) {
      for (Path p : files.toList()) {
        Path target = to.resolve(from.relativize(p).toString());
        if (Files.isDirectory(p)) {
          Files.createDirectories(target);
        } else {
          Files.copy(p, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
        }
      }
    }
  }

}
