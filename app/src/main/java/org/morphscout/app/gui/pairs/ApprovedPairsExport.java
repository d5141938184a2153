package org.morphscout.app.gui.pairs;

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
import org.morphscout.indexer.catalog.DecisionStore;
import org.morphscout.indexer.text.CsvCells;

/**
 * Writes approved pairs as CSV (RFC 4180, header row) or as a JSON array of objects. Columns: a_id, a_path, b_id,
 * b_path, note, decided_at (ISO-8601 instant).
 */
final class ApprovedPairsExport {
  static final String[] COLUMNS = {"a_id", "a_path", "b_id", "b_path", "note", "decided_at"};

  private ApprovedPairsExport() {}

  /** Writes the approved decisions among {@code decisions}; returns how many were written. */
  static int write(List<DecisionStore.Decision> decisions, Path file, ExportFormat format) throws IOException {
    List<DecisionStore.Decision> approved = decisions.stream()
        .filter(d -> d.verdict() == DecisionStore.Verdict.APPROVED).toList();
    Path parent = file.toAbsolutePath().getParent();
    if (parent != null) {
      Files.createDirectories(parent);
    }
    try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
      if (format == ExportFormat.CSV) {
        try (CsvCells.Printer csv = CsvCells.printer(w, COLUMNS)) {
          for (DecisionStore.Decision d : approved) {
            csv.row(d.imageA(), d.pathA(), d.imageB(), d.pathB(), d.note() == null ? "" : d.note(),
                d.decidedAt());
          }
        }
      } else {
        List<Map<String, Object>> doc = new ArrayList<>();
        for (DecisionStore.Decision d : approved) {
          Map<String, Object> m = new LinkedHashMap<>();
          m.put(COLUMNS[0], d.imageA());
          m.put(COLUMNS[1], d.pathA());
          m.put(COLUMNS[2], d.imageB());
          m.put(COLUMNS[3], d.pathB());
          m.put(COLUMNS[4], d.note() == null ? "" : d.note());
          m.put(COLUMNS[5], d.decidedAt());
          doc.add(m);
        }
        new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
            .disable(com.fasterxml.jackson.core.JsonGenerator.Feature.AUTO_CLOSE_TARGET).writeValue(w, doc);
      }
    }
    return approved.size();
  }
}
