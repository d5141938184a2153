package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Collection;
import org.morphscout.indexer.DiskSpace;
import org.morphscout.indexer.MorphscoutException;

/**
 * The rules for every file Morphscout writes at a place the user names (previews, contact sheets, exports): the place
 * must not be a folder or one of the inputs, its folder must be writable, and the file is written beside its target
 * under a temporary name and moved into place only when complete. So an input is never overwritten, a folder is never
 * replaced, and a failed write (full disk, no permission) leaves no half-written file behind.
 */
public final class OutputFile {
  /** Writes the content to the given (temporary) file. */
  @FunctionalInterface
  public interface Body {
    void writeTo(Path file) throws IOException;
  }

  private OutputFile() {}

  /**
   * Checks, before any work is done, that {@code file} may be written.
   *
   * @param inputs files the output is made from; it must not be one of them
   * @throws MorphscoutException saying what is wrong with the place, in the user's words
   */
  public static void check(Path file, Collection<Path> inputs) {
    Path target = file.toAbsolutePath().normalize();
    if (Files.isDirectory(target)) {
      throw new MorphscoutException(target + " is a folder; name a file to write (a new file, or one inside it)");
    }
    if (Files.exists(target) && !Files.isRegularFile(target)) {
      throw new MorphscoutException(target + " exists and is not a regular file; name another output file");
    }
    for (Path input : inputs) {
      if (sameFile(target, input.toAbsolutePath().normalize())) {
        throw new MorphscoutException(target + " is one of the input images and would be overwritten; name another "
            + "output file");
      }
    }
    Path folder = target.getParent();
    Path existing = folder;
    while (existing != null && !Files.exists(existing)) {
      existing = existing.getParent();
    }
    if (existing != null && !Files.isDirectory(existing)) {
      throw new MorphscoutException("cannot write " + target + ": " + existing + " is a file, not a folder");
    }
    if (existing != null && !Files.isWritable(existing)) {
      throw new MorphscoutException("cannot write " + target + ": the folder " + existing + " is not writable");
    }
    if (Files.exists(target) && !Files.isWritable(target)) {
      throw new MorphscoutException("cannot write " + target + ": the file exists and is read-only");
    }
  }

  /** Checks {@code file} (see {@link #check}) and writes it through a temporary file moved into place when complete. */
  public static void write(Path file, Collection<Path> inputs, Body body) throws IOException {
    check(file, inputs);
    Path target = file.toAbsolutePath().normalize();
    Path folder = target.getParent();
    Files.createDirectories(folder);
    Path temp;
    try {
      temp = Files.createTempFile(folder, "." + target.getFileName() + ".", ".part");
    } catch (AccessDeniedException e) {
      throw new MorphscoutException("cannot write " + target + ": the folder " + folder + " is not writable", e);
    }
    boolean done = false;
    try {
      body.writeTo(temp);
      try {
        Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
      }
      done = true;
    } catch (FileSystemException e) {
      throw new MorphscoutException("cannot write " + target + ": " + DiskSpace.describe(e, folder), e);
    } finally {
      if (!done) {
        Files.deleteIfExists(temp);
      }
    }
  }

  private static boolean sameFile(Path a, Path b) {
    if (a.equals(b)) {
      return true;
    }
    try {
      return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
    } catch (IOException e) {
      return false;
    }
  }
}
