package org.morphscout.indexer.ingest;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * How {@link LibraryScanner} walks.
 *
 * @param links which symbolic links to follow; default {@link LinkPolicy#NONE}
 * @param includeHidden whether to enter hidden folders and list hidden files (names starting with '.', e.g.
 *     macOS "._IMG.jpg" resource forks); default false
 * @param excludedFolders folders never entered, typically the catalog folder when it lies inside a root;
 *     default none
 * @param extensions lower-case file extensions (without dot) that count as images; default {@link #IMAGE_EXTENSIONS}
 */
public record ScanOptions(
    LinkPolicy links, boolean includeHidden, Set<Path> excludedFolders, Set<String> extensions) {

  /** Which symbolic links a scan follows. */
  public enum LinkPolicy {
    /** Follow no links (default): links are neither entered nor listed; a root that is itself a link is entered. */
    NONE,
    /** Follow links whose target lies inside one of the scanned roots. */
    WITHIN_ROOTS,
    /** Follow every link, also out of the roots. Loops are detected and reported. */
    ANY
  }

  /** Extensions ImageIoDecoder decodes (JPEG, PNG, TIFF, BMP, GIF, WebP). */
  public static final Set<String> DECODABLE_EXTENSIONS =
      Set.of("jpg", "jpeg", "jpe", "png", "tif", "tiff", "bmp", "gif", "webp");

  /**
   * Formats found so that the catalog can report them as unsupported rather than silently miss them: HEIF/HEIC,
   * AVIF and camera raw (Canon CR2, Nikon NEF, Sony ARW, Adobe DNG, Fujifilm RAF, Olympus ORF, Panasonic RW2).
   */
  public static final Set<String> UNSUPPORTED_EXTENSIONS =
      Set.of("heic", "heif", "avif", "cr2", "nef", "arw", "dng", "raf", "orf", "rw2");

  /** Default: decodable plus unsupported extensions. */
  public static final Set<String> IMAGE_EXTENSIONS =
      java.util.stream.Stream.concat(DECODABLE_EXTENSIONS.stream(), UNSUPPORTED_EXTENSIONS.stream())
          .collect(Collectors.toUnmodifiableSet());

  public ScanOptions {
    Objects.requireNonNull(links, "links");
    excludedFolders = Set.copyOf(excludedFolders);
    extensions = extensions.stream()
        .map(e -> e.startsWith(".") ? e.substring(1) : e)
        .map(e -> e.toLowerCase(Locale.ROOT))
        .collect(Collectors.toUnmodifiableSet());
    if (extensions.isEmpty()) {
      throw new IllegalArgumentException("extensions must not be empty");
    }
  }

  /** Whether a file of this name counts as an image (its extension, in any case, is one of {@link #extensions}). */
  public boolean countsAsImage(String fileName) {
    return extensions.contains(FormatSniffer.extension(fileName));
  }

  /** No links followed, hidden entries skipped, nothing excluded, {@link #IMAGE_EXTENSIONS}. */
  public static ScanOptions defaults() {
    return new ScanOptions(LinkPolicy.NONE, false, Set.of(), IMAGE_EXTENSIONS);
  }

  public ScanOptions withLinks(LinkPolicy policy) {
    return new ScanOptions(policy, includeHidden, excludedFolders, extensions);
  }

  public ScanOptions withExcludedFolders(Set<Path> folders) {
    return new ScanOptions(links, includeHidden, folders, extensions);
  }

  public ScanOptions withIncludeHidden(boolean include) {
    return new ScanOptions(links, include, excludedFolders, extensions);
  }
}
