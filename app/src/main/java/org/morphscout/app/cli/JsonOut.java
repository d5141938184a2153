package org.morphscout.app.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;
import java.io.UncheckedIOException;

/** Writes JSON documents to a command's stdout, pretty-printed, one document a run. */
final class JsonOut {
  static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

  private JsonOut() {}

  static void write(PrintWriter out, Object document) {
    try {
      out.println(MAPPER.writeValueAsString(document));
      out.flush();
    } catch (JsonProcessingException e) {
      throw new UncheckedIOException(e);
    }
  }
}
