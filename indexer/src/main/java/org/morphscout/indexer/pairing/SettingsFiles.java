package org.morphscout.indexer.pairing;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Properties;
import org.morphscout.indexer.MorphscoutException;

/**
 * Reads a settings file into key/value strings: a {@code .json} object of scalars, or of groups of scalars (a group's
 * members are read with the group's name and a dot before them), or a {@code .properties} file.
 */
final class SettingsFiles {
  private static final ObjectMapper JSON = new ObjectMapper();

  private SettingsFiles() {}

  static Map<String, String> read(Path file) throws IOException {
    String name = file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
    Map<String, String> out = new LinkedHashMap<>();
    if (name.endsWith(".json")) {
      JsonNode root;
      try {
        root = JSON.readTree(file.toFile());
      } catch (JsonProcessingException e) {
        throw new MorphscoutException("settings file " + file + " is not valid JSON: " + e.getOriginalMessage(), e);
      }
      if (root == null || !root.isObject()) {
        throw new MorphscoutException("settings file " + file + " must hold one JSON object of name: value pairs");
      }
      for (Map.Entry<String, JsonNode> e : root.properties()) {
        if (e.getValue().isObject()) {
          // A group, e.g. {"silhouetteMatch": {"weight": 3}}: its members are read as silhouetteMatch.weight.
          for (Map.Entry<String, JsonNode> m : e.getValue().properties()) {
            put(out, e.getKey() + "." + m.getKey(), m.getValue(), file);
          }
        } else {
          put(out, e.getKey(), e.getValue(), file);
        }
      }
      return out;
    }
    if (name.endsWith(".properties")) {
      Properties p = new Properties();
      try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
        p.load(r);
      } catch (java.nio.charset.CharacterCodingException e) {
        throw new MorphscoutException("settings file " + file + " is not UTF-8 text: save it as UTF-8", e);
      } catch (IllegalArgumentException e) {
        // Properties.load refuses a malformed unicode escape this way.
        throw new MorphscoutException("settings file " + file + " is not a valid .properties file: "
            + e.getMessage(), e);
      }
      for (String key : p.stringPropertyNames()) {
        out.put(key, p.getProperty(key));
      }
      return out;
    }
    throw new MorphscoutException("settings file " + file + " must end in .json or .properties");
  }

  private static void put(Map<String, String> out, String key, JsonNode value, Path file) {
    if (!value.isValueNode()) {
      throw new MorphscoutException("setting " + key + " in " + file + " must be a number");
    }
    if (out.put(key, value.asText()) != null) {
      throw new MorphscoutException("setting " + key + " is given twice in " + file);
    }
  }
}
