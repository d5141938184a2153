package org.morphscout.demo;

import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;

/** Named daemon threads for the generator's pool ({@code morphscout-demo-1}, ...). */
final class DemoThreads implements ThreadFactory {
  private final AtomicInteger next = new AtomicInteger(1);

  @Override
  public Thread newThread(Runnable r) {
    Thread t = new Thread(r, "morphscout-demo-" + next.getAndIncrement());
    t.setDaemon(true);
    return t;
  }
}
