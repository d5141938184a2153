package org.morphscout.indexer.silhouette;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.morphscout.indexer.MorphscoutException;

/**
 * Fetches a package tarball with the local {@code npm pack <spec>} (npm's own client, cache and registry settings),
 * only when {@code npm} is on the PATH. Used once, at install time, never during indexing. Thread-safe.
 */
final class NpmPack {
  private static final long TIMEOUT_MINUTES = 10;

  private final String pathVariable;
  private final boolean offline;

  /**
   * @param pathVariable the PATH to search for npm (normally {@code System.getenv("PATH")})
   * @param offline pass {@code --offline}: use only npm's local cache, never the network (for tests)
   */
  NpmPack(String pathVariable, boolean offline) {
    this.pathVariable = pathVariable == null ? "" : pathVariable;
    this.offline = offline;
  }

  NpmPack(String pathVariable) {
    this(pathVariable, false);
  }

  NpmPack() {
    this(System.getenv("PATH"), false);
  }

  /** The npm executable on the PATH, if any. */
  Optional<Path> locate() {
    boolean windows = System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).startsWith("windows");
    List<String> names = windows ? List.of("npm.cmd", "npm.exe", "npm") : List.of("npm");
    for (String dir : pathVariable.split(File.pathSeparator)) {
      if (dir.isBlank()) {
        continue;
      }
      for (String n : names) {
        Path p = Path.of(dir, n);
        if (Files.isRegularFile(p) && Files.isExecutable(p)) {
          return Optional.of(p);
        }
      }
    }
    return Optional.empty();
  }

  /**
   * Runs {@code npm pack spec} in {@code workDir} and returns the tarball it wrote there.
   *
   * @throws MorphscoutException when npm is missing or fails
   */
  Path pack(String spec, Path workDir) throws IOException {
    Path npm = locate()
        .orElseThrow(() -> new MorphscoutException(
            "Cannot fetch " + spec + ": npm is not on the PATH. Install Node.js/npm, or download the package"
                + " tarball (or the model file) yourself and install it from that file."));
    Path log = workDir.resolve("npm-pack.log");
    List<String> command = new java.util.ArrayList<>(List.of(npm.toString(), "pack", spec));
    if (offline) {
      command.add("--offline");
    }
    Process process = new ProcessBuilder(command)
        .directory(workDir.toFile())
        .redirectErrorStream(true)
        .redirectOutput(log.toFile())
        .start();
    try {
      if (!process.waitFor(TIMEOUT_MINUTES, TimeUnit.MINUTES)) {
        process.destroyForcibly();
        throw new MorphscoutException("npm pack " + spec + " did not finish within " + TIMEOUT_MINUTES + " minutes");
      }
    } catch (InterruptedException e) {
      process.destroyForcibly();
      Thread.currentThread().interrupt();
      throw new MorphscoutException("npm pack " + spec + " was interrupted", e);
    }
    if (process.exitValue() != 0) {
      throw new MorphscoutException("npm pack " + spec + " failed (exit " + process.exitValue() + "): "
          + tail(Files.readString(log)));
    }
    try (Stream<Path> files = Files.list(workDir)) {
      return files.filter(p -> p.getFileName().toString().endsWith(".tgz"))
          .findFirst()
          .orElseThrow(() -> new MorphscoutException("npm pack " + spec + " wrote no .tgz file in " + workDir));
    }
  }

  private static String tail(String s) {
    String t = s.strip();
    return t.length() <= 600 ? t : "..." + t.substring(t.length() - 600);
  }
}
