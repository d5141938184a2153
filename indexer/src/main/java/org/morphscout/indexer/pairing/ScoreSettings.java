package org.morphscout.indexer.pairing;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import org.morphscout.indexer.MorphscoutException;

/**
 * Every setting of the pair score, in their documented order (each component's, in component order, then the general
 * ones), and the reading of "key = value" settings into a {@link ScoreConfig}: keys are the settings' keys or their
 * earlier names, values numbers within the setting's range. Unknown keys, two names of one setting and values not
 * accepted become {@link MorphscoutException}s naming the source (a file or "command-line options") and the key as
 * given. Stateless.
 */
public final class ScoreSettings {
  private static final List<ScoreSetting> ALL;
  private static final Map<String, ScoreSetting> BY_NAME = new LinkedHashMap<>();

  static {
    List<ScoreSetting> all = new ArrayList<>();
    for (PairComponent c : PairComponent.all()) {
      all.addAll(c.settings());
    }
    all.addAll(ScoreConfig.generalSettings());
    ALL = Collections.unmodifiableList(all);
    for (ScoreSetting s : ALL) {
      name(s.key(), s);
    }
    for (ScoreSetting s : ALL) {
      for (String earlier : s.earlierNames()) {
        name(earlier, s);
      }
    }
  }

  private ScoreSettings() {}

  /** Every setting, in the documented order. */
  public static List<ScoreSetting> all() {
    return ALL;
  }

  /** The setting of this key or earlier name, if any. */
  public static Optional<ScoreSetting> byName(String name) {
    return Optional.ofNullable(BY_NAME.get(name));
  }

  static ScoreConfig apply(ScoreConfig base, Map<String, String> given, String source) {
    TreeSet<String> unknown = new TreeSet<>();
    Map<ScoreSetting, String> names = new LinkedHashMap<>();
    Map<ScoreSetting, Double> values = new LinkedHashMap<>();
    for (Map.Entry<String, String> e : given.entrySet()) {
      ScoreSetting s = BY_NAME.get(e.getKey());
      if (s == null) {
        unknown.add(e.getKey());
        continue;
      }
      String other = names.put(s, e.getKey());
      if (other != null) {
        throw new MorphscoutException("settings " + other + " and " + e.getKey() + " in " + source
            + " are one setting (earlier names are still read): give only " + s.key());
      }
      values.put(s, parse(s, e.getKey(), e.getValue(), source));
    }
    if (!unknown.isEmpty()) {
      List<String> known = new ArrayList<>();
      ALL.forEach(s -> known.add(s.key()));
      throw new MorphscoutException("unknown setting" + (unknown.size() > 1 ? "s " : " ") + String.join(", ", unknown)
          + " in " + source + "; known settings: " + String.join(", ", known));
    }
    try {
      return base.with(values);
    } catch (IllegalArgumentException e) {
      throw new MorphscoutException("invalid settings in " + source + ": " + e.getMessage(), e);
    }
  }

  private static double parse(ScoreSetting s, String name, String raw, String source) {
    String text = raw == null ? "" : raw.trim();
    double v;
    try {
      v = Double.parseDouble(text);
    } catch (NumberFormatException e) {
      throw new MorphscoutException("setting " + name + " in " + source + " must be "
          + (s.whole() ? "a whole number" : "a number") + ", got '" + text + "'", e);
    }
    String problem = s.problem(v);
    if (problem != null) {
      throw new MorphscoutException("setting " + name + " in " + source + " " + problem);
    }
    return v;
  }

  private static void name(String name, ScoreSetting s) {
    ScoreSetting before = BY_NAME.put(name, s);
    if (before != null) {
      throw new IllegalStateException("two settings are called " + name + ": " + before + " and " + s);
    }
  }
}
