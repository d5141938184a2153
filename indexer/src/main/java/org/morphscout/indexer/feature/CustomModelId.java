package org.morphscout.indexer.feature;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** The catalog identifier of a user model: "custom:" + first 16 hex digits of the file's SHA-256 + ":WxH". */
final class CustomModelId {
  private CustomModelId() {}

  static String of(ModelDescription d) throws IOException {
    MessageDigest sha;
    try {
      sha = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java runtime has SHA-256", e);
    }
    try (InputStream in = new DigestInputStream(Files.newInputStream(d.modelFile()), sha)) {
      in.transferTo(OutputStream.nullOutputStream());
    }
    String hex = HexFormat.of().formatHex(sha.digest()).substring(0, 16);
    return "custom:" + hex + ":" + d.inputWidth() + "x" + d.inputHeight();
  }
}
