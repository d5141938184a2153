package org.morphscout.app.gui.indexing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.junit.jupiter.api.Test;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;

class UiProgressTest {
  /** A runner whose UI queue is drained only when the test says so, like a busy JavaFX thread. */
  static final class QueuedRunner implements TaskRunner {
    final List<Runnable> queue = new ArrayList<>();

    @Override
    public <T> TaskHandle submit(String name, Work<T> work, Consumer<? super T> ok, Consumer<Throwable> fail) {
      throw new UnsupportedOperationException();
    }

    @Override
    public void onUiThread(Runnable action) {
      queue.add(action);
    }
  }

  @Test
  void thousandsOfUpdatesBecomeOneUiCallShowingTheLatest() {
    QueuedRunner runner = new QueuedRunner();
    ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper();
    ReadOnlyStringWrapper phase = new ReadOnlyStringWrapper();
    ReadOnlyStringWrapper item = new ReadOnlyStringWrapper();
    IndexingViewModel.UiProgress p = new IndexingViewModel.UiProgress(runner, progress, phase, item);
    p.phase("analysing", 5000);
    for (int i = 1; i <= 5000; i++) {
      p.progressed(i, "img" + i + ".jpg");
    }
    assertThat(runner.queue).hasSize(1);
    runner.queue.remove(0).run();
    assertThat(progress.get()).isEqualTo(1.0);
    assertThat(phase.get()).isEqualTo("analysing 5000 / 5000");
    assertThat(item.get()).isEqualTo("img5000.jpg");
    p.progressed(10, "x");
    assertThat(runner.queue).hasSize(1);
  }
}
