package org.morphscout.indexer.ingest;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Finds image files below one or more roots by extension (case-insensitive).
 *
 * <p>Robust against what real libraries contain: files that vanish or folders that cannot be read while walking
 * become {@link ScanProblem}s instead of aborting; symbolic links are not followed unless {@link ScanOptions#links()}
 * says so, and when following, loops are detected by the JDK walker ({@link FileSystemLoopException}) and each real
 * file is listed once; hidden folders and the excluded (catalog) folders are skipped. Any file name the file system
 * allows works (spaces, non-ASCII letters, newlines). The result is sorted by path, so it is deterministic.
 *
 * <p>Thread-safe: each scan keeps its state on the stack.
 */
public final class LibraryScanner {
  private static final Logger LOG = LoggerFactory.getLogger(LibraryScanner.class);

  private final ScanOptions options;

  public LibraryScanner(ScanOptions options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** Scans {@code roots} without progress reporting or cancellation. */
  public ScanResult scan(List<Path> roots) throws IOException {
    return scan(roots, ProgressListener.NONE, CancellationToken.none());
  }

  /**
   * Scans {@code roots}. Reports phase "scan" (total unknown) and the number of files found per folder.
   *
   * @throws CancellationToken.CancelledException when {@code cancel} is cancelled
   */
  public ScanResult scan(List<Path> roots, ProgressListener progress, CancellationToken cancel)
      throws IOException {
    progress.phase("scan", -1);
    List<Path> realRoots = new ArrayList<>();
    List<ScanProblem> problems = new ArrayList<>();
    List<FoundFile> found = new ArrayList<>();
    for (Path root : roots) {
      try {
        realRoots.add(root.toRealPath());
      } catch (NoSuchFileException e) {
        problems.add(new ScanProblem(root, "folder not found"));
      }
    }
    Set<Path> excluded = new HashSet<>();
    for (Path p : options.excludedFolders()) {
      excluded.add(p.toAbsolutePath().normalize());
      try {
        excluded.add(p.toRealPath());
      } catch (IOException e) {
        // not there (yet): the absolute form is enough
      }
    }
    // Always walk with FOLLOW_LINKS so that a root which is itself a link (a Pictures folder moved to another
    // disk) is entered; every other link is then judged by linkAllowed() under the policy.
    EnumSet<FileVisitOption> visitOptions = EnumSet.of(FileVisitOption.FOLLOW_LINKS);
    for (Path root : roots) {
      if (!Files.exists(root)) {
        continue;
      }
      Visitor visitor = new Visitor(root, realRoots, excluded, found, problems, progress, cancel);
      Files.walkFileTree(root, visitOptions, Integer.MAX_VALUE, visitor);
    }
    found.sort(Comparator.comparing(FoundFile::path));
    problems.sort(Comparator.comparing(ScanProblem::path));
    List<FoundFile> unique = dropDuplicates(found, options.links() != ScanOptions.LinkPolicy.NONE);
    progress.finished();
    return new ScanResult(unique, problems);
  }

  /**
   * Lists each file once: overlapping roots yield the same path twice, and (when following links) the same real
   * file may be reached through several links; the first path in sorted order is kept.
   */
  private static List<FoundFile> dropDuplicates(List<FoundFile> sorted, boolean byRealPath) {
    Set<Path> seen = new HashSet<>();
    List<FoundFile> out = new ArrayList<>();
    for (FoundFile f : sorted) {
      Path real = f.path().toAbsolutePath().normalize();
      if (byRealPath) {
        try {
          real = f.path().toRealPath();
        } catch (IOException e) {
          // vanished since: keep it under its own path, the decoder will report it
        }
      }
      if (seen.add(real)) {
        out.add(f);
      }
    }
    return out;
  }

  private boolean isHidden(Path p) {
    if (options.includeHidden()) {
      return false;
    }
    Path name = p.getFileName();
    if (name != null && name.toString().startsWith(".")) {
      return true;
    }
    try {
      return Files.isHidden(p); // DOS hidden attribute on Windows
    } catch (IOException e) {
      return false;
    }
  }

  private boolean isImageName(Path file) {
    Path name = file.getFileName();
    return name != null && options.countsAsImage(name.toString());
  }

  private final class Visitor extends SimpleFileVisitor<Path> {
    private final Path root;
    private final List<Path> realRoots;
    private final Set<Path> excluded;
    private final List<FoundFile> found;
    private final List<ScanProblem> problems;
    private final ProgressListener progress;
    private final CancellationToken cancel;

    Visitor(Path root, List<Path> realRoots, Set<Path> excluded, List<FoundFile> found,
        List<ScanProblem> problems, ProgressListener progress, CancellationToken cancel) {
      this.root = root;
      this.realRoots = realRoots;
      this.excluded = excluded;
      this.found = found;
      this.problems = problems;
      this.progress = progress;
      this.cancel = cancel;
    }

    @Override
    public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
      cancel.throwIfCancelled();
      if (!dir.equals(root) && isHidden(dir)) {
        return FileVisitResult.SKIP_SUBTREE;
      }
      if (isExcluded(dir)) {
        LOG.debug("Skipping excluded folder {}", dir);
        return FileVisitResult.SKIP_SUBTREE;
      }
      if (!dir.equals(root) && Files.isSymbolicLink(dir) && !linkAllowed(dir)) {
        LOG.debug("Not following link {} out of the scanned roots", dir);
        return FileVisitResult.SKIP_SUBTREE;
      }
      progress.progressed(found.size(), dir.toString());
      return FileVisitResult.CONTINUE;
    }

    @Override
    public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
      if (attrs.isSymbolicLink()) {
        // With FOLLOW_LINKS only broken links arrive with the link's own attributes.
        if (options.links() != ScanOptions.LinkPolicy.NONE && isImageName(file)) {
          problems.add(new ScanProblem(file, "broken symbolic link"));
        }
        return FileVisitResult.CONTINUE;
      }
      if (!attrs.isRegularFile() || isHidden(file) || !isImageName(file)) {
        return FileVisitResult.CONTINUE;
      }
      if (Files.isSymbolicLink(file) && !linkAllowed(file)) {
        return FileVisitResult.CONTINUE;
      }
      if (!nameRoundTrips(file)) {
        problems.add(new ScanProblem(file, "the file name is not valid text in the system's character set (UTF-8 "
            + "expected), so it cannot be stored faithfully; rename the file (for example with convmv) and index "
            + "again"));
        return FileVisitResult.CONTINUE;
      }
      found.add(new FoundFile(file, attrs.size(), attrs.lastModifiedTime().toInstant()));
      return FileVisitResult.CONTINUE;
    }

    /**
     * Whether the path's text names the same file again. A name whose bytes the platform cannot decode (not UTF-8,
     * or any non-ASCII name under a non-UTF-8 locale) turns into replacement characters in its text form, which would
     * be stored and later name no file.
     */
    private boolean nameRoundTrips(Path file) {
      String text = file.toString();
      if (text.indexOf('\uFFFD') < 0) {
        return true;
      }
      try {
        return Files.exists(Path.of(text), java.nio.file.LinkOption.NOFOLLOW_LINKS)
            && Files.isSameFile(Path.of(text), file);
      } catch (IOException | java.nio.file.InvalidPathException e) {
        return false;
      }
    }

    @Override
    public FileVisitResult visitFileFailed(Path file, IOException exc) {
      if (exc instanceof FileSystemLoopException && options.links() == ScanOptions.LinkPolicy.NONE) {
        return FileVisitResult.CONTINUE; // a link we would not have followed anyway
      }
      problems.add(new ScanProblem(file, describe(exc)));
      return FileVisitResult.CONTINUE;
    }

    @Override
    public FileVisitResult postVisitDirectory(Path dir, IOException exc) {
      if (exc != null) {
        problems.add(new ScanProblem(dir, describe(exc)));
      }
      return FileVisitResult.CONTINUE;
    }

    private boolean isExcluded(Path dir) {
      if (excluded.isEmpty()) {
        return false;
      }
      if (excluded.contains(dir.toAbsolutePath().normalize())) {
        return true;
      }
      try {
        return excluded.contains(dir.toRealPath());
      } catch (IOException e) {
        return false;
      }
    }

    /** Whether the link's target may be entered under the current policy (a root is always entered). */
    private boolean linkAllowed(Path link) {
      if (link.equals(root) || options.links() == ScanOptions.LinkPolicy.ANY) {
        return true;
      }
      if (options.links() == ScanOptions.LinkPolicy.NONE) {
        return false;
      }
      try {
        Path real = link.toRealPath();
        return realRoots.stream().anyMatch(real::startsWith);
      } catch (IOException e) {
        return false;
      }
    }
  }

  /** Short phrases for the scan problems the catalog shows. */
  static String describe(IOException exc) {
    if (exc instanceof FileSystemLoopException) {
      return "symbolic link loop (not followed again)";
    }
    if (exc instanceof NoSuchFileException) {
      return "vanished during the scan";
    }
    if (exc instanceof AccessDeniedException) {
      return "permission denied";
    }
    return "unreadable: " + (exc.getMessage() == null ? exc.getClass().getSimpleName() : exc.getMessage());
  }
}
