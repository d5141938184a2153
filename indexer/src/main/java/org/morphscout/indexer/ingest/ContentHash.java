package org.morphscout.indexer.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * SHA-256 (FIPS 180-4) of a file's bytes, streamed in 64 KiB blocks so memory stays constant for any file size.
 * Used to recognise moved or renamed files and unchanged content. Thread-safe (no state).
 */
public final class ContentHash {
  private static final int BLOCK = 1 << 16;

  private ContentHash() {}

  /** Lower-case hexadecimal SHA-256 of {@code file} (64 characters). */
  public static String sha256Hex(Path file) throws IOException {
    MessageDigest digest = newDigest();
    byte[] buffer = new byte[BLOCK];
    try (InputStream in = Files.newInputStream(file)) {
      int n;
      while ((n = in.read(buffer)) > 0) {
        digest.update(buffer, 0, n);
      }
    }
    return HexFormat.of().formatHex(digest.digest());
  }

  /** Lower-case hexadecimal SHA-256 of {@code bytes}. */
  public static String sha256Hex(byte[] bytes) {
    return HexFormat.of().formatHex(newDigest().digest(bytes));
  }

  private static MessageDigest newDigest() {
    try {
      return MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      // Every Java platform must provide SHA-256 (java.security.MessageDigest documentation).
      throw new IllegalStateException("SHA-256 missing from this Java runtime", e);
    }
  }
}
