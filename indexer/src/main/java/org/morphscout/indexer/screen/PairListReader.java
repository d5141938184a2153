package org.morphscout.indexer.screen;

import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.NoSuchElementException;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.morphscout.indexer.MorphscoutException;

/**
 * Reads a CSV list of planned pairs one row at a time, in bounded memory (one row, at most {@link #MAX_ROW_BYTES}, is
 * held at a time), for files of any length. RFC 4180 CSV in UTF-8, with or without a byte-order mark; rows may be
 * quoted across lines. Each row becomes an {@link Entry}: a pair to screen, or the line number and what is wrong with
 * it (not UTF-8, unbalanced quote, too long, fewer than two paths), so one bad row never stops the file. A file that
 * is not text at all (UTF-16, NUL bytes) is refused as a whole.
 *
 * <p>A first row whose first cell does not look like an image path is a header: its third and later cells name the
 * extra columns, which are passed through.
 */
public final class PairListReader implements Closeable, Iterator<PairListReader.Entry> {
  /** The longest row accepted (bytes, quoted line breaks included). */
  public static final int MAX_ROW_BYTES = 1 << 20;

  private static final Set<String> IMAGE_EXTENSIONS = Set.of("jpg", "jpeg", "jpe", "png", "tif", "tiff", "bmp", "gif",
      "webp", "heic", "heif", "avif");
  private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setTrim(true).get();

  /**
   * One row of the list: a pair to screen, or why the row could not be read.
   *
   * @param line the row's first line number (1-based)
   * @param row the pair (null when {@code problem} is set)
   * @param problem what is wrong with the row, in plain words (null for a good row)
   */
  public record Entry(long line, ScreenRow row, String problem) {}

  private final Path file;
  private final Path base;
  private final InputStream in;
  private final List<String> extraNames = new ArrayList<>();
  private long lineNumber;
  private boolean atStart = true;
  private Entry next;

  /**
   * Opens {@code file} and reads its first row.
   *
   * @throws MorphscoutException when the file is not text (binary or UTF-16)
   */
  public PairListReader(Path file) throws IOException {
    this.file = file.toAbsolutePath().normalize();
    if (!Files.isRegularFile(this.file)) {
      throw new NoSuchFileException(this.file.toString());
    }
    this.base = this.file.getParent();
    this.in = new BufferedInputStream(Files.newInputStream(this.file), 1 << 16);
    try {
      refuseNonText();
      next = read();
      if (next != null && next.row() != null && !looksLikeImage(next.row().pathA())) {
        // A header: names for the extra columns.
        extraNames.addAll(next.row().extras());
        next = read();
      }
    } catch (IOException | RuntimeException e) {
      in.close();
      throw e;
    }
  }

  /** Names of the extra columns (from the header, else extra1, extra2, ... as far as the first row needs). */
  public List<String> extraNames() {
    List<String> names = new ArrayList<>(extraNames);
    int wanted = next != null && next.row() != null ? next.row().extras().size() : 0;
    while (names.size() < wanted) {
      names.add("extra" + (names.size() + 1));
    }
    return names;
  }

  @Override
  public boolean hasNext() {
    return next != null;
  }

  @Override
  public Entry next() {
    if (next == null) {
      throw new NoSuchElementException();
    }
    Entry e = next;
    try {
      next = read();
    } catch (IOException ex) {
      throw new java.io.UncheckedIOException(ex);
    }
    return e;
  }

  @Override
  public void close() throws IOException {
    in.close();
  }

  private void refuseNonText() throws IOException {
    in.mark(8192);
    byte[] head = in.readNBytes(8192);
    in.reset();
    if (head.length >= 2 && ((head[0] == (byte) 0xFE && head[1] == (byte) 0xFF)
        || (head[0] == (byte) 0xFF && head[1] == (byte) 0xFE))) {
      throw new MorphscoutException(file + ": the file is UTF-16 text; save it as UTF-8 (CSV UTF-8) and try again");
    }
    for (byte b : head) {
      if (b == 0) {
        throw new MorphscoutException(file + ": not a CSV text file (it holds binary data)");
      }
    }
  }

  /** The next non-empty row, or null at the end. */
  private Entry read() throws IOException {
    while (true) {
      long first = lineNumber + 1;
      ByteArrayOutputStream row = new ByteArrayOutputStream();
      boolean tooLong = false;
      boolean inQuotes = false;
      boolean any = false;
      int b;
      while ((b = in.read()) != -1) {
        any = true;
        if (b == '"') {
          inQuotes = !inQuotes;
        }
        if (b == '\n') {
          lineNumber++;
          if (!inQuotes) {
            break;
          }
        }
        if (row.size() < MAX_ROW_BYTES) {
          row.write(b);
        } else {
          tooLong = true;
          if (!inQuotes) {
            continue;
          }
          // An unbalanced quote would swallow the rest of the file: give up on this row at the limit.
          skipLine();
          return new Entry(first, null, "line " + first + ": unbalanced quote (a field opened with \" is not "
              + "closed)");
        }
      }
      if (!any) {
        return null;
      }
      if (tooLong) {
        return new Entry(first, null, "line " + first + ": the row is longer than " + (MAX_ROW_BYTES >> 20)
            + " MB");
      }
      if (inQuotes) {
        return new Entry(first, null, "line " + first + ": unbalanced quote (a field opened with \" is not closed)");
      }
      byte[] bytes = row.toByteArray();
      String text;
      try {
        text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
      } catch (CharacterCodingException e) {
        return new Entry(first, null, "line " + first + ": not UTF-8 text (save the file as UTF-8; Latin-1 and other "
            + "encodings are not read)");
      }
      if (atStart) {
        atStart = false;
        if (text.startsWith("\uFEFF")) {
          text = text.substring(1); // a byte-order mark, as spreadsheets write for "CSV UTF-8"
        }
      }
      if (text.isBlank()) {
        continue;
      }
      return parse(first, text);
    }
  }

  private void skipLine() throws IOException {
    int b;
    while ((b = in.read()) != -1 && b != '\n') {
      // skip
    }
    lineNumber++;
  }

  private Entry parse(long line, String text) {
    List<String> cells;
    try {
      List<CSVRecord> records = FORMAT.parse(new StringReader(text)).getRecords();
      if (records.size() != 1) {
        return new Entry(line, null, "line " + line + ": not one CSV row (a quote in the middle of a field?)");
      }
      cells = records.get(0).toList();
    } catch (IOException | java.io.UncheckedIOException | IllegalStateException e) {
      return new Entry(line, null, "line " + line + ": not a valid CSV row (a quote in the middle of a field must "
          + "be doubled, and the field quoted)");
    }
    if (cells.size() < 2 || cells.get(0).isEmpty() || cells.get(1).isEmpty()) {
      return new Entry(line, null, "line " + line + ": a row needs two image paths");
    }
    try {
      return new Entry(line, new ScreenRow(resolve(cells.get(0)), resolve(cells.get(1)),
          cells.subList(2, cells.size())), null);
    } catch (java.nio.file.InvalidPathException e) {
      return new Entry(line, null, "line " + line + ": not a usable path (" + e.getReason() + ")");
    }
  }

  private String resolve(String cell) {
    Path p = Path.of(cell);
    return (p.isAbsolute() ? p : base.resolve(p)).normalize().toString();
  }

  static boolean looksLikeImage(String cell) {
    int dot = cell.lastIndexOf('.');
    return dot > 0 && IMAGE_EXTENSIONS.contains(cell.substring(dot + 1).toLowerCase(Locale.ROOT));
  }
}
