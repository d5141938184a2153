package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.morphscout.app.Main;

/** Runs command lines in-process against one catalog folder and parses what they print. */
final class Cli {
  private static final ObjectMapper JSON = new ObjectMapper();

  private final Path catalog;

  Cli(Path catalog) {
    this.catalog = catalog;
  }

  /** What one command line printed and returned. */
  record Run(int code, String out, String err) {
    JsonNode json() {
      try {
        return JSON.readTree(out);
      } catch (IOException e) {
        throw new AssertionError("stdout is not JSON (exit " + code + ", stderr: " + err + "):\n" + out, e);
      }
    }

    /** RFC 4180 records with the first row as the header. */
    List<CSVRecord> csv() {
      try {
        return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
            .parse(new StringReader(out)).getRecords();
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }

    List<String> csvHeader() {
      try {
        return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
            .parse(new StringReader(out)).getHeaderNames();
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }

    /** Asserts a clean user-facing failure: the given code, one line on stderr, no stack trace. */
    Run failsCleanly(int expectedCode) {
      assertThat(code).as("exit code; stderr: %s", err).isEqualTo(expectedCode);
      assertThat(err.strip().lines().count()).as("one error line, got:%n%s", err).isEqualTo(1);
      assertThat(err).doesNotContain("\tat ", "Exception:");
      return this;
    }

    Run succeeds() {
      assertThat(code).as("exit code; stderr: %s", err).isZero();
      return this;
    }
  }

  /** Runs {@code morphscout --catalog <catalog> args...}. */
  Run run(String... args) {
    List<String> all = new ArrayList<>(List.of("--catalog", catalog.toString()));
    all.addAll(List.of(args));
    return runRaw(all.toArray(String[]::new));
  }

  /** Runs {@code morphscout args...} without naming a catalog. */
  static Run runRaw(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code;
    try (PrintWriter o = new PrintWriter(out); PrintWriter e = new PrintWriter(err)) {
      code = Main.execute(args, o, e);
    }
    return new Run(code, out.toString(), err.toString());
  }

  static List<String> texts(JsonNode array) {
    List<String> out = new ArrayList<>();
    array.forEach(n -> out.add(n.asText()));
    return out;
  }

  static Path png(Path file, BufferedImage image) {
    try {
      Files.createDirectories(file.getParent());
      ImageIO.write(image, "png", file.toFile());
      return file;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  static Path jpeg(Path file, BufferedImage image) {
    try {
      Files.createDirectories(file.getParent());
      BufferedImage rgb = new BufferedImage(image.getWidth(), image.getHeight(), BufferedImage.TYPE_INT_RGB);
      rgb.createGraphics().drawImage(image, 0, 0, null);
      ImageIO.write(rgb, "jpg", file.toFile());
      return file;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  static String abs(Path p) {
    return p.toAbsolutePath().normalize().toString();
  }
}
