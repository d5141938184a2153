package org.morphscout.indexer.text;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import java.time.ZoneId;
import org.junit.jupiter.api.Test;

class HumanTimeTest {
  @Test
  void showsTheLocalDateAndTimeToTheMinute() {
    Instant t = Instant.parse("2026-12-03T21:15:04.123456Z");
    assertThat(HumanTime.of(t, ZoneId.of("UTC"))).isEqualTo("2026-12-03 21:15");
    // Central European Time is UTC+1 in December (the IANA time zone database)
    assertThat(HumanTime.of(t, ZoneId.of("Europe/Paris"))).isEqualTo("2026-12-03 22:15");
    assertThat(HumanTime.localIso("2026-12-03T21:15:04.123456Z")).isEqualTo(HumanTime.local(t))
        .matches("\\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2}");
    assertThat(HumanTime.localIso("yesterday")).isEqualTo("yesterday");
    assertThat(HumanTime.localIso(null)).isEmpty();
  }

  @Test
  void writesFiguresToThreeSignificantDigits() {
    assertThat(Figures.threeDigits(0.021345)).isEqualTo("0.0213");
    assertThat(Figures.threeDigits(0.15649)).isEqualTo("0.156");
    assertThat(Figures.threeDigits(1234.5)).isEqualTo("1230");
    assertThat(Figures.threeDigits(Double.POSITIVE_INFINITY)).isEqualTo("–");
  }
}
