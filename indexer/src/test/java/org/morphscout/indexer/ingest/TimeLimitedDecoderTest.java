package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

class TimeLimitedDecoderTest {
  private static final Path FILE = Path.of("slow.jpg");
  private static final DecodedImage IMAGE =
      new DecodedImage(new BufferedImage(1, 1, BufferedImage.TYPE_INT_ARGB), 1, 1, "jpeg", 1, false);

  @Test
  void slowDecodeIsCutOffWithATimeOutReason() throws Exception {
    // The decode blocks until it is interrupted (or, were the limit broken, until the test releases it at the end),
    // so only the limit can end the call with TIMED_OUT; no time is measured.
    CountDownLatch never = new CountDownLatch(1);
    CountDownLatch interrupted = new CountDownLatch(1);
    ImageDecoder slow = file -> {
      try {
        never.await();
      } catch (InterruptedException e) {
        interrupted.countDown();
        Thread.currentThread().interrupt();
      }
      return IMAGE;
    };
    // 1.5 s: the worker starts (and so can be interrupted) well within the limit even on a loaded machine.
    try (TimeLimitedDecoder limited = new TimeLimitedDecoder(slow, Duration.ofMillis(1500))) {
      assertThatThrownBy(() -> limited.decode(FILE))
          .isInstanceOfSatisfying(ImageReadException.class, e -> {
            assertThat(e.failure()).isEqualTo(ReadFailure.TIMED_OUT);
            assertThat(e.reason()).isEqualTo("decoding took longer than the 1500 ms limit");
          });
      // The worker is interrupted by the cut-off itself, before close() would (the wait only guards against a hang).
      assertThat(interrupted.await(60, TimeUnit.SECONDS)).as("the cut-off decode was interrupted").isTrue();
    } finally {
      never.countDown();
    }
  }

  @Test
  void resultsAndFailuresPassThrough() throws Exception {
    try (TimeLimitedDecoder ok = new TimeLimitedDecoder(file -> IMAGE, Duration.ofSeconds(5))) {
      assertThat(ok.decode(FILE)).isSameAs(IMAGE);
    }
    ImageDecoder failing = file -> {
      throw new ImageReadException(file, ReadFailure.EMPTY, "empty file (0 bytes)");
    };
    try (TimeLimitedDecoder limited = new TimeLimitedDecoder(failing, Duration.ofSeconds(5))) {
      assertThatThrownBy(() -> limited.decode(FILE)).isInstanceOf(ImageReadException.class)
          .hasMessageContaining("empty file");
    }
    ImageDecoder ioFailing = file -> {
      throw new IOException("disk on fire");
    };
    try (TimeLimitedDecoder limited = new TimeLimitedDecoder(ioFailing, Duration.ofSeconds(5))) {
      assertThatThrownBy(() -> limited.decode(FILE)).isInstanceOf(IOException.class).hasMessage("disk on fire");
    }
  }

  @Test
  void interruptedDecodeStopsWithTheTimeOutReason(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
    Path file = TestImages.write(dir, "a.png", TestImages.encode(TestImages.filled(300, 200, 0xFF00FF00), "png"));
    ImageIoDecoder decoder = new ImageIoDecoder(DecodeOptions.defaults());
    Thread.currentThread().interrupt();
    try {
      assertThatThrownBy(() -> decoder.decode(file))
          .isInstanceOfSatisfying(ImageReadException.class,
              e -> assertThat(e.failure()).as(e.reason()).isEqualTo(ReadFailure.TIMED_OUT));
    } finally {
      Thread.interrupted(); // clear the flag for the next test
    }
    assertThat(decoder.decode(file).width()).isEqualTo(300);
  }

  @Test
  void workerThreadsAreNamed() throws Exception {
    try (TimeLimitedDecoder limited = new TimeLimitedDecoder(file -> {
      assertThat(Thread.currentThread().getName()).startsWith("morphscout-decode-");
      return IMAGE;
    }, Duration.ofSeconds(5))) {
      assertThat(limited.decode(FILE)).isSameAs(IMAGE);
    }
  }
}
