package org.morphscout.app.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.morphscout.indexer.pairing.PairComponent;
import org.morphscout.indexer.pairing.PairScore;

/** Turns pair scores into JSON objects and CSV cells the same way for every command. */
final class PairRows {
  private PairRows() {}

  static Map<String, Object> json(String first, String second, PairScore s) {
    Map<String, Object> row = new LinkedHashMap<>();
    row.put("first", first);
    row.put("second", second);
    row.put("score", round(s.score(), 1));
    row.put("verdict", s.verdict().label());
    row.put("components", rounded(s.components()));
    row.put("measures", rounded(s.measures()));
    row.put("reasons", s.reasons());
    return row;
  }

  /** The CSV columns of the sub-scores: one per component ({@link PairComponent#csvColumn()}), in their order. */
  static List<String> componentColumns() {
    List<String> out = new ArrayList<>();
    for (PairComponent c : PairComponent.values()) {
      out.add(c.csvColumn());
    }
    return out;
  }

  /** The sub-scores of a pair for {@link #componentColumns()}, rounded as in JSON; empty where one is missing. */
  static List<Object> componentCells(PairScore s) {
    List<Object> out = new ArrayList<>();
    for (PairComponent c : PairComponent.values()) {
      Double v = s.components().get(c.key());
      out.add(v == null ? "" : round(v, 4));
    }
    return out;
  }

  static Map<String, Double> rounded(Map<String, Double> values) {
    Map<String, Double> out = new LinkedHashMap<>();
    values.forEach((k, v) -> out.put(k, round(v, 4)));
    return out;
  }

  static double round(double v, int decimals) {
    if (!Double.isFinite(v)) {
      return v;
    }
    double f = Math.pow(10, decimals);
    return Math.round(v * f) / f;
  }

  /** Reasons joined for one CSV cell or one text line. */
  static String reasons(List<String> reasons) {
    return String.join("; ", reasons);
  }
}
