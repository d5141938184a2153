package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/** Walking a library: nesting, odd names, links, loops, hidden and excluded folders, order. */
class LibraryScannerTest {
  @TempDir Path tmp;

  private static Path touch(Path file) throws IOException {
    Files.createDirectories(file.getParent());
    return Files.write(file, new byte[] {1, 2, 3});
  }

  private static List<Path> paths(ScanResult r) {
    return r.files().stream().map(FoundFile::path).toList();
  }

  private static boolean symlinksSupported(Path dir) {
    try {
      Path link = Files.createSymbolicLink(dir.resolve(".probe-link"), dir);
      Files.delete(link);
      return true;
    } catch (IOException | UnsupportedOperationException e) {
      return false;
    }
  }

  @Test
  void findsNestedImagesByExtensionCaseInsensitivelyInSortedOrder() throws Exception {
    Path root = tmp.resolve("lib");
    Path a = touch(root.resolve("2024/summer/IMG_0001.JPG"));
    Path b = touch(root.resolve("2024/summer/scan.Tiff"));
    Path c = touch(root.resolve("a.png"));
    Path d = touch(root.resolve("2023/raw/DSC_1.nef")); // found: reported as unsupported by the decoder later
    touch(root.resolve("2024/notes.txt"));
    touch(root.resolve("2024/summer/IMG_0001.JPG.xmp"));
    touch(root.resolve("noextension"));
    Files.setLastModifiedTime(c, FileTime.from(Instant.parse("2020-01-02T03:04:05Z")));

    ScanResult r = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root));

    assertThat(paths(r)).containsExactly(d, a, b, c); // Path order: "2023/..." < "2024/..." < "a.png"
    assertThat(r.problems()).isEmpty();
    FoundFile fc = r.files().get(3);
    assertThat(fc.size()).isEqualTo(3);
    assertThat(fc.mtime()).isEqualTo(Instant.parse("2020-01-02T03:04:05Z"));
  }

  @Test
  void overlappingRootsListEachFileOnce() throws Exception {
    Path root = tmp.resolve("lib");
    Path a = touch(root.resolve("2024/a.jpg"));
    Path b = touch(root.resolve("b.png"));
    ScanResult r = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root.resolve("2024"), root));
    assertThat(paths(r)).containsExactly(a, b);
  }

  @Test
  void oddNamesWork() throws Exception {
    Path root = tmp.resolve("lib");
    Path spaces = touch(root.resolve("holiday photos/beach at noon.jpeg"));
    Path accents = touch(root.resolve("Ålesund/Ærø_straße_日本.jpg"));
    Path newline;
    try {
      newline = touch(root.resolve("odd\nname.png"));
    } catch (IOException | java.nio.file.InvalidPathException e) {
      newline = null; // file systems that forbid newlines (Windows)
    }
    ScanResult r = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root));
    assertThat(paths(r)).contains(spaces, accents);
    if (newline != null) {
      assertThat(paths(r)).contains(newline);
    }
    assertThat(r.problems()).isEmpty();
  }

  @Test
  void hiddenAndExcludedFoldersAreSkipped() throws Exception {
    Path root = tmp.resolve("lib");
    Path keep = touch(root.resolve("keep.jpg"));
    touch(root.resolve(".thumbnails/t.jpg"));
    touch(root.resolve("._keep.jpg")); // macOS resource fork next to the real file
    Path catalog = root.resolve("morphscout-catalog");
    touch(catalog.resolve("thumbs/x.jpg"));

    ScanResult r = new LibraryScanner(ScanOptions.defaults().withExcludedFolders(Set.of(catalog)))
        .scan(List.of(root));
    assertThat(paths(r)).containsExactly(keep);

    ScanResult all = new LibraryScanner(ScanOptions.defaults().withIncludeHidden(true)).scan(List.of(root));
    assertThat(all.files()).hasSize(4);
  }

  @Test
  void linkOutsideTheRootIsNotFollowedByDefault() throws Exception {
    assumeTrue(symlinksSupported(tmp), "symbolic links not supported here");
    Path root = tmp.resolve("lib");
    Path inside = touch(root.resolve("in.jpg"));
    Path outside = tmp.resolve("elsewhere");
    touch(outside.resolve("out.jpg"));
    Path dirLink = Files.createSymbolicLink(root.resolve("linked-folder"), outside);
    Path fileLink = Files.createSymbolicLink(root.resolve("linked.jpg"), outside.resolve("out.jpg"));

    assertThat(paths(new LibraryScanner(ScanOptions.defaults()).scan(List.of(root)))).containsExactly(inside);
    assertThat(paths(new LibraryScanner(ScanOptions.defaults().withLinks(ScanOptions.LinkPolicy.WITHIN_ROOTS))
        .scan(List.of(root)))).containsExactly(inside);

    ScanResult any = new LibraryScanner(ScanOptions.defaults().withLinks(ScanOptions.LinkPolicy.ANY))
        .scan(List.of(root));
    // Both links reach the same real file: listed once, under the first path in sorted order.
    assertThat(paths(any)).containsExactly(inside, dirLink.resolve("out.jpg"));
    assertThat(fileLink.toRealPath()).isEqualTo(dirLink.resolve("out.jpg").toRealPath());
  }

  @Test
  void linkInsideTheRootIsFollowedWhenAsked() throws Exception {
    assumeTrue(symlinksSupported(tmp), "symbolic links not supported here");
    Path root = tmp.resolve("lib");
    Path real = touch(root.resolve("archive/2019/a.jpg"));
    Path linkRoot = tmp.resolve("lib2");
    Files.createDirectories(linkRoot);
    Path viaLink = Files.createSymbolicLink(linkRoot.resolve("best-of"), root.resolve("archive/2019"));

    ScanOptions within = ScanOptions.defaults().withLinks(ScanOptions.LinkPolicy.WITHIN_ROOTS);
    assertThat(paths(new LibraryScanner(within).scan(List.of(linkRoot)))).isEmpty(); // target not in a root
    assertThat(paths(new LibraryScanner(within).scan(List.of(root, linkRoot)))).containsExactly(real);
    assertThat(viaLink.resolve("a.jpg").toRealPath()).isEqualTo(real.toRealPath());
  }

  @Test
  void rootThatIsALinkIsEntered() throws Exception {
    assumeTrue(symlinksSupported(tmp), "symbolic links not supported here");
    Path disk = tmp.resolve("external-disk/photos");
    touch(disk.resolve("a.jpg"));
    Path root = Files.createSymbolicLink(tmp.resolve("Pictures"), disk);
    ScanResult r = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root));
    assertThat(paths(r)).containsExactly(root.resolve("a.jpg"));
  }

  @Test
  void loopIsSilentlyIgnoredWhenNotFollowingLinks() throws Exception {
    assumeTrue(symlinksSupported(tmp), "symbolic links not supported here");
    Path root = tmp.resolve("lib");
    Path a = touch(root.resolve("a/pic.jpg"));
    Files.createSymbolicLink(root.resolve("a/back-to-root"), root);
    ScanResult r = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root));
    assertThat(paths(r)).containsExactly(a);
    assertThat(r.problems()).isEmpty();
  }

  @Test
  void symlinkLoopEndsAndIsReported() throws Exception {
    assumeTrue(symlinksSupported(tmp), "symbolic links not supported here");
    Path root = tmp.resolve("lib");
    Path a = touch(root.resolve("a/pic.jpg"));
    Path loop = Files.createSymbolicLink(root.resolve("a/back-to-root"), root);

    ScanResult r = new LibraryScanner(ScanOptions.defaults().withLinks(ScanOptions.LinkPolicy.ANY))
        .scan(List.of(root));

    assertThat(paths(r)).containsExactly(a);
    assertThat(r.problems()).extracting(ScanProblem::path).containsExactly(loop);
    assertThat(r.problems().get(0).reason()).contains("loop");
  }

  @Test
  void brokenLinkIsReportedWhenFollowingLinks() throws Exception {
    assumeTrue(symlinksSupported(tmp), "symbolic links not supported here");
    Path root = tmp.resolve("lib");
    Path ok = touch(root.resolve("ok.jpg"));
    Path dangling = Files.createSymbolicLink(root.resolve("moved.jpg"), tmp.resolve("not-there.jpg"));

    ScanResult ignoring = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root));
    assertThat(paths(ignoring)).containsExactly(ok);
    assertThat(ignoring.problems()).isEmpty();

    ScanResult following = new LibraryScanner(ScanOptions.defaults().withLinks(ScanOptions.LinkPolicy.ANY))
        .scan(List.of(root));
    assertThat(paths(following)).containsExactly(ok);
    assertThat(following.problems()).containsExactly(new ScanProblem(dangling, "broken symbolic link"));
  }

  @Test
  void missingRootAndUnreadableFolderAreProblemsNotFailures() throws Exception {
    Path root = tmp.resolve("lib");
    Path ok = touch(root.resolve("ok.jpg"));
    Path locked = root.resolve("locked");
    touch(locked.resolve("secret.jpg"));
    Path missing = tmp.resolve("no-such-folder");
    boolean posix = Files.getFileStore(tmp).supportsFileAttributeView("posix");
    if (posix) {
      Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
    }
    try {
      ScanResult r = new LibraryScanner(ScanOptions.defaults()).scan(List.of(root, missing));
      assertThat(paths(r)).contains(ok);
      assertThat(r.problems()).contains(new ScanProblem(missing, "folder not found"));
      boolean permissionsEnforced = posix && !Files.isReadable(locked); // not enforced for root
      if (permissionsEnforced) {
        assertThat(r.problems()).contains(new ScanProblem(locked, "permission denied"));
      }
    } finally {
      if (posix) {
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwx------"));
      }
    }
  }

  @Test
  void vanishedEntriesAreDescribed() {
    // The walker reports a file removed between listing and reading through visitFileFailed; the phrase shown.
    assertThat(LibraryScanner.describe(new java.nio.file.NoSuchFileException("x")))
        .isEqualTo("vanished during the scan");
    assertThat(LibraryScanner.describe(new java.nio.file.AccessDeniedException("x"))).isEqualTo("permission denied");
  }

  @Test
  void cancellationStopsTheScan() throws Exception {
    Path root = tmp.resolve("lib");
    touch(root.resolve("x/a.jpg"));
    CancellationToken token = new CancellationToken();
    token.cancel();
    assertThatThrownBy(() -> new LibraryScanner(ScanOptions.defaults()).scan(List.of(root), ProgressListener.NONE, token))
        .isInstanceOf(CancellationToken.CancelledException.class);
  }
}
