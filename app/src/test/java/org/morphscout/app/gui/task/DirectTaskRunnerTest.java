package org.morphscout.app.gui.task;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.progress.CancellationToken;

class DirectTaskRunnerTest {
  private final DirectTaskRunner runner = new DirectTaskRunner();
  private final List<String> events = new ArrayList<>();

  @Test
  void resultGoesToOnSuccessOnly() {
    TaskHandle h = runner.submit("t", token -> 6 * 7, r -> events.add("ok " + r), e -> events.add("failed"));
    assertThat(events).containsExactly("ok 42");
    assertThat(h.isDone()).isTrue();
  }

  @Test
  void exceptionGoesToOnFailureOnly() {
    runner.submit("t", token -> {
      throw new java.io.IOException("disk gone");
    }, r -> events.add("ok"), e -> events.add("failed " + e.getMessage()));
    assertThat(events).containsExactly("failed disk gone");
  }

  @Test
  void cancellationIsNeitherSuccessNorFailure() {
    runner.submit("t", token -> {
      token.cancel();
      token.throwIfCancelled();
      return 1;
    }, r -> events.add("ok"), e -> events.add("failed"));
    assertThat(events).isEmpty();
  }

  @Test
  void cancelledExceptionWithoutCancelIsStillCancellation() {
    runner.submit("t", token -> {
      throw new CancellationToken.CancelledException();
    }, r -> events.add("ok"), e -> events.add("failed"));
    assertThat(events).isEmpty();
  }
}
