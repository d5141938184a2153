package org.morphscout.indexer.pairing;

import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.morphscout.indexer.MorphscoutException;

/**
 * Applies "name = value" settings to a flat config record of numbers and booleans: each key must name a record
 * component, values are parsed by the component's type, and the record's own constructor validates the result.
 * Unknown keys and unparsable or invalid values become {@link MorphscoutException}s that name the source (a file or
 * "command line") and the setting.
 */
final class RecordSettings {
  private RecordSettings() {}

  static <R extends Record> R apply(R base, Map<String, String> settings, String source) {
    @SuppressWarnings("unchecked")
    Class<R> type = (Class<R>) base.getClass();
    RecordComponent[] components = type.getRecordComponents();
    TreeSet<String> known = new TreeSet<>();
    for (RecordComponent c : components) {
      known.add(c.getName());
    }
    TreeSet<String> unknown = new TreeSet<>(settings.keySet());
    unknown.removeAll(known);
    if (!unknown.isEmpty()) {
      throw new MorphscoutException("unknown setting" + (unknown.size() > 1 ? "s " : " ") + String.join(", ", unknown)
          + " in " + source + "; known settings: " + String.join(", ", known));
    }
    List<Object> values = new ArrayList<>();
    Class<?>[] types = new Class<?>[components.length];
    for (int i = 0; i < components.length; i++) {
      RecordComponent c = components[i];
      types[i] = c.getType();
      String raw = settings.get(c.getName());
      values.add(raw == null ? read(base, c) : parse(c, raw.trim(), source));
    }
    try {
      Constructor<R> ctor = type.getDeclaredConstructor(types);
      return ctor.newInstance(values.toArray());
    } catch (InvocationTargetException e) {
      Throwable cause = e.getCause();
      throw new MorphscoutException("invalid settings in " + source + ": " + cause.getMessage(), cause);
    } catch (ReflectiveOperationException e) {
      throw new IllegalStateException("cannot build " + type.getSimpleName(), e);
    }
  }

  private static Object read(Record base, RecordComponent c) {
    try {
      return c.getAccessor().invoke(base);
    } catch (ReflectiveOperationException e) {
      throw new IllegalStateException("cannot read " + c.getName(), e);
    }
  }

  private static Object parse(RecordComponent c, String raw, String source) {
    Class<?> t = c.getType();
    try {
      if (t == double.class) {
        double v = Double.parseDouble(raw);
        if (!Double.isFinite(v)) {
          throw new NumberFormatException();
        }
        return v;
      }
      if (t == int.class) {
        return Integer.parseInt(raw);
      }
      if (t == boolean.class) {
        if (!raw.equalsIgnoreCase("true") && !raw.equalsIgnoreCase("false")) {
          throw new NumberFormatException();
        }
        return Boolean.parseBoolean(raw);
      }
    } catch (NumberFormatException e) {
      String kind = t == double.class ? "a number" : t == int.class ? "a whole number" : "true or false";
      throw new MorphscoutException("setting " + c.getName() + " in " + source + " must be " + kind + ", got '"
          + raw + "'", e);
    }
    throw new IllegalStateException("unsupported setting type " + t + " for " + c.getName());
  }
}
