package org.morphscout.indexer.library;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.morphscout.indexer.text.CsvCells;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;

/**
 * The one format of a list of decisions, written by {@code decisions --json|--csv} and by the browser's export of
 * approved pairs. CSV columns {@code first, second, decision, note, decided_at} (RFC 4180, a header row, cells under
 * {@link CsvCells}' formula rule); JSON {@code {"decisions": [{first, second, decision, note, decidedAt}], "notes"}}.
 * {@code decided_at} is the ISO-8601 instant the catalog stores (UTC), for scripts.
 */
public final class DecisionTable {
  /** The CSV header. */
  public static final List<String> CSV_COLUMNS = List.of("first", "second", "decision", "note", "decided_at");

  /** What an empty list says (in the JSON notes and on stderr). */
  public static final String NONE = "no decisions yet (morphscout decide FIRST SECOND approve|reject)";

  private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private DecisionTable() {}

  /** The decisions with the given decision word, in the order given; all of them when {@code only} is null. */
  public static List<Decision> only(List<Decision> decisions, DecisionKind only) {
    return decisions.stream().filter(d -> only == null || d.kind() == only).toList();
  }

  /** Writes the CSV form (header and one row a decision); does not close {@code out}. */
  public static void csv(Writer out, List<Decision> decisions) throws IOException {
    try (CsvCells.Printer csv = CsvCells.printer(out, CSV_COLUMNS.toArray(String[]::new))) {
      for (Decision d : decisions) {
        csv.row(d.pathA(), d.pathB(), d.kind().word(), d.note(), d.decidedAt());
      }
    }
  }

  /** The JSON document: the decisions and the notes that explain an empty list. */
  public static Map<String, Object> json(List<Decision> decisions, List<String> notes) {
    List<Map<String, Object>> rows = new ArrayList<>();
    for (Decision d : decisions) {
      Map<String, Object> row = new LinkedHashMap<>();
      row.put("first", d.pathA());
      row.put("second", d.pathB());
      row.put("decision", d.kind().word());
      row.put("note", d.note());
      row.put("decidedAt", d.decidedAt());
      rows.add(row);
    }
    Map<String, Object> doc = new LinkedHashMap<>();
    doc.put("decisions", rows);
    doc.put("notes", notes);
    return doc;
  }

  /**
   * Writes the decisions to {@code file} through {@link OutputFile} (never over an input, temporary file moved into
   * place): JSON when the name ends in {@code .json}, else CSV.
   */
  public static void write(Path file, List<Decision> decisions) throws IOException {
    boolean json = file.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".json");
    OutputFile.write(file, List.of(), temp -> {
      try (Writer w = Files.newBufferedWriter(temp, StandardCharsets.UTF_8)) {
        if (json) {
          w.write(JSON.writeValueAsString(json(decisions, decisions.isEmpty() ? List.of(NONE) : List.of())));
          w.write(System.lineSeparator());
        } else {
          csv(w, decisions);
        }
      }
    });
  }
}
