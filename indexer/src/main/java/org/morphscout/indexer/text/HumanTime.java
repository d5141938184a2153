package org.morphscout.indexer.text;

import java.time.Instant;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;

/**
 * Times written for people: the local date and time to the minute ({@code 2026-12-03 22:15}), never a raw count of
 * micro- or milliseconds. Machine outputs (JSON, CSV) keep ISO-8601 instants.
 */
public final class HumanTime {
  private static final DateTimeFormatter FORMAT = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

  private HumanTime() {}

  /** {@code instant} in the given zone, to the minute. */
  public static String of(Instant instant, ZoneId zone) {
    return FORMAT.format(instant.atZone(zone));
  }

  /** {@code instant} in this machine's zone, to the minute. */
  public static String local(Instant instant) {
    return of(instant, ZoneId.systemDefault());
  }

  /** A time stored as milliseconds since 1970 (file modification times), in this machine's zone. */
  public static String localMillis(long epochMillis) {
    return local(Instant.ofEpochMilli(epochMillis));
  }

  /** A stored ISO-8601 instant ({@code 2026-12-03T21:15:04.123456Z}) in this machine's zone; other text as given. */
  public static String localIso(String iso) {
    if (iso == null || iso.isBlank()) {
      return "";
    }
    try {
      return local(Instant.parse(iso));
    } catch (DateTimeParseException e) {
      return iso; // not an instant (a catalog written by hand): show it as stored rather than nothing
    }
  }
}
