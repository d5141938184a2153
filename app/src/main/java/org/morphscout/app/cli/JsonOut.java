package org.morphscout.app.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.io.UncheckedIOException;

/**
 * Writes JSON documents to a command's stdout, pretty-printed, one document a run. Numbers are written in plain
 * notation ({@code 0.0005}, not {@code 5.0E-4}), as the text and CSV outputs write them.
 */
final class JsonOut {
  static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
      .registerModule(new SimpleModule("plain-numbers").addSerializer(Double.class, new PlainDouble()));

  /** A finite double in plain decimal notation; NaN and infinities as Jackson writes them. */
  private static final class PlainDouble extends StdSerializer<Double> {
    PlainDouble() {
      super(Double.class);
    }

    @Override
    public void serialize(Double v, JsonGenerator g, SerializerProvider p) throws IOException {
      if (Double.isFinite(v) && v != 0 && Math.abs(v) < 1e-3) { // where Java's own form turns scientific
        g.writeNumber(BigDecimal.valueOf(v).stripTrailingZeros().toPlainString());
      } else {
        g.writeNumber(v);
      }
    }
  }

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
